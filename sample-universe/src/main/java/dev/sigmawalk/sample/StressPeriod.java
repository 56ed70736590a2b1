package dev.sigmawalk.sample;

import java.time.LocalDate;
import java.util.Objects;

/**
 * A high-volatility stretch with concrete dates, both inclusive.
 *
 * @param from first day
 * @param to last day, not before {@code from}
 * @param marketMultiplier factor on the market volatility, ≥ 1
 * @param residualMultiplier factor on every residual volatility, ≥ 1
 */
record StressPeriod(LocalDate from, LocalDate to, double marketMultiplier, double residualMultiplier) {
    StressPeriod {
        Objects.requireNonNull(from, "from");
        Objects.requireNonNull(to, "to");
        if (to.isBefore(from)) {
            throw new IllegalArgumentException("stress period " + from + ".." + to + " ends before it starts");
        }
        if (!(marketMultiplier >= 1 && residualMultiplier >= 1)) {
            throw new IllegalArgumentException("stress multipliers (" + marketMultiplier + ", "
                    + residualMultiplier + ") must be >= 1");
        }
    }

    boolean contains(LocalDate date) {
        return !date.isBefore(from) && !date.isAfter(to);
    }
}
