package dev.sigmawalk.engine.data;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.time.LocalDate;
import java.util.SplittableRandom;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** Periods per year from date spacing, Method §1 thresholds (4, 15, 60, 200 days). */
class PeriodsPerYearTest {

    private static LocalDate[] dates(String... iso) {
        LocalDate[] out = new LocalDate[iso.length];
        for (int i = 0; i < iso.length; i++) {
            out[i] = LocalDate.parse(iso[i]);
        }
        return out;
    }

    /** Trading days Thu, Fri, Mon, Tue, Wed: spacings 1, 3, 1, 1, median 1 day → 252. */
    @Test
    void tradingDays_give252() {
        assertEquals(252, PeriodsPerYear.infer(dates("2021-03-04", "2021-03-05", "2021-03-08", "2021-03-09", "2021-03-10")));
    }

    @Test
    void fridays_give52() {
        assertEquals(52, PeriodsPerYear.infer(dates("2021-03-05", "2021-03-12", "2021-03-19", "2021-03-26")));
    }

    /** Month ends: spacings 29, 31, 30 days (2020 is a leap year), median 30 → 12. */
    @Test
    void monthEnds_give12() {
        assertEquals(12, PeriodsPerYear.infer(dates("2020-01-31", "2020-02-29", "2020-03-31", "2020-04-30")));
    }

    @Test
    void quarterEnds_give4() {
        assertEquals(4, PeriodsPerYear.infer(dates("2020-03-31", "2020-06-30", "2020-09-30", "2020-12-31")));
    }

    @Test
    void yearEnds_give1() {
        assertEquals(1, PeriodsPerYear.infer(dates("2018-12-31", "2019-12-31", "2020-12-31")));
    }

    /** Even count of spacings: 1, 3, 7, 9 have median (3 + 7) / 2 = 5 days → 52. */
    @Test
    void evenNumberOfSpacings_usesTheMeanOfTheMiddleTwo() {
        LocalDate[] d = dates("2021-01-01", "2021-01-02", "2021-01-05", "2021-01-12", "2021-01-21");
        assertEquals(5.0, PeriodsPerYear.medianSpacingDays(d), 0.0);
        assertEquals(52, PeriodsPerYear.infer(d));
    }

    /**
     * Equal spacing of k days always has median k, whatever the count. The 200 cases (k from 1
     * to 400 days, 2 to 40 dates) are drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("spacingsAndCounts")
    void equalSpacing_hasThatMedian(int days, int n) {
        LocalDate[] d = new LocalDate[n];
        for (int i = 0; i < n; i++) {
            d[i] = LocalDate.of(2000, 1, 1).plusDays((long) i * days);
        }
        String spacing = n + " dates " + days + " days apart";
        assertEquals(days, PeriodsPerYear.medianSpacingDays(d), 0.0, spacing);
        assertEquals(PeriodsPerYear.fromMedianSpacing(days), PeriodsPerYear.infer(d), spacing);
    }

    static Stream<Arguments> spacingsAndCounts() {
        SplittableRandom rng = new SplittableRandom(0x5EED_0004L);
        return Stream.generate(() -> Arguments.of(rng.nextInt(1, 401), rng.nextInt(2, 41))).limit(200);
    }
}
