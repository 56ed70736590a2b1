package dev.sigmawalk.engine.timeline;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.data.InputException;
import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.study.Calendar;
import dev.sigmawalk.engine.study.RebalanceRule;
import dev.sigmawalk.engine.study.WalkForwardSpec;
import java.time.DayOfWeek;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/** The rebalance timeline of Method §2. */
class TimelineTest {

    private static ReturnPanel panel(LocalDate[] dates) {
        int rows = dates.length;
        return new ReturnPanel(dates, List.of("A"), new double[rows], new double[rows], new double[rows], "m", 12);
    }

    private static LocalDate[] businessDays(LocalDate from, int count) {
        List<LocalDate> out = new ArrayList<>();
        LocalDate d = from;
        while (out.size() < count) {
            if (d.getDayOfWeek() != DayOfWeek.SATURDAY && d.getDayOfWeek() != DayOfWeek.SUNDAY) {
                out.add(d);
            }
            d = d.plusDays(1);
        }
        return out.toArray(new LocalDate[0]);
    }

    private static WalkForwardSpec spec(List<Integer> windows, RebalanceRule rule, LocalDate start) {
        return new WalkForwardSpec(windows, rule, Optional.ofNullable(start), Optional.empty(), 0);
    }

    @Test
    void everyK_startsAtLongestWindowMinusOne_andLeavesARowToHold() {
        ReturnPanel p = panel(businessDays(LocalDate.of(2020, 1, 1), 20));
        Schedule s = Timeline.plan(p, spec(List.of(5, 8), new RebalanceRule.EveryRows(4), null));
        // τ_0 = 8 − 1 = 7; then 11, 15; 19 is the last row and leaves nothing to hold.
        assertArrayEquals(new int[] {7, 11, 15}, s.rebalanceRows());
        assertEquals(19, s.lastRow());
        assertEquals(15, s.holdEnd(1), "rows 12..15 held after τ_1 = 11");
        assertEquals(19, s.holdEnd(2));
    }

    @Test
    void start_movesTheFirstRebalanceLater() {
        LocalDate[] d = businessDays(LocalDate.of(2020, 1, 1), 30);
        Schedule s = Timeline.plan(panel(d), spec(List.of(5), new RebalanceRule.EveryRows(1), d[12]));
        assertEquals(12, s.firstRebalance());
    }

    @Test
    void monthEnd_usesTheLastRowOfEachMonthInTheData() {
        LocalDate[] d = businessDays(LocalDate.of(2021, 1, 1), 80);
        Schedule s = Timeline.plan(panel(d), spec(List.of(10), new RebalanceRule.CalendarEnd(Calendar.MONTH_END), null));
        for (int row : s.rebalanceRows()) {
            assertTrue(d[row].getMonthValue() != d[row + 1].getMonthValue(), "row " + row + " is a month's last");
            assertTrue(row >= 9);
        }
        // Business days of 2021: Jan 29, Feb 26, Mar 31 are month ends (80 rows reach late April).
        assertEquals(LocalDate.of(2021, 1, 29), d[s.firstRebalance()]);
        assertEquals(3, s.count());
    }

    @Test
    void quarterAndYearKeys_groupMonthsCorrectly() {
        assertEquals(Timeline.periodKey(LocalDate.of(2020, 1, 5), Calendar.QUARTER_END),
                Timeline.periodKey(LocalDate.of(2020, 3, 31), Calendar.QUARTER_END));
        assertTrue(Timeline.periodKey(LocalDate.of(2020, 3, 31), Calendar.QUARTER_END)
                != Timeline.periodKey(LocalDate.of(2020, 4, 1), Calendar.QUARTER_END));
        assertTrue(Timeline.periodKey(LocalDate.of(2020, 12, 31), Calendar.YEAR_END)
                != Timeline.periodKey(LocalDate.of(2021, 1, 1), Calendar.YEAR_END));
    }

    @Test
    void windowLongerThanData_isAnInputError() {
        ReturnPanel p = panel(businessDays(LocalDate.of(2020, 1, 1), 10));
        InputException e = assertThrows(InputException.class,
                () -> Timeline.plan(p, spec(List.of(12), new RebalanceRule.EveryRows(1), null)));
        assertTrue(e.getMessage().contains("longest window (12 rows)"), e.getMessage());
        assertTrue(e.getMessage().contains("have 10"), e.getMessage());
    }

    /** One row after the window holds one return, and a spread needs two (Method §7). */
    @Test
    void windowOneShorterThanData_leavesTooFewRowsToHold() {
        ReturnPanel p = panel(businessDays(LocalDate.of(2020, 1, 1), 20));
        InputException e = assertThrows(InputException.class,
                () -> Timeline.plan(p, spec(List.of(19), new RebalanceRule.EveryRows(1), null)));
        assertEquals("walkforward.windows: the longest window (19 rows) needs at least 21 rows of data"
                + " (a window plus two rows to hold: a spread of returns needs two), but the data have 20"
                + " (2020-01-01 to 2020-01-28)", e.getMessage());
    }

    @Test
    void startOnTheNextToLastRow_leavesTooFewRowsToHold() {
        LocalDate[] d = businessDays(LocalDate.of(2020, 1, 1), 20);
        InputException e = assertThrows(InputException.class,
                () -> Timeline.plan(panel(d), spec(List.of(5), new RebalanceRule.EveryRows(1), d[18])));
        assertEquals("walkforward.start: from 2020-01-27 on fewer than two rows are left to hold a portfolio"
                + " (data end 2020-01-28); a spread of returns needs two", e.getMessage());
    }

    /** Business days of 2021: the first month end at or after row 19 (Jan 28) is Jan 29, row 20. */
    @Test
    void firstCalendarRebalanceOnTheNextToLastRow_leavesTooFewRowsToHold() {
        LocalDate[] d = businessDays(LocalDate.of(2021, 1, 1), 22);
        InputException e = assertThrows(InputException.class, () -> Timeline.plan(panel(d),
                spec(List.of(20), new RebalanceRule.CalendarEnd(Calendar.MONTH_END), null)));
        assertEquals("walkforward: the first month-end rebalance, 2021-01-29, leaves one row to hold"
                + " (data end 2021-02-01); a spread of returns needs two", e.getMessage());
    }
}
