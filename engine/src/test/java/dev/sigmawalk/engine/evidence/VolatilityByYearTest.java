package dev.sigmawalk.engine.evidence;

import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

class VolatilityByYearTest {
    private static final double HAND = 1e-12;

    /**
     * Hand computation, p = 12: 2021 has excess returns (0.01, -0.01, 0.03) with mean 0.01,
     * deviations (0, -0.02, 0.02), sd = √(0.0008/2) = 0.02, so realised = √12 · 0.02; forecasts
     * (0.01, 0.02, 0.03) average 0.02, forecast = √12 · 0.02. 2022 has excess (0.02, -0.02)
     * (rf 0.001 subtracted), sd = √(0.0008/1), and forecasts averaging 0.015. 2023 has one row and
     * is left out.
     */
    @Test
    void threeYears_matchHandComputation() {
        LocalDate[] dates = {LocalDate.of(2021, 1, 31), LocalDate.of(2021, 2, 28), LocalDate.of(2021, 3, 31),
            LocalDate.of(2022, 1, 31), LocalDate.of(2022, 2, 28), LocalDate.of(2023, 1, 31)};
        double[] returns = {0.01, -0.01, 0.03, 0.021, -0.019, 0.05};
        double[] rf = {0, 0, 0, 0.001, 0.001, 0.001};
        double[] forecast = {0.01, 0.02, 0.03, 0.01, 0.02, 0.02};
        List<YearVolatility> years = VolatilityByYear.of(dates, returns, rf, forecast, 12);
        double root = Math.sqrt(12);
        assertEquals(2, years.size());
        assertEquals(2021, years.get(0).year());
        assertEquals(3, years.get(0).periods());
        assertEquals(root * 0.02, years.get(0).realised(), HAND);
        assertEquals(root * 0.02, years.get(0).forecast(), HAND);
        assertEquals(1.0, years.get(0).ratio(), HAND);
        assertEquals(2022, years.get(1).year());
        assertEquals(root * Math.sqrt(0.0008), years.get(1).realised(), HAND);
        assertEquals(root * 0.015, years.get(1).forecast(), HAND);
    }

    @Test
    void unsortedDatesOrBadPeriods_areRejected() {
        LocalDate[] dates = {LocalDate.of(2021, 2, 28), LocalDate.of(2021, 1, 31)};
        double[] two = {0.01, 0.02};
        assertThrows(IllegalArgumentException.class,
                () -> VolatilityByYear.of(dates, two, new double[2], two, 12));
        LocalDate[] sorted = {LocalDate.of(2021, 1, 31), LocalDate.of(2021, 2, 28)};
        assertThrows(IllegalArgumentException.class,
                () -> VolatilityByYear.of(sorted, two, new double[2], two, 0));
    }
}
