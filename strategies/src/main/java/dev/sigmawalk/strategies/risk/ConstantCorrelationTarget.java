package dev.sigmawalk.strategies.risk;

/**
 * The constant-correlation shrinkage target of Ledoit &amp; Wolf (2004, J. Portfolio Management,
 * appendix): r̄ = 2/(n(n-1)) Σ_{i&lt;j} r_ij with r_ij = S_ij / √(S_ii S_jj), then
 * F_ij = r̄ √(S_ii S_jj) for i ≠ j and F_ii = S_ii. F carries the divisor of S (here L-1).
 *
 * <p>With one asset there is no pair: r̄ is reported as 0 and F = S.
 */
final class ConstantCorrelationTarget {
    private final double meanCorrelation;
    private final double[] matrix;

    private ConstantCorrelationTarget(double meanCorrelation, double[] matrix) {
        this.meanCorrelation = meanCorrelation;
        this.matrix = matrix;
    }

    /**
     * @param s n×n sample covariance, row-major
     * @throws IllegalArgumentException when a variance is not positive and finite (its
     *                                  correlations are then undefined)
     */
    static ConstantCorrelationTarget of(double[] s, int n) {
        double[] sd = new double[n];
        for (int i = 0; i < n; i++) {
            double v = s[i * n + i];
            if (!(v > 0) || !Double.isFinite(v)) {
                throw new IllegalArgumentException("variance of asset " + i + " (" + v
                        + ") must be finite and > 0 for the constant-correlation target");
            }
            sd[i] = Math.sqrt(v);
        }
        double sum = 0;
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                sum += s[i * n + j] / (sd[i] * sd[j]);
            }
        }
        double rBar = n > 1 ? 2.0 * sum / (n * (n - 1.0)) : 0.0;
        double[] f = new double[n * n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                f[i * n + j] = i == j ? s[i * n + i] : rBar * (sd[i] * sd[j]);
            }
        }
        return new ConstantCorrelationTarget(rBar, f);
    }

    /** r̄. */
    double meanCorrelation() {
        return meanCorrelation;
    }

    /** F, n×n row-major (owned by this object). */
    double[] matrix() {
        return matrix;
    }
}
