package dev.sigmawalk.engine.study;

/** Calendar rebalance rules, {@code rebalance:}. */
public enum Calendar implements Spelled {
    MONTH_END("month-end"),
    QUARTER_END("quarter-end"),
    YEAR_END("year-end");

    private final String spelling;

    Calendar(String spelling) {
        this.spelling = spelling;
    }

    @Override
    public String spelling() {
        return spelling;
    }
}
