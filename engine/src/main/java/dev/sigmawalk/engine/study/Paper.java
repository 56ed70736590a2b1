package dev.sigmawalk.engine.study;

/**
 * The paper the printed report is laid out for, {@code report.paper:}: ISO 216 A4 or US Letter.
 * The spelling is also the CSS page size keyword (CSS Paged Media Level 3, "page-size").
 */
public enum Paper implements Spelled {
    A4("a4"),
    LETTER("letter");

    private final String spelling;

    Paper(String spelling) {
        this.spelling = spelling;
    }

    @Override
    public String spelling() {
        return spelling;
    }
}
