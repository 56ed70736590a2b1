package dev.sigmawalk.engine.evidence;

/**
 * Automatic HAC bandwidth by Andrews' (1991, Econometrica 59, 817-858, §6) AR(1) plug-in
 * method.
 *
 * <p>Each component a of the (centred) series gets an AR(1) fit by least squares without
 * intercept, ρ_a = Σ_{t≥1} y_t y_{t-1} / Σ_{t≥1} y_{t-1}², and innovation variance
 * σ_a² = Σ_{t≥1} (y_t - ρ_a y_{t-1})² / (T - 1). With unit weights, as Andrews suggests,
 * <pre>
 *   α(1) = Σ_a 4 ρ_a² σ_a⁴ / ((1 - ρ_a)⁶ (1 + ρ_a)²)  /  Σ_a σ_a⁴ / (1 - ρ_a)⁴,
 *   α(2) = Σ_a 4 ρ_a² σ_a⁴ / (1 - ρ_a)⁸               /  Σ_a σ_a⁴ / (1 - ρ_a)⁴
 * </pre>
 * (his eqs. for the univariate AR(1) approximation, written from memory as (6.4)), and the
 * kernel's optimal bandwidth follows from {@link HacKernel}. A fitted |ρ| is capped at 0.97 so
 * that a near unit root cannot give a bandwidth of the order of T (common practice). A constant
 * component carries no information and is skipped; when all are constant the bandwidth is 0,
 * which keeps only the lag-0 term.
 */
final class AndrewsBandwidth {
    /** Largest |ρ| used in the plug-in formulas. */
    static final double MAX_ABS_AUTOCORRELATION = 0.97;

    private AndrewsBandwidth() {
    }

    /**
     * @param centred components, each of length T >= 2 and mean zero
     * @param kernel the kernel whose optimal rate applies
     * @return S* >= 0
     */
    static double of(double[][] centred, HacKernel kernel) {
        int length = centred[0].length;
        double alphaOneSum = 0;
        double alphaTwoSum = 0;
        double scaleSum = 0;
        for (double[] y : centred) {
            double lagged = 0;
            double cross = 0;
            for (int t = 1; t < length; t++) {
                lagged += y[t - 1] * y[t - 1];
                cross += y[t] * y[t - 1];
            }
            if (!(lagged > 0)) {
                continue;
            }
            double rho = Math.max(-MAX_ABS_AUTOCORRELATION, Math.min(MAX_ABS_AUTOCORRELATION, cross / lagged));
            double innovation = 0;
            for (int t = 1; t < length; t++) {
                double e = y[t] - rho * y[t - 1];
                innovation += e * e;
            }
            double s4 = Math.pow(innovation / (length - 1), 2);
            double oneMinus = 1.0 - rho;
            double onePlus = 1.0 + rho;
            alphaOneSum += 4.0 * rho * rho * s4 / (Math.pow(oneMinus, 6) * onePlus * onePlus);
            alphaTwoSum += 4.0 * rho * rho * s4 / Math.pow(oneMinus, 8);
            scaleSum += s4 / Math.pow(oneMinus, 4);
        }
        if (!(scaleSum > 0)) {
            return 0.0;
        }
        return kernel.optimalBandwidth(alphaOneSum / scaleSum, alphaTwoSum / scaleSum, length);
    }
}
