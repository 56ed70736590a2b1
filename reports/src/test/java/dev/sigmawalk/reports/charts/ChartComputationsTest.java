package dev.sigmawalk.reports.charts;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

class ChartComputationsTest {
    private static final double TOLERANCE = 1e-12;

    /** Span rule of RollingVolatility: common practice (a year of monthly data, a quarter of daily data). */
    @Test
    void span_followsPeriodsPerYear() {
        assertEquals(12, RollingVolatility.span(12));
        assertEquals(13, RollingVolatility.span(52));
        assertEquals(63, RollingVolatility.span(252));
        assertEquals(4, RollingVolatility.span(4));
        assertEquals(2, RollingVolatility.span(1), "a standard deviation needs two values");
    }

    /**
     * Hand computation, span 3, p = 12, returns 0.01, 0.03, -0.02, 0.05. Rows 0..2: mean 0.02/3,
     * squared deviations sum 0.00126667, divided by 2 gives 0.00063333, √(12 · 0.00063333) =
     * 0.0871780. Rows 1..3: mean 0.02, squared deviations 0.0001 + 0.0016 + 0.0009 = 0.0026,
     * /2 = 0.0013, √(12 · 0.0013) = √0.0156 = 0.1248999.
     */
    @Test
    void rollingVolatility_matchesHandComputation() {
        double[] v = RollingVolatility.annualised(new double[] {0.01, 0.03, -0.02, 0.05}, 3, 12);
        assertTrue(Double.isNaN(v[0]) && Double.isNaN(v[1]), "no full span before row 2");
        assertEquals(Math.sqrt(12 * 0.0012666666666666667 / 2), v[2], TOLERANCE);
        assertEquals(Math.sqrt(0.0156), v[3], TOLERANCE);
    }

    @Test
    void rollingVolatility_rejectsSpanBelowTwo() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> RollingVolatility.annualised(new double[] {0.1, 0.2}, 1, 12));
        assertTrue(e.getMessage().contains("rolling span (1)"), e.getMessage());
    }

    /** Hand computation: 1/(0.5² + 0.3² + 0.2²) = 1/0.38 = 2.6315789...; largest weight 0.5. */
    @Test
    void concentration_matchesHandComputation() {
        double[] w = {0.5, 0.3, 0.2};
        assertEquals(1 / 0.38, Concentration.effectiveHoldings(w), TOLERANCE);
        assertEquals(0.5, Concentration.largestWeight(w), 0.0);
        assertEquals(4.0, Concentration.effectiveHoldings(new double[] {0.25, 0.25, 0.25, 0.25}), TOLERANCE);
    }

    @Test
    void concentration_rejectsAllZeroWeights() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Concentration.effectiveHoldings(new double[] {0, 0}));
        assertTrue(e.getMessage().contains("non-zero weight"), e.getMessage());
    }

    /**
     * For long-only weights summing to 1: 1 ≤ 1/Σw² ≤ n (Cauchy-Schwarz), and max w ≥ 1/n. Two
     * hundred weight vectors of 1 to 30 entries in [0.01, 1], drawn from a fixed seed.
     */
    @Test
    void effectiveHoldings_liesBetweenOneAndCount() {
        java.util.SplittableRandom rng = new java.util.SplittableRandom(2_024_1202L);
        for (int c = 0; c < 200; c++) {
            double[] raw = rng.doubles(rng.nextInt(1, 31), 0.01, 1).toArray();
            assertEffectiveHoldingsBounded(raw);
        }
    }

    private static void assertEffectiveHoldingsBounded(double[] raw) {
        double total = Arrays.stream(raw).sum();
        double[] w = Arrays.stream(raw).map(x -> x / total).toArray();
        double eff = Concentration.effectiveHoldings(w);
        assertTrue(eff >= 1 - 1e-9 && eff <= w.length + 1e-9, "effective holdings " + eff + " for n = " + w.length);
        assertTrue(Concentration.largestWeight(w) >= 1.0 / w.length - 1e-12, "largest weight below 1/n");
    }

    /** Hand computation: 1.1, 1.1 · 0.5 = 0.55, 0.55 · 1.2 = 0.66. */
    @Test
    void growth_compoundsReturns() {
        assertArrayEquals(new double[] {1.1, 0.55, 0.66}, Growth.ofOne(new double[] {0.1, -0.5, 0.2}), TOLERANCE);
    }

    /**
     * A loss of everything (−100 %) leaves wealth 0, which a log scale drew at an infinite
     * coordinate (an SVG path of "Infinity"), and a loss of more turned later wealth positive
     * again: from that row on there is no value (Method §7).
     */
    @Test
    void growth_afterALossOfEverything_hasNoValue() {
        double[] lost = Growth.ofOne(new double[] {0.1, -1.0, 0.2});
        assertEquals(1.1, lost[0], TOLERANCE);
        assertTrue(Double.isNaN(lost[1]) && Double.isNaN(lost[2]), Arrays.toString(lost));
        double[] more = Growth.ofOne(new double[] {0.1, -1.5, -1.5});
        assertTrue(Double.isNaN(more[1]) && Double.isNaN(more[2]), Arrays.toString(more));
    }
}
