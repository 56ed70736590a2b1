package dev.sigmawalk.engine.study;

/** The portfolio rule a strategy names under {@code objective:}. */
public enum Objective implements Spelled {
    MIN_VARIANCE("min-variance", false),
    MEAN_VARIANCE("mean-variance", true),
    MAX_SHARPE("max-sharpe", true),
    EQUAL_WEIGHT("equal-weight", false);

    private final String spelling;
    private final boolean needsExpectedReturns;

    Objective(String spelling, boolean needsExpectedReturns) {
        this.spelling = spelling;
        this.needsExpectedReturns = needsExpectedReturns;
    }

    @Override
    public String spelling() {
        return spelling;
    }

    /** Whether the rule uses an expected-return vector. */
    public boolean needsExpectedReturns() {
        return needsExpectedReturns;
    }
}
