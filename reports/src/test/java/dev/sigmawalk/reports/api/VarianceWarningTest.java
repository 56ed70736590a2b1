package dev.sigmawalk.reports.api;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sigmawalk.engine.compare.Comparison;
import dev.sigmawalk.engine.evidence.DifferenceMeasure;
import dev.sigmawalk.engine.evidence.DifferenceTest;
import dev.sigmawalk.engine.evidence.HacKernel;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/** The run's warning about variance tests whose dependence exceeds their bandwidth (Method §9). */
class VarianceWarningTest {
    private static Comparison comparison(String strategy, int window, double lingering) {
        DifferenceTest v = new DifferenceTest(DifferenceMeasure.VARIANCE, HacKernel.PARZEN, 5500, 1.2e-4, 1.0e-4,
                Math.log(1.2), 0.05, Math.log(1.2) / 0.05, 0.0003, 0.001, 6.5, 3, 2000, lingering);
        return new Comparison(strategy, "equal", window, Optional.empty(), Optional.of(v), Optional.empty(), 0.01,
                0.01, Optional.empty());
    }

    @Test
    void namesEachFlaggedComparison_inOneLine() {
        List<String> w = Runs.warningsOfTests(List.of(comparison("index", 250, 7.5), comparison("sample", 250, 1.0),
                comparison("shrunk", 500, 3.2)));
        assertEquals(List.of("the variance tests of 'index' against 'equal' (window 250), 'shrunk' against 'equal'"
                + " (window 500) find more autocorrelation in the two strategies' squared returns than their bandwidth"
                + " covers, as when their volatilities move apart (Method §9): their p-values may be too small; treat"
                + " them as borderline, or check with a longer evidence.block_length"), w);
        assertEquals(List.of("the variance test of 'index' against 'equal' (window 250) finds more autocorrelation in"
                + " the two strategies' squared returns than its bandwidth covers, as when their volatilities move"
                + " apart (Method §9): its p-values may be too small; treat it as borderline, or check with a longer"
                + " evidence.block_length"), Runs.warningsOfTests(List.of(comparison("index", 250, 7.5))));
    }

    @Test
    void nothingFlagged_noVerdict_orNoVarianceTest_giveNoWarning() {
        Comparison skipped = new Comparison("index", "equal", 250, Optional.empty(), Optional.empty(), Optional.empty(),
                Double.NaN, Double.NaN, Optional.of("a series does not vary"));
        assertEquals(List.of(), Runs.warningsOfTests(List.of(comparison("index", 250, 2.9),
                comparison("sample", 250, Double.NaN), skipped)));
    }
}
