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

    /**
     * The kept indices are the ascending set of every bucket's low, high and first NaN plus both
     * ends: the mask gives exactly what a sorted set of those indices gives, on seeded random lines
     * with gaps and ties, of lengths around the bucket boundaries.
     */
    @Test
    void keptIndices_equalTheSortedSetOfBucketExtremes() {
        java.util.SplittableRandom cases = new java.util.SplittableRandom(77_003L);
        for (int c = 0; c < 200; c++) {
            int n = 5 + cases.nextInt(4000);
            int limit = 4 + cases.nextInt(600);
            double[] y = new double[n];
            for (int k = 0; k < n; k++) {
                double u = cases.nextDouble();
                y[k] = u < 0.05 ? Double.NaN : u < 0.15 ? 0.5 : cases.nextGaussian();
            }
            assertArrayEquals(sortedSetOfExtremes(y, limit), Decimation.minMax(y, limit), "case " + c);
        }
    }

    /** The rule spelled out with a sorted set, point by point. */
    private static int[] sortedSetOfExtremes(double[] y, int limit) {
        int n = y.length;
        java.util.TreeSet<Integer> keep = new java.util.TreeSet<>();
        if (n <= limit) {
            for (int k = 0; k < n; k++) {
                keep.add(k);
            }
        } else {
            keep.add(0);
            keep.add(n - 1);
            int buckets = (limit - 2) / 3;
            for (int b = 0; b < buckets; b++) {
                int start = (int) ((long) b * n / buckets);
                int end = (int) ((long) (b + 1) * n / buckets);
                // Lowest and highest (first index on ties) and first NaN, by stream search.
                java.util.function.Supplier<java.util.stream.IntStream> values =
                        () -> java.util.stream.IntStream.range(start, end).filter(k -> !Double.isNaN(y[k]));
                values.get().boxed().min(java.util.Comparator.<Integer>comparingDouble(k -> y[k])
                        .thenComparing(k -> k)).ifPresent(keep::add);
                values.get().boxed().max(java.util.Comparator.<Integer>comparingDouble(k -> y[k])
                        .thenComparing(k -> -k)).ifPresent(keep::add);
                java.util.stream.IntStream.range(start, end).filter(k -> Double.isNaN(y[k])).findFirst()
                        .ifPresent(keep::add);
            }
        }
        return keep.stream().mapToInt(Integer::intValue).toArray();
    }
}
