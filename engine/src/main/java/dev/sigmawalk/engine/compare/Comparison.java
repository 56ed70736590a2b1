package dev.sigmawalk.engine.compare;

import dev.sigmawalk.engine.evidence.DifferenceTest;
import dev.sigmawalk.engine.evidence.JobsonKorkieTest;
import java.util.Objects;
import java.util.Optional;

/**
 * One strategy against its baseline with one window length: the Sharpe-ratio and variance
 * difference tests on net returns, the Jobson-Korkie/Memmel test, and the Holm-adjusted
 * bootstrap p-values across the windows the study tried.
 *
 * @param strategy the strategy tested
 * @param baseline the strategy it is compared with
 * @param window L
 * @param sharpe Ledoit-Wolf (2008) test on excess net returns, when it could be run
 * @param variance Ledoit-Wolf (2011) test on net returns, when it could be run
 * @param jobsonKorkie Jobson-Korkie with Memmel's correction, when it could be run
 * @param holmSharpe Holm-adjusted bootstrap p-value of the Sharpe test across windows
 * @param holmVariance Holm-adjusted bootstrap p-value of the variance test across windows
 * @param skipped why a test could not be run (for example a series that does not vary)
 * @param familySharpe the Sharpe test's p-value adjusted over the whole family of comparisons the
 *        report chooses among (Romano-Wolf stepdown, Method §9); NaN where the test did not run
 * @param familyVariance the same for the variance test
 */
public record Comparison(String strategy, String baseline, int window, Optional<DifferenceTest> sharpe,
                         Optional<DifferenceTest> variance, Optional<JobsonKorkieTest> jobsonKorkie,
                         double holmSharpe, double holmVariance, Optional<String> skipped, double familySharpe,
                         double familyVariance) {
    public Comparison {
        Objects.requireNonNull(strategy, "strategy");
        Objects.requireNonNull(baseline, "baseline");
        Objects.requireNonNull(sharpe, "sharpe");
        Objects.requireNonNull(variance, "variance");
        Objects.requireNonNull(jobsonKorkie, "jobsonKorkie");
        Objects.requireNonNull(skipped, "skipped");
    }

    /** A comparison before the family correction (both family p-values NaN). */
    public Comparison(String strategy, String baseline, int window, Optional<DifferenceTest> sharpe,
                      Optional<DifferenceTest> variance, Optional<JobsonKorkieTest> jobsonKorkie, double holmSharpe,
                      double holmVariance, Optional<String> skipped) {
        this(strategy, baseline, window, sharpe, variance, jobsonKorkie, holmSharpe, holmVariance, skipped, Double.NaN,
                Double.NaN);
    }

    Comparison withHolm(double sharpeAdjusted, double varianceAdjusted) {
        return new Comparison(strategy, baseline, window, sharpe, variance, jobsonKorkie, sharpeAdjusted,
                varianceAdjusted, skipped, familySharpe, familyVariance);
    }

    Comparison withFamily(double sharpeAdjusted, double varianceAdjusted) {
        return new Comparison(strategy, baseline, window, sharpe, variance, jobsonKorkie, holmSharpe, holmVariance,
                skipped, sharpeAdjusted, varianceAdjusted);
    }
}
