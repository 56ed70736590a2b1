package dev.sigmawalk.engine.data;

import dev.sigmawalk.engine.study.DecimalSpelling;
import java.time.LocalDate;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * What a refused cell most likely is, said after the refusal: the forms spreadsheet and database
 * exports write that intake does not read (a percent sign, a decimal comma, a thousands
 * separator, an error or missing-value marker, a time of day, a day-first or month-first date, a
 * serial day number). Each hint names the fix; a cell that matches none gets no hint. The markers are common practice in spreadsheet and
 * statistics-package exports, listed from memory.
 */
final class CellHints {
    /** Written by spreadsheets and statistics packages where a value is missing or an error. */
    private static final Set<String> MISSING_MARKERS = Set.of("#n/a", "n/a", "na", "nan", "null", "none", "nil",
            "-", "--", ".", "#div/0!", "#value!", "#ref!", "#num!", "#name?", "#null!", "missing");
    private static final Pattern TIME_OF_DAY = Pattern.compile("\\d{4}-\\d{2}-\\d{2}[ T]\\d{1,2}:\\d{2}(:\\d{2}(\\.\\d+)?)?Z?");
    private static final Pattern DAY_MONTH_YEAR = Pattern.compile("\\d{1,2}[/.\\-]\\d{1,2}[/.\\-]\\d{2,4}");
    private static final Pattern COMPACT = Pattern.compile("\\d{8}");
    private static final Pattern SERIAL = Pattern.compile("\\d{5}");
    /** Digits grouped in threes by commas, with an optional '.' fraction: 10,190.83 or 1,234,567. */
    private static final Pattern THOUSANDS = Pattern.compile("[+-]?\\d{1,3}(,\\d{3})+(\\.\\d+)?");
    /**
     * Day 0 of the serial day numbers spreadsheets store dates as (the common 1900 date system,
     * whose day 60 is a 29 February 1900 that never was, so later days count from 1899-12-30);
     * from memory. Only numbers between the two limits (1954-10-03 to 2119-01-11) get the hint.
     */
    private static final LocalDate SERIAL_EPOCH = LocalDate.of(1899, 12, 30);
    private static final int SERIAL_FIRST = 20_000;
    private static final int SERIAL_LAST = 80_000;

    private CellHints() {
    }

    /** The hint for a cell that is not a number, starting with "; ", or "". */
    static String number(String cell) {
        String t = cell.strip();
        if (MISSING_MARKERS.contains(t.toLowerCase(Locale.ROOT))) {
            return "; a missing value is an empty cell: leave the cell empty instead of writing '" + t + "'";
        }
        if (t.endsWith("%") && DecimalSpelling.isPlain(t.substring(0, t.length() - 1).strip())) {
            return "; a percent sign is not read: write returns as decimals (0.039 for 3.9 %)";
        }
        if (THOUSANDS.matcher(t).matches() && (t.indexOf(',') != t.lastIndexOf(',') || t.indexOf('.') > 0)) {
            return "; a thousands separator is not read: write the number without it, as " + t.replace(",", "");
        }
        if (t.indexOf(',') > 0 && t.indexOf(',') == t.lastIndexOf(',') && DecimalSpelling.isPlain(t.replace(',', '.'))) {
            return "; a decimal comma is not read: write '.' as the decimal point, with no thousands separator";
        }
        return foreignCharacter(cell);
    }

    /**
     * A character outside ASCII, which no number holds, named by its code point: a no-break
     * space or a typeset minus sign looks like nothing or like '-' in the message's quotes.
     */
    private static String foreignCharacter(String cell) {
        int c = cell.codePoints().filter(x -> x > 0x7f).findFirst().orElse(-1);
        if (c < 0) {
            return "";
        }
        String name = Character.getName(c);
        boolean dash = Character.getType(c) == Character.DASH_PUNCTUATION || c == 0x2212;
        return "; it holds " + String.format("U+%04X", c) + (name == null ? "" : " (" + name + ")")
                + ", which no number contains: " + (dash ? "write the ASCII '-' instead" : "remove it");
    }

    /** The hint for a cell that is not an ISO-8601 date, starting with "; ", or "". */
    static String date(String cell) {
        String t = cell.strip();
        if (TIME_OF_DAY.matcher(t).matches()) {
            return "; a time of day is not read: keep the date part only (" + t.substring(0, 10) + ")";
        }
        if (DAY_MONTH_YEAR.matcher(t).matches()) {
            return "; in a date such as '" + t + "' the order of day and month cannot be told for sure: re-save the"
                    + " column with the format YYYY-MM-DD";
        }
        if (SERIAL.matcher(t).matches()) {
            int days = Integer.parseInt(t);
            if (days >= SERIAL_FIRST && days <= SERIAL_LAST) {
                return "; it looks like a spreadsheet's serial day number (days since 1899-12-30, here "
                        + SERIAL_EPOCH.plusDays(days) + "): format the date column as YYYY-MM-DD before saving";
            }
        }
        if (COMPACT.matcher(t).matches()) {
            return "; write it with dashes, as " + t.substring(0, 4) + "-" + t.substring(4, 6) + "-" + t.substring(6);
        }
        return "";
    }

    /**
     * The hint for a header whose first cell is not {@code date} but holds semicolons or tabs:
     * the whole header is one cell, so the file is separated by something other than commas.
     */
    static String header(String firstCell) {
        if (firstCell.indexOf(';') >= 0) {
            return "; the header is separated by semicolons, as spreadsheets write CSV in locales with a decimal"
                    + " comma: re-save the file comma-separated with '.' as the decimal point";
        }
        if (firstCell.indexOf('\t') >= 0) {
            return "; the header is separated by tabs: re-save the file comma-separated";
        }
        return "";
    }
}
