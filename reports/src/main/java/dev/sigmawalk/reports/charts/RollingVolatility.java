package dev.sigmawalk.reports.charts;

import dev.sigmawalk.engine.measures.SeriesStats;
import java.util.Arrays;

/**
 * Realised volatility over a trailing span of rows, annualised: σ_k = √p · sd(R_{k−q+1..k}), the
 * standard deviation with divisor q − 1. The first q − 1 rows have no full span and are NaN.
 */
public final class RollingVolatility {
    private RollingVolatility() {
    }

    /**
     * The trailing span q for p periods a year: about a quarter of daily data, a year of monthly
     * data (common practice): 12 → 12, 52 → 13, 252 → 63, otherwise p, and never less than 2
     * (a standard deviation needs two values).
     */
    public static int span(int periodsPerYear) {
        if (!(periodsPerYear >= 1)) {
            throw new IllegalArgumentException("periods per year (" + periodsPerYear + ") must be >= 1");
        }
        return switch (periodsPerYear) {
            case 52 -> 13;
            case 252 -> 63;
            default -> Math.max(2, periodsPerYear);
        };
    }

    /**
     * @param returns per-period simple returns
     * @param span q >= 2
     * @param periodsPerYear p >= 1
     * @return one value per row, NaN for rows 0..q−2
     */
    public static double[] annualised(double[] returns, int span, int periodsPerYear) {
        if (!(span >= 2)) {
            throw new IllegalArgumentException("rolling span (" + span + ") must be >= 2");
        }
        if (!(periodsPerYear >= 1)) {
            throw new IllegalArgumentException("periods per year (" + periodsPerYear + ") must be >= 1");
        }
        double[] out = new double[returns.length];
        Arrays.fill(out, Double.NaN);
        double scale = Math.sqrt(periodsPerYear);
        for (int k = span - 1; k < returns.length; k++) {
            out[k] = scale * SeriesStats.sd(returns, k - span + 1, k + 1);
        }
        return out;
    }
}
