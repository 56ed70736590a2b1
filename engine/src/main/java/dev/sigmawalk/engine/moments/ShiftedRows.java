package dev.sigmawalk.engine.moments;

import dev.sigmawalk.engine.data.ReturnPanel;

/**
 * Reads a panel's excess returns as deviations from a per-column shift: for a row t the
 * columns 0..N−1 hold d_ti = (r_ti − rf_t) − c_i and column N holds d_tm = (r_mt − rf_t) − c_m.
 * A missing return gives d_ti = 0, so it adds nothing to any sum.
 */
final class ShiftedRows {
    private final ReturnPanel panel;
    private final int assets;

    ShiftedRows(ReturnPanel panel) {
        this.panel = panel;
        this.assets = panel.assetCount();
    }

    /** N + 1: the assets and the market. */
    int width() {
        return assets + 1;
    }

    /** Index of the market in a row. */
    int marketIndex() {
        return assets;
    }

    /**
     * Writes the deviations of panel row {@code row} into {@code out[at .. at+N]}, multiplied by
     * {@code sign} (±1, exact), and adds the signed deviations to {@code sum} when it is not null
     * (so a removed row, sign −1, is subtracted).
     */
    void fill(int row, double[] shift, double sign, double[] out, int at, double[] sum) {
        double[] r = panel.rawReturns();
        double rf = panel.riskFree(row);
        int src = row * assets;
        for (int i = 0; i < assets; i++) {
            double x = r[src + i];
            double d = Double.isNaN(x) ? 0.0 : (x - rf) - shift[i];
            out[at + i] = sign * d;
        }
        double dm = (panel.market(row) - rf) - shift[assets];
        out[at + assets] = sign * dm;
        if (sum != null) {
            for (int i = 0; i <= assets; i++) {
                sum[i] += out[at + i];
            }
        }
    }

    /**
     * Per-column means of the present excess returns over rows first..last (0 for a column with
     * none), the market's in the last place: the shift that makes a window's deviations small.
     */
    double[] windowMeans(int first, int last) {
        double[] r = panel.rawReturns();
        double[] total = new double[assets + 1];
        int[] count = new int[assets + 1];
        for (int row = first; row <= last; row++) {
            double rf = panel.riskFree(row);
            int src = row * assets;
            for (int i = 0; i < assets; i++) {
                double x = r[src + i];
                if (!Double.isNaN(x)) {
                    total[i] += x - rf;
                    count[i]++;
                }
            }
            total[assets] += panel.market(row) - rf;
            count[assets]++;
        }
        for (int i = 0; i <= assets; i++) {
            total[i] = count[i] == 0 ? 0.0 : total[i] / count[i];
        }
        return total;
    }
}
