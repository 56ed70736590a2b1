package dev.sigmawalk.engine.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Malformed data files: every rule of Method §1 stops the load with a message naming file,
 * line (the header is line 1), column and value. Line numbers were counted by hand in the
 * fixtures of {@link StudyFixture}.
 */
class DataIntakeErrorTest {
    @TempDir
    Path dir;

    private InputException loadFails(StudyFixture f) {
        return assertThrows(InputException.class, f::load);
    }

    private static void assertAt(InputException e, String file, int line, String column) {
        assertEquals(file, e.location().file().getFileName().toString(), "file of: " + e.getMessage());
        assertEquals(line, e.location().line(), "line of: " + e.getMessage());
        assertEquals(column, e.location().column(), "column of: " + e.getMessage());
    }

    @Test
    void nonIsoDate_isRejectedAtItsLine() {
        InputException e = loadFails(new StudyFixture(dir).edit("assets.csv", "2020-03-31", "03/31/2020"));
        assertAt(e, "assets.csv", 4, "date");
        assertTrue(e.getMessage().startsWith("assets.csv line 4, column 'date': '03/31/2020' is not an ISO-8601 date"),
                e.getMessage());
    }

    @Test
    void impossibleCalendarDate_isRejected() {
        InputException e = loadFails(new StudyFixture(dir).edit("assets.csv", "2020-02-29", "2020-02-30"));
        assertAt(e, "assets.csv", 3, "date");
        assertTrue(e.getMessage().contains("'2020-02-30' is not a calendar date"), e.getMessage());
    }

    @Test
    void duplicateDate_namesBothLines() {
        InputException e = loadFails(new StudyFixture(dir).edit("assets.csv", "2020-03-31", "2020-02-29"));
        assertAt(e, "assets.csv", 4, "date");
        assertTrue(e.getMessage().contains("'2020-02-29' repeats the date on line 3"), e.getMessage());
    }

    @Test
    void unsortedDate_isRejected() {
        InputException e = loadFails(new StudyFixture(dir).edit("assets.csv", "2020-03-31", "2020-01-15"));
        assertAt(e, "assets.csv", 4, "date");
        assertTrue(e.getMessage().contains("'2020-01-15' comes before 2020-02-29 on line 3"), e.getMessage());
    }

    @Test
    void duplicateAssetName_isRejectedInTheHeader() {
        InputException e = loadFails(new StudyFixture(dir).edit("assets.csv", "A01,A02,A03", "A01,A02,A01"));
        assertAt(e, "assets.csv", 1, "A01");
        assertTrue(e.getMessage().contains("'A01' names two columns"), e.getMessage());
    }

    @Test
    void nonNumericCell_namesLineColumnAndValue() {
        InputException e = loadFails(new StudyFixture(dir).edit("assets.csv", "2020-05-31,0.01,0.03", "2020-05-31,0.01,abc"));
        assertEquals("assets.csv line 6, column 'A02': 'abc' is not a number; expected a decimal such as 0.0123 or an empty cell",
                e.getMessage());
    }

    @Test
    void nonPositivePrice_isRejected() {
        StudyFixture f = new StudyFixture(dir)
                .write("assets.csv", "date,A01,A02\n2020-01-31,10,20\n2020-02-29,11,0\n2020-03-31,12,21\n")
                .edit("study.yaml", "values: returns", "values: prices");
        InputException e = loadFails(f);
        assertAt(e, "assets.csv", 3, "A02");
        assertTrue(e.getMessage().contains("'0' is not a positive price"), e.getMessage());
    }

    @Test
    void marketGapInsideTheNeededRows_isAnError() {
        InputException e = loadFails(new StudyFixture(dir).edit("market.csv", "2020-04-30,0.021", "2020-04-30,"));
        assertAt(e, "market.csv", 5, "IDX");
        assertTrue(e.getMessage().contains("'' is missing; the market needs a value on every date from 2020-01-31"),
                e.getMessage());
    }

    /** τ_0 = row 5 (start 2020-06-30), L_max = 3, so rows from τ_0 − L_max + 1 = 3 (2020-04-30) are needed. */
    @Test
    void marketGapBeforeTheNeededRows_isAccepted_butOneInsideIsNot() {
        StudyFixture f = new StudyFixture(dir).edit("study.yaml", "  rebalance_every: 1", "  rebalance_every: 1\n  start: 2020-06-30")
                .edit("market.csv", "2020-03-31,-0.012", "2020-03-31,");
        assertTrue(Double.isNaN(f.load().panel().market(2)), "market row 2 stays missing");
        f.edit("market.csv", "2020-04-30,0.021", "2020-04-30,");
        assertAt(loadFails(f), "market.csv", 5, "IDX");
    }

    @Test
    void marketWithoutAnAssetDate_isRejectedAtTheAssetLine() {
        InputException e = loadFails(new StudyFixture(dir).edit("market.csv", "2020-06-30,-0.006\n", ""));
        assertAt(e, "assets.csv", 7, "date");
        assertTrue(e.getMessage().contains("'2020-06-30' has no row in market.csv"), e.getMessage());
        assertFalse(e.getMessage().contains("date their months differently"), "June has no row at all: " + e.getMessage());
    }

    /**
     * Monthly series from different sources often date a month on its first day where returns are
     * dated on its last (common practice of public rate tables, from memory): the message says so
     * and names the fix, instead of only a missing row.
     */
    @Test
    void riskFreeDatedOnTheFirstOfEachMonth_isNamedAsADatingMismatch() {
        InputException e = loadFails(new StudyFixture(dir).write("riskfree.csv", String.join("\n", "date,rf",
                "2020-01-01,0.001", "2020-02-01,0.001", "2020-03-01,0.001", "2020-04-01,0.001", "2020-05-01,0.001",
                "2020-06-01,0.001", "2020-07-01,0.001", "2020-08-01,0.001", "")));
        assertAt(e, "assets.csv", 2, "date");
        assertTrue(e.getMessage().contains("'2020-01-31' has no row in riskfree.csv; the risk-free needs a row on"
                + " the dates of assets.csv; riskfree.csv has '2020-01-01' (line 2) in that month: the two files"
                + " date their months differently; give riskfree.csv the dates of assets.csv"), e.getMessage());
    }

    /**
     * Method §1 needs the market only from τ_0 − L_max + 1: an index history that starts after
     * the assets' (no rows at all for the first dates) is read like one with empty cells there.
     * τ_0 = row 5 (start 2020-06-30), L_max = 3, so rows from 2020-04-30 on are needed.
     */
    @Test
    void marketFileStartingAfterTheAssets_isAccepted_whenItCoversTheWalk() {
        StudyFixture f = new StudyFixture(dir).edit("study.yaml", "  rebalance_every: 1", "  rebalance_every: 1\n  start: 2020-06-30")
                .edit("market.csv", "2020-01-31,0.011\n2020-02-29,0.004\n2020-03-31,-0.012\n", "");
        StudyData data = f.load();
        for (int t = 0; t < 3; t++) {
            assertTrue(Double.isNaN(data.panel().market(t)), "no market row for panel row " + t);
        }
        assertEquals(0.021, data.panel().market(3), "the first needed row keeps the file's value");
        assertEquals(0.007, data.panel().market(7), "the last row keeps the file's value");
        assertTrue(data.warnings().stream().noneMatch(w -> w.contains("market.csv")), data.warnings().toString());
    }

    /** The same history one row shorter misses the first needed date: refused at the assets file's line of it. */
    @Test
    void marketFileStartingInsideTheWalk_isRefusedAtTheFirstNeededDate() {
        StudyFixture f = new StudyFixture(dir).edit("study.yaml", "  rebalance_every: 1", "  rebalance_every: 1\n  start: 2020-06-30")
                .edit("market.csv", "2020-01-31,0.011\n2020-02-29,0.004\n2020-03-31,-0.012\n2020-04-30,0.021\n", "");
        InputException e = loadFails(f);
        assertAt(e, "assets.csv", 5, "date");
        assertEquals("assets.csv line 5, column 'date': '2020-04-30' has no row in market.csv; the market needs a row"
                + " on every date from 2020-04-30 (the start of the longest window before the first rebalance on"
                + " 2020-06-30) to 2020-08-31", e.getMessage());
    }

    /** With prices the return of the first needed row needs the price a row before it too. */
    @Test
    void marketPriceFileStartingAtTheFirstNeededDate_isRefusedForThePriceBeforeIt() {
        StudyFixture f = new StudyFixture(dir)
                .prices("date,A01,A02\n2020-01-31,10,20\n2020-02-29,11,21\n2020-03-31,12,20\n"
                        + "2020-04-30,11,22\n2020-05-31,12,23\n2020-06-30,13,22\n2020-07-31,12,24\n2020-08-31,13,23\n",
                        "date,IDX\n2020-03-31,100\n2020-04-30,101\n2020-05-31,99\n2020-06-30,102\n"
                        + "2020-07-31,103\n2020-08-31,104\n")
                .edit("study.yaml", "  rebalance_every: 1", "  rebalance_every: 1\n  start: 2020-06-30");
        // Return rows: 2020-02-29 (0) .. 2020-08-31 (6); τ_0 = 4, L_max = 3: from row 2 (2020-04-30), which needs 2020-03-31's price.
        StudyData data = f.load();
        assertEquals(101.0 / 100 - 1, data.panel().market(2), 1e-15, "the first needed return");
        f.edit("market.csv", "2020-03-31,100\n", "");
        InputException e = loadFails(f);
        assertAt(e, "assets.csv", 4, "date");
        assertTrue(e.getMessage().startsWith("assets.csv line 4, column 'date': '2020-03-31' has no row in market.csv;"
                + " the market needs a row on every date from 2020-04-30"), e.getMessage());
    }

    @Test
    void riskFreeGap_isAnError() {
        InputException e = loadFails(new StudyFixture(dir).edit("riskfree.csv", "2020-07-31,0.001", "2020-07-31,"));
        assertAt(e, "riskfree.csv", 8, "rf");
        assertTrue(e.getMessage().contains("the risk-free needs a value"), e.getMessage());
    }

    @Test
    void emptyFile_isRejected() {
        InputException e = loadFails(new StudyFixture(dir).write("assets.csv", ""));
        assertEquals("assets.csv: the file is empty; expected a header row", e.getMessage());
    }

    @Test
    void headerWithoutRows_isRejected() {
        InputException e = loadFails(new StudyFixture(dir).write("assets.csv", "date,A01,A02\n"));
        assertAt(e, "assets.csv", 1, null);
        assertTrue(e.getMessage().contains("the header has no rows below it"), e.getMessage());
    }

    @Test
    void rowWithTooFewCells_isRejected() {
        InputException e = loadFails(new StudyFixture(dir).edit("assets.csv", "2020-05-31,0.01,0.03,-0.02", "2020-05-31,0.01"));
        assertAt(e, "assets.csv", 6, null);
        assertTrue(e.getMessage().contains("the row has 2 cells but the header has 4"), e.getMessage());
    }

    /** 3 assets with bounds [0, 0.2]: 3 · 0.2 = 0.6 < 1, so no weights sum to 1 (Method §5). */
    @Test
    void boundsThatCannotSumToOne_areAnErrorWithKeyPath() {
        InputException e = loadFails(new StudyFixture(dir).edit("study.yaml", "objective: min-variance",
                "objective: min-variance\n    bounds: [0, 0.2]"));
        assertTrue(e.getMessage().startsWith("study.yaml: strategies[0].bounds [0.0, 0.2] cannot make 3 weights sum to 1"),
                e.getMessage());
    }

    @Test
    void windowLongerThanTheData_isAnError() {
        InputException e = loadFails(new StudyFixture(dir).edit("study.yaml", "windows: [3]", "windows: [8]"));
        assertTrue(e.getMessage().contains("the longest window (8 rows) needs at least 10 rows"), e.getMessage());
        assertEquals("study.yaml", e.location().file().getFileName().toString());
    }

    @Test
    void missingMarketColumn_namesTheColumnsThere() {
        InputException e = loadFails(new StudyFixture(dir).edit("study.yaml", "market: market.csv", "market: IDX"));
        assertTrue(e.getMessage().contains("no column named 'IDX' for the market; the header's columns are A01, A02, A03"),
                e.getMessage());
    }

    @Test
    void missingFile_isAnInputError() {
        InputException e = loadFails(new StudyFixture(dir).edit("study.yaml", "riskfree: riskfree.csv", "riskfree: rates.csv"));
        assertTrue(e.getMessage().startsWith("rates.csv: data file not found"), e.getMessage());
    }

    /** A row far wider than the header is counted to its end; the line is exact. */
    @Test
    void rowFarWiderThanTheHeader_isRejectedAtItsLine() {
        String wide = "2020-02-29" + ",0.01".repeat(600);
        InputException e = loadFails(new StudyFixture(dir).edit("assets.csv", "2020-02-29,0.02,-0.01,0.00", wide));
        assertAt(e, "assets.csv", 3, null);
        assertEquals("assets.csv line 3: the row has 601 cells but the header has 4", e.getMessage());
    }
}
