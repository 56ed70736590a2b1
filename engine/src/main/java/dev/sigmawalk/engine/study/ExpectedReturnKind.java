package dev.sigmawalk.engine.study;

/** The expected-return model, {@code expected_returns:}. */
public enum ExpectedReturnKind implements Spelled {
    SINGLE_INDEX("single-index"),
    HISTORICAL("historical");

    private final String spelling;

    ExpectedReturnKind(String spelling) {
        this.spelling = spelling;
    }

    @Override
    public String spelling() {
        return spelling;
    }
}
