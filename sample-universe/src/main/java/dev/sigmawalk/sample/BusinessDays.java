package dev.sigmawalk.sample;

import java.time.DayOfWeek;
import java.time.LocalDate;
import java.time.temporal.TemporalAdjusters;

/** Weekday arithmetic for the invented exchange, which trades Monday to Friday, no holidays. */
final class BusinessDays {
    private BusinessDays() {
    }

    static boolean isWeekday(LocalDate date) {
        DayOfWeek day = date.getDayOfWeek();
        return day != DayOfWeek.SATURDAY && day != DayOfWeek.SUNDAY;
    }

    static LocalDate next(LocalDate weekday) {
        LocalDate next = weekday.plusDays(1);
        while (!isWeekday(next)) {
            next = next.plusDays(1);
        }
        return next;
    }

    static LocalDate previousOrSame(LocalDate date) {
        LocalDate day = date;
        while (!isWeekday(day)) {
            day = day.minusDays(1);
        }
        return day;
    }

    /** The weekday {@code count} weekdays after {@code weekday} (count ≥ 0). */
    static LocalDate plus(LocalDate weekday, int count) {
        if (!(count >= 0)) {
            throw new IllegalArgumentException("weekday count (" + count + ") must be >= 0");
        }
        LocalDate day = weekday.plusWeeks(count / 5);
        for (int i = 0; i < count % 5; i++) {
            day = next(day);
        }
        return day;
    }

    static LocalDate firstOfMonth(LocalDate date) {
        LocalDate day = date.withDayOfMonth(1);
        return isWeekday(day) ? day : next(day);
    }

    static LocalDate lastOfMonth(LocalDate date) {
        return previousOrSame(date.with(TemporalAdjusters.lastDayOfMonth()));
    }
}
