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
 * @param lines 1-based line of each row in {@code file} (for a long file, the first line of the row's date)
 * @param values row-major rows × columns
 * @param cellLines for a long file, the line of every cell (0 where the file has no row for it),
 *        row-major like {@code values}; {@code null} for a wide file, where a cell's line is its row's
 */
record WideTable(Path file, List<String> columns, LocalDate[] dates, int[] lines, double[] values, int[] cellLines) {
    WideTable {
        columns = List.copyOf(columns);
        if (lines.length != dates.length || values.length != dates.length * columns.size()
                || cellLines != null && cellLines.length != values.length) {
            throw new IllegalArgumentException("wide table arrays disagree: " + dates.length + " dates, "
                    + lines.length + " lines, " + values.length + " values for " + columns.size() + " columns");
        }
    }

    /** A table read from a wide file, where every cell sits on its row's line. */
    WideTable(Path file, List<String> columns, LocalDate[] dates, int[] lines, double[] values) {
        this(file, columns, dates, lines, values, null);
    }

    /** The line of the cell at {@code row}, {@code col}; 0 when a long file has no row for it. */
    int line(int row, int col) {
        return cellLines == null ? lines[row] : cellLines[row * columns.size() + col];
    }

    /** The line of every cell of column {@code col}, one per row. */
    int[] columnLines(int col) {
        int[] out = new int[dates.length];
        for (int t = 0; t < out.length; t++) {
            out[t] = line(t, col);
        }
        return out;
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
