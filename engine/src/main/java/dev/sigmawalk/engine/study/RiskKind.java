package dev.sigmawalk.engine.study;

/** The covariance model a strategy names under {@code risk:}. */
public enum RiskKind implements Spelled {
    SAMPLE("sample"),
    SINGLE_INDEX("single-index"),
    SHRINKAGE("shrinkage");

    private final String spelling;

    RiskKind(String spelling) {
        this.spelling = spelling;
    }

    @Override
    public String spelling() {
        return spelling;
    }
}
