package dev.sigmawalk.engine.study;

/** The covariance model a strategy names under {@code risk:}. */
public enum RiskKind implements Spelled {
    SAMPLE("sample"),
    SINGLE_INDEX("single-index"),
    SHRINKAGE("shrinkage"),
    /** Market plus sector factors, or the factors of a file (Method §11). */
    MULTI_INDEX("multi-index"),
    /** The k largest principal components of S plus a diagonal (Method §11). */
    PRINCIPAL_COMPONENTS("principal-components"),
    /** Exponentially weighted, zero mean (Method §11). */
    EWMA("ewma"),
    /** Ledoit &amp; Wolf (2020) analytical nonlinear shrinkage (Method §11). */
    NONLINEAR_SHRINKAGE("nonlinear-shrinkage");

    private final String spelling;

    RiskKind(String spelling) {
        this.spelling = spelling;
    }

    @Override
    public String spelling() {
        return spelling;
    }
}
