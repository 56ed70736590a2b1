package dev.sigmawalk.engine.data;

import java.nio.file.Path;
import java.util.Objects;

/**
 * A problem with something the user supplied (study file, data file, command line). The message
 * always names where the problem is and what was expected, so the user can fix it without
 * reading code. The command line maps this exception to exit code 2.
 */
public final class InputException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final Location location;

    /** Where in a user's file a problem sits. {@code line} and {@code column} are 1-based; 0 = unknown. */
    public record Location(Path file, int line, String column) {
        public Location {
            Objects.requireNonNull(file, "file");
            if (line < 0) {
                throw new IllegalArgumentException("line (" + line + ") must be >= 0");
            }
        }

        /** Renders as {@code assets.csv line 214, column 'H07'}. */
        public String describe() {
            StringBuilder sb = new StringBuilder(String.valueOf(file.getFileName() == null ? file : file.getFileName()));
            if (line > 0) {
                sb.append(" line ").append(line);
            }
            if (column != null && !column.isEmpty()) {
                sb.append(line > 0 ? ", column '" : " column '").append(column).append('\'');
            }
            return sb.toString();
        }
    }

    public InputException(Location location, String problem) {
        super(location.describe() + ": " + problem);
        this.location = location;
    }

    /**
     * For a position in a text file given by line and column numbers (a YAML study file), rendered
     * as {@code demo.yaml line 7, column 3: problem}.
     *
     * @param file the file
     * @param line 1-based line
     * @param columnNumber 1-based character column
     * @param problem what is wrong and what was expected
     */
    public static InputException at(Path file, int line, int columnNumber, String problem) {
        Location location = new Location(file, line, null);
        String where = location.describe() + (columnNumber > 0 ? ", column " + columnNumber : "");
        return new InputException(location, where + ": " + problem, true);
    }

    /** The message is already complete; {@code preformatted} only tells this constructor apart. */
    private InputException(Location location, String message, boolean preformatted) {
        super(message);
        this.location = location;
    }

    /** For problems with no file position (for example a command-line value). */
    public InputException(String message) {
        super(message);
        this.location = null;
    }

    /** The file position, or {@code null} when the problem has none. */
    public Location location() {
        return location;
    }
}
