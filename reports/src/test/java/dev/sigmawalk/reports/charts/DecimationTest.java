package dev.sigmawalk.reports.charts;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import org.junit.jupiter.api.Test;

class DecimationTest {
    private static final int LIMIT = 100;

    @Test
    void shortLine_isKeptWhole() {
        assertArrayEquals(new int[] {0, 1, 2}, Decimation.minMax(new double[] {3, 1, 2}, LIMIT));
    }

    /** A gap (NaN) in the middle of a long line is still there after thinning. */
    @Test
    void gap_survivesThinning() {
        double[] y = new double[5000];
        Arrays.fill(y, 1.0);
        y[2500] = Double.NaN;
        int[] kept = Decimation.minMax(y, LIMIT);
        assertTrue(Arrays.stream(kept).anyMatch(k -> Double.isNaN(y[k])), "the gap is kept");
    }

    /**
     * For any long random walk: at most the limit of points, strictly increasing indices, both
     * ends kept, and the global lowest and highest values kept.
     */
    @Property(tries = 50)
    void longLine_keepsEndsAndExtremes(@ForAll @IntRange(min = 101, max = 20_000) int n,
                                       @ForAll @LongRange(min = 0, max = 1_000_000) long seed) {
        java.util.SplittableRandom rng = new java.util.SplittableRandom(seed);
        double[] y = new double[n];
        for (int k = 1; k < n; k++) {
            y[k] = y[k - 1] + rng.nextDouble() - 0.5;
        }
        int[] kept = Decimation.minMax(y, LIMIT);
        assertTrue(kept.length <= LIMIT, "kept " + kept.length);
        assertEquals(0, kept[0]);
        assertEquals(n - 1, kept[kept.length - 1]);
        for (int k = 1; k < kept.length; k++) {
            assertTrue(kept[k] > kept[k - 1], "indices increase");
        }
        double min = Arrays.stream(y).min().orElseThrow();
        double max = Arrays.stream(y).max().orElseThrow();
        assertTrue(Arrays.stream(kept).anyMatch(k -> y[k] == min), "lowest kept");
        assertTrue(Arrays.stream(kept).anyMatch(k -> y[k] == max), "highest kept");
    }
}
