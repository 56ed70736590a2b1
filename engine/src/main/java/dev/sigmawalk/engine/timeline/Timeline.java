package dev.sigmawalk.engine.timeline;

import dev.sigmawalk.engine.data.InputException;
import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.study.Calendar;
import dev.sigmawalk.engine.study.RebalanceRule;
import dev.sigmawalk.engine.study.WalkForwardSpec;
import java.time.LocalDate;
import java.util.Arrays;

/**
 * Plans the rebalance rows of a study (Method §2). All windows share one out-of-sample period:
 * the first rebalance is τ_0 = max(L_max − 1, first row on or after {@code start}); then every
 * k rows, or on each row that is the last of its calendar month / quarter / year in the data's
 * own dates (the first being the earliest such row at or after that τ_0). The last rebalance
 * leaves at least one row to hold, and the first at least two: the out-of-sample measures of
 * Method §7 take a standard deviation of the held returns, which one return does not have.
 */
public final class Timeline {
    private Timeline() {
    }

    /**
     * @param panel the returns, already cut at {@code end}
     * @param spec windows, rule and start
     * @throws InputException when the data are too short for the longest window
     */
    public static Schedule plan(ReturnPanel panel, WalkForwardSpec spec) {
        int rows = panel.rows();
        int longest = spec.longestWindow();
        int startRow = spec.start().map(panel::firstRowOnOrAfter).orElse(0);
        int tau0 = Math.max(longest - 1, startRow);
        int lastRow = rows - 1;
        if (tau0 >= lastRow - 1) {
            throw new InputException(tooShort(panel, longest, startRow, rows));
        }
        int[] candidates = spec.rebalance() instanceof RebalanceRule.CalendarEnd c
                ? calendarRows(panel, c.calendar(), tau0, lastRow)
                : everyRows(((RebalanceRule.EveryRows) spec.rebalance()).rows(), tau0, lastRow);
        if (candidates.length == 0) {
            throw new InputException("walkforward: no " + describe(spec.rebalance()) + " row between "
                    + panel.date(tau0) + " and " + panel.date(lastRow - 1) + " leaves a row to hold");
        }
        if (lastRow - candidates[0] < 2) {
            throw new InputException("walkforward: the first " + describe(spec.rebalance()) + " rebalance, "
                    + panel.date(candidates[0]) + ", leaves one row to hold (data end " + panel.date(lastRow)
                    + "); a spread of returns needs two");
        }
        return new Schedule(candidates, lastRow);
    }

    private static String tooShort(ReturnPanel panel, int longest, int startRow, int rows) {
        if (longest >= rows - 1) {
            return "walkforward.windows: the longest window (" + longest + " rows) needs at least "
                    + (longest + 2) + " rows of data (a window plus two rows to hold: a spread of returns needs two),"
                    + " but the data have " + rows
                    + (rows > 0 ? " (" + panel.date(0) + " to " + panel.date(rows - 1) + ")" : "");
        }
        if (startRow >= rows) {
            return "walkforward.start: no row is left to hold a portfolio (data end " + panel.date(rows - 1) + ")";
        }
        return "walkforward.start: from " + panel.date(startRow) + " on fewer than two rows are left to hold a"
                + " portfolio (data end " + panel.date(rows - 1) + "); a spread of returns needs two";
    }

    private static int[] everyRows(int k, int tau0, int lastRow) {
        int count = (lastRow - 1 - tau0) / k + 1;
        int[] out = new int[count];
        for (int j = 0; j < count; j++) {
            out[j] = tau0 + j * k;
        }
        return out;
    }

    private static int[] calendarRows(ReturnPanel panel, Calendar calendar, int tau0, int lastRow) {
        int[] out = new int[lastRow - tau0];
        int count = 0;
        // A row is the last of its period when the next row falls in another period; the data's
        // final row never qualifies as a rebalance because it leaves nothing to hold.
        for (int t = tau0; t < lastRow; t++) {
            if (periodKey(panel.date(t), calendar) != periodKey(panel.date(t + 1), calendar)) {
                out[count++] = t;
            }
        }
        return Arrays.copyOf(out, count);
    }

    /** A number that is equal for two dates exactly when they share the calendar period. */
    static int periodKey(LocalDate d, Calendar calendar) {
        switch (calendar) {
            case MONTH_END:
                return d.getYear() * 12 + d.getMonthValue() - 1;
            case QUARTER_END:
                return d.getYear() * 4 + (d.getMonthValue() - 1) / 3;
            case YEAR_END:
                return d.getYear();
            default:
                throw new IllegalStateException("unknown calendar " + calendar);
        }
    }

    private static String describe(RebalanceRule rule) {
        return rule instanceof RebalanceRule.CalendarEnd c ? c.calendar().spelling() : "rebalance";
    }
}
