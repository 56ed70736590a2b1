package dev.sigmawalk.reports.charts;

import java.time.LocalDate;
import java.time.ZoneOffset;

/** Converts dates to the x values of time charts: epoch milliseconds at 00:00 UTC. */
public final class TimeAxisValues {
    private TimeAxisValues() {
    }

    /** One x value per date. */
    public static double[] of(LocalDate[] dates) {
        double[] x = new double[dates.length];
        for (int k = 0; k < dates.length; k++) {
            x[k] = dates[k].atStartOfDay(ZoneOffset.UTC).toInstant().toEpochMilli();
        }
        return x;
    }
}
