package dev.sigmawalk.strategies.risk;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Tolerance checks with labelled failures. */
final class Close {
    private Close() {
    }

    /** |actual - expected| ≤ tol · |expected|, or exact equality when expected is 0. */
    static void relative(double expected, double actual, double tol, String label) {
        double err = Math.abs(actual - expected);
        assertTrue(err <= tol * Math.abs(expected),
                () -> label + ": expected " + expected + " but was " + actual + " (relative error "
                        + err / Math.abs(expected) + ", tolerance " + tol + ")");
    }

    /** Element-wise {@link #relative} over two arrays of the same length. */
    static void relative(double[] expected, double[] actual, double tol, String label) {
        assertEquals(expected.length, actual.length, label + ": length");
        for (int k = 0; k < expected.length; k++) {
            relative(expected[k], actual[k], tol, label + "[" + k + "]");
        }
    }

    /** Element-wise |actual - expected| ≤ tol. */
    static void absolute(double[] expected, double[] actual, double tol, String label) {
        assertEquals(expected.length, actual.length, label + ": length");
        for (int k = 0; k < expected.length; k++) {
            assertEquals(expected[k], actual[k], tol, label + "[" + k + "]");
        }
    }
}
