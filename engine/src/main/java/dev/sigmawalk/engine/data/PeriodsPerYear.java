package dev.sigmawalk.engine.data;

import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.Arrays;

/**
 * Periods per year inferred from the dates (Method §1): the median spacing of consecutive dates
 * in calendar days, then under 4 → 252 (trading days), under 15 → 52, under 60 → 12, under 200 →
 * 4, else 1. With an even number of spacings the median is the mean of the two middle ones.
 */
public final class PeriodsPerYear {
    private PeriodsPerYear() {
    }

    /**
     * @param dates strictly increasing, at least two
     * @throws IllegalArgumentException with fewer than two dates
     */
    public static int infer(LocalDate[] dates) {
        if (dates.length < 2) {
            throw new IllegalArgumentException("inferring periods per year needs at least two dates, got "
                    + dates.length);
        }
        return fromMedianSpacing(medianSpacingDays(dates));
    }

    /** The median of d_t − d_{t−1} in days. */
    public static double medianSpacingDays(LocalDate[] dates) {
        long[] gaps = new long[dates.length - 1];
        for (int t = 1; t < dates.length; t++) {
            gaps[t - 1] = ChronoUnit.DAYS.between(dates[t - 1], dates[t]);
        }
        Arrays.sort(gaps);
        int m = gaps.length / 2;
        return gaps.length % 2 == 1 ? gaps[m] : (gaps[m - 1] + gaps[m]) / 2.0;
    }

    /** The Method §1 thresholds. */
    public static int fromMedianSpacing(double days) {
        if (days < 4) {
            return 252;
        }
        if (days < 15) {
            return 52;
        }
        if (days < 60) {
            return 12;
        }
        if (days < 200) {
            return 4;
        }
        return 1;
    }
}
