package dev.sigmawalk.sample;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;

/** The calm regime (multipliers 1) broken by the stress periods, placed on a span of weekdays. */
final class VolatilityRegimes {
    private final List<StressPeriod> periods;

    private VolatilityRegimes(List<StressPeriod> periods) {
        this.periods = List.copyOf(periods);
    }

    /** Places each shape on whole calendar months of the span starting {@code firstDay}. */
    static VolatilityRegimes place(List<MarketParameters.StressShape> shapes, LocalDate firstDay, int rows) {
        List<StressPeriod> periods = new ArrayList<>();
        for (MarketParameters.StressShape shape : shapes) {
            LocalDate start = BusinessDays.plus(firstDay, rowAt(shape.startFraction(), rows));
            LocalDate end = BusinessDays.plus(firstDay, rowAt(shape.endFraction(), rows));
            periods.add(new StressPeriod(BusinessDays.firstOfMonth(start), BusinessDays.lastOfMonth(end),
                    shape.marketMultiplier(), shape.residualMultiplier()));
        }
        return new VolatilityRegimes(periods);
    }

    private static int rowAt(double fraction, int rows) {
        return Math.min(rows - 1, (int) Math.floor(fraction * rows));
    }

    List<StressPeriod> periods() {
        return periods;
    }

    double marketMultiplier(LocalDate date) {
        for (StressPeriod p : periods) {
            if (p.contains(date)) {
                return p.marketMultiplier();
            }
        }
        return 1.0;
    }

    double residualMultiplier(LocalDate date) {
        for (StressPeriod p : periods) {
            if (p.contains(date)) {
                return p.residualMultiplier();
            }
        }
        return 1.0;
    }
}
