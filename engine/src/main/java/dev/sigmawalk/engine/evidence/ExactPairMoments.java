package dev.sigmawalk.engine.evidence;

import java.util.Objects;

/**
 * Exact null mean and standard deviation of the test indicator d ρ̂_ij² of one residual pair, for
 * the bias-adjusted LM test of Pesaran, Ullah &amp; Yamagata (2008, Econometrics Journal 11,
 * 105-127, their Section 3), Method §8. With M_i = I - P_i the residual makers of the two
 * regressions and d = T - k,
 * <pre>
 *   μ_ij  = tr(M_i M_j) / d,
 *   v_ij² = [tr(M_i M_j)]² a₁ + 2 tr[(M_i M_j)²] a₂,
 *   a₂ = 3 [((d-8)(d+2) + 24) / ((d+2)(d-2)(d-4))]²  (= 3/(d+2)²),   a₁ = a₂ - 1/d².
 * </pre>
 * For a common regression (M_i = M_j) μ = 1 and v² = 2(d-1)/(d+2).
 *
 * <p>The traces come from the orthonormal bases ({@link RegressorSpace}) without forming any L×L
 * matrix: with C = Q_i'Q_j, tr(M_i M_j) = L - k_i - k_j + ‖C‖², and since
 * tr[(M_i M_j)²] = tr[(M_i M_j M_i)²] with M_i M_j M_i = M_i - W W', W = M_i Q_j, W'W = I - C'C,
 * tr[(M_i M_j)²] = (L - k_i) - 2(k_j - ‖C‖²) + ‖I - C'C‖² (Frobenius norms). Cost O(L k_i k_j).
 *
 * <p>The paper takes the same number k of regressors for every unit. Where the two regressions
 * have k_i ≠ k_j we use d_ij = √((L - k_i)(L - k_j)): to first order E[ρ̂_ij²] =
 * tr(M_i M_j) / ((L - k_i)(L - k_j)), so E[d_ij ρ̂_ij²] ≈ tr(M_i M_j) / d_ij = μ_ij, and d_ij is the
 * paper's T - k when the counts agree (our generalisation, checked by simulation in the tests).
 *
 * @param traceProduct tr(M_i M_j), > 0
 * @param traceProductSquared tr[(M_i M_j)²], > 0
 * @param degreesOfFreedom d (d_ij above), > 4 so that a₂ is defined
 * @param mean μ_ij
 * @param sd v_ij > 0
 */
public record ExactPairMoments(double traceProduct, double traceProductSquared, double degreesOfFreedom,
                               double mean, double sd) {
    /** Smallest d for which the paper's a₂ has a positive denominator. */
    public static final double MIN_DEGREES_OF_FREEDOM = 4;

    public ExactPairMoments {
        if (!(degreesOfFreedom > MIN_DEGREES_OF_FREEDOM) || Double.isInfinite(degreesOfFreedom)) {
            throw new IllegalArgumentException("residual degrees of freedom (" + degreesOfFreedom
                    + ") must be > 4 for the bias-adjusted LM test: the window is too short for its regressors");
        }
        if (!(traceProduct > 0) || !(traceProductSquared > 0) || !(sd > 0) || !Double.isFinite(mean)
                || Double.isInfinite(sd)) {
            throw new IllegalArgumentException("pair moments tr(MiMj) " + traceProduct + ", tr((MiMj)^2) "
                    + traceProductSquared + ", mean " + mean + ", sd " + sd + " must be finite and > 0");
        }
    }

    /** The moments of a pair whose residuals come from the same regression with k regressors over L rows. */
    public static ExactPairMoments common(int length, int regressors) {
        double d = length - regressors;
        return from(d, d, d);
    }

    /** The moments of the pair of residuals of two (possibly different) regressions over the same rows. */
    public static ExactPairMoments of(RegressorSpace first, RegressorSpace second) {
        Objects.requireNonNull(first, "first");
        Objects.requireNonNull(second, "second");
        double[][] c = first.cross(second);
        int ki = first.regressors();
        int kj = second.regressors();
        double frobenius = 0;
        for (double[] row : c) {
            for (double v : row) {
                frobenius += v * v;
            }
        }
        // I - C'C (k_j × k_j): the Gram matrix of W = M_i Q_j.
        double gram = 0;
        for (int a = 0; a < kj; a++) {
            for (int b = 0; b < kj; b++) {
                double ctc = 0;
                for (double[] row : c) {
                    ctc += row[a] * row[b];
                }
                double w = (a == b ? 1.0 : 0.0) - ctc;
                gram += w * w;
            }
        }
        int length = first.length();
        double trace = length - ki - kj + frobenius;
        double traceSquared = (length - ki) - 2.0 * (kj - frobenius) + gram;
        double d = Math.sqrt((double) (length - ki) * (length - kj));
        return from(trace, traceSquared, d);
    }

    /** μ and v from the two traces and d (the paper's equations above). */
    public static ExactPairMoments from(double traceProduct, double traceProductSquared, double d) {
        if (!(d > MIN_DEGREES_OF_FREEDOM)) {
            throw new IllegalArgumentException("residual degrees of freedom (" + d
                    + ") must be > 4 for the bias-adjusted LM test: the window is too short for its regressors");
        }
        double ratio = ((d - 8) * (d + 2) + 24) / ((d + 2) * (d - 2) * (d - 4));
        double a2 = 3 * ratio * ratio;
        double a1 = a2 - 1 / (d * d);
        double variance = traceProduct * traceProduct * a1 + 2 * traceProductSquared * a2;
        return new ExactPairMoments(traceProduct, traceProductSquared, d, traceProduct / d, Math.sqrt(variance));
    }

    /** The standardised indicator (d ρ² - μ) / v of one pair's residual correlation ρ. */
    public double standardise(double correlation) {
        return (degreesOfFreedom * correlation * correlation - mean) / sd;
    }
}
