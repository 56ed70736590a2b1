package dev.sigmawalk.engine.measures;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.run.PathResult;
import dev.sigmawalk.engine.run.RebalanceRecord;
import java.time.LocalDate;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

/**
 * Measures of Method §7 on a four-row series, each checked against the arithmetic written
 * beside it.
 */
class PerformanceMeasuresTest {
    private static final double TIGHT = 1e-12;
    private static final double[] R = {0.02, -0.01, 0.03, -0.04};
    private static final double[] RF = {0.001, 0.001, 0.001, 0.001};
    private static final double[] MARKET = {0.01, 0.00, 0.02, -0.03};

    private static RebalanceRecord rec(int row, double turnover, double variance) {
        return new RebalanceRecord(LocalDate.of(2020, 1, 31).plusMonths(row), row, 2, List.of("A", "B"),
                new double[] {0.5, 0.5}, turnover, 0, OptionalDouble.of(variance), OptionalDouble.empty(), 0,
                Optional.empty(), List.of());
    }

    @Test
    void summary_matchesHandComputation() {
        PathResult path = new PathResult("s", "sample", 24, R, R, new double[] {0.02, 0.02, 0.03, 0.03},
                List.of(rec(0, 1.0, 0.0004), rec(2, 0.3, 0.0009)));
        Summary s = new PerformanceMeasures(RF, MARKET, 12).of(path);
        // mean(R) = 0; sd(R) = √((4+1+9+16)e-4 / 3) = √(0.001)
        assertEquals(0.0, s.meanReturn(), TIGHT);
        assertEquals(Math.sqrt(12) * Math.sqrt(0.001), s.volatility(), TIGHT);
        // excess mean = −0.001, sd unchanged → sharpe = √12 · (−0.001)/√0.001
        assertEquals(Math.sqrt(12) * -0.001 / Math.sqrt(0.001), s.sharpe(), TIGHT);
        // W: 1.02, 1.0098, 1.040094, 0.99849024; peak 1.040094 → dd = 1 − 0.96
        assertEquals(0.04, s.maxDrawdown(), TIGHT);
        assertEquals(Math.pow(1.02 * 0.99 * 1.03 * 0.96, 12.0 / 4) - 1, s.cagr(), TIGHT);
        assertEquals(0.3, s.meanTurnover().getAsDouble(), TIGHT, "mean over rebalances after the first");
        // active = (0.01, −0.01, 0.01, −0.01): mean 0, sd = √(4e-4/3)
        assertEquals(Math.sqrt(12) * Math.sqrt(4e-4 / 3), s.trackingError().getAsDouble(), TIGHT);
        assertEquals(0.0, s.informationRatio().getAsDouble(), TIGHT);
        assertEquals((Math.sqrt(12 * 0.0004) + Math.sqrt(12 * 0.0009)) / 2, s.forecastVolatility().getAsDouble(), TIGHT);
        // z = (0.019/0.02, −0.011/0.02, 0.029/0.03, −0.041/0.03)
        double[] z = {0.95, -0.55, 0.029 / 0.03, -0.041 / 0.03};
        assertEquals(SeriesStats.sd(z), s.bias().getAsDouble(), TIGHT);
    }

    @Test
    void marketRow_leavesPathMeasuresEmpty() {
        Summary m = new PerformanceMeasures(RF, MARKET, 12).market();
        assertEquals("market", m.strategy());
        assertTrue(m.window().isEmpty());
        assertTrue(m.meanTurnover().isEmpty() && m.trackingError().isEmpty() && m.bias().isEmpty());
        assertEquals(12 * 0.0, m.meanReturn(), TIGHT);
    }

    @Test
    void drawdown_isZeroForARisingSeries() {
        assertEquals(0.0, SeriesStats.maxDrawdown(new double[] {0.01, 0.02, 0.0}), 0.0);
        // W: 2, 1, 0.5, 2 → deepest point 0.5 against the peak 2
        assertEquals(0.75, SeriesStats.maxDrawdown(new double[] {1.0, -0.5, -0.5, 3.0}), TIGHT);
    }

    /**
     * A loss of more than everything in one period (−150 %, a short book): W goes 1.1, −0.55,
     * then a second such loss would make the product +0.275, a "recovery" no investor sees. The
     * wealth is taken as gone at row 1: drawdown 1 from there, max drawdown 1 (not the 1.5 of −0.55 against 1.1),
     * CAGR −1 (not NaN); hand computation.
     */
    @Test
    void lossOfMoreThanEverything_isRuin_notARecovery() {
        double[] r = {0.1, -1.5, -1.5, 0.2};
        assertEquals(1, SeriesStats.firstRuin(r));
        assertEquals(1.0, SeriesStats.maxDrawdown(r), 0.0);
        assertArrayEquals(new double[] {0, 1, 1, 1}, SeriesStats.drawdowns(r), 0.0);
        assertEquals(-1.0, SeriesStats.cagr(r, 12), 0.0);
        assertEquals(-1, SeriesStats.firstRuin(new double[] {0.1, -0.99, 5}));
    }

    /** Exactly −100 % is ruin too: W = 0, drawdown 1, CAGR −1, as the plain formulas give. */
    @Test
    void lossOfEverything_isRuin() {
        double[] r = {0.1, -1.0, 0.5};
        assertEquals(1, SeriesStats.firstRuin(r));
        assertEquals(1.0, SeriesStats.maxDrawdown(r), 0.0);
        assertEquals(-1.0, SeriesStats.cagr(r, 12), 0.0);
    }
}
