package dev.sigmawalk.engine.evidence;

/**
 * Is the single-index assumption (uncorrelated residuals) holding in one window? Method §8.
 *
 * <ul>
 *   <li>mean |ρ_ij| over the n(n-1)/2 pairs i &lt; j; the one statistic here that needs every pair
 *       by definition, so on very large windows it is computed only at some rebalances
 *       (Method §8) and is NaN, "not computed at this rebalance", at the others;</li>
 *   <li>Breusch &amp; Pagan (1980, Rev. Econ. Studies 47, 239-253) Lagrange-multiplier test of a
 *       diagonal residual covariance: LM = L Σ_{i&lt;j} ρ_ij², asymptotically χ² with
 *       n(n-1)/2 degrees of freedom as L grows with n fixed; p = P(χ² &gt; LM);</li>
 *   <li>Pesaran (2004, "General diagnostic tests for cross section dependence in panels", CESifo WP 1229) cross-section dependence test:
 *       CD = √(2L / (n(n-1))) Σ_{i&lt;j} ρ_ij, standard normal under the null; two-sided
 *       p = P(|Z| &gt; |CD|). Unlike LM it is not over-sized when n is large relative to L,
 *       but positive and negative correlations can cancel in it.</li>
 *   <li>the bias-adjusted LM of Pesaran, Ullah &amp; Yamagata (2008), {@link BiasAdjustedLm}, with
 *       every residual from the same regression on an intercept and the market (k = 2); upper-tail
 *       p. It needs d = L - 2 &gt; 4; on shorter windows both its values are NaN (not defined).</li>
 * </ul>
 *
 * <p>Breusch-Pagan's χ² reference is badly over-sized when n is not small against L (about 64 %
 * rejections at 5 % for n = 70, L = 36 with independent residuals), so verdicts rest on CD and
 * LM_adj; LM is kept for continuity.
 *
 * @param assets n
 * @param length L
 * @param meanAbsCorrelation mean |ρ_ij|, in [0, 1]; NaN when not computed at this rebalance
 * @param lmStatistic LM >= 0
 * @param lmDegreesOfFreedom n(n-1)/2
 * @param lmPValue in [0, 1]
 * @param cdStatistic CD
 * @param cdPValue two-sided, in [0, 1]
 * @param lmAdjStatistic LM_adj, finite; NaN when L - 2 &lt;= 4
 * @param lmAdjPValue upper-tail, in [0, 1]; NaN exactly when the statistic is
 */
public record ResidualDiagnostics(int assets, int length, double meanAbsCorrelation, double lmStatistic,
                                  int lmDegreesOfFreedom, double lmPValue, double cdStatistic, double cdPValue,
                                  double lmAdjStatistic, double lmAdjPValue) {
    public ResidualDiagnostics {
        if (!(assets >= 2)) {
            throw new IllegalArgumentException("assets (" + assets + ") must be >= 2");
        }
        if (lmDegreesOfFreedom != assets * (assets - 1) / 2) {
            throw new IllegalArgumentException("LM degrees of freedom (" + lmDegreesOfFreedom + ") must be n(n-1)/2 = "
                    + assets * (assets - 1) / 2);
        }
        if (!(meanAbsCorrelation >= 0 && meanAbsCorrelation <= 1) && !Double.isNaN(meanAbsCorrelation)) {
            throw new IllegalArgumentException("mean |residual correlation| (" + meanAbsCorrelation
                    + ") must be in [0, 1], or NaN when not computed");
        }
        if (!(lmStatistic >= 0) || Double.isInfinite(lmStatistic)) {
            throw new IllegalArgumentException("LM statistic (" + lmStatistic + ") must be finite and >= 0");
        }
        if (Double.isNaN(cdStatistic) || Double.isInfinite(cdStatistic)) {
            throw new IllegalArgumentException("CD statistic (" + cdStatistic + ") must be finite");
        }
        if (!(lmPValue >= 0 && lmPValue <= 1) || !(cdPValue >= 0 && cdPValue <= 1)) {
            throw new IllegalArgumentException("p-values (LM " + lmPValue + ", CD " + cdPValue + ") must be in [0, 1]");
        }
        if (Double.isNaN(lmAdjStatistic) != Double.isNaN(lmAdjPValue) || Double.isInfinite(lmAdjStatistic)
                || !(Double.isNaN(lmAdjPValue) || lmAdjPValue >= 0 && lmAdjPValue <= 1)) {
            throw new IllegalArgumentException("LM_adj (" + lmAdjStatistic + ", p " + lmAdjPValue
                    + ") must be finite with a p-value in [0, 1], or both NaN");
        }
    }

    /** Minimum window length for LM_adj with k = 2 regressors: d = L - 2 must exceed 4. */
    public static final int MIN_LM_ADJ_LENGTH = 7;

    /** True when LM_adj was defined for this window. */
    public boolean hasLmAdj() {
        return !Double.isNaN(lmAdjStatistic);
    }

    /** True when the mean |ρ| was computed at this rebalance. */
    public boolean hasMeanAbsCorrelation() {
        return !Double.isNaN(meanAbsCorrelation);
    }

    /** These statistics with the mean |ρ| of an all-pairs scan. */
    public ResidualDiagnostics withMeanAbsCorrelation(double mean) {
        return new ResidualDiagnostics(assets, length, mean, lmStatistic, lmDegreesOfFreedom, lmPValue, cdStatistic,
                cdPValue, lmAdjStatistic, lmAdjPValue);
    }

    /** Intercept and market. */
    private static final int SINGLE_INDEX_REGRESSORS = 2;

    /**
     * The statistics from the two sums over pairs i &lt; j, for single-index residuals (every asset
     * regressed on the same intercept and market, k = 2):
     * LM = L Σρ², CD = √(2L / (n(n-1))) Σρ and, since every pair then shares μ and v,
     * LM_adj = √(2 / (n(n-1))) (d Σρ² − P μ) / v with P = n(n-1)/2 ({@link BiasAdjustedLm#fromSquares}).
     *
     * @param meanAbsCorrelation mean |ρ|, or NaN when not computed
     */
    static ResidualDiagnostics fromSums(int n, int length, double sum, double sumSquares, double meanAbsCorrelation) {
        int pairs = n * (n - 1) / 2;
        double lm = length * sumSquares;
        double cd = Math.sqrt(2.0 * length / ((double) n * (n - 1))) * sum;
        double adjusted = Double.NaN;
        double adjustedP = Double.NaN;
        if (length >= MIN_LM_ADJ_LENGTH) {
            BiasAdjustedLm test = BiasAdjustedLm.fromSquares(n, sumSquares,
                    ExactPairMoments.common(length, SINGLE_INDEX_REGRESSORS));
            adjusted = test.statistic();
            adjustedP = test.pValue();
        }
        return new ResidualDiagnostics(n, length, meanAbsCorrelation, lm, pairs,
                TailProbabilities.chiSquaredUpper(lm, pairs), cd, TailProbabilities.twoSidedNormal(cd), adjusted,
                adjustedP);
    }
}
