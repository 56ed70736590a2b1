package dev.sigmawalk.engine.measures;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class SeriesStatsTest {
    private static final double TIGHT = 1e-15;

    /** (1, 2, 3, 4, 6): mean 3.2, squared deviations 4.84 + 1.44 + 0.04 + 0.64 + 7.84 = 14.8, sd = √(14.8 / 4) = √3.7 (worked by hand). */
    @Test
    void sd_ofAKnownSeries_isTheSquareRootOfTheSampleVariance() {
        assertEquals(Math.sqrt(3.7), SeriesStats.sd(new double[] {1, 2, 3, 4, 6}), TIGHT);
        assertEquals(Math.sqrt(3.7), SeriesStats.sd(new double[] {9, 1, 2, 3, 4, 6, 9}, 1, 6), TIGHT);
    }

    /** The range form gives bit for bit the value of the plain form on a copy of the range, 200 seeded cases. */
    @Test
    void sdOfARange_isBitForBitTheSdOfItsCopy() {
        SplittableRandom random = new SplittableRandom(20_261_202L);
        for (int c = 0; c < 200; c++) {
            double[] x = new double[random.nextInt(2, 400)];
            for (int k = 0; k < x.length; k++) {
                x[k] = 0.01 * (random.nextDouble() - 0.5) + 1e-4;
            }
            int from = random.nextInt(0, x.length - 1);
            int to = random.nextInt(from + 2, x.length + 1);
            double plain = SeriesStats.sd(Arrays.copyOfRange(x, from, to));
            assertEquals(Double.doubleToRawLongBits(plain), Double.doubleToRawLongBits(SeriesStats.sd(x, from, to)),
                    "case " + c + ": [" + from + ", " + to + ") of " + x.length);
        }
    }

    @Test
    void sdOfFewerThanTwoValues_isRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> SeriesStats.sd(new double[] {1, 2, 3}, 2, 3));
        assertTrue(e.getMessage().contains("at least 2 values, got 1"), e.getMessage());
    }
}
