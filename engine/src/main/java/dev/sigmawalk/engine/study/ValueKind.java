package dev.sigmawalk.engine.study;

/** What the data files hold, {@code data.values:}. */
public enum ValueKind implements Spelled {
    RETURNS("returns"),
    PRICES("prices");

    private final String spelling;

    ValueKind(String spelling) {
        this.spelling = spelling;
    }

    @Override
    public String spelling() {
        return spelling;
    }
}
