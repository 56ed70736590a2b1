package dev.sigmawalk.reports.charts;

/** Wealth paths of return series. */
public final class Growth {
    private Growth() {
    }

    /**
     * Value of 1 invested just before the first row: W_k = Π_{s≤k} (1 + R_s). Sums log1p terms
     * so long daily series do not lose precision to repeated rounding of small factors.
     */
    public static double[] ofOne(double[] returns) {
        double[] out = new double[returns.length];
        double logWealth = 0;
        for (int k = 0; k < returns.length; k++) {
            logWealth += Math.log1p(returns[k]);
            out[k] = Math.exp(logWealth);
        }
        return out;
    }
}
