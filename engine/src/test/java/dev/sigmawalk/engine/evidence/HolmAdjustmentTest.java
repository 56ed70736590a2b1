package dev.sigmawalk.engine.evidence;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Size;
import org.junit.jupiter.api.Test;

import java.util.List;

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
     */
    @Property(tries = 300)
    void adjusted_boundedOrderedAndBonferroniFirst(
            @ForAll @Size(min = 1, max = 30) List<@DoubleRange(min = 0, max = 1) Double> raw) {
        double[] p = raw.stream().mapToDouble(Double::doubleValue).toArray();
        double[] q = HolmAdjustment.adjust(p);
        double minP = 1;
        double minQ = 1;
        for (int i = 0; i < p.length; i++) {
            assertTrue(q[i] >= p[i] && q[i] <= 1, "index " + i);
            for (int j = 0; j < p.length; j++) {
                if (p[i] < p[j]) {
                    assertTrue(q[i] <= q[j], "order " + i + "," + j);
                }
            }
            minP = Math.min(minP, p[i]);
            minQ = Math.min(minQ, q[i]);
        }
        assertEquals(Math.min(1, p.length * minP), minQ, 1e-15);
    }
}
