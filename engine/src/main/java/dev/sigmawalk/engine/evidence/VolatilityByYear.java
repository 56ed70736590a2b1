package dev.sigmawalk.engine.evidence;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;

/**
 * Forecast against realised volatility by calendar year, so a reader can see when a model
 * under- or overstated risk. For the rows of year y (N_y of them, grouped by the year of each
 * row's date):
 * <pre>
 *   realised_y = √p · sd(R_t - rf_t)   (divisor N_y - 1),
 *   forecast_y = √p · mean(σ̂_t),
 * </pre>
 * with σ̂_t the per-period forecast volatility in force for row t (the forecast is averaged as a
 * volatility, not as a variance, matching Method §7's forecast_volatility). Excess returns are
 * used because the forecasts are of excess-return risk; a constant rf makes no difference.
 * A year with fewer than 2 rows has no sample deviation and is left out of the result.
 */
public final class VolatilityByYear {
    private VolatilityByYear() {
    }

    /**
     * @param dates row dates, strictly increasing
     * @param returns gross portfolio returns R_t
     * @param riskFree rf_t
     * @param forecastVolatility σ̂_t > 0
     * @param periodsPerYear p >= 1
     * @return one entry per year with >= 2 rows, in calendar order
     */
    public static List<YearVolatility> of(LocalDate[] dates, double[] returns, double[] riskFree,
                                          double[] forecastVolatility, int periodsPerYear) {
        if (!(periodsPerYear >= 1)) {
            throw new IllegalArgumentException("periods per year (" + periodsPerYear + ") must be >= 1");
        }
        double[] z = BiasStatistic.standardised(returns, riskFree, forecastVolatility);
        if (dates.length != z.length) {
            throw new IllegalArgumentException("dates (" + dates.length + ") must be aligned with returns (" + z.length + ")");
        }
        for (int t = 1; t < dates.length; t++) {
            if (!dates[t].isAfter(dates[t - 1])) {
                throw new IllegalArgumentException("dates must be strictly increasing: " + dates[t - 1] + " then " + dates[t]);
            }
        }
        double root = Math.sqrt(periodsPerYear);
        List<YearVolatility> years = new ArrayList<>();
        int start = 0;
        while (start < dates.length) {
            int end = start;
            while (end < dates.length && dates[end].getYear() == dates[start].getYear()) {
                end++;
            }
            if (end - start >= 2) {
                years.add(year(dates[start].getYear(), returns, riskFree, forecastVolatility, start, end, root));
            }
            start = end;
        }
        return List.copyOf(years);
    }

    private static YearVolatility year(int year, double[] returns, double[] riskFree, double[] forecast,
                                       int start, int end, double root) {
        int n = end - start;
        double mean = 0;
        double forecastSum = 0;
        for (int t = start; t < end; t++) {
            mean += returns[t] - riskFree[t];
            forecastSum += forecast[t];
        }
        mean /= n;
        double squares = 0;
        for (int t = start; t < end; t++) {
            double d = returns[t] - riskFree[t] - mean;
            squares += d * d;
        }
        return new YearVolatility(year, n, root * Math.sqrt(squares / (n - 1)), root * forecastSum / n);
    }
}
