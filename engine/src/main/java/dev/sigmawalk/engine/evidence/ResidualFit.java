package dev.sigmawalk.engine.evidence;

import dev.sigmawalk.engine.model.EstimationWindow;
import java.util.List;
import java.util.Objects;

/**
 * The market-model regression of every asset of one estimation window, fitted from the window's
 * own rows in O(L n) (Method §8): x̄_i, m̄, β_i = Σ_t (x_ti − x̄_i)(m_t − m̄) / Σ_t (m_t − m̄)² and
 * the residuals e_ti = (x_ti − x̄_i) − β_i (m_t − m̄) (least squares with an intercept, so every
 * e_i has mean zero and is orthogonal to the market). No moment matrix is formed.
 *
 * <p>Kept per asset: the total sum of squares Σ_t (x_ti − x̄_i)² and the residual one Σ_t e_ti²,
 * whose ratio decides whether an asset has a residual at all (it moves exactly with the market
 * when the residual is rounding dust), see {@link #hasResidual}.
 */
public final class ResidualFit {
    /** A residual sum of squares at or below this share of the asset's total counts as zero. */
    public static final double RELATIVE_ZERO_VARIANCE = ResidualCorrelations.RELATIVE_ZERO_VARIANCE;

    private final List<String> assets;
    private final int length;
    private final double[] residuals;
    private final double[] total;
    private final double[] residual;

    private ResidualFit(List<String> assets, int length, double[] residuals, double[] total, double[] residual) {
        this.assets = assets;
        this.length = length;
        this.residuals = residuals;
        this.total = total;
        this.residual = residual;
    }

    /**
     * Fits every asset of a window.
     *
     * @param window at least 3 rows, a market that varies (else β is undefined)
     */
    public static ResidualFit of(EstimationWindow window) {
        Objects.requireNonNull(window, "window");
        int n = window.assetCount();
        int len = window.length();
        if (!(len >= 3)) {
            throw new IllegalArgumentException("window length (" + len + ") must be >= 3 for market-model residuals");
        }
        if (!window.marketVaries()) {
            // Compared exactly: centring a constant series can leave rounding dust, not zeros.
            throw new IllegalArgumentException("the market's excess return does not vary in the window: β is undefined");
        }
        double[] m = window.marketExcess();
        double[] centredMarket = centredMarket(m);
        double smm = 0;
        for (double v : centredMarket) {
            smm += v * v;
        }
        if (!(smm > 0) || Double.isInfinite(smm)) {
            throw new IllegalArgumentException("market sum of squares (" + smm + ") must be finite and > 0");
        }
        double[] x = window.excessReturns();
        double[] mean = columnMeans(x, len, n);
        double[] total = new double[n];
        double[] cross = new double[n];
        for (int t = 0; t < len; t++) {
            int row = t * n;
            double mt = centredMarket[t];
            for (int i = 0; i < n; i++) {
                double d = x[row + i] - mean[i];
                total[i] += d * d;
                cross[i] += d * mt;
            }
        }
        double[] beta = new double[n];
        for (int i = 0; i < n; i++) {
            beta[i] = cross[i] / smm;
        }
        double[] e = new double[len * n];
        double[] residual = new double[n];
        for (int t = 0; t < len; t++) {
            int row = t * n;
            double mt = centredMarket[t];
            for (int i = 0; i < n; i++) {
                double v = (x[row + i] - mean[i]) - beta[i] * mt;
                e[row + i] = v;
                residual[i] += v * v;
            }
        }
        return new ResidualFit(window.assets(), len, e, total, residual);
    }

    private static double[] centredMarket(double[] m) {
        double mean = 0;
        for (double v : m) {
            mean += v;
        }
        mean /= m.length;
        double[] out = new double[m.length];
        for (int t = 0; t < m.length; t++) {
            out[t] = m[t] - mean;
        }
        return out;
    }

    private static double[] columnMeans(double[] x, int len, int n) {
        double[] mean = new double[n];
        for (int t = 0; t < len; t++) {
            int row = t * n;
            for (int i = 0; i < n; i++) {
                mean[i] += x[row + i];
            }
        }
        for (int i = 0; i < n; i++) {
            mean[i] /= len;
        }
        return mean;
    }

    /** n. */
    public int assetCount() {
        return assets.size();
    }

    /** L. */
    public int length() {
        return length;
    }

    /**
     * Whether asset i has a market-model residual: its residual sum of squares is finite and above
     * {@value #RELATIVE_ZERO_VARIANCE} of its total (the rule {@link ResidualCorrelations} applies
     * to the moments, so both routes leave out the same assets).
     */
    public boolean hasResidual(int i) {
        double d = residual[Objects.checkIndex(i, assets.size())];
        return d > RELATIVE_ZERO_VARIANCE * total[i] && Double.isFinite(d);
    }

    /**
     * The standardised residuals z_i = e_i / ‖e_i‖ of the given assets, in the given order.
     *
     * @param keep ascending indices of assets that {@link #hasResidual}, at least two
     */
    public ResidualRows standardised(int[] keep) {
        int n = assets.size();
        int k = keep.length;
        if (!(k >= 2)) {
            throw new IllegalArgumentException("standardised residuals need >= 2 assets, got " + k);
        }
        double[] scale = new double[k];
        String[] ids = new String[k];
        for (int a = 0; a < k; a++) {
            int i = keep[a];
            if (!hasResidual(i) || a > 0 && !(i > keep[a - 1])) {
                throw new IllegalArgumentException("asset index " + i + " must be ascending and have a residual");
            }
            scale[a] = 1.0 / Math.sqrt(residual[i]);
            ids[a] = assets.get(i);
        }
        double[] z = new double[length * k];
        for (int t = 0; t < length; t++) {
            int from = t * n;
            int to = t * k;
            for (int a = 0; a < k; a++) {
                z[to + a] = residuals[from + keep[a]] * scale[a];
            }
        }
        return ResidualRows.of(List.of(ids), length, z);
    }
}
