package dev.sigmawalk.reports.html;

/**
 * The rough 95 % band of the bias statistic for N honest forecasts with normal returns,
 * 1 ± √(2/N) (Menchero, Wang &amp; Orr 2011, eq. 5).
 *
 * @param low 1 − √(2/N)
 * @param high 1 + √(2/N)
 */
record Band(double low, double high) {
    static Band of(int periods) {
        if (!(periods >= 1)) {
            throw new IllegalArgumentException("bias band periods (" + periods + ") must be >= 1");
        }
        double half = Math.sqrt(2.0 / periods);
        return new Band(1 - half, 1 + half);
    }

    boolean contains(double value) {
        return value >= low && value <= high;
    }
}
