package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.moments.CrossProducts;

/**
 * A window's demeaned excess returns stored asset by asset, x̃_ti at {@code i*L + t} (n×L
 * row-major, the transpose of the window's layout), with the sums over the L×L side that the
 * low-rank forms need: for a matrix U of L rows and n columns, Σ_ij (u_i'u_j)² = ‖U'U‖²_F equals
 * ‖UU'‖²_F, the squared norm of the L×L Gram matrix, which costs O(L² n) instead of O(L n²).
 */
final class CentredColumns {
    private final int n;
    private final int len;
    private final double[] columns;
    private final double[] market;

    private CentredColumns(int n, int len, double[] columns, double[] market) {
        this.n = n;
        this.len = len;
        this.columns = columns;
        this.market = market;
    }

    /** Transposes the centred rows of {@code window}: O(L n). */
    static CentredColumns of(CentredWindow window) {
        int n = window.assets();
        int len = window.length();
        double[] cols = new double[n * len];
        double[] y = new double[len];
        double[] x = new double[n];
        for (int t = 0; t < len; t++) {
            y[t] = window.row(t, x);
            for (int i = 0; i < n; i++) {
                cols[i * len + t] = x[i];
            }
        }
        return new CentredColumns(n, len, cols, y);
    }

    /** n. */
    int assets() {
        return n;
    }

    /** L. */
    int length() {
        return len;
    }

    /** x̃_ti at {@code i*L + t} (read-only). */
    double[] columns() {
        return columns;
    }

    /** ỹ_t, the demeaned market excess returns (read-only). */
    double[] market() {
        return market;
    }

    /**
     * The residuals of each asset's regression on the demeaned market through the origin,
     * e_ti = x̃_ti − ỹ_t b_i with b_i = x̃_i'ỹ / ỹ'ỹ, in the same n×L layout. Because both are
     * demeaned, these are the market model's OLS residuals with an intercept.
     *
     * @param slope b_i, length n
     */
    double[] residuals(double[] slope) {
        double[] e = new double[n * len];
        for (int i = 0; i < n; i++) {
            int base = i * len;
            double b = slope[i];
            for (int t = 0; t < len; t++) {
                e[base + t] = columns[base + t] - market[t] * b;
            }
        }
        return e;
    }

    /** ‖UU'‖²_F = Σ_ij (u_i'u_j)² for U stored n×L like {@link #columns()}: the L×L Gram through the blocked kernel. */
    static double gramNormSquared(double[] u, int n, int len) {
        return normSquared(gram(u, n, len), len);
    }

    /** The upper triangle of UU' (L×L row-major) for U stored n×L, O(L² n). */
    static double[] gram(double[] u, int n, int len) {
        double[] gram = new double[len * len];
        CrossProducts.accumulate(u, u, n, len, gram);
        return gram;
    }

    /** ‖G‖²_F of a symmetric L×L matrix given by its upper triangle. */
    static double normSquared(double[] upper, int len) {
        double diagonal = 0;
        double off = 0;
        for (int s = 0; s < len; s++) {
            int row = s * len;
            diagonal += upper[row + s] * upper[row + s];
            for (int t = s + 1; t < len; t++) {
                off += upper[row + t] * upper[row + t];
            }
        }
        return diagonal + 2 * off;
    }

    /**
     * The upper triangle of X̃X̃' from that of EE' for X̃ = E + ỹβ' (E the residuals of
     * {@link #residuals}): EE' + vỹ' + ỹv' + (β'β)ỹỹ' with v = Eβ, in O(L n + L²).
     */
    static double[] withMarket(double[] residualGram, double[] e, double[] slope, double[] market, int n, int len) {
        double[] v = new double[len];
        double bb = 0;
        for (int i = 0; i < n; i++) {
            double b = slope[i];
            bb += b * b;
            int base = i * len;
            for (int t = 0; t < len; t++) {
                v[t] += e[base + t] * b;
            }
        }
        double[] g = residualGram.clone();
        for (int s = 0; s < len; s++) {
            for (int t = s; t < len; t++) {
                g[s * len + t] += v[s] * market[t] + market[s] * v[t] + bb * market[s] * market[t];
            }
        }
        return g;
    }

    /** Σ_i (u_i'u_i)² for U stored n×L: the squared diagonal of U'U, O(L n). */
    static double ownNormsSquared(double[] u, int n, int len) {
        double sum = 0;
        for (int i = 0; i < n; i++) {
            int base = i * len;
            double norm = 0;
            for (int t = 0; t < len; t++) {
                norm += u[base + t] * u[base + t];
            }
            sum += norm * norm;
        }
        return sum;
    }
}
