package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.evidence.DifferenceTest;
import dev.sigmawalk.engine.evidence.JobsonKorkieTest;
import java.util.Objects;
import java.util.Optional;

/**
 * One strategy against its baseline with one window: the tests of METHODS §9 as the report
 * shows them.
 *
 * @param strategy the strategy tested
 * @param baseline the strategy it is compared with
 * @param window L
 * @param sharpe Ledoit-Wolf (2008) test of equal Sharpe ratios, when it could be run
 * @param variance Ledoit-Wolf (2011) test of equal variances, when it could be run
 * @param jobsonKorkie Jobson-Korkie test with Memmel's correction, when it could be run
 * @param holmSharpe Holm-adjusted bootstrap p-value of the Sharpe test, in [0, 1], or NaN when not run
 * @param holmVariance Holm-adjusted bootstrap p-value of the variance test, in [0, 1], or NaN when not run
 * @param skipped why a test could not be run
 */
public record PairComparison(String strategy, String baseline, int window, Optional<DifferenceTest> sharpe,
                             Optional<DifferenceTest> variance, Optional<JobsonKorkieTest> jobsonKorkie,
                             double holmSharpe, double holmVariance, Optional<String> skipped) {
    public PairComparison {
        Objects.requireNonNull(strategy, "strategy");
        Objects.requireNonNull(baseline, "baseline");
        Objects.requireNonNull(sharpe, "sharpe");
        Objects.requireNonNull(variance, "variance");
        Objects.requireNonNull(jobsonKorkie, "jobsonKorkie");
        Objects.requireNonNull(skipped, "skipped");
        if (!(Double.isNaN(holmSharpe) || (holmSharpe >= 0 && holmSharpe <= 1))
                || !(Double.isNaN(holmVariance) || (holmVariance >= 0 && holmVariance <= 1))) {
            throw new IllegalArgumentException("Holm p-values (" + holmSharpe + ", " + holmVariance
                    + ") must be in [0, 1] or NaN");
        }
    }
}
