package dev.sigmawalk.sample;

import java.time.LocalDate;
import java.time.YearMonth;
import java.util.Arrays;

/**
 * Turns daily rows into calendar-month rows, dated the month's last weekday.
 *
 * <p>A month's return is Π(1 + r_d) - 1 over its daily rows, for the companies, the index and
 * the risk-free rate alike. A month is emitted only when the daily rows cover it whole, from its
 * first weekday to its last, so a span that starts or ends mid-month loses that partial month.
 * A company's month return is present only when it has a return on every daily row of the month;
 * the month it lists in and the month it delists in are therefore empty.
 */
final class MonthCompounder {
    private final double[] growth;
    private final int[] daysWithReturn;
    private YearMonth month;
    private boolean coversMonthStart;
    private int days;
    private double indexGrowth;
    private double riskFreeGrowth;

    MonthCompounder(int companies) {
        this.growth = new double[companies];
        this.daysWithReturn = new int[companies];
    }

    /**
     * Adds one daily row (already rounded to what is written) and, when it closes a whole month,
     * fills {@code monthOut} with that month and returns true.
     */
    boolean add(DayValues day, DayValues monthOut) {
        LocalDate date = day.date();
        if (!YearMonth.from(date).equals(month)) {
            startMonth(date);
        }
        days++;
        indexGrowth *= 1 + day.index();
        riskFreeGrowth *= 1 + day.riskFree();
        for (int i = 0; i < growth.length; i++) {
            double r = day.asset(i);
            if (!Double.isNaN(r)) {
                growth[i] *= 1 + r;
                daysWithReturn[i]++;
            }
        }
        if (!(coversMonthStart && date.equals(BusinessDays.lastOfMonth(date)))) {
            return false;
        }
        monthOut.set(date, riskFreeGrowth - 1, indexGrowth - 1);
        for (int i = 0; i < growth.length; i++) {
            monthOut.setAsset(i, daysWithReturn[i] == days ? growth[i] - 1 : Double.NaN);
        }
        return true;
    }

    private void startMonth(LocalDate date) {
        month = YearMonth.from(date);
        coversMonthStart = date.equals(BusinessDays.firstOfMonth(date));
        days = 0;
        indexGrowth = 1;
        riskFreeGrowth = 1;
        Arrays.fill(growth, 1.0);
        Arrays.fill(daysWithReturn, 0);
    }
}
