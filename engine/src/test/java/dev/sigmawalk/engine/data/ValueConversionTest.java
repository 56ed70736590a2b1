package dev.sigmawalk.engine.data;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sigmawalk.engine.study.ValueKind;
import java.util.Arrays;
import dev.sigmawalk.engine.SeededCases;
import java.util.SplittableRandom;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** Prices to returns (Method §1): r_t = P_t / P_{t−1} − 1, the first row giving none. */
class ValueConversionTest {
    /**
     * Relative error allowed after compounding up to 60 rounded returns. Forming 1 + r from
     * r = P_t/P_{t−1} − 1 loses bits by cancellation when the price falls: the rounding of r
     * (about 1.1e-16) is magnified by P_{t−1}/P_t ≤ 100 for prices in [1, 100], so at most about
     * 60 · 100 · 2.2e-16 ≈ 1.3e-12 in all.
     */
    private static final double COMPOUNDING_TOLERANCE = 1e-11;

    /**
     * Compounding the returns gives back the price ratio: Π(1 + r_t) = P_last / P_first. The
     * 300 price paths (2 to 60 prices in [1, 100]) are drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("pricePaths")
    void compoundedReturns_equalThePriceRatio(double[] p) {
        String prices = "prices " + Arrays.toString(p);
        double[] r = ValueConversion.convert(ValueKind.PRICES, p);
        assertEquals(p.length - 1, r.length, "one return fewer than prices; " + prices);
        double growth = 1.0;
        for (double x : r) {
            growth *= 1.0 + x;
        }
        double ratio = p[p.length - 1] / p[0];
        assertEquals(ratio, growth, COMPOUNDING_TOLERANCE * ratio, prices);
    }

    static Stream<Arguments> pricePaths() {
        SplittableRandom rng = new SplittableRandom(0x5EED_0001L);
        return Stream.generate(() -> Arguments.of(prices(rng, 2, 60))).limit(300);
    }

    /**
     * A missing price removes its own row's return and the next one, nothing else. The 100
     * cases (4 to 30 prices in [1, 100], the gap's position in [0, 1]) are drawn from a fixed
     * seed.
     */
    @ParameterizedTest
    @MethodSource("pricePathsWithGap")
    void missingPrice_removesTwoReturns(double[] prices, double where) {
        double[] p = prices.clone();
        int gap = 1 + (int) (where * (p.length - 2));
        p[gap] = Double.NaN;
        String path = "prices " + Arrays.toString(p);
        double[] r = ValueConversion.convert(ValueKind.PRICES, p);
        for (int t = 0; t < r.length; t++) {
            boolean expectMissing = t + 1 == gap || t == gap;
            assertEquals(expectMissing, Double.isNaN(r[t]),
                    "return row " + t + " with the price gap at " + gap + "; " + path);
        }
        assertEquals(p.length - 1, r.length, "one return fewer than prices; " + path);
    }

    static Stream<Arguments> pricePathsWithGap() {
        SplittableRandom rng = new SplittableRandom(0x5EED_0002L);
        return Stream.generate(() -> Arguments.of(prices(rng, 4, 30), SeededCases.inRange(rng, 0, 1))).limit(100);
    }

    /** Between min and max prices, each in [1, 100]. */
    private static double[] prices(SplittableRandom rng, int min, int max) {
        double[] p = new double[rng.nextInt(min, max + 1)];
        for (int i = 0; i < p.length; i++) {
            p[i] = SeededCases.inRange(rng, 1, 100);
        }
        return p;
    }
}
