package dev.sigmawalk.sample;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class SplitMix64Test {
    private static final int DRAWS = 200_000;
    /** Five standard errors of a mean of DRAWS standard normals (1/√DRAWS ≈ 0.0022). */
    private static final double MEAN_TOLERANCE = 5 / Math.sqrt(DRAWS);
    /** Five standard errors of their variance (√(2/DRAWS) ≈ 0.0032). */
    private static final double VARIANCE_TOLERANCE = 5 * Math.sqrt(2.0 / DRAWS);

    /**
     * Source: the JDK's {@code java.util.SplittableRandom} (Java 17), whose {@code nextLong} is
     * SplitMix64 with the golden gamma (Steele, Lea &amp; Flood 2014); the same seed must give
     * the same stream.
     */
    @Test
    void nextLong_matchesJdkSplittableRandom_forTheSameSeed() {
        for (long seed : new long[] {0L, 1L, -7L, 20_020_104L, Long.MAX_VALUE}) {
            SplitMix64 ours = new SplitMix64(seed);
            SplittableRandom jdk = new SplittableRandom(seed);
            for (int i = 0; i < 1000; i++) {
                assertEquals(jdk.nextLong(), ours.nextLong(), "seed " + seed + ", draw " + i);
            }
        }
    }

    @Test
    void streams_withDifferentNumbers_differ() {
        assertNotEquals(SplitMix64.stream(5, 0).nextLong(), SplitMix64.stream(5, 1).nextLong());
        assertEquals(SplitMix64.stream(5, 3).nextLong(), SplitMix64.stream(5, 3).nextLong());
    }

    /** Moments of the standard normal (common practice: mean 0, variance 1). */
    @Test
    void nextGaussian_hasMeanZeroAndVarianceOne() {
        SplitMix64 random = new SplitMix64(11);
        double sum = 0;
        double sumSquares = 0;
        for (int i = 0; i < DRAWS; i++) {
            double z = random.nextGaussian();
            sum += z;
            sumSquares += z * z;
        }
        double mean = sum / DRAWS;
        assertEquals(0, mean, MEAN_TOLERANCE, "mean");
        assertEquals(1, sumSquares / DRAWS - mean * mean, VARIANCE_TOLERANCE, "variance");
    }

    @Test
    void nextInt_staysInRangeAndReachesBothEnds() {
        SplitMix64 random = new SplitMix64(3);
        boolean sawLow = false;
        boolean sawHigh = false;
        for (int i = 0; i < 1000; i++) {
            int k = random.nextInt(4, 9);
            assertTrue(k >= 4 && k <= 9, "draw " + k + " outside [4, 9]");
            sawLow |= k == 4;
            sawHigh |= k == 9;
        }
        assertTrue(sawLow && sawHigh, "both ends of [4, 9] drawn in 1000 tries");
    }

    @Test
    void nextInt_refusesAnEmptyRange() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new SplitMix64(1).nextInt(5, 4));
        assertTrue(e.getMessage().contains("[5, 4]"), e.getMessage());
    }
}
