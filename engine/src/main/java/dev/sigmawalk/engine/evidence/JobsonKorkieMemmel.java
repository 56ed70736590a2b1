package dev.sigmawalk.engine.evidence;

/**
 * Test of equal Sharpe ratios for iid normal returns: Jobson &amp; Korkie (1981, J. Finance 36,
 * 889-908) with the correction of Memmel (2003, Finance Letters 1, 21-23) to their asymptotic
 * variance:
 * <pre>
 *   z = (σ_b μ_a - σ_a μ_b) / √θ,
 *   θ = (1/T) (2σ_a²σ_b² - 2σ_aσ_bσ_ab + ½μ_a²σ_b² + ½μ_b²σ_a² - (μ_aμ_b / (σ_aσ_b)) σ_ab²),
 * </pre>
 * asymptotically standard normal; two-sided p-value. θ is the delta-method variance of the
 * numerator under bivariate normality, where Var(μ̂) = σ²/T, Var(σ̂) = σ²/(2T),
 * Cov(σ̂_a, σ̂_b) = σ_ab²/(2σ_aσ_bT) and means are independent of standard deviations. An
 * often-quoted form whose last term is (μ_aμ_b / (2σ_aσ_b))(σ_ab² + σ_a²σ_b²) disagrees with that
 * variance unless μ_aμ_b = 0 or |ρ| = 1, and a simulation rejects it (see the test); it is not used.
 *
 * <p>This is the iid, normal special case of the Ledoit-Wolf Sharpe test ({@link DifferenceTests}),
 * useful as a cross-check but not robust to fat tails or serial dependence. Moments from series
 * use divisor T (maximum likelihood, as in the asymptotic derivation).
 *
 * <p>Equal Sharpe ratios (numerator within 1e-12 of σ_aσ_b(|SR_a| + |SR_b|), which covers
 * identical and proportional series, where θ is also 0) give z = 0 and p = 1. A θ that is not
 * positive with unequal Sharpe ratios is rejected as degenerate.
 */
public final class JobsonKorkieMemmel {
    /** Relative size below which the numerator counts as zero. */
    static final double ZERO_NUMERATOR = 1e-12;

    private JobsonKorkieMemmel() {
    }

    /** The test on two aligned excess-return series (T >= 2, finite, both varying). */
    public static JobsonKorkieTest test(double[] excessA, double[] excessB) {
        SeriesChecks.requireFinite("first series", excessA, 2);
        SeriesChecks.requireFinite("second series", excessB, 2);
        SeriesChecks.requireSameLength("first series", excessA, "second series", excessB);
        int length = excessA.length;
        double ma = mean(excessA);
        double mb = mean(excessB);
        double va = 0;
        double vb = 0;
        double cov = 0;
        for (int t = 0; t < length; t++) {
            double da = excessA[t] - ma;
            double db = excessB[t] - mb;
            va += da * da;
            vb += db * db;
            cov += da * db;
        }
        return test(ma, mb, va / length, vb / length, cov / length, length);
    }

    /**
     * The test from moments.
     *
     * @param meanA μ_a
     * @param meanB μ_b
     * @param varianceA σ_a² > 0
     * @param varianceB σ_b² > 0
     * @param covariance σ_ab
     * @param periods T >= 2
     */
    public static JobsonKorkieTest test(double meanA, double meanB, double varianceA, double varianceB,
                                        double covariance, int periods) {
        if (!(varianceA > 0) || !(varianceB > 0) || Double.isInfinite(varianceA) || Double.isInfinite(varianceB)) {
            throw new IllegalArgumentException("variances (" + varianceA + ", " + varianceB + ") must be finite and > 0");
        }
        if (!Double.isFinite(meanA) || !Double.isFinite(meanB) || !Double.isFinite(covariance)) {
            throw new IllegalArgumentException("means (" + meanA + ", " + meanB + ") and covariance (" + covariance
                    + ") must be finite");
        }
        if (!(periods >= 2)) {
            throw new IllegalArgumentException("periods (" + periods + ") must be >= 2");
        }
        double sa = Math.sqrt(varianceA);
        double sb = Math.sqrt(varianceB);
        double sharpeA = meanA / sa;
        double sharpeB = meanB / sb;
        double numerator = sb * meanA - sa * meanB;
        if (Math.abs(numerator) <= ZERO_NUMERATOR * sa * sb * (Math.abs(sharpeA) + Math.abs(sharpeB))) {
            return new JobsonKorkieTest(periods, sharpeA, sharpeB, 0.0, 1.0);
        }
        // Memmel (2003): the corrected asymptotic variance of the numerator.
        double theta = (2 * varianceA * varianceB - 2 * sa * sb * covariance
                + 0.5 * meanA * meanA * varianceB + 0.5 * meanB * meanB * varianceA
                - meanA * meanB / (sa * sb) * covariance * covariance) / periods;
        if (!(theta > 0)) {
            throw new IllegalArgumentException("Jobson-Korkie variance θ (" + theta
                    + ") must be > 0 for unequal Sharpe ratios; the pair is degenerate");
        }
        double z = numerator / Math.sqrt(theta);
        return new JobsonKorkieTest(periods, sharpeA, sharpeB, z, TailProbabilities.twoSidedNormal(z));
    }

    private static double mean(double[] x) {
        double s = 0;
        for (double v : x) {
            s += v;
        }
        return s / x.length;
    }
}
