package dev.sigmawalk.engine.study;

/** The target of Ledoit-Wolf shrinkage, {@code shrinkage_target:}. */
public enum ShrinkageTarget implements Spelled {
    SINGLE_INDEX("single-index"),
    CONSTANT_CORRELATION("constant-correlation"),
    IDENTITY("identity");

    private final String spelling;

    ShrinkageTarget(String spelling) {
        this.spelling = spelling;
    }

    @Override
    public String spelling() {
        return spelling;
    }
}
