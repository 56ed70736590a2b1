package dev.sigmawalk.engine.evidence;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class CircularResampleTest {
    /** Blocks 1, 2 and 3 of (1, 2, 3, 4, 5) from starts 4, 0 and 3: every wrap worked by hand. */
    @Test
    void blocksWrapPastTheEnd() {
        double[] x = {1, 2, 3, 4, 5};
        assertDrawn(x, new int[] {4, 0, 3}, 1, new double[] {5, 1, 4});
        assertDrawn(x, new int[] {4, 0, 3}, 2, new double[] {5, 1, 1, 2, 4, 5});
        assertDrawn(x, new int[] {4, 0, 3}, 3, new double[] {5, 1, 2, 1, 2, 3, 4, 5, 1});
    }

    /**
     * The resample is x[(start + j) mod T] block by block (Politis &amp; Romano 1992), and its sums
     * are bit for bit those of adding its values in period order, as {@link PairMoments#of} adds
     * them: 300 seeded cases, block lengths 1 to 40, every start equally likely.
     */
    @Test
    void resample_isTheCircularBlocks_andItsSumsAreThoseOfItsValues() {
        SplittableRandom random = new SplittableRandom(20_261_202L);
        for (int c = 0; c < 300; c++) {
            int length = random.nextInt(2, 200);
            int block = random.nextInt(1, Math.min(40, length) + 1);
            double[] x = new double[length];
            for (int t = 0; t < length; t++) {
                x[t] = 0.02 * (random.nextDouble() - 0.5);
            }
            int[] starts = new int[length / block];
            for (int j = 0; j < starts.length; j++) {
                starts[j] = random.nextInt(length);
            }
            double[] expected = new double[starts.length * block];
            for (int j = 0; j < starts.length; j++) {
                for (int k = 0; k < block; k++) {
                    expected[j * block + k] = x[(starts[j] + k) % length];
                }
            }
            assertDrawn(x, starts, block, expected);
        }
    }

    private static void assertDrawn(double[] x, int[] starts, int block, double[] expected) {
        CircularResample r = new CircularResample(expected.length);
        r.draw(x, starts, block);
        assertArrayEquals(expected, r.values(), 0.0, "block " + block);
        double s = 0;
        double q = 0;
        for (double v : expected) {
            s += v;
            q += v * v;
        }
        assertEquals(Double.doubleToRawLongBits(s), Double.doubleToRawLongBits(r.sum()), "sum, block " + block);
        assertEquals(Double.doubleToRawLongBits(q), Double.doubleToRawLongBits(r.sumOfSquares()),
                "sum of squares, block " + block);
    }
}
