package dev.sigmawalk.reports.html;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

/** The documented print rules of {@link Formats}, checked by hand. */
class FormatsTest {
    @Test
    void percent_showsTwoDecimalsAndUnit() {
        assertEquals("12.34 %", Formats.percent(0.12344));
        assertEquals("-0.50 %", Formats.percent(-0.005));
        assertEquals("n/a", Formats.percent(Double.NaN));
        assertEquals("n/a", Formats.percent(OptionalDouble.empty()));
    }

    @Test
    void ratio_showsTwoDecimals() {
        assertEquals("0.86", Formats.ratio(0.857));
        assertEquals("1.00", Formats.ratio(OptionalDouble.of(0.999)));
        assertEquals("n/a", Formats.ratio(Double.POSITIVE_INFINITY));
    }

    @Test
    void basisPoints_dropsNeedlessDecimals() {
        assertEquals("10 bp", Formats.basisPoints(10));
        assertEquals("7.5 bp", Formats.basisPoints(7.5));
        assertEquals("0 bp", Formats.basisPoints(0));
    }
}
