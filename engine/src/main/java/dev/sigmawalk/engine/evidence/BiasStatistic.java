package dev.sigmawalk.engine.evidence;

/**
 * Were the risk forecasts honest? The bias statistic as used by Menchero, Wang &amp; Orr (2011):
 * with z_t = (R_t - rf_t) / σ̂_t the realised excess return standardised by the per-period
 * forecast volatility,
 * <pre>
 *   b = sd(z) = √( Σ (z_t - z̄)² / (N - 1) ),
 * </pre>
 * near 1 for honest forecasts, above 1 when risk was understated. For N honest forecasts with
 * normal returns b lies within about 1 ± √(2/N) with 95 % confidence (their eq. 5). Also the share
 * of periods with |z_t| &gt; 2 (about 4.6 % for normal z).
 *
 * <p>Fat tails widen that band. For iid z with kurtosis κ = E(z - Ez)⁴ / σ⁴ the delta method gives
 * Var(s²) ≈ σ⁴(κ - 1)/N and so Var(s) ≈ σ²(κ - 1)/(4N) (a textbook large-sample result, from
 * memory); two standard errors about 1 give the kurtosis-adjusted band 1 ± √((κ - 1)/N), which is
 * Menchero's 1 ± √(2/N) at the normal κ = 3. κ is estimated from the z_t themselves (m₄ / m₂²,
 * divisor N). With daily kurtosis of 5-9 the adjusted band is about 1.4-2 times as wide.
 *
 * @param periods N >= 2
 * @param value b >= 0
 * @param bandLow 1 - √(2/N)
 * @param bandHigh 1 + √(2/N)
 * @param shareBeyondTwo share of periods with |z| &gt; 2, in [0, 1]
 * @param kurtosis κ̂ of z, m₄ / m₂² (>= 1 for any data; 3 for normal z); NaN when z does not vary
 * @param robustLow 1 - √((κ̂ - 1)/N); NaN with κ̂
 * @param robustHigh 1 + √((κ̂ - 1)/N); NaN with κ̂
 */
public record BiasStatistic(int periods, double value, double bandLow, double bandHigh, double shareBeyondTwo,
                            double kurtosis, double robustLow, double robustHigh) {
    public BiasStatistic {
        if (!(periods >= 2)) {
            throw new IllegalArgumentException("bias statistic periods (" + periods + ") must be >= 2");
        }
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException("bias statistic (" + value + ") must be finite and >= 0");
        }
        if (!(bandLow < bandHigh) || !(shareBeyondTwo >= 0 && shareBeyondTwo <= 1)) {
            throw new IllegalArgumentException("band [" + bandLow + ", " + bandHigh + "] must be ordered and share |z|>2 ("
                    + shareBeyondTwo + ") in [0, 1]");
        }
        if (Double.isNaN(kurtosis) ? !(Double.isNaN(robustLow) && Double.isNaN(robustHigh))
                : !(kurtosis >= 0 && robustLow <= robustHigh)) {
            throw new IllegalArgumentException("kurtosis (" + kurtosis + ") must be >= 0 with an ordered robust band ["
                    + robustLow + ", " + robustHigh + "], or all NaN");
        }
    }

    /**
     * @param returns gross portfolio returns R_t of the held rows
     * @param riskFree rf_t, aligned
     * @param forecastVolatility σ̂_t, the per-period forecast volatility in force for row t, > 0
     */
    public static BiasStatistic of(double[] returns, double[] riskFree, double[] forecastVolatility) {
        double[] z = standardised(returns, riskFree, forecastVolatility);
        int n = z.length;
        double mean = 0;
        for (double v : z) {
            mean += v;
        }
        mean /= n;
        double squares = 0;
        double fourth = 0;
        int beyond = 0;
        for (double v : z) {
            double d2 = (v - mean) * (v - mean);
            squares += d2;
            fourth += d2 * d2;
            if (Math.abs(v) > 2.0) {
                beyond++;
            }
        }
        double halfWidth = Math.sqrt(2.0 / n);
        double m2 = squares / n;
        double kurtosis = m2 > 0 ? fourth / n / (m2 * m2) : Double.NaN;
        // κ̂ >= 1 always (Jensen), so the root is real; rounding can only touch it at κ̂ = 1 exactly.
        double robustHalf = Double.isNaN(kurtosis) ? Double.NaN : Math.sqrt(Math.max(0.0, kurtosis - 1) / n);
        return new BiasStatistic(n, Math.sqrt(squares / (n - 1)), 1 - halfWidth, 1 + halfWidth, (double) beyond / n,
                kurtosis, 1 - robustHalf, 1 + robustHalf);
    }

    /**
     * The statistic over the rows that had a forecast: rows whose σ̂ is not a positive number
     * (a rebalance where no portfolio was formed leaves NaN) are left out.
     *
     * @return empty when fewer than two rows had a forecast
     */
    public static java.util.Optional<BiasStatistic> overForecastRows(double[] returns, double[] riskFree,
                                                                     double[] forecastVolatility) {
        SeriesChecks.requireSameLength("returns", returns, "forecast volatilities", forecastVolatility);
        SeriesChecks.requireSameLength("returns", returns, "risk-free rates", riskFree);
        int count = 0;
        for (double v : forecastVolatility) {
            if (v > 0) {
                count++;
            }
        }
        if (count < 2) {
            return java.util.Optional.empty();
        }
        double[] r = new double[count];
        double[] f = new double[count];
        double[] s = new double[count];
        int k = 0;
        for (int t = 0; t < returns.length; t++) {
            if (forecastVolatility[t] > 0) {
                r[k] = returns[t];
                f[k] = riskFree[t];
                s[k++] = forecastVolatility[t];
            }
        }
        return java.util.Optional.of(of(r, f, s));
    }

    /** True when the statistic lies inside the rough 95 % band. */
    public boolean withinBand() {
        return value >= bandLow && value <= bandHigh;
    }

    /** True when the statistic lies inside the kurtosis-adjusted band (false when κ̂ is undefined). */
    public boolean withinRobustBand() {
        return value >= robustLow && value <= robustHigh;
    }

    /** z_t = (R_t - rf_t) / σ̂_t after checking the three series. */
    static double[] standardised(double[] returns, double[] riskFree, double[] forecastVolatility) {
        SeriesChecks.requireFinite("returns", returns, 2);
        SeriesChecks.requireFinite("risk-free rates", riskFree, 2);
        SeriesChecks.requireFinite("forecast volatilities", forecastVolatility, 2);
        SeriesChecks.requireSameLength("returns", returns, "risk-free rates", riskFree);
        SeriesChecks.requireSameLength("returns", returns, "forecast volatilities", forecastVolatility);
        double[] z = new double[returns.length];
        for (int t = 0; t < z.length; t++) {
            if (!(forecastVolatility[t] > 0)) {
                throw new IllegalArgumentException("forecast volatility " + t + " (" + forecastVolatility[t] + ") must be > 0");
            }
            z[t] = (returns[t] - riskFree[t]) / forecastVolatility[t];
        }
        return z;
    }
}
