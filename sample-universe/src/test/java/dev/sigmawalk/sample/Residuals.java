package dev.sigmawalk.sample;

/** Test arithmetic for the single-index residuals: OLS with intercept, then correlations. */
final class Residuals {
    private Residuals() {
    }

    /** e_t = (x_t - x̄) - β (m_t - m̄), β = Σ(x - x̄)(m - m̄) / Σ(m - m̄)². */
    static double[] of(double[] x, double[] m) {
        double xBar = mean(x);
        double mBar = mean(m);
        double sxm = 0;
        double smm = 0;
        for (int t = 0; t < x.length; t++) {
            sxm += (x[t] - xBar) * (m[t] - mBar);
            smm += (m[t] - mBar) * (m[t] - mBar);
        }
        double beta = sxm / smm;
        double[] e = new double[x.length];
        for (int t = 0; t < x.length; t++) {
            e[t] = (x[t] - xBar) - beta * (m[t] - mBar);
        }
        return e;
    }

    /** Mean over pairs i &lt; j of the sample correlations of mean-zero series. */
    static double meanPairCorrelation(double[][] series) {
        double sum = 0;
        int pairs = 0;
        for (int i = 0; i < series.length; i++) {
            for (int j = i + 1; j < series.length; j++) {
                sum += dot(series[i], series[j]) / Math.sqrt(dot(series[i], series[i]) * dot(series[j], series[j]));
                pairs++;
            }
        }
        if (pairs == 0) {
            throw new IllegalArgumentException("need at least two series, got " + series.length);
        }
        return sum / pairs;
    }

    private static double dot(double[] a, double[] b) {
        double s = 0;
        for (int t = 0; t < a.length; t++) {
            s += a[t] * b[t];
        }
        return s;
    }

    private static double mean(double[] x) {
        double s = 0;
        for (double v : x) {
            s += v;
        }
        return s / x.length;
    }
}
