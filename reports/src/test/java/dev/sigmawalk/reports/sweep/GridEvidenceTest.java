package dev.sigmawalk.reports.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The grid's best point and its family-corrected p-value. Expected values are Holm's (1979,
 * Scand. J. Statistics 6, 65-70) step-down worked by hand: sorted p-values 0.01, 0.03, 0.04
 * become 3 x 0.01 = 0.03, max(0.03, 2 x 0.03) = 0.06, max(0.06, 1 x 0.04) = 0.06.
 */
class GridEvidenceTest {
    private static final double EXACT = 1e-15;

    private static GridPoint point(int n) {
        return new GridPoint(n, String.format("%03d", n), List.of(String.valueOf(n)), Path.of("/grid/points/" + n), "");
    }

    private static PointRow row(GridPoint p, String strategy, String window, double volatility) {
        return new PointRow(p, strategy, window, volatility, 0.5, 0.1, 1.0);
    }

    @Test
    void best_isTheLowestVolatilityTested_andItsPValueIsHolmAdjustedOverTheGrid() {
        GridPoint a = point(1);
        GridPoint b = point(2);
        List<PointRow> rows = List.of(row(a, "model", "36", 0.12), row(a, "base", "36", 0.13), row(a, "market", "", 0.05),
                row(b, "model", "36", 0.10), row(b, "base", "36", 0.14), row(b, "model", "60", 0.11),
                row(b, "untested", "36", 0.01));
        List<PointComparison> tests = List.of(new PointComparison(a, "model", "base", "36", 0.01),
                new PointComparison(b, "model", "base", "36", 0.04), new PointComparison(b, "model", "base", "60", 0.03));
        GridEvidence e = GridEvidence.of(rows, tests);
        assertEquals("002", e.best().get().point().label(), "best point (the market and untested rows are not candidates)");
        assertEquals("36", e.best().get().window());
        assertEquals(0.14, e.baseline().get().volatility(), EXACT, "its baseline in the same point and window");
        assertEquals(0.04, e.rawPValue(), EXACT);
        assertEquals(0.06, e.familyPValue(), EXACT, "Holm over 3 comparisons");
        assertEquals(3, e.family());
    }

    @Test
    void noTestedStrategy_namesNoBest() {
        GridEvidence e = GridEvidence.of(List.of(row(point(1), "equal", "36", 0.1)), List.of());
        assertTrue(e.best().isEmpty() && e.baseline().isEmpty());
        assertTrue(Double.isNaN(e.familyPValue()));
    }
}
