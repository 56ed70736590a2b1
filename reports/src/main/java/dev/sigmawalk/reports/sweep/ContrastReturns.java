package dev.sigmawalk.reports.sweep;

import java.time.LocalDate;
import java.util.Arrays;
import java.util.Objects;

/**
 * The net returns of one compared pair of a point (the strategy and the strategy it was tested
 * against, in the same window), on the out-of-sample dates both have, oldest first.
 *
 * @param comparison the test of the point's {@code tests.csv} these returns belong to
 * @param days the dates as epoch days, strictly increasing
 * @param first the strategy's net returns on those dates
 * @param second the other strategy's net returns on the same dates
 */
record ContrastReturns(PointComparison comparison, int[] days, double[] first, double[] second) {
    ContrastReturns {
        Objects.requireNonNull(comparison, "comparison");
        if (days.length != first.length || days.length != second.length) {
            throw new IllegalArgumentException("point " + comparison.point().label() + " " + comparison.strategy()
                    + ": " + days.length + " dates for " + first.length + " and " + second.length + " returns");
        }
        for (int t = 1; t < days.length; t++) {
            if (!(days[t] > days[t - 1])) {
                throw new IllegalArgumentException("point " + comparison.point().label() + " " + comparison.strategy()
                        + ": date " + LocalDate.ofEpochDay(days[t]) + " does not follow " + LocalDate.ofEpochDay(days[t - 1]));
            }
        }
    }

    /** Number of out-of-sample dates. */
    int periods() {
        return days.length;
    }

    /** The sorted dates both this pair and {@code others} (sorted) have. */
    int[] sharedWith(int[] others) {
        int[] out = new int[Math.min(days.length, others.length)];
        int n = 0;
        int i = 0;
        int j = 0;
        while (i < days.length && j < others.length) {
            if (days[i] < others[j]) {
                i++;
            } else if (days[i] > others[j]) {
                j++;
            } else {
                out[n++] = days[i];
                i++;
                j++;
            }
        }
        return Arrays.copyOf(out, n);
    }

    /** This pair restricted to {@code dates}, each of which it must have (sorted). */
    double[][] on(int[] dates) {
        double[][] out = new double[2][dates.length];
        int i = 0;
        for (int t = 0; t < dates.length; t++) {
            while (i < days.length && days[i] < dates[t]) {
                i++;
            }
            if (i == days.length || days[i] != dates[t]) {
                throw new IllegalArgumentException("point " + comparison.point().label() + " " + comparison.strategy()
                        + " has no return on " + LocalDate.ofEpochDay(dates[t]));
            }
            out[0][t] = first[i];
            out[1][t] = second[i];
        }
        return out;
    }
}
