package dev.sigmawalk.engine.data;

import java.nio.file.Path;
import java.time.LocalDate;
import java.time.YearMonth;
import java.util.List;

/**
 * The market or risk-free series aligned to the assets file's rows, remembering where every value
 * came from so that a gap can be reported at its own file, line and column.
 *
 * @param role "market" or "risk-free", for messages
 * @param file the file the values were read from
 * @param column the column's header name in that file
 * @param values one value per row of the assets file (NaN = empty cell)
 * @param lines the line in {@code file} of each value (0 where a long file has no row for it)
 */
record SeriesColumn(String role, Path file, String column, double[] values, int[] lines) {

    /** A column of the assets file itself. */
    static SeriesColumn fromColumn(String role, WideTable assets, int col) {
        return new SeriesColumn(role, assets.file(), assets.columns().get(col), assets.column(col),
                assets.columnLines(col));
    }

    /**
     * A one-column file {@code date,<name>} joined on the assets' dates: every asset date must
     * have a row there. Further rows before the first or after the last asset date are ignored
     * and counted in a warning; with {@code perPeriod} values a row between two asset dates is
     * refused ({@link InsidePeriod}), while prices may hold any further dates.
     *
     * @param perPeriod whether the values are returns or rates over the period ending on their date
     * @throws InputException at the first asset date the series has no row for, or the first row
     *                        of per-period values inside a period
     */
    static SeriesColumn join(String role, WideTable series, WideTable assets, boolean perPeriod,
                             List<String> warnings) {
        if (series.columnCount() != 1) {
            throw new InputException(new InputException.Location(series.file(), 1, null),
                    "the " + role + " file has " + series.columnCount() + " value columns; expected one, as in 'date,<name>'");
        }
        LocalDate[] want = assets.dates();
        LocalDate[] have = series.dates();
        double[] values = new double[want.length];
        int[] lines = new int[want.length];
        int k = 0;
        for (int t = 0; t < want.length; t++) {
            while (k < have.length && have[k].isBefore(want[t])) {
                if (perPeriod && t > 0 && have[k].isAfter(want[t - 1])) {
                    throw InsidePeriod.refusal(series.file(), series.lines()[k], have[k], want[t - 1], want[t],
                            assets.file());
                }
                k++;
            }
            if (k == have.length || !have[k].equals(want[t])) {
                throw new InputException(new InputException.Location(assets.file(), assets.lines()[t], "date"),
                        "'" + want[t] + "' has no row in " + series.file().getFileName() + "; the " + role
                                + " must have a row for every date of the assets file"
                                + sameMonthHint(series, have, want, t, assets.file()));
            }
            values[t] = series.value(k, 0);
            lines[t] = series.lines()[k];
        }
        int ignored = have.length - want.length;
        if (ignored > 0) {
            warnings.add(series.file().getFileName() + ": " + ignored + " dates that the assets file lacks were ignored");
        }
        return new SeriesColumn(role, series.file(), series.columns().get(0), values, lines);
    }

    /**
     * A hint when both files hold one row a month and the series has this month under another day:
     * monthly series from different sources often date a month differently (its first day, its
     * last calendar day, its last trading day), and the fix is to give both files the same dates,
     * not to fill a gap. Daily files, which hold many rows a month, get no hint.
     */
    private static String sameMonthHint(WideTable series, LocalDate[] have, LocalDate[] want, int t, Path assetsFile) {
        YearMonth month = YearMonth.from(want[t]);
        boolean assetsMonthly = (t == 0 || !YearMonth.from(want[t - 1]).equals(month))
                && (t + 1 == want.length || !YearMonth.from(want[t + 1]).equals(month));
        int found = -1;
        int inMonth = 0;
        for (int k = 0; k < have.length; k++) {
            if (YearMonth.from(have[k]).equals(month)) {
                found = k;
                inMonth++;
            }
        }
        if (!assetsMonthly || inMonth != 1) {
            return "";
        }
        return "; " + series.file().getFileName() + " has '" + have[found] + "' (line " + series.lines()[found]
                + ") in that month: the two files date their months differently; give "
                + series.file().getFileName() + " the dates of " + assetsFile.getFileName();
    }
}
