package dev.sigmawalk.engine.study;

/** When rebalances happen: every k rows, or on the last row of each calendar period in the data. */
public sealed interface RebalanceRule permits RebalanceRule.EveryRows, RebalanceRule.CalendarEnd {

    /** {@code rebalance_every: k}. */
    record EveryRows(int rows) implements RebalanceRule {
        public EveryRows {
            if (!(rows >= 1)) {
                throw new IllegalArgumentException("rebalance_every (" + rows + ") must be >= 1");
            }
        }
    }

    /** {@code rebalance: month-end | quarter-end | year-end}. */
    record CalendarEnd(Calendar calendar) implements RebalanceRule {
        public CalendarEnd {
            java.util.Objects.requireNonNull(calendar, "calendar");
        }
    }
}
