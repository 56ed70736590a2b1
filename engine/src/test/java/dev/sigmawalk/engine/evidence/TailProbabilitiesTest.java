package dev.sigmawalk.engine.evidence;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class TailProbabilitiesTest {
    /** Printed critical values carry 3 decimals; the tail moves about 0.01 per unit, so 1e-4. */
    private static final double THREE_DECIMAL_TABLE = 1e-4;
    /** Normal quantiles printed to 6 decimals. */
    private static final double SIX_DECIMAL_TABLE = 1e-6;

    /**
     * Upper 5 % points of chi-squared 3.841 (1 df), 7.815 (3 df), 18.307 (10 df), 79.082 (60 df)
     * and the 1 % point 23.209 (10 df): standard statistical tables, as printed in Abramowitz
     * &amp; Stegun (1964), Table 26.8 (values from memory).
     */
    @Test
    void chiSquaredUpper_matchesPrintedFivePercentPoints() {
        assertEquals(0.05, TailProbabilities.chiSquaredUpper(3.841, 1), THREE_DECIMAL_TABLE, "1 df");
        assertEquals(0.05, TailProbabilities.chiSquaredUpper(7.815, 3), THREE_DECIMAL_TABLE, "3 df");
        assertEquals(0.05, TailProbabilities.chiSquaredUpper(18.307, 10), THREE_DECIMAL_TABLE, "10 df");
        assertEquals(0.05, TailProbabilities.chiSquaredUpper(79.082, 60), THREE_DECIMAL_TABLE, "60 df");
        assertEquals(0.01, TailProbabilities.chiSquaredUpper(23.209, 10), THREE_DECIMAL_TABLE, "10 df, 1 %");
    }

    /**
     * Hand computation: for 2 df the chi-squared tail is exp(-x/2), so P(χ²₂ &gt; 4) = e⁻².
     */
    @Test
    void chiSquaredUpper_twoDegreesOfFreedom_isExponential() {
        assertEquals(Math.exp(-2.0), TailProbabilities.chiSquaredUpper(4.0, 2), 1e-14);
    }

    /**
     * Two-sided normal points 1.959964 (5 %) and 2.575829 (1 %), Abramowitz &amp; Stegun (1964),
     * Table 26.1 (from memory); z = 0 gives 1.
     */
    @Test
    void twoSidedNormal_matchesPrintedQuantiles() {
        assertEquals(0.05, TailProbabilities.twoSidedNormal(1.959964), SIX_DECIMAL_TABLE);
        assertEquals(0.05, TailProbabilities.twoSidedNormal(-1.959964), SIX_DECIMAL_TABLE);
        assertEquals(0.01, TailProbabilities.twoSidedNormal(2.575829), SIX_DECIMAL_TABLE);
        assertEquals(1.0, TailProbabilities.twoSidedNormal(0.0), 0.0);
        assertEquals(0.0, TailProbabilities.twoSidedNormal(Double.POSITIVE_INFINITY), 0.0);
    }

    @Test
    void invalidArguments_areRejectedWithTheValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> TailProbabilities.chiSquaredUpper(Double.NaN, 3));
        assertTrue(e.getMessage().contains("NaN"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> TailProbabilities.chiSquaredUpper(1.0, 0));
        assertThrows(IllegalArgumentException.class, () -> TailProbabilities.twoSidedNormal(Double.NaN));
    }
}
