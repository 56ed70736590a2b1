package dev.sigmawalk.reports.charts;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
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
     * ends kept, and the global lowest and highest values kept. Fifty walks, their lengths
     * (101 to 20,000) and seeds drawn from a fixed seed.
     */
    @Test
    void longLine_keepsEndsAndExtremes() {
        java.util.SplittableRandom cases = new java.util.SplittableRandom(50_101L);
        for (int c = 0; c < 50; c++) {
            assertWalkThinnedWell(cases.nextInt(101, 20_001), cases.nextLong(0, 1_000_001));
        }
    }

    private static void assertWalkThinnedWell(int n, long seed) {
        java.util.SplittableRandom rng = new java.util.SplittableRandom(seed);
        double[] y = new double[n];
        for (int k = 1; k < n; k++) {
            y[k] = y[k - 1] + rng.nextDouble() - 0.5;
        }
        int[] kept = Decimation.minMax(y, LIMIT);
        assertTrue(kept.length <= LIMIT, "kept " + kept.length + " of n = " + n + ", seed " + seed);
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
