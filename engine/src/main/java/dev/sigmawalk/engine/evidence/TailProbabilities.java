package dev.sigmawalk.engine.evidence;

import org.apache.commons.math3.special.Erf;
import org.apache.commons.math3.special.Gamma;

/**
 * Upper-tail probabilities of the reference distributions used by the tests in this package.
 * Both are computed from the complementary special functions directly, not as 1 - cdf, so that
 * small p-values keep their relative accuracy.
 */
final class TailProbabilities {
    private TailProbabilities() {
    }

    /**
     * P(χ²_df > x) = Q(df/2, x/2), the regularised upper incomplete gamma function.
     *
     * @param x the statistic, >= 0 (0 gives 1)
     * @param degreesOfFreedom df >= 1
     */
    static double chiSquaredUpper(double x, int degreesOfFreedom) {
        if (!(degreesOfFreedom >= 1)) {
            throw new IllegalArgumentException("degrees of freedom (" + degreesOfFreedom + ") must be >= 1");
        }
        if (!(x >= 0) || Double.isInfinite(x)) {
            throw new IllegalArgumentException("chi-squared statistic (" + x + ") must be finite and >= 0");
        }
        if (x == 0) {
            return 1.0;
        }
        return Gamma.regularizedGammaQ(degreesOfFreedom / 2.0, x / 2.0);
    }

    /**
     * Two-sided standard normal p-value P(|Z| > |z|) = erfc(|z| / √2).
     *
     * @param z a finite statistic; ±∞ gives 0
     */
    static double twoSidedNormal(double z) {
        if (Double.isNaN(z)) {
            throw new IllegalArgumentException("normal statistic is NaN");
        }
        if (Double.isInfinite(z)) {
            return 0.0;
        }
        return Erf.erfc(Math.abs(z) / Math.sqrt(2.0));
    }

    /**
     * Upper-tail standard normal probability 1 - Φ(z) = erfc(z / √2) / 2.
     *
     * @param z a statistic, not NaN; +∞ gives 0 and -∞ gives 1
     */
    static double upperNormal(double z) {
        if (Double.isNaN(z)) {
            throw new IllegalArgumentException("normal statistic is NaN");
        }
        if (Double.isInfinite(z)) {
            return z > 0 ? 0.0 : 1.0;
        }
        return 0.5 * Erf.erfc(z / Math.sqrt(2.0));
    }
}
