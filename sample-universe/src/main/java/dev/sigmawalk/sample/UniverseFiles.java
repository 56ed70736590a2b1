package dev.sigmawalk.sample;

import java.util.List;

/** The fixed names of the generated files, their index and rate columns, and the study files. */
final class UniverseFiles {
    static final String SECTORS = "sectors.csv";
    static final String TRUTH = "truth.csv";
    static final String REGIMES = "regimes.csv";
    static final String DAILY = "daily";
    static final String MONTHLY = "monthly";
    /** Column name of the published market index. */
    static final String INDEX_COLUMN = "harbour_composite";
    /** Column name of the risk-free rate (a short government bill of the invented economy). */
    static final String RISK_FREE_COLUMN = "harbour_bill";
    static final String MONTHLY_STUDY = "demo-monthly.yaml";
    static final String DAILY_STUDY = "demo-daily.yaml";

    /** Every file the generator writes, in the order it writes them. */
    static final List<String> DATA = List.of(SECTORS, TRUTH, REGIMES,
            assets(DAILY), market(DAILY), riskFree(DAILY),
            assets(MONTHLY), market(MONTHLY), riskFree(MONTHLY));
    static final List<String> STUDIES = List.of(MONTHLY_STUDY, DAILY_STUDY);

    private UniverseFiles() {
    }

    static String assets(String frequency) {
        return "assets-" + frequency + ".csv";
    }

    static String market(String frequency) {
        return "market-" + frequency + ".csv";
    }

    static String riskFree(String frequency) {
        return "riskfree-" + frequency + ".csv";
    }
}
