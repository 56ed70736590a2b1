package dev.sigmawalk.sample;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The committed demo files in the module folder: reproducible and as the README describes. */
class CommittedDataTest {
    /**
     * A written value is its exact value rounded to 8 significant digits, so it is within half a
     * unit in the 8th digit: at most 5e-8 of its own size.
     */
    private static final double WRITTEN_RELATIVE_ERROR = 5e-8;
    /** Slack for the floating-point products over a month of daily factors. */
    private static final double PRODUCT_SLACK = 1e-14;

    private static Csv daily;
    private static Csv monthly;
    private static Csv truth;
    private static List<LocalDate> dailyDates;

    @BeforeAll
    static void read() throws IOException {
        daily = Csv.read(ModuleFolder.file(UniverseFiles.assets(UniverseFiles.DAILY)));
        monthly = Csv.read(ModuleFolder.file(UniverseFiles.assets(UniverseFiles.MONTHLY)));
        truth = Csv.read(ModuleFolder.file(UniverseFiles.TRUTH));
        dailyDates = daily.texts("date").stream().map(LocalDate::parse).toList();
    }

    /** The committed files cannot drift from the generator: regenerate with the demo spec. */
    @Test
    void committedFiles_equalARegenerationWithTheDemoSpec(@TempDir Path tmp) throws IOException {
        UniverseGenerator.generate(UniverseSpec.demo(), tmp);
        for (String name : UniverseFiles.DATA) {
            assertArrayEquals(Files.readAllBytes(tmp.resolve(name)), Files.readAllBytes(ModuleFolder.file(name)),
                    name + " differs from a regeneration; rerun the command in README.md");
        }
    }

    @Test
    void demo_hasAtLeastSixtyCompaniesInAtLeastSixSectors_withIdsHoldingDigits() throws IOException {
        Csv sectors = Csv.read(ModuleFolder.file(UniverseFiles.SECTORS));
        assertTrue(sectors.rows().size() >= 60, sectors.rows().size() + " companies");
        assertTrue(new HashSet<>(sectors.texts("sector")).size() >= 6, "sectors");
        assertEquals(sectors.texts("asset"), daily.assets(), "sectors.csv lists the daily file's columns");
        for (String id : daily.assets()) {
            assertTrue(id.matches("[A-Z]{2}[0-9]{2,}"), "id '" + id + "' is letters then digits");
        }
    }

    @Test
    void everyReturn_isAboveMinusOne() throws IOException {
        for (String frequency : List.of(UniverseFiles.DAILY, UniverseFiles.MONTHLY)) {
            Csv assets = frequency.equals(UniverseFiles.DAILY) ? daily : monthly;
            for (String id : assets.assets()) {
                for (double r : assets.numbers(id)) {
                    assertTrue(Double.isNaN(r) || r > -1, frequency + " " + id + ": " + r);
                }
            }
            for (double r : Csv.read(ModuleFolder.file(UniverseFiles.market(frequency))).numbers(UniverseFiles.INDEX_COLUMN)) {
                assertTrue(r > -1, frequency + " index: " + r);
            }
        }
    }

    /**
     * Daily cells are empty exactly outside [first_return, last_return] of truth.csv; month
     * cells are present exactly for months wholly inside that span.
     */
    @Test
    void cells_areEmptyExactlyOutsideTheTradingSpan() {
        List<String> ids = truth.texts("asset");
        List<String> first = truth.texts("first_return");
        List<String> last = truth.texts("last_return");
        LocalDate start = LocalDate.parse(daily.rows().get(0)[0]);
        LocalDate end = LocalDate.parse(daily.rows().get(daily.rows().size() - 1)[0]);
        int late = 0;
        int gone = 0;
        for (int a = 0; a < ids.size(); a++) {
            LocalDate from = LocalDate.parse(first.get(a));
            LocalDate to = LocalDate.parse(last.get(a));
            late += from.isAfter(start) ? 1 : 0;
            gone += to.isBefore(end) ? 1 : 0;
            checkDaily(ids.get(a), from, to);
            checkMonthly(ids.get(a), from, to);
        }
        assertTrue(late >= 3, late + " late listings");
        assertTrue(gone >= 3, gone + " delistings");
    }

    private static void checkDaily(String id, LocalDate from, LocalDate to) {
        double[] r = daily.numbers(id);
        for (int t = 0; t < r.length; t++) {
            LocalDate date = dailyDates.get(t);
            boolean inside = !date.isBefore(from) && !date.isAfter(to);
            assertEquals(inside, !Double.isNaN(r[t]), id + " on " + date);
        }
    }

    private static void checkMonthly(String id, LocalDate from, LocalDate to) {
        int c = monthly.column(id);
        for (String[] row : monthly.rows()) {
            LocalDate monthEnd = LocalDate.parse(row[0]);
            boolean whole = !BusinessDays.firstOfMonth(monthEnd).isBefore(from) && !monthEnd.isAfter(to);
            assertEquals(whole, !row[c].isEmpty(), id + " in the month ending " + monthEnd);
        }
    }

    /** A month's value is Π(1 + r_d) - 1 over the written daily values, rounded to 8 digits. */
    @Test
    void monthlyFiles_compoundTheDailyFiles() throws IOException {
        for (String kind : List.of("assets", "market", "riskfree")) {
            Csv day = Csv.read(ModuleFolder.file(kind + "-daily.csv"));
            Csv month = Csv.read(ModuleFolder.file(kind + "-monthly.csv"));
            List<String> dayMonths = day.rows().stream().map(r -> r[0].substring(0, 7)).toList();
            Map<String, Integer> firstRowOfMonth = new HashMap<>();
            for (int row = dayMonths.size() - 1; row >= 0; row--) {
                firstRowOfMonth.put(dayMonths.get(row), row);
            }
            for (String column : day.assets()) {
                double[] d = day.numbers(column);
                double[] m = month.numbers(column);
                for (int k = 0; k < m.length; k++) {
                    String monthKey = month.rows().get(k)[0].substring(0, 7);
                    double growth = 1;
                    for (int row = firstRowOfMonth.get(monthKey); row < d.length && dayMonths.get(row).equals(monthKey); row++) {
                        growth *= 1 + d[row];
                    }
                    if (!Double.isNaN(m[k])) {
                        double expected = growth - 1;
                        assertEquals(expected, m[k], Math.abs(expected) * WRITTEN_RELATIVE_ERROR + PRODUCT_SLACK,
                                kind + " " + column + " month " + monthKey);
                    }
                }
            }
        }
    }

    /** The stress period of regimes.csv must show in the index: true factor 2.6 on volatility. */
    @Test
    void firstStressPeriod_atLeastDoublesIndexVolatility() throws IOException {
        Csv regimes = Csv.read(ModuleFolder.file(UniverseFiles.REGIMES));
        LocalDate from = LocalDate.parse(regimes.rows().get(0)[0]);
        LocalDate to = LocalDate.parse(regimes.rows().get(0)[1]);
        Csv market = Csv.read(ModuleFolder.file(UniverseFiles.market(UniverseFiles.DAILY)));
        double[] r = market.numbers(UniverseFiles.INDEX_COLUMN);
        Set<Integer> inside = new HashSet<>();
        for (int t = 0; t < r.length; t++) {
            LocalDate date = LocalDate.parse(market.rows().get(t)[0]);
            if (!date.isBefore(from) && !date.isAfter(to)) {
                inside.add(t);
            }
        }
        double ratio = sd(r, inside, true) / sd(r, inside, false);
        // About 440 stressed rows: the ratio's sampling error is a few per cent of 2.6.
        assertTrue(ratio > 2.0 && ratio < 3.2, "stressed / calm volatility " + ratio);
    }

    /** Rates stay at or above 0 and move slowly: a day changes the annual rate by under 0.3 %. */
    @Test
    void riskFree_isNonNegativeAndSlowlyVarying() throws IOException {
        double[] rf = Csv.read(ModuleFolder.file(UniverseFiles.riskFree(UniverseFiles.DAILY)))
                .numbers(UniverseFiles.RISK_FREE_COLUMN);
        for (int t = 0; t < rf.length; t++) {
            assertTrue(rf[t] >= 0, "rate on row " + t + ": " + rf[t]);
            if (t > 0) {
                assertTrue(Math.abs(rf[t] - rf[t - 1]) * 261 < 0.003, "rate change on row " + t);
            }
        }
    }

    private static double sd(double[] r, Set<Integer> rows, boolean inside) {
        double sum = 0;
        double sumSquares = 0;
        int n = 0;
        for (int t = 0; t < r.length; t++) {
            if (rows.contains(t) == inside) {
                sum += r[t];
                sumSquares += r[t] * r[t];
                n++;
            }
        }
        double mean = sum / n;
        return Math.sqrt((sumSquares - n * mean * mean) / (n - 1));
    }
}
