package dev.sigmawalk.engine.data;

import java.nio.file.Path;

/**
 * Names that sigmawalk writes back into its output CSV files (assets, sectors, strategies) must
 * be inert when those files are opened in a spreadsheet. A cell that starts with {@code =},
 * {@code +}, {@code -} or {@code @} (or a tab or carriage return) is read as a formula there, the
 * "CSV injection" of the OWASP guidance; such names are refused where they are read, so every
 * name in the outputs is exactly the name in the inputs.
 */
public final class Names {
    private static final String FORMULA_STARTS = "=+-@\t\r";

    private Names() {
    }

    /** Whether {@code name} starts with a character a spreadsheet takes as the start of a formula. */
    public static boolean startsLikeFormula(String name) {
        return !name.isEmpty() && FORMULA_STARTS.indexOf(name.charAt(0)) >= 0;
    }

    /** What to tell the user about such a name, phrased to follow the quoted name. */
    public static String formulaProblem(String what) {
        return "starts with a character that a spreadsheet runs as a formula when it opens the output CSV files;"
                + " rename the " + what + " so that it does not start with = + - @";
    }

    /** Refuses a formula-like name read from a CSV cell. */
    static String requireInert(String name, Path file, int line, String column, String what) {
        if (startsLikeFormula(name)) {
            throw new InputException(new InputException.Location(file, line, column),
                    "'" + name + "' " + formulaProblem(what));
        }
        return name;
    }
}
