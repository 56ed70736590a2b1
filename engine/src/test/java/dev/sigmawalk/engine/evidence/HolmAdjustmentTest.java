package dev.sigmawalk.engine.evidence;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.util.Arrays;
import java.util.SplittableRandom;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class HolmAdjustmentTest {
    private static final double HAND = 1e-15;

    /**
     * Hand example of Holm's (1979) step-down: p = (0.01, 0.04, 0.03, 0.005), m = 4. Sorted:
     * 0.005·4 = 0.02, 0.01·3 = 0.03, 0.03·2 = 0.06, 0.04·1 = 0.04 → running max 0.06. In input
     * order: (0.03, 0.06, 0.06, 0.02). At α = 0.05 only the first and last are rejected.
     */
    @Test
    void fourTests_matchHandExample() {
        assertArrayEquals(new double[] {0.03, 0.06, 0.06, 0.02},
                HolmAdjustment.adjust(new double[] {0.01, 0.04, 0.03, 0.005}), HAND);
    }

    /** Hand: (0.5, 0.6) → 0.5·2 = 1 (capped), then max(1, 0.6) = 1. */
    @Test
    void largeProducts_areCappedAtOne() {
        assertArrayEquals(new double[] {1.0, 1.0}, HolmAdjustment.adjust(new double[] {0.5, 0.6}), HAND);
    }

    @Test
    void emptyAndSingle_areUnchanged() {
        assertEquals(0, HolmAdjustment.adjust(new double[0]).length);
        assertArrayEquals(new double[] {0.2}, HolmAdjustment.adjust(new double[] {0.2}), HAND);
    }

    @Test
    void outOfRangeP_isRejectedWithItsIndex() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> HolmAdjustment.adjust(new double[] {0.1, Double.NaN}));
        assertTrue(e.getMessage().contains("p-value 1"), e.getMessage());
    }

    /**
     * Invariants of the step-down: each adjusted p lies in [p, 1], adjusted values keep the order
     * of the raw ones, and the smallest is min(1, m · min p) (Bonferroni for the first step).
     * The 300 sets of 1 to 30 p-values in [0, 1] are drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("pValueSets")
    void adjusted_boundedOrderedAndBonferroniFirst(double[] p) {
        String raw = " of p = " + Arrays.toString(p);
        double[] q = HolmAdjustment.adjust(p);
        double minP = 1;
        double minQ = 1;
        for (int i = 0; i < p.length; i++) {
            assertTrue(q[i] >= p[i] && q[i] <= 1, "index " + i + raw);
            for (int j = 0; j < p.length; j++) {
                if (p[i] < p[j]) {
                    assertTrue(q[i] <= q[j], "order " + i + "," + j + raw);
                }
            }
            minP = Math.min(minP, p[i]);
            minQ = Math.min(minQ, q[i]);
        }
        assertEquals(Math.min(1, p.length * minP), minQ, 1e-15, "smallest" + raw);
    }

    static Stream<double[]> pValueSets() {
        SplittableRandom rng = new SplittableRandom(0x5EED_0006L);
        return Stream.generate(() -> {
            double[] p = new double[rng.nextInt(1, 31)];
            for (int i = 0; i < p.length; i++) {
                p[i] = inUnitInterval(rng);
            }
            return p;
        }).limit(300);
    }

    /**
     * A p-value: now and then 0 or 1 itself, often a decimal with two places (so ties occur),
     * otherwise any double in [0, 1).
     */
    private static double inUnitInterval(SplittableRandom rng) {
        int pick = rng.nextInt(20);
        if (pick == 0) {
            return 0;
        }
        if (pick == 1) {
            return 1;
        }
        if (pick < 10) {
            return rng.nextInt(101) / 100.0;
        }
        return rng.nextDouble();
    }
}
