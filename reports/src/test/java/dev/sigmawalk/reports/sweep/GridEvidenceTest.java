package dev.sigmawalk.reports.sweep;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.evidence.DifferenceTests;
import dev.sigmawalk.engine.evidence.HacKernel;
import dev.sigmawalk.engine.study.EvidenceSpec;
import java.nio.file.Path;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The grid's best point and its family-corrected p-value. Expected values are Holm's (1979,
 * Scand. J. Statistics 6, 65-70) step-down worked by hand: sorted p-values 0.01, 0.03, 0.04
 * become 3 x 0.01 = 0.03, max(0.03, 2 x 0.03) = 0.06, max(0.06, 1 x 0.04) = 0.06. The Romano-Wolf
 * family itself is checked in {@link GridFamilyTest}.
 */
class GridEvidenceTest {
    private static final double EXACT = 1e-15;
    private static final DifferenceTests TESTS = new DifferenceTests(HacKernel.PARZEN, new EvidenceSpec(199, 5L, 0));

    /** The comparison with 60 dates of simulated returns (day t = 18,000 + t). */
    private static ContrastReturns withReturns(PointComparison c, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        int[] days = new int[60];
        double[] a = new double[60];
        double[] b = new double[60];
        for (int t = 0; t < 60; t++) {
            days[t] = 18_000 + t;
            a[t] = 0.01 * (random.nextDouble() - 0.5);
            b[t] = 0.012 * (random.nextDouble() - 0.5);
        }
        return new ContrastReturns(c, days, a, b);
    }

    private static GridPoint point(int n) {
        return new GridPoint(n, String.format("%03d", n), List.of(String.valueOf(n)), Path.of("/grid/points/" + n), "");
    }

    private static PointRow row(GridPoint p, String strategy, String window, double volatility) {
        return new PointRow(p, strategy, window, volatility, 0.5, 0.1, 1.0);
    }

    @Test
    void best_isTheLowestVolatilityTested_andHolmIsAdjustedOverTheWholeGrid() {
        GridPoint a = point(1);
        GridPoint b = point(2);
        List<PointRow> rows = List.of(row(a, "model", "36", 0.12), row(a, "base", "36", 0.13), row(a, "market", "", 0.05),
                row(b, "model", "36", 0.10), row(b, "base", "36", 0.14), row(b, "model", "60", 0.11),
                row(b, "untested", "36", 0.01));
        List<ContrastReturns> tests = List.of(withReturns(new PointComparison(a, "model", "base", "36", 0.01), 1),
                withReturns(new PointComparison(b, "model", "base", "36", 0.04), 2),
                withReturns(new PointComparison(b, "model", "base", "60", 0.03), 3));
        GridEvidence e = GridEvidence.of(rows, tests, TESTS);
        assertEquals("002", e.best().get().point().label(), "best point (the market and untested rows are not candidates)");
        assertEquals("36", e.best().get().window());
        assertEquals(0.14, e.baseline().get().volatility(), EXACT, "its baseline in the same point and window");
        assertEquals(0.04, e.rawPValue(), EXACT);
        assertEquals(0.06, e.holmPValue(), EXACT, "Holm over 3 comparisons");
        assertArrayEquals(new double[] {0.03, 0.06, 0.06}, e.holm(), EXACT, "Holm of each");
        assertEquals(3, e.comparisonCount());
        assertEquals(3, e.family().members().size(), "all three share their 60 dates");
        assertEquals(e.family().member(tests.get(1).comparison()).get().adjusted(), e.familyPValue(), 0.0,
                "the best's family p-value is its member's");
    }

    /**
     * A path that never formed a portfolio held cash throughout: its volatility, here 0.01, is
     * the risk-free rate's, so the lowest volatility of the grid is not a model's and the best is
     * the next compared path that invested. When the only compared path never invested there is
     * no best, and the family says why.
     */
    @Test
    void pathThatNeverInvested_isNeverTheBest() {
        GridPoint a = point(1);
        GridPoint b = point(2);
        PointRow cash = new PointRow(a, "model", "36", 0.01, 0.0, 0.0, Double.NaN, false);
        List<PointRow> rows = List.of(cash, row(a, "base", "36", 0.13), row(b, "model", "36", 0.10),
                row(b, "base", "36", 0.14));
        List<ContrastReturns> tests = List.of(withReturns(new PointComparison(a, "model", "base", "36", 0.01), 1),
                withReturns(new PointComparison(b, "model", "base", "36", 0.04), 2));
        GridEvidence e = GridEvidence.of(rows, tests, TESTS);
        assertEquals("002", e.best().get().point().label());
        assertEquals(0.10, e.best().get().volatility(), EXACT);
        assertEquals(0.04, e.rawPValue(), EXACT, "the invested path's own p-value");

        GridEvidence none = GridEvidence.of(List.of(cash, row(a, "base", "36", 0.13)), tests.subList(0, 1), TESTS);
        assertTrue(none.best().isEmpty() && Double.isNaN(none.familyPValue()));
        assertEquals("no compared strategy formed a portfolio at any rebalance", none.family().notFormed().get());
    }

    @Test
    void noTestedStrategy_namesNoBest() {
        GridEvidence e = GridEvidence.of(List.of(row(point(1), "equal", "36", 0.1)), List.of(), TESTS);
        assertTrue(e.best().isEmpty() && e.baseline().isEmpty());
        assertTrue(Double.isNaN(e.familyPValue()) && Double.isNaN(e.holmPValue()));
        assertTrue(e.family().notFormed().isPresent());
    }
}
