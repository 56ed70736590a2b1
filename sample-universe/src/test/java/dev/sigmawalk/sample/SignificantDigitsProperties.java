package dev.sigmawalk.sample;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.SplittableRandom;
import java.util.stream.DoubleStream;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class SignificantDigitsProperties {
    /**
     * Floating-point slack on the half-unit bound: the scaled product |x|·10^k is itself rounded
     * once (relative error 2^-53), which can move a value by that much across a rounding tie.
     */
    private static final double PRODUCT_SLACK = 1e-15;

    /**
     * Parsing the written text gives back exactly the rounded double. The 300 cases (x in
     * [-50, 50], 4 to 15 digits) are drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("valuesUpTo50")
    void textParsesToTheRoundedValue(double x, int digits) {
        SignificantDigits d = new SignificantDigits(digits);
        assertEquals(d.round(x), Double.parseDouble(d.format(x)), 0.0, "x = " + x + ", " + digits + " digits");
    }

    /**
     * The written decimal has at most d significant digits and lies within half a unit of its
     * last digit from x (checked in exact decimal arithmetic with BigDecimal). The 300 cases (x in
     * [-2, 2], 4 to 12 digits) are drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("valuesUpTo2")
    void textIsWithinHalfAUnitInTheLastDigit(double x, int digits) {
        if (x == 0) {
            return;
        }
        BigDecimal written = new BigDecimal(new SignificantDigits(digits).format(x));
        BigDecimal exact = new BigDecimal(x);
        assertTrue(written.stripTrailingZeros().precision() <= digits,
                "precision of " + written + " for x = " + x + ", " + digits + " digits");
        BigDecimal unit = BigDecimal.ONE.scaleByPowerOfTen(exact.precision() - exact.scale() - digits);
        BigDecimal bound = unit.multiply(new BigDecimal("0.5")).add(exact.abs().multiply(new BigDecimal(PRODUCT_SLACK)));
        assertTrue(written.subtract(exact).abs().compareTo(bound) <= 0,
                "x = " + x + " written " + written + " to " + digits + " digits is off by more than half a unit "
                        + unit);
    }

    /**
     * Rounding to 8 digits is idempotent: rounding the rounded value again changes nothing. The
     * 300 values in [-10, 10] are drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("valuesUpTo10")
    void roundingTwiceChangesNothing(double x) {
        SignificantDigits d = new SignificantDigits(8);
        assertEquals(d.round(x), d.round(d.round(x)), 0.0, "x = " + x);
    }

    static Stream<Arguments> valuesUpTo50() {
        SplittableRandom rng = new SplittableRandom(0x5EED_0009L);
        return Stream.generate(() -> Arguments.of(inRange(rng, -50, 50), rng.nextInt(4, 16))).limit(300);
    }

    static Stream<Arguments> valuesUpTo2() {
        SplittableRandom rng = new SplittableRandom(0x5EED_000AL);
        return Stream.generate(() -> Arguments.of(inRange(rng, -2, 2), rng.nextInt(4, 13))).limit(300);
    }

    static DoubleStream valuesUpTo10() {
        SplittableRandom rng = new SplittableRandom(0x5EED_000BL);
        return DoubleStream.generate(() -> inRange(rng, -10, 10)).limit(300);
    }

    /**
     * A value in [lo, hi]: now and then an end or zero itself, often a decimal with two places
     * (so ties and round numbers occur), sometimes a value scaled down by a power of ten (so small
     * magnitudes occur), otherwise any double.
     */
    private static double inRange(SplittableRandom rng, double lo, double hi) {
        int pick = rng.nextInt(20);
        if (pick == 0) {
            return lo;
        }
        if (pick == 1) {
            return hi;
        }
        if (pick == 2) {
            return 0.0;
        }
        if (pick < 10) {
            long cents = Math.round(lo * 100);
            return (cents + rng.nextLong(Math.round(hi * 100) - cents + 1)) / 100.0;
        }
        double x = lo + (hi - lo) * rng.nextDouble();
        return pick < 13 ? x / Math.pow(10, rng.nextInt(1, 8)) : x;
    }
}
