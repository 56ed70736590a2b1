package dev.sigmawalk.engine.data;

import dev.sigmawalk.engine.study.DecimalSpelling;
import java.nio.file.Path;
import java.time.DateTimeException;
import java.time.LocalDate;

/**
 * Parses single CSV cells, throwing an {@link InputException} that names file, line, column and
 * value. The happy path throws and catches nothing: a number is first screened character by
 * character, then handed to {@link Double#parseDouble}.
 */
final class Cells {
    private Cells() {
    }

    /**
     * An ISO-8601 calendar date {@code YYYY-MM-DD}, nothing else (no times, no other orders,
     * which would make {@code 01/02/2020} ambiguous).
     */
    static LocalDate date(String cell, Path file, int line, String column) {
        if (cell.length() == 10 && cell.charAt(4) == '-' && cell.charAt(7) == '-' && digitsAt(cell)) {
            try {
                return LocalDate.of(Integer.parseInt(cell, 0, 4, 10), Integer.parseInt(cell, 5, 7, 10),
                        Integer.parseInt(cell, 8, 10, 10));
            } catch (DateTimeException e) {
                throw new InputException(new InputException.Location(file, line, column),
                        "'" + cell + "' is not a calendar date (" + e.getMessage() + ")");
            }
        }
        throw new InputException(new InputException.Location(file, line, column),
                "'" + cell + "' is not an ISO-8601 date; expected YYYY-MM-DD, for example 2020-01-31"
                        + CellHints.date(cell));
    }

    private static boolean digitsAt(String s) {
        for (int i = 0; i < 10; i++) {
            if (i != 4 && i != 7 && (s.charAt(i) < '0' || s.charAt(i) > '9')) {
                return false;
            }
        }
        return true;
    }

    /**
     * A finite decimal number; an empty cell is missing and gives {@code NaN}. Words such as
     * {@code NaN}, {@code Infinity} or {@code n/a} are rejected, as is an overflow to infinity.
     */
    static double number(String cell, Path file, int line, String column) {
        if (cell.isEmpty()) {
            return Double.NaN;
        }
        if (DecimalSpelling.isPlain(cell)) {
            double v = Double.parseDouble(cell);
            if (Double.isFinite(v)) {
                return v;
            }
            throw new InputException(new InputException.Location(file, line, column),
                    "'" + cell + "' is not a finite number");
        }
        throw new InputException(new InputException.Location(file, line, column),
                "'" + cell + "' is not a number; expected a decimal such as 0.0123 or an empty cell"
                        + CellHints.number(cell));
    }

    /**
     * Method §1: a price must be positive; a return or rate below -1 (a loss of more than all
     * of it) is impossible, and one above {@link #LARGEST_RETURN} is refused as a data error.
     * Missing values (NaN) pass.
     *
     * @param prices whether {@code value} is a price (false for returns and for rates beside prices)
     */
    static void requirePossible(double value, boolean prices, String cell, Path file, int line, String column) {
        if (prices) {
            if (!(value > 0) && !Double.isNaN(value)) {
                throw new InputException(new InputException.Location(file, line, column),
                        "'" + cell + "' is not a positive price; prices must be > 0");
            }
        } else if (value < -1) {
            throw new InputException(new InputException.Location(file, line, column),
                    "'" + cell + "' is a return below -1, a loss of more than everything, which is impossible;"
                            + " expected decimal returns (-0.015 for a 1.5 % loss): if the file holds percent,"
                            + " divide every value by 100");
        } else if (value > LARGEST_RETURN) {
            throw new InputException(new InputException.Location(file, line, column),
                    "'" + cell + "' is a return above 1e12 (a gain of a hundred trillion percent in one period),"
                            + " which no asset earns; expected decimal returns (0.015 for a 1.5 % gain): if an assets"
                            + " or market file holds prices, set values: prices in the study file (risk-free and"
                            + " factor files hold per-period rates and returns whatever values says)");
        }
    }

    /**
     * The largest return or rate accepted. Far beyond any asset's period return (returns above
     * +500 % already draw a warning), and far enough below the range of a double that the study's
     * sums of squared and fourth-power returns stay finite: past about 1e75, r⁴ overflows, and a
     * run would end in a non-finite statistic instead of this message.
     */
    static final double LARGEST_RETURN = 1e12;

}
