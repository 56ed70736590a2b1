package dev.sigmawalk.engine.evidence;

/**
 * How much autocorrelation a test's influence series u_t keeps beyond what the bandwidth rule
 * assumes (Method §9). Andrews' AR(1) plug-in reads the dependence of u_t from its lag-one
 * autocorrelation r₁ alone, so it expects the first K autocorrelations to sum to
 * Σ_{k=1..K} r₁^k. Volatility clustering that does not cancel between the two series (their
 * volatilities move apart) leaves a small r₁ and a long, slowly decaying tail: the plug-in then
 * under-covers the long-run variance and the variance test rejects too often. The check is
 *
 * <pre>z = (Σ_{k=1..K} r_k − Σ_{k=1..K} r₁^k) / √(K/T),</pre>
 *
 * the excess in units of the sum's standard error for independent data (each r_k has variance
 * about 1/T; Bartlett 1946). In the size study's simulations with K = 20 and z above 3 it flagged
 * 90 % of GARCH(1,1) pairs on separate volatility paths at T = 5,500, against 0-0.3 % of
 * independent pairs and 1.5 % of GARCH pairs sharing one path; at T = 156 it flagged 2.3 % of
 * the separate-path pairs, so a monthly history is too short for it to tell.
 */
public final class LingeringDependence {
    /** Autocorrelations summed. */
    static final int LAGS = 20;
    /** Shortest series checked: four times the lags. */
    static final int MIN_PERIODS = 4 * LAGS;
    /** z above this flags the test. */
    public static final double THRESHOLD = 3.0;

    private LingeringDependence() {
    }

    /** z for {@value #LAGS} lags, or NaN when the series is shorter than {@value #MIN_PERIODS} or constant. */
    static double of(double[] u) {
        return u.length < MIN_PERIODS ? Double.NaN : of(u, LAGS);
    }

    /** z for the first {@code lags} autocorrelations (sample autocorrelations, divisor T, about the mean). */
    static double of(double[] u, int lags) {
        int n = u.length;
        if (!(lags >= 1 && lags < n)) {
            throw new IllegalArgumentException("lags (" + lags + ") must be in [1, " + n + ")");
        }
        double mean = 0;
        for (double x : u) {
            mean += x;
        }
        mean /= n;
        double variance = 0;
        for (double x : u) {
            variance += (x - mean) * (x - mean);
        }
        if (!(variance > 0)) {
            return Double.NaN;
        }
        double sum = 0;
        double first = 0;
        for (int k = 1; k <= lags; k++) {
            double s = 0;
            for (int t = k; t < n; t++) {
                s += (u[t] - mean) * (u[t - k] - mean);
            }
            double r = s / variance;
            sum += r;
            if (k == 1) {
                first = r;
            }
        }
        // The plug-in's own clamp of r₁ (AndrewsBandwidth), so the two agree on what it assumes.
        double r1 = Math.max(-AndrewsBandwidth.MAX_ABS_AUTOCORRELATION,
                Math.min(AndrewsBandwidth.MAX_ABS_AUTOCORRELATION, first));
        double implied = 0;
        double power = 1;
        for (int k = 1; k <= lags; k++) {
            power *= r1;
            implied += power;
        }
        return (sum - implied) / Math.sqrt((double) lags / n);
    }
}
