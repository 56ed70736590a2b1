package dev.sigmawalk.engine.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.SplittableRandom;
import java.util.stream.DoubleStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** Single cells: what counts as a number, a date or a missing value. */
class CellsTest {
    private static final Path FILE = Path.of("assets.csv");

    /**
     * Java's shortest round-trip text of a finite double parses back to the same bits. The 500
     * values (the extremes, then random bit patterns over every exponent alternating with values
     * of everyday size) are drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("finiteDoubles")
    void finiteDouble_roundTripsThroughItsText(double v) {
        String text = Double.toString(v);
        assertEquals(Double.doubleToLongBits(v), Double.doubleToLongBits(Cells.number(text, FILE, 2, "A")), text);
    }

    static DoubleStream finiteDoubles() {
        double[] extremes = {0.0, -0.0, 1.0, -1.0, 0.1, -0.1, Double.MIN_VALUE, -Double.MIN_VALUE, Double.MIN_NORMAL,
            -Double.MIN_NORMAL, Math.nextDown(Double.MIN_NORMAL), Double.MAX_VALUE, -Double.MAX_VALUE};
        SplittableRandom rng = new SplittableRandom(0x5EED_0003L);
        DoubleStream drawn = DoubleStream.generate(() -> {
            if (rng.nextBoolean()) {
                return (rng.nextDouble() * 2 - 1) * Math.pow(10, rng.nextInt(-6, 7));
            }
            double v;
            do {
                v = Double.longBitsToDouble(rng.nextLong());
            } while (!Double.isFinite(v));
            return v;
        });
        return DoubleStream.concat(DoubleStream.of(extremes), drawn.limit(500 - extremes.length));
    }

    @Test
    void decimalsAndExponents_areNumbers() {
        assertEquals(0.0123, Cells.number("0.0123", FILE, 2, "A"), 0.0);
        assertEquals(-0.5, Cells.number("-.5", FILE, 2, "A"), 0.0);
        assertEquals(12.0, Cells.number("+1.2e1", FILE, 2, "A"), 0.0);
        assertEquals(7.0, Cells.number("7.", FILE, 2, "A"), 0.0);
        assertTrue(Double.isNaN(Cells.number("", FILE, 2, "A")), "empty cell is missing");
    }

    @Test
    void wordsPercentAndThousandsSeparators_areNotNumbers() {
        for (String bad : new String[] {"NaN", "Infinity", "n/a", "1,5", "2%", "1e", "--1", ".", "0x10", "1e5.5", "1d"}) {
            InputException e = assertThrows(InputException.class, () -> Cells.number(bad, FILE, 9, "A07"), bad);
            assertEquals("assets.csv line 9, column 'A07': '" + bad + "' is not a number; expected a decimal such as"
                    + " 0.0123 or an empty cell" + CellHints.number(bad), e.getMessage());
        }
    }

    /** Each export form gets the fix that reads it; a cell of no known form gets none. */
    @Test
    void refusedNumbers_carryTheHintOfTheirForm() {
        for (String marker : new String[] {"#N/A", "N/A", "NA", "NaN", "null", "-", ".", "#DIV/0!", "#VALUE!"}) {
            assertEquals("; a missing value is an empty cell: leave the cell empty instead of writing '" + marker + "'",
                    CellHints.number(marker), marker);
        }
        assertEquals("; a percent sign is not read: write returns as decimals (0.039 for 3.9 %)", CellHints.number("3.9%"));
        assertEquals("; a percent sign is not read: write returns as decimals (0.039 for 3.9 %)", CellHints.number("-2 %"));
        for (String comma : new String[] {"1,5", "-0,0123", "0,5e-3"}) {
            assertEquals("; a decimal comma is not read: write '.' as the decimal point, with no thousands separator",
                    CellHints.number(comma), comma);
        }
        for (String plain : new String[] {"abc", "1e", "--1", "0x10", "1,23,567", ",5", "Infinity"}) {
            assertEquals("", CellHints.number(plain), plain);
        }
    }

    /** Prices exported with thousands separators: the hint gives the number as it must be written. */
    @Test
    void thousandsSeparators_carryTheNumberWithoutThem() {
        assertEquals("; a thousands separator is not read: write the number without it, as 10190.83",
                CellHints.number("10,190.83"));
        assertEquals("; a thousands separator is not read: write the number without it, as 1234567",
                CellHints.number("1,234,567"));
        assertEquals("; a thousands separator is not read: write the number without it, as -1234.5",
                CellHints.number("-1,234.5"));
    }

    /** Characters a spreadsheet or word processor puts into a number that look like ASCII ones or like nothing. */
    @Test
    void invisibleAndLookAlikeCharacters_areNamed() {
        assertEquals("; it holds U+00A0 (NO-BREAK SPACE), which no number contains: remove it",
                CellHints.number("0.01\u00a0"));
        assertEquals("; it holds U+202F (NARROW NO-BREAK SPACE), which no number contains: remove it",
                CellHints.number("1\u202f000"));
        assertEquals("; it holds U+2212 (MINUS SIGN), which no number contains: write the ASCII '-' instead",
                CellHints.number("\u22120.01"));
        assertEquals("; it holds U+2013 (EN DASH), which no number contains: write the ASCII '-' instead",
                CellHints.number("\u20130.01"));
        assertEquals("; it holds U+FEFF (ZERO WIDTH NO-BREAK SPACE), which no number contains: remove it",
                CellHints.number("\ufeff0.01"));
    }

    @Test
    void refusedDates_carryTheHintOfTheirForm() {
        assertEquals("; a time of day is not read: keep the date part only (2020-01-31)", CellHints.date("2020-01-31 00:00:00"));
        assertEquals("; a time of day is not read: keep the date part only (2020-01-31)", CellHints.date("2020-01-31T16:30"));
        assertEquals("; in a date such as '31/01/2020' the order of day and month cannot be told for sure: re-save the"
                + " column with the format YYYY-MM-DD", CellHints.date("31/01/2020"));
        assertEquals("; write it with dashes, as 2020-01-31", CellHints.date("20200131"));
        assertEquals("", CellHints.date("2020-1-31"));
        assertEquals("", CellHints.date("Jan 31 2020"));
    }

    /**
     * A date column saved as numbers: 40209 days after 1899-12-30 is 2010-01-31 (Python's
     * datetime.date(1899, 12, 30) + timedelta(40209)); numbers outside 20 000..80 000 get no hint.
     */
    @Test
    void spreadsheetSerialDayNumber_isNamedWithItsDate() {
        assertEquals("; it looks like a spreadsheet's serial day number (days since 1899-12-30, here 2010-01-31):"
                + " format the date column as YYYY-MM-DD before saving", CellHints.date("40209"));
        assertEquals("", CellHints.date("12345"));
        assertEquals("", CellHints.date("90000"));
    }

    @Test
    void headersSeparatedOtherwise_carryTheHint() {
        assertTrue(CellHints.header("date;A01;A02").startsWith("; the header is separated by semicolons"));
        assertEquals("; the header is separated by tabs: re-save the file comma-separated", CellHints.header("date\tA01"));
        assertEquals("", CellHints.header("Date"));
    }

    @Test
    void overflow_isNotFinite() {
        InputException e = assertThrows(InputException.class, () -> Cells.number("1e400", FILE, 3, "A"));
        assertTrue(e.getMessage().endsWith("'1e400' is not a finite number"), e.getMessage());
    }

    @Test
    void onlyIsoDates_areDates() {
        assertEquals(LocalDate.of(2024, 2, 29), Cells.date("2024-02-29", FILE, 2, "date"));
        for (String bad : new String[] {"01/02/2020", "2020-1-31", "20200131", "2020-01-31T00:00", "31.01.2020"}) {
            InputException e = assertThrows(InputException.class, () -> Cells.date(bad, FILE, 4, "date"), bad);
            assertTrue(e.getMessage().startsWith("assets.csv line 4, column 'date': '" + bad + "' is not an ISO-8601 date"),
                    e.getMessage());
        }
    }
}
