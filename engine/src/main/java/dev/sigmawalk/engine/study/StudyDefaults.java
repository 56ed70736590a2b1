package dev.sigmawalk.engine.study;

import java.util.List;

/**
 * Every value the study reader fills in when a study file is silent, in one place, and the rules
 * that are not defaults but choices a reader of a study file should know. {@link #describe()}
 * lists them for {@code sigmawalk check}.
 */
public final class StudyDefaults {
    /** {@code output:} when absent, resolved against the study file's folder. */
    public static final String OUTPUT = "sigmawalk-out";
    /** {@code data.layout:} when absent: one column per asset. */
    public static final DataLayout LAYOUT = DataLayout.WIDE;
    /** {@code walkforward.rebalance_every:} when neither it nor {@code rebalance:} is given. */
    public static final int REBALANCE_EVERY = 1;
    /** {@code walkforward.cost_bps:} when absent: no trading cost. */
    public static final double COST_BPS = 0.0;
    /** {@code risk:} of an equal-weight strategy when absent (the model of its forecast). */
    public static final RiskKind EQUAL_WEIGHT_RISK = RiskKind.SAMPLE;
    /** {@code shrinkage_target:} of a shrinkage strategy when absent. */
    public static final ShrinkageTarget SHRINKAGE_TARGET = ShrinkageTarget.SINGLE_INDEX;
    /** {@code factors:} of a multi-index strategy when absent: market plus one factor per sector. */
    public static final FactorSource FACTORS = new FactorSource.Sectors();
    /** {@code expected_returns:} of mean-variance and max-sharpe when absent. */
    public static final ExpectedReturnKind EXPECTED_RETURNS = ExpectedReturnKind.SINGLE_INDEX;
    /**
     * The risk aversion recorded for objectives that do not use one. Mean-variance has no
     * default: its {@code risk_aversion:} is required, because the weights depend on it entirely.
     */
    public static final double UNUSED_RISK_AVERSION = 1.0;
    /** {@code report.paper:} when absent: ISO A4, the paper of most of the world. */
    public static final Paper PAPER = Paper.A4;

    private StudyDefaults() {
    }

    /** One line per default or rule, as printed by {@code sigmawalk check}. */
    public static List<String> describe() {
        EvidenceSpec evidence = EvidenceSpec.defaults();
        return List.of(
                "title: the study file's name without its extension",
                "data.layout: " + LAYOUT.spelling(),
                "data.periods_per_year: inferred from the median spacing of the dates"
                        + " (days < 4: 252, < 15: 52, < 60: 12, < 200: 4, else 1)",
                "data.market, data.riskfree: a value ending in .csv or holding a '/' is a file; otherwise a column"
                        + " of the assets file; a number (risk-free only) is an annual rate",
                "walkforward.rebalance_every: " + REBALANCE_EVERY + " (when no rebalance: is given)",
                "walkforward.start: the first row where the longest window is full",
                "walkforward.end: the last date of the data",
                "walkforward.cost_bps: " + COST_BPS,
                "strategies[].risk: " + EQUAL_WEIGHT_RISK.spelling() + " for equal-weight; required otherwise",
                "strategies[].shrinkage_target: " + SHRINKAGE_TARGET.spelling(),
                "strategies[].bounds: none (short sales allowed)",
                "strategies[].factors: " + FACTORS.spelling() + " for multi-index (needs data.sectors)",
                "strategies[].components: required for principal-components; no default",
                "strategies[].half_life: required for ewma; no default",
                "strategies[].risk_aversion: required for mean-variance; no default",
                "strategies[].expected_returns: " + EXPECTED_RETURNS.spelling() + " for mean-variance and max-sharpe",
                "strategies[].alphas: none (every alpha 0)",
                "strategies[].market_premium: the window's mean market excess return",
                "strategies[].baseline: the first sample-covariance strategy with the same objective and bounds"
                        + " (none when the study has no such strategy)",
                "evidence.resamples: " + evidence.resamples(),
                "evidence.seed: " + evidence.seed(),
                "evidence.block_length: chosen from the data",
                "report.paper: " + PAPER.spelling(),
                "output: " + OUTPUT + " beside the study file");
    }
}
