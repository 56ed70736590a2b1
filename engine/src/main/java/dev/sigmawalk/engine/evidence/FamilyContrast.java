package dev.sigmawalk.engine.evidence;

import java.util.Objects;

/**
 * One member of a family of difference tests corrected together (Method §9): the two aligned
 * series, the measure compared and the original test on them.
 *
 * @param measure what is compared
 * @param first first series (excess returns for Sharpe ratios, returns for variances)
 * @param second second series, aligned with the first
 * @param test the individual test on these series, whose Δ̂ and studentised |Δ̂| / s(Δ̂) the
 *        family correction uses
 */
public record FamilyContrast(DifferenceMeasure measure, double[] first, double[] second, DifferenceTest test) {
    public FamilyContrast {
        Objects.requireNonNull(measure, "measure");
        Objects.requireNonNull(test, "test");
        SeriesChecks.requireSameLength("first series", first, "second series", second);
        if (test.measure() != measure || test.periods() != first.length) {
            throw new IllegalArgumentException("the test (" + test.measure().label() + ", " + test.periods()
                    + " periods) does not belong to these " + measure.label() + " series of " + first.length + " periods");
        }
    }
}
