package dev.sigmawalk.engine.evidence;

/**
 * Forecast against realised volatility over one calendar year, both annualised.
 *
 * @param year calendar year of the rows' dates
 * @param periods rows in that year, >= 2
 * @param realised √p · sd(R_t - rf_t), divisor N - 1
 * @param forecast √p · mean(σ̂_t)
 */
public record YearVolatility(int year, int periods, double realised, double forecast) {
    public YearVolatility {
        if (!(periods >= 2)) {
            throw new IllegalArgumentException("year " + year + ": periods (" + periods + ") must be >= 2");
        }
        if (!(realised >= 0) || !(forecast > 0) || Double.isInfinite(realised) || Double.isInfinite(forecast)) {
            throw new IllegalArgumentException("year " + year + ": realised (" + realised + ") must be finite and >= 0, forecast ("
                    + forecast + ") finite and > 0");
        }
    }

    /** realised / forecast: above 1 when the year's risk was understated. */
    public double ratio() {
        return realised / forecast;
    }
}
