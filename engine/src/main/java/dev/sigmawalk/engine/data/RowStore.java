package dev.sigmawalk.engine.data;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Arrays;
import java.util.List;

/**
 * The rows of a wide file as they are read: dates, lines and one row-major {@code double[]}.
 * Once the first row's length in bytes is known, the store is sized for the whole file (its
 * size over that length, plus 2 %), so a large file is laid out about once rather than doubled
 * again and again; a file of shorter rows than its first grows by half at a time.
 */
final class RowStore {
    private static final String DATE = "date";

    private final int cols;
    private final long fileBytes;
    private final long headerEnd;
    private LocalDate[] dates;
    private int[] lines;
    private double[] values;
    int count;

    /**
     * @param cols values per row
     * @param fileBytes the file's size
     * @param headerEnd the file offset just after the header line
     * @param capacity rows to hold before the first row is measured
     */
    RowStore(int cols, long fileBytes, long headerEnd, int capacity) {
        this.cols = cols;
        this.fileBytes = fileBytes;
        this.headerEnd = headerEnd;
        this.dates = new LocalDate[capacity];
        this.lines = new int[capacity];
        this.values = new double[Math.multiplyExact(capacity, cols)];
    }

    /** Refuses a date that does not come after the previous row's. */
    void requireAfterLast(LocalDate date, Path file, int line, String cell) {
        if (count == 0 || date.isAfter(dates[count - 1])) {
            return;
        }
        LocalDate previous = dates[count - 1];
        if (date.equals(previous)) {
            throw new InputException(new InputException.Location(file, line, DATE),
                    "'" + cell + "' repeats the date on line " + lines[count - 1]
                            + "; dates must be strictly increasing with no duplicates");
        }
        throw new InputException(new InputException.Location(file, line, DATE),
                "'" + cell + "' comes before " + previous + " on line " + lines[count - 1]
                        + "; dates must be strictly increasing");
    }

    /** Whether {@code date} comes after the previous row's (always, for the first row). */
    boolean isAfterLast(LocalDate date) {
        return count == 0 || date.isAfter(dates[count - 1]);
    }

    /** The array to write the next row's values into, from {@code count · cols}. */
    double[] ensureRoom() {
        if (count == dates.length) {
            grow(count + Math.max(count / 2, 16));
        }
        return values;
    }

    /**
     * Keeps the row whose values were written.
     *
     * @param offsetAfter the file offset just after the row's line, which sizes the store at the first row
     */
    void commit(LocalDate date, int line, long offsetAfter) {
        dates[count] = date;
        lines[count] = line;
        count++;
        if (count == 1) {
            long perRow = Math.max(1, offsetAfter - headerEnd);
            long expected = (fileBytes - headerEnd) / perRow + 1;
            long sized = expected + expected / 50 + 2;
            if (sized > dates.length && sized * cols < Integer.MAX_VALUE) {
                grow((int) sized);
            }
        }
    }

    private void grow(int capacity) {
        dates = Arrays.copyOf(dates, capacity);
        lines = Arrays.copyOf(lines, capacity);
        values = Arrays.copyOf(values, Math.multiplyExact(capacity, cols));
    }

    WideTable toTable(Path file, List<String> columns) {
        double[] exact = values.length == count * cols ? values : Arrays.copyOf(values, count * cols);
        values = null;
        return new WideTable(file, columns, Arrays.copyOf(dates, count), Arrays.copyOf(lines, count), exact);
    }
}
