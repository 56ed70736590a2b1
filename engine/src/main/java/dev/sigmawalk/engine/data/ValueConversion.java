package dev.sigmawalk.engine.data;

import dev.sigmawalk.engine.study.ValueKind;

/**
 * Turns a column of values into per-row simple returns (Method §1). Returns pass through. With
 * prices, r_t = P_t / P_{t−1} − 1 from two consecutive rows; the first row and a row after a
 * missing price give no return, so the panel starts at the second row ({@link #offset} = 1).
 */
final class ValueConversion {
    private ValueConversion() {
    }

    /** Rows of the file before panel row 0: 1 with prices, 0 with returns. */
    static int offset(ValueKind kind) {
        return kind == ValueKind.PRICES ? 1 : 0;
    }

    /**
     * Returns of a row-major block: column {@code col} of {@code values} (rows × cols) written into
     * column {@code outCol} of {@code out} (panel rows × outCols). NaN stays NaN; a NaN price
     * makes its own and the next row's return NaN.
     */
    static void convert(ValueKind kind, double[] values, int cols, int col, double[] out, int outCols, int outCol) {
        int offset = offset(kind);
        int panelRows = out.length / outCols;
        for (int t = 0; t < panelRows; t++) {
            double current = values[(t + offset) * cols + col];
            double r = kind == ValueKind.PRICES ? current / values[t * cols + col] - 1.0 : current;
            out[t * outCols + outCol] = r;
        }
    }

    /** {@link #convert} for a single series. */
    static double[] convert(ValueKind kind, double[] series) {
        double[] out = new double[series.length - offset(kind)];
        convert(kind, series, 1, 0, out, 1, 0);
        return out;
    }
}
