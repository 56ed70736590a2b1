package dev.sigmawalk.engine.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The byte-level number parser against the JDK's {@link Double#parseDouble} (correctly rounded
 * by its specification): the same bits for every number, the same message as {@link Cells#number}
 * for every non-number.
 */
class DecimalBytesTest {
    private static final Path FILE = Path.of("assets.csv");

    private static double parse(String cell) {
        byte[] b = ("," + cell + ",").getBytes(StandardCharsets.UTF_8);
        return DecimalBytes.parse(b, 1, b.length - 1, FILE, 2, "A");
    }

    /** Both paths: the cell parse, and the one-pass scan when it takes the number (then to the cell's end). */
    private static void assertSameBits(String text) {
        long expected = Double.doubleToRawLongBits(Double.parseDouble(text));
        assertEquals(expected, Double.doubleToRawLongBits(parse(text)), text);
        byte[] b = (text + ",").getBytes(StandardCharsets.UTF_8);
        DecimalBytes scanner = new DecimalBytes();
        if (scanner.scan(b, 0, b.length)) {
            assertEquals(text.length(), scanner.end, "scan end of " + text);
            assertEquals(expected, Double.doubleToRawLongBits(scanner.value), "scan of " + text);
        }
    }

    /** The one-pass scan takes everyday returns (up to 15 significant digits), stopping at the cell's end. */
    @Test
    void everydayReturns_takeTheOnePassScan() {
        DecimalBytes scanner = new DecimalBytes();
        for (String t : List.of("-0.012345678", "0.5", "+1.25e-3", "123456789012345", "-0.000000000000001", "7.")) {
            byte[] b = (t + " ,").getBytes(StandardCharsets.UTF_8);
            assertTrue(scanner.scan(b, 0, b.length), t);
            assertEquals(t.length(), scanner.end, t);
            assertEquals(Double.parseDouble(t), scanner.value, 0.0, t);
        }
    }

    /**
     * Cases near the fast path's edges (2^53, 10^22, 18 digits), signed zeros, the subnormal and
     * overflow ends, and the halfway cases of decimal-to-binary rounding from Clinger's paper and
     * from Java's own bug history (2.2250738585072012e-308).
     */
    @Test
    void trickyNumbers_giveTheBitsOfParseDouble() {
        for (String t : List.of("0", "-0", "+0", "0.0", "-0.0", "+.5", "-.5", "5.", "00000.5", "0.30000000000000004",
                "0.1", "0.2", "0.3", "1e22", "1e23", "1e-22", "1e-23", "1E5", "1e+5", "1e-5", "+1.2e1", "-1.2E-1",
                "9007199254740992", "9007199254740993", "9007199254740991", "900719925474099.3",
                "123456789012345678", "1234567890123456789", "12345678901234567890123", "0.000000000000000000000001",
                "4.9e-324", "2.4703282292062327e-324", "2.2250738585072012e-308", "1.7976931348623157e308",
                "8.988465674311579E307", "0.0123456789012345678", "-0.015", "1.00000000000000000000", "1e0000",
                "1.5e-0", "3.0000000000000004", "0.1000000000000000055511151231257827")) {
            assertSameBits(t);
        }
    }

    /**
     * 20 000 seeded values written every way a CSV holds a number: Java's shortest form, fixed
     * and scientific with 1 to 17 significant digits, a leading '+', leading and trailing zeros.
     */
    @Test
    void seededNumbersInEveryNotation_giveTheBitsOfParseDouble() {
        SplittableRandom rng = new SplittableRandom(0x5EED_0011L);
        for (int i = 0; i < 20_000; i++) {
            double v = rng.nextBoolean() ? (rng.nextDouble() * 2 - 1) * Math.pow(10, rng.nextInt(-8, 9))
                    : Double.longBitsToDouble(rng.nextLong());
            if (!Double.isFinite(v)) {
                continue;
            }
            int digits = rng.nextInt(1, 18);
            String text = switch (rng.nextInt(6)) {
                case 0 -> Double.toString(v);
                case 1 -> String.format(Locale.ROOT, "%." + digits + "e", v);
                case 2 -> Math.abs(v) < 1e6 && Math.abs(v) > 1e-6 ? String.format(Locale.ROOT, "%." + digits + "f", v)
                        : Double.toString(v);
                case 3 -> "+" + String.format(Locale.ROOT, "%." + digits + "g", Math.abs(v));
                case 4 -> padded(String.format(Locale.ROOT, "%." + digits + "g", Math.abs(v)));
                default -> String.format(Locale.ROOT, "%." + digits + "E", v).replace("E+", "E");
            };
            assertSameBits(text);
        }
    }

    /** Leading zeros, and trailing zeros after a point when there is no exponent. */
    private static String padded(String g) {
        boolean fraction = g.contains(".") && !g.contains("e");
        return "000" + g + (fraction ? "000" : "");
    }

    @Test
    void emptyCell_isMissing() {
        assertTrue(Double.isNaN(DecimalBytes.parse(new byte[0], 0, 0, FILE, 2, "A")));
    }

    @Test
    void nonNumbers_getTheMessageOfTheTextPath() {
        for (String bad : List.of("NaN", "Infinity", "n/a", "2%", "1e", "--1", ".", "0x10", "1e5.5", "1d", "+", "1e+",
                "1.2.3", "1 2")) {
            InputException e = assertThrows(InputException.class, () -> parse(bad), bad);
            assertEquals("assets.csv line 2, column 'A': '" + bad + "' is not a number; expected a decimal such as"
                    + " 0.0123 or an empty cell" + CellHints.number(bad), e.getMessage());
        }
        InputException e = assertThrows(InputException.class, () -> parse("1e400"));
        assertEquals("assets.csv line 2, column 'A': '1e400' is not a finite number", e.getMessage());
    }
}
