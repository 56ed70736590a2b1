package dev.sigmawalk.sample;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDate;
import org.junit.jupiter.api.Test;

/**
 * February 2024 has 21 weekdays, Thursday 1 to Thursday 29 (counted with numpy.busday_count,
 * numpy 2.4.6). Expected compounded values are hand computations: 1.01^21 - 1 =
 * 0.2323919403474468 and 1.01^20 · 1.02 - 1 = 0.24459384074692636 (evaluated in Python floats).
 */
class MonthCompounderTest {
    private static final double TOLERANCE = 1e-14;
    private static final LocalDate FIRST = LocalDate.of(2024, 2, 1);

    @Test
    void wholeMonth_compoundsEveryDailyReturn() {
        MonthCompounder compounder = new MonthCompounder(3);
        DayValues month = new DayValues(3);
        int emitted = feedFebruary(compounder, month, FIRST, -1);
        assertEquals(1, emitted, "one month row");
        assertEquals(LocalDate.of(2024, 2, 29), month.date(), "dated the last weekday");
        assertEquals(0.2323919403474468, month.asset(0), TOLERANCE, "1 % every day");
        assertEquals(0.24459384074692636, month.asset(2), TOLERANCE, "2 % on the last day");
        assertEquals(0.2323919403474468, month.index(), TOLERANCE, "index");
        assertEquals(0.0, month.riskFree(), TOLERANCE, "zero rate");
    }

    @Test
    void assetMissingOneDay_hasNoMonthReturn() {
        MonthCompounder compounder = new MonthCompounder(3);
        DayValues month = new DayValues(3);
        feedFebruary(compounder, month, FIRST, 7);
        assertTrue(Double.isNaN(month.asset(1)), "asset 1 lacks day 7");
        assertEquals(0.2323919403474468, month.asset(0), TOLERANCE, "asset 0 is complete");
    }

    @Test
    void monthEnteredMidway_isNotEmitted() {
        MonthCompounder compounder = new MonthCompounder(3);
        DayValues month = new DayValues(3);
        assertEquals(0, feedFebruary(compounder, month, LocalDate.of(2024, 2, 2), -1), "partial month");
    }

    @Test
    void spanEndingMidMonth_emitsNothingForThatMonth() {
        MonthCompounder compounder = new MonthCompounder(1);
        DayValues day = new DayValues(1);
        DayValues month = new DayValues(1);
        for (LocalDate d = FIRST; d.isBefore(LocalDate.of(2024, 2, 28)); d = BusinessDays.next(d)) {
            day.set(d, 0, 0.01);
            day.setAsset(0, 0.01);
            assertFalse(compounder.add(day, month), d + " closes no month");
        }
    }

    /** Feeds February 2024 from {@code from}; asset 1 has no return on weekday {@code gapDay}. */
    private static int feedFebruary(MonthCompounder compounder, DayValues month, LocalDate from, int gapDay) {
        DayValues day = new DayValues(3);
        int emitted = 0;
        int k = 0;
        for (LocalDate d = from; d.getMonthValue() == 2; d = BusinessDays.next(d), k++) {
            day.set(d, 0, 0.01);
            day.setAsset(0, 0.01);
            day.setAsset(1, k == gapDay ? Double.NaN : 0.01);
            day.setAsset(2, d.getDayOfMonth() == 29 ? 0.02 : 0.01);
            emitted += compounder.add(day, month) ? 1 : 0;
        }
        return emitted;
    }
}
