package dev.sigmawalk.sample;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Expected texts are hand-rounded decimals of the inputs. */
class SignificantDigitsTest {
    private final SignificantDigits eight = new SignificantDigits(8);

    @Test
    void format_roundsToEightSignificantDigits_inPlainNotation() {
        assertEquals("-0.012345679", eight.format(-0.0123456789));
        assertEquals("0.0012345678", eight.format(0.00123456781));
        assertEquals("1.2345679", eight.format(1.23456789));
        assertEquals("123456790", eight.format(123456789.0));
        assertEquals("0.00000012345679", eight.format(1.23456789e-7));
    }

    @Test
    void format_dropsTrailingZerosAndKeepsIntegers() {
        assertEquals("0.3", eight.format(0.3));
        assertEquals("2.6", eight.format(2.6));
        assertEquals("261", eight.format(261));
        assertEquals("0", eight.format(0.0));
        assertEquals("-1", eight.format(-1.0));
    }

    /** 9.99999999 has nine nines: rounding to eight digits carries into a new decade. */
    @Test
    void format_carriesIntoTheNextDecade() {
        assertEquals("10", eight.format(9.99999999));
        assertEquals("-0.1", eight.format(-0.0999999999));
    }

    /** Beyond the exact powers of ten the BigDecimal path answers; hand-rounded. */
    @Test
    void format_handlesTinyValues() {
        assertEquals("0.000000000000000000012345679", eight.format(1.23456789e-20));
    }

    @Test
    void round_returnsTheValueOfTheWrittenText() {
        double[] values = {-0.0123456789, 0.3, 1.0 / 3, 2.0 / 3, -0.999999999, 1e-20 / 3, 12345.6789};
        for (double x : values) {
            assertEquals(Double.parseDouble(eight.format(x)), eight.round(x), 0.0, "value " + x);
        }
    }

    @Test
    void format_refusesNonFiniteValues() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> eight.format(Double.NaN));
        assertTrue(e.getMessage().contains("(NaN) must be finite"), e.getMessage());
    }
}
