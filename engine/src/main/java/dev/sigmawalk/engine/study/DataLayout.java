package dev.sigmawalk.engine.study;

/**
 * How the assets file is laid out, {@code data.layout:}: one column per asset ({@code wide}), or
 * one {@code date,asset,value} fact per row in any order ({@code long}), as return databases
 * export them.
 */
public enum DataLayout implements Spelled {
    WIDE("wide"),
    LONG("long");

    private final String spelling;

    DataLayout(String spelling) {
        this.spelling = spelling;
    }

    @Override
    public String spelling() {
        return spelling;
    }
}
