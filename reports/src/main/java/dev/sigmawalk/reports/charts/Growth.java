package dev.sigmawalk.reports.charts;

import java.util.Arrays;

/** Wealth paths of return series. */
public final class Growth {
    private Growth() {
    }

    /**
     * Value of 1 invested just before the first row: W_k = Π_{s≤k} (1 + R_s). Sums log1p terms
     * so long daily series do not lose precision to repeated rounding of small factors. From the
     * first row with R ≤ −1 on the wealth is gone (Method §7) and the values are NaN, a gap in
     * the line: a log scale has no place for 0 or below, and a 0 there was drawn at an infinite
     * coordinate.
     */
    public static double[] ofOne(double[] returns) {
        double[] out = new double[returns.length];
        double logWealth = 0;
        for (int k = 0; k < returns.length; k++) {
            if (!(1 + returns[k] > 0)) {
                Arrays.fill(out, k, returns.length, Double.NaN);
                return out;
            }
            logWealth += Math.log1p(returns[k]);
            out[k] = Math.exp(logWealth);
        }
        return out;
    }
}
