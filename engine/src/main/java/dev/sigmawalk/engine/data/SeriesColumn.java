package dev.sigmawalk.engine.data;

import java.nio.file.Path;
import java.time.LocalDate;
import java.time.YearMonth;
import java.util.List;
import java.util.Optional;

/**
 * The market or risk-free series aligned to the assets file's rows, remembering where every value
 * came from so that a gap can be reported at its own file, line and column.
 *
 * @param role "market" or "risk-free", for messages
 * @param file the file the values were read from
 * @param column the column's header name in that file
 * @param values one value per row of the assets file (NaN = empty cell or no row)
 * @param lines the line in {@code file} of each value (0 where the file has no row for it)
 * @param joinedTo for a file of its own, the assets file it was joined to, whose lines name an
 *        asset date the file has no row for; empty for a column of the assets file
 */
record SeriesColumn(String role, Path file, String column, double[] values, int[] lines,
                    Optional<WideTable> joinedTo) {

    /** A column of the assets file itself. */
    static SeriesColumn fromColumn(String role, WideTable assets, int col) {
        return new SeriesColumn(role, assets.file(), assets.columns().get(col), assets.column(col),
                assets.columnLines(col), Optional.empty());
    }

    /**
     * A one-column file {@code date,<name>} joined on the assets' dates. An asset date the file
     * has no row for gets no value (NaN, line 0), like an empty cell: Method §1 needs the series
     * only from the first row a window reads, which {@link IntakeChecks#requireComplete} checks
     * once the timeline is known, so an index history shorter than the assets' is accepted when
     * it covers the walk. A monthly file that dates a month on another day than the assets file
     * is refused at once, at the first such date, since none of its rows would ever match.
     * Further rows before the first or after the last asset date are ignored
     * and counted in a warning; with {@code perPeriod} values a row between two asset dates is
     * refused ({@link InsidePeriod}), while prices may hold any further dates.
     *
     * @param perPeriod whether the values are returns or rates over the period ending on their date
     * @throws InputException at the first asset date whose month the file dates on another day, or
     *                        the first row of per-period values inside a period
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
        int matched = 0;
        for (int t = 0; t < want.length; t++) {
            while (k < have.length && have[k].isBefore(want[t])) {
                if (perPeriod && t > 0 && have[k].isAfter(want[t - 1])) {
                    throw InsidePeriod.refusal(series.file(), series.lines()[k], have[k], want[t - 1], want[t],
                            assets.file());
                }
                k++;
            }
            if (k == have.length || !have[k].equals(want[t])) {
                String otherDay = sameMonthHint(series, have, want, t, assets.file());
                if (!otherDay.isEmpty()) {
                    throw new InputException(new InputException.Location(assets.file(), assets.lines()[t], "date"),
                            "'" + want[t] + "' has no row in " + series.file().getFileName() + "; the " + role
                                    + " needs a row on the dates of " + assets.file().getFileName() + otherDay);
                }
                values[t] = Double.NaN;
                continue;
            }
            values[t] = series.value(k, 0);
            lines[t] = series.lines()[k];
            matched++;
        }
        int ignored = have.length - matched;
        if (ignored > 0) {
            warnings.add(series.file().getFileName() + ": " + ignored + " dates that the assets file lacks were ignored");
        }
        return new SeriesColumn(role, series.file(), series.columns().get(0), values, lines,
                Optional.of(assets));
    }

    /**
     * The refusal of an asset date this series' file has no row for, at the assets file's line of
     * that date; {@code needed} says which dates the series must cover.
     *
     * @param row the assets file's row whose date the file lacks
     * @throws IllegalStateException for a column of the assets file, which has a cell on every row
     */
    InputException noRow(int row, String needed) {
        WideTable assets = joinedTo.orElseThrow(() -> new IllegalStateException(
                "'" + column + "' is a column of the assets file"));
        return new InputException(new InputException.Location(assets.file(), assets.lines()[row], "date"),
                "'" + assets.dates()[row] + "' has no row in " + file.getFileName() + "; the " + role + " needs a row"
                        + needed);
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
