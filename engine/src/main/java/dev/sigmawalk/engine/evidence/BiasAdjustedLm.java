package dev.sigmawalk.engine.evidence;

import java.util.Objects;

/**
 * The bias-adjusted LM test of error cross-section independence (Pesaran, Ullah &amp; Yamagata
 * 2008, Econometrics Journal 11, 105-127, eq. 13), Method §8:
 * <pre>
 *   LM_adj = √(2 / (n(n-1))) Σ_{i&lt;j} (d_ij ρ̂_ij² - μ_ij) / v_ij,
 * </pre>
 * standard normal under independent normal errors as n grows with L fixed; upper-tail p-value
 * 1 - Φ(LM_adj), since dependence of either sign raises Σ ρ². The exact μ_ij, v_ij are
 * {@link ExactPairMoments}. Unlike Breusch-Pagan's L Σ ρ², whose χ² reference is badly over-sized
 * when n is not small against L, this keeps its size with normal errors (the paper's Tables; our
 * size benchmark in the developer guide).
 *
 * @param statistic LM_adj, finite
 * @param pValue 1 - Φ(LM_adj), in [0, 1]
 */
public record BiasAdjustedLm(double statistic, double pValue) {
    public BiasAdjustedLm {
        if (!Double.isFinite(statistic) || !(pValue >= 0 && pValue <= 1)) {
            throw new IllegalArgumentException("LM_adj statistic (" + statistic + ") must be finite and its p-value ("
                    + pValue + ") in [0, 1]");
        }
    }

    /** ρ̂_ij of the pair i &lt; j. */
    @FunctionalInterface
    public interface PairCorrelation {
        double of(int i, int j);
    }

    /** The exact moments of the pair i &lt; j (they depend on the pair only through its two regressions). */
    @FunctionalInterface
    public interface PairExactMoments {
        ExactPairMoments of(int i, int j);
    }

    /**
     * The test when every pair shares its exact moments, as when every residual comes from the
     * same regression (the single index, k = 2: intercept and market): the sum over pairs then
     * needs only Σ ρ̂², Σ (d ρ̂² − μ) / v = (d Σ ρ̂² − P μ) / v with P = n(n-1)/2, which
     * {@link ResidualRows} gets without visiting pairs. Regressions that differ per asset keep
     * their per-pair moments: {@link #of}.
     *
     * @param assets n >= 2
     * @param sumOfSquares Σ_{i&lt;j} ρ̂_ij², >= 0
     * @param common the moments every pair shares
     */
    public static BiasAdjustedLm fromSquares(int assets, double sumOfSquares, ExactPairMoments common) {
        Objects.requireNonNull(common, "common");
        if (!(assets >= 2) || !(sumOfSquares >= 0)) {
            throw new IllegalArgumentException("LM_adj needs >= 2 assets (" + assets + ") and a sum of squares >= 0 ("
                    + sumOfSquares + ")");
        }
        double pairs = (double) assets * (assets - 1) / 2;
        double sum = (common.degreesOfFreedom() * sumOfSquares - pairs * common.mean()) / common.sd();
        double statistic = Math.sqrt(2.0 / ((double) assets * (assets - 1))) * sum;
        return new BiasAdjustedLm(statistic, TailProbabilities.upperNormal(statistic));
    }

    /**
     * The test with per-pair moments (regressors that differ across assets, Method §11).
     *
     * @param assets n >= 2
     * @param correlation ρ̂_ij for 0 &lt;= i &lt; j &lt; n
     * @param moments the exact moments of each pair
     */
    public static BiasAdjustedLm of(int assets, PairCorrelation correlation, PairExactMoments moments) {
        Objects.requireNonNull(correlation, "correlation");
        Objects.requireNonNull(moments, "moments");
        if (!(assets >= 2)) {
            throw new IllegalArgumentException("LM_adj needs >= 2 assets, got " + assets);
        }
        double sum = 0;
        for (int i = 0; i < assets; i++) {
            for (int j = i + 1; j < assets; j++) {
                sum += moments.of(i, j).standardise(correlation.of(i, j));
            }
        }
        double statistic = Math.sqrt(2.0 / ((double) assets * (assets - 1))) * sum;
        return new BiasAdjustedLm(statistic, TailProbabilities.upperNormal(statistic));
    }
}
