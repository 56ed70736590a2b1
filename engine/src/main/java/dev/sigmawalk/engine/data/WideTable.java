package dev.sigmawalk.engine.data;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;

/**
 * A wide CSV as read: strictly increasing dates by named columns of numbers (NaN = empty cell),
 * with the line each row came from. Package-private; arrays are owned by this object and never
 * handed out for writing.
 *
 * @param file the file read
 * @param columns the value columns' header names (without {@code date})
 * @param dates one per row, strictly increasing
 * @param lines 1-based line of each row in {@code file}
 * @param values row-major rows × columns
 */
record WideTable(Path file, List<String> columns, LocalDate[] dates, int[] lines, double[] values) {
    WideTable {
        columns = List.copyOf(columns);
        if (lines.length != dates.length || values.length != dates.length * columns.size()) {
            throw new IllegalArgumentException("wide table arrays disagree: " + dates.length + " dates, "
                    + lines.length + " lines, " + values.length + " values for " + columns.size() + " columns");
        }
    }

    int rows() {
        return dates.length;
    }

    int columnCount() {
        return columns.size();
    }

    double value(int row, int col) {
        return values[row * columns.size() + col];
    }

    /** Column index of {@code name}, or -1. */
    int columnIndex(String name) {
        return columns.indexOf(name);
    }

    /** A copy of one column. */
    double[] column(int col) {
        int cols = columns.size();
        double[] out = new double[dates.length];
        for (int t = 0; t < out.length; t++) {
            out[t] = values[t * cols + col];
        }
        return out;
    }
}
