package dev.sigmawalk.sample;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

class SignificantDigitsProperties {
    /**
     * Floating-point slack on the half-unit bound: the scaled product |x|·10^k is itself rounded
     * once (relative error 2^-53), which can move a value by that much across a rounding tie.
     */
    private static final double PRODUCT_SLACK = 1e-15;

    /** Parsing the written text gives back exactly the rounded double. */
    @Property(tries = 300)
    void textParsesToTheRoundedValue(@ForAll @DoubleRange(min = -50, max = 50) double x,
                                     @ForAll @IntRange(min = 4, max = 15) int digits) {
        SignificantDigits d = new SignificantDigits(digits);
        assertEquals(d.round(x), Double.parseDouble(d.format(x)), 0.0, "x = " + x);
    }

    /**
     * The written decimal has at most d significant digits and lies within half a unit of its
     * last digit from x (checked in exact decimal arithmetic with BigDecimal).
     */
    @Property(tries = 300)
    void textIsWithinHalfAUnitInTheLastDigit(@ForAll @DoubleRange(min = -2, max = 2) double x,
                                             @ForAll @IntRange(min = 4, max = 12) int digits) {
        if (x == 0) {
            return;
        }
        BigDecimal written = new BigDecimal(new SignificantDigits(digits).format(x));
        BigDecimal exact = new BigDecimal(x);
        assertTrue(written.stripTrailingZeros().precision() <= digits, "precision of " + written);
        BigDecimal unit = BigDecimal.ONE.scaleByPowerOfTen(exact.precision() - exact.scale() - digits);
        BigDecimal bound = unit.multiply(new BigDecimal("0.5")).add(exact.abs().multiply(new BigDecimal(PRODUCT_SLACK)));
        assertTrue(written.subtract(exact).abs().compareTo(bound) <= 0,
                "x = " + x + " written " + written + " is off by more than half a unit " + unit);
    }

    @Property(tries = 300)
    void roundingTwiceChangesNothing(@ForAll @DoubleRange(min = -10, max = 10) double x) {
        SignificantDigits d = new SignificantDigits(8);
        assertEquals(d.round(x), d.round(d.round(x)), 0.0, "x = " + x);
    }
}
