package dev.sigmawalk.engine.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A per-period series with a row between two of the assets' dates (Method §1: row t is the
 * return over (d_{t−1}, d_t]) is finer than the assets file, and its value on d_t covers only
 * part of the period; it is refused at that row. Rows before or after the assets' dates, and
 * prices on any further dates, stay harmless.
 */
class InsidePeriodTest {
    private static final String EXPECTED = "'2020-03-15' falls between the dates 2020-02-29 and 2020-03-31 of"
            + " assets.csv, so this file's value on 2020-03-31 would cover only part of that period; expected one row"
            + " per period of assets.csv, on its dates, each the return (or rate) over the whole period";
    private static final String MID_MARCH = "2020-02-29,0.004\n2020-03-15,0.002\n";

    @TempDir
    Path dir;

    private void assertRefusedAt(StudyFixture f, String file, int line) {
        InputException e = assertThrows(InputException.class, f::load);
        assertEquals(file + " line " + line + ", column 'date': " + EXPECTED, e.getMessage());
        assertEquals(new InputException.Location(dir.resolve(file).toAbsolutePath().normalize(), line, "date"),
                e.location());
    }

    @Test
    void marketReturnInsideAPeriod_isRefusedAtItsRow() {
        assertRefusedAt(new StudyFixture(dir).edit("market.csv", "2020-02-29,0.004\n", MID_MARCH), "market.csv", 4);
    }

    @Test
    void riskFreeRateInsideAPeriod_isRefusedAtItsRow() {
        assertRefusedAt(new StudyFixture(dir).edit("riskfree.csv", "2020-02-29,0.001\n",
                "2020-02-29,0.001\n2020-03-15,0.0005\n"), "riskfree.csv", 4);
    }

    @Test
    void factorReturnInsideAPeriod_isRefusedAtItsRow() {
        StudyFixture f = new StudyFixture(dir)
                .write("factors.csv", StudyFixture.MARKET.replace("date,IDX", "date,size").replace("2020-02-29,0.004\n",
                        MID_MARCH))
                .edit("study.yaml", "    risk: sample", "    risk: multi-index\n    factors: factors.csv");
        assertRefusedAt(f, "factors.csv", 4);
    }

    @Test
    void rowsOutsideTheAssetsDates_areIgnoredWithAWarning() {
        StudyData d = new StudyFixture(dir)
                .edit("market.csv", "date,IDX\n", "date,IDX\n2019-12-31,0.5\n")
                .edit("market.csv", "2020-08-31,0.007\n", "2020-08-31,0.007\n2020-09-30,0.5\n").load();
        assertEquals(0.011, d.panel().market(0), 0.0, "the row of the first asset date, not the one before it");
        assertEquals(0.007, d.panel().market(7), 0.0);
        assertTrue(d.warnings().contains("market.csv: 2 dates that the assets file lacks were ignored"),
                d.warnings().toString());
    }

    /** With prices a return is P_t / P_{t−1} − 1 between the assets' dates whatever lies between them. */
    @Test
    void pricesOnFurtherDates_giveTheReturnsBetweenTheAssetsDates() {
        StringBuilder assets = new StringBuilder("date,A01,A02,A03\n");
        StringBuilder market = new StringBuilder("date,IDX\n");
        String[] dates = StudyFixture.ASSETS.lines().skip(1).map(l -> l.substring(0, 10)).toArray(String[]::new);
        for (int t = 0; t < dates.length; t++) {
            assets.append(dates[t]).append(',').append(100 + t).append(',').append(50 + 2 * t).append(',')
                    .append(80 - t).append('\n');
            market.append(dates[t]).append(',').append(1000 + 10 * t * t).append('\n');
            if (t == 2) {
                market.append("2020-04-15,5000\n");
            }
        }
        StudyData d = new StudyFixture(dir).write("assets.csv", assets.toString()).write("market.csv", market.toString())
                .edit("study.yaml", "values: returns", "values: prices").load();
        assertEquals(1090.0 / 1040.0 - 1, d.panel().market(2), 1e-15, "2020-04-30 against 2020-03-31, row 2 of the panel");
    }
}
