package dev.sigmawalk.reports.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * {@code sigmawalk check} through the real command line: exit codes as the README gives them, messages on
 * standard error naming file, line, column and value, and no file written, ever. Line numbers in
 * the expected messages were counted by hand in the invented fixtures below (header = line 1).
 */
class CheckCommandTest {
    private static final String ASSETS = String.join("\n",
            "date,A01,A02,A03,IDX",
            "2020-01-31,0.01,0.02,-0.01,0.011",
            "2020-02-29,0.02,-0.01,0.00,0.004",
            "2020-03-31,-0.03,0.01,0.02,-0.012",
            "2020-04-30,0.04,0.00,0.01,0.021",
            "2020-05-31,0.01,0.03,-0.02,0.003",
            "2020-06-30,-0.02,0.01,0.01,-0.006",
            "2020-07-31,0.00,0.02,0.03,0.015",
            "2020-08-31,0.03,-0.01,0.00,0.007", "");
    private static final String RISK_FREE = String.join("\n",
            "date,rf",
            "2020-01-31,0.001", "2020-02-29,0.001", "2020-03-31,0.001", "2020-04-30,0.001",
            "2020-05-31,0.001", "2020-06-30,0.001", "2020-07-31,0.001", "2020-08-31,0.001", "");
    private static final String STUDY = String.join("\n",
            "title: Invented harbour study",        // line 1
            "data:",                                // 2
            "  assets: assets.csv",                 // 3
            "  values: returns",                    // 4
            "  market: IDX",                        // 5
            "  riskfree: riskfree.csv",             // 6
            "walkforward:",                         // 7
            "  windows: [3, 4]",                    // 8
            "  rebalance_every: 1",                 // 9
            "strategies:",                          // 10
            "  - name: index-model",                // 11
            "    risk: single-index",               // 12
            "    objective: min-variance",          // 13
            "    bounds: [0, 0.5]",                 // 14
            "  - name: equal",                      // 15
            "    objective: equal-weight",          // 16
            "");

    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    @BeforeEach
    void writeFixture() {
        write("assets.csv", ASSETS);
        write("riskfree.csv", RISK_FREE);
        write("study.yaml", STUDY);
    }

    private void write(String name, String text) {
        try {
            Files.writeString(dir.resolve(name), text);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private void edit(String name, String from, String to) {
        try {
            String text = Files.readString(dir.resolve(name));
            assertTrue(text.contains(from), name + " contains " + from);
            write(name, text.replaceFirst(Pattern.quote(from), Matcher.quoteReplacement(to)));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Every file under the folder with its content, to prove that check writes nothing. */
    private Map<String, String> snapshot() {
        try (Stream<Path> files = Files.walk(dir)) {
            Map<String, String> map = new TreeMap<>();
            files.forEach(p -> {
                try {
                    map.put(dir.relativize(p).toString(), Files.isDirectory(p) ? "/" : Files.readString(p));
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            });
            return map;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private int check() {
        CommandLine cl = SigmawalkCommand.commandLine();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        Map<String, String> before = snapshot();
        int code = cl.execute("check", dir.resolve("study.yaml").toString());
        assertEquals(before, snapshot(), "check must leave the folder unchanged");
        return code;
    }

    /** Runs check, expects exit 2 and exactly this message on standard error. */
    private void assertRejected(String message) {
        int code = check();
        assertEquals(SigmawalkCommand.EXIT_BAD_INPUT, code, "exit code; stderr: " + err);
        assertEquals("sigmawalk: " + message, err.toString().strip());
        assertEquals("", out.toString(), "nothing on standard output");
    }

    private void assertRejectedStartingWith(String start) {
        int code = check();
        assertEquals(SigmawalkCommand.EXIT_BAD_INPUT, code, "exit code; stderr: " + err);
        assertTrue(err.toString().startsWith("sigmawalk: " + start), err.toString());
        assertEquals("", out.toString(), "nothing on standard output");
    }

    @Test
    void validStudy_printsWhatItFound_andExitsZero() {
        edit("assets.csv", "2020-03-31,-0.03", "2020-03-31,");
        assertEquals(0, check(), "stderr: " + err);
        String text = out.toString();
        assertTrue(text.startsWith("Study: Invented harbour study\n"), text);
        assertTrue(text.contains("dates 2020-01-31 to 2020-08-31, 8 rows of returns, 3 assets"), text);
        assertTrue(text.contains("periods per year: 12 (inferred from the dates)"), text);
        assertTrue(text.contains("market: column 'IDX' of the assets file"), text);
        assertTrue(text.contains("risk-free: file riskfree.csv"), text);
        assertTrue(text.contains("    A01: 2020-01-31 to 2020-08-31, 1 row missing (1 inside its span)"), text);
        // τ_0 = L_max − 1 = row 3 (2020-04-30); rows 4..7 held; windows start at rows 3−3+1 and 3−4+1.
        assertTrue(text.contains("first rebalance 2020-04-30, 4 rebalances; out-of-sample 2020-05-31 to 2020-08-31 (4 rows)"), text);
        assertTrue(text.contains("window 3: first estimation date 2020-02-29"), text);
        assertTrue(text.contains("window 4: first estimation date 2020-01-31"), text);
        assertTrue(text.contains("index-model: min-variance, risk single-index, bounds [0.0, 0.5]"), text);
        assertTrue(text.contains("equal: equal-weight, risk sample, no bounds"), text);
        assertTrue(text.contains("index-model: min-variance, risk single-index, bounds [0.0, 0.5]; no baseline: no"
                + " sample-covariance strategy with the same objective and bounds\n"), text);
        assertTrue(text.contains("; no baseline: equal weight does not use the covariance estimate"), text);
        assertTrue(text.contains("walkforward.cost_bps: 0.0"), text);
        // Only the defaults this study received: it gives rebalance_every and index-model's bounds.
        assertTrue(text.contains("  strategies[1] (equal).risk: sample\n"), text);
        assertTrue(text.contains("  strategies[1] (equal).bounds: none (short sales allowed)\n"), text);
        assertTrue(!text.contains("walkforward.rebalance_every:"), text);
        assertTrue(!text.contains("(index-model).bounds"), text);
        assertTrue(!text.contains("(index-model).risk"), text);
        assertTrue(!text.contains("market_premium"), "no strategy uses expected returns: " + text);
        assertTrue(text.contains("Warnings:\n  none\n"), text);
        assertEquals("", err.toString());
    }

    @Test
    void manyAssetsWithGaps_listTwentyThenCount() {
        StringBuilder csv = new StringBuilder("date,IDX");
        for (int j = 0; j < 25; j++) {
            csv.append(",G").append(j);
        }
        String[] dates = {"2020-01-31", "2020-02-29", "2020-03-31", "2020-04-30", "2020-05-31", "2020-06-30"};
        for (int t = 0; t < dates.length; t++) {
            csv.append('\n').append(dates[t]).append(",0.01");
            for (int j = 0; j < 25; j++) {
                csv.append(t == 0 ? "," : ",0.0" + (j % 9 + 1));
            }
        }
        write("assets.csv", csv + "\n");
        edit("study.yaml", "windows: [3, 4]", "windows: [2]");
        edit("study.yaml", "    bounds: [0, 0.5]\n", "");
        edit("study.yaml", "riskfree: riskfree.csv", "riskfree: 0.0");
        assertEquals(0, check(), "stderr: " + err);
        assertTrue(out.toString().contains("assets with missing rows: 25"), out.toString());
        assertTrue(out.toString().contains("    G19: "), out.toString());
        assertTrue(!out.toString().contains("    G20: "), out.toString());
        assertTrue(out.toString().contains("    and 5 more"), out.toString());
    }

    @Test
    void warnings_arePrinted() {
        edit("assets.csv", "2020-02-29,0.02", "2020-02-29,7");
        assertEquals(0, check());
        assertTrue(out.toString().contains("  assets.csv line 3, column 'A01': a return of 7.0 is above +500 %"), out.toString());
    }

    /** What a run without --out would refuse is a warning of check, which still writes nothing. */
    @Test
    void outputFolderARunWouldRefuse_isAWarning() {
        edit("study.yaml", "title: Invented harbour study", "title: Invented harbour study\noutput: assets.csv");
        assertEquals(0, check());
        assertTrue(out.toString().contains("  output: a run without --out would stop here: output " + dir.resolve("assets.csv")
                + " is a file, not a folder; choose another --out"), out.toString());
        write("study.yaml", STUDY + "output: .\n");
        write("summary.csv", "mine\n");
        out.getBuffer().setLength(0);
        assertEquals(0, check());
        assertTrue(out.toString().contains("  output: a run without --out would stop here: output folder " + dir
                + " is not empty and was not written by sigmawalk"), out.toString());
    }

    @Test
    void nonIsoDate_exitsTwo() {
        edit("assets.csv", "2020-04-30", "30.04.2020");
        assertRejected("assets.csv line 5, column 'date': '30.04.2020' is not an ISO-8601 date; expected YYYY-MM-DD,"
                + " for example 2020-01-31; in a date such as '30.04.2020' the order of day and month cannot be told"
                + " for sure: re-save the column with the format YYYY-MM-DD");
    }

    @Test
    void duplicateDate_exitsTwo() {
        edit("assets.csv", "2020-05-31", "2020-04-30");
        assertRejected("assets.csv line 6, column 'date': '2020-04-30' repeats the date on line 5;"
                + " dates must be strictly increasing with no duplicates");
    }

    @Test
    void unsortedDates_exitTwo() {
        edit("assets.csv", "2020-05-31", "2020-03-15");
        assertRejected("assets.csv line 6, column 'date': '2020-03-15' comes before 2020-04-30 on line 5;"
                + " dates must be strictly increasing");
    }

    @Test
    void duplicateAssetName_exitsTwo() {
        edit("assets.csv", "A01,A02,A03", "A01,A03,A03");
        assertRejected("assets.csv line 1, column 'A03': 'A03' names two columns; expected each column's name once"
                + " (an asset's, a series' or a factor's)");
    }

    @Test
    void nonNumericCell_exitsTwo() {
        edit("assets.csv", "2020-07-31,0.00,0.02", "2020-07-31,0.00,2%");
        assertRejected("assets.csv line 8, column 'A02': '2%' is not a number; expected a decimal such as 0.0123 or an"
                + " empty cell; a percent sign is not read: write returns as decimals (0.039 for 3.9 %)");
    }

    @Test
    void nonPositivePrice_exitsTwo() {
        write("assets.csv", "date,A01,A02,IDX\n2020-01-31,10,20,100\n2020-02-29,11,-3,101\n");
        edit("study.yaml", "values: returns", "values: prices");
        assertRejected("assets.csv line 3, column 'A02': '-3' is not a positive price; prices must be > 0");
    }

    @Test
    void marketGapInsideTheNeededRows_exitsTwo() {
        edit("assets.csv", "-0.02,0.01,0.01,-0.006", "-0.02,0.01,0.01,");
        assertRejectedStartingWith("assets.csv line 7, column 'IDX': '' is missing; the market needs a value on every"
                + " date from 2020-01-31");
    }

    /**
     * half_life 0.01: a row one period old already weighs 0.5^100 ≈ 8e-31 of the latest, below
     * rounding, so the ewma matrix holds one row and is singular with three assets (Method §11);
     * check says so, with the half-life that keeps three rows, ⌈(3 − 1)/52 · 100⌉/100 = 0.04
     * (0.04 · 52 = 2.08, so rows 0, 1 and 2 periods old count). half_life 24 draws nothing.
     */
    @Test
    void ewmaHalfLifeBelowTheAssets_isWarnedOf() {
        edit("study.yaml", "  - name: equal\n", "  - name: decaying\n    risk: ewma\n    half_life: 0.01\n"
                + "    objective: min-variance\n  - name: equal\n");
        assertEquals(0, check(), err.toString());
        assertTrue(out.toString().contains("  strategy 'decaying', 3-row window: half_life 0.01 leaves only the latest"
                + " 1 row of the window with a weight above rounding, fewer than the up to 3 eligible assets, so the ewma"
                + " matrix is singular to rounding: no portfolio without bounds can be formed where more assets are"
                + " eligible, and bounded ones rest on 1 row; a half_life of at least 0.04 keeps as many rows as"
                + " assets"), out.toString());
        assertTrue(out.toString().contains("  strategy 'decaying', 4-row window: half_life 0.01"), out.toString());
        out.getBuffer().setLength(0);
        edit("study.yaml", "half_life: 0.01", "half_life: 24");
        assertEquals(0, check(), err.toString());
        assertTrue(!out.toString().contains("with a weight above rounding"), out.toString());
    }

    @Test
    void marketFileNotCoveringTheAssetDates_exitsTwo() {
        write("market.csv", "date,IDX\n2020-01-31,0.01\n2020-02-29,0.01\n2020-04-30,0.01\n");
        edit("study.yaml", "market: IDX", "market: market.csv");
        assertRejectedStartingWith("assets.csv line 4, column 'date': '2020-03-31' has no row in market.csv;"
                + " the market needs a row on every date from ");
    }

    @Test
    void riskFreeGap_exitsTwo() {
        edit("riskfree.csv", "2020-08-31,0.001", "2020-08-31,");
        assertRejectedStartingWith("riskfree.csv line 9, column 'rf': '' is missing; the risk-free needs a value");
    }

    @Test
    void emptyAssetsFile_exitsTwo() {
        write("assets.csv", "");
        assertRejected("assets.csv: the file is empty; expected a header row");
    }

    @Test
    void headerWithoutRows_exitsTwo() {
        write("assets.csv", "date,A01,A02,A03,IDX\r\n");
        assertRejected("assets.csv line 1: the header has no rows below it; expected at least one dated row");
    }

    @Test
    void unknownStudyKey_suggestsTheNearest() {
        edit("study.yaml", "rebalance_every: 1", "rebalance_evry: 1");
        assertRejected("study.yaml line 9, column 3: unknown key 'rebalance_evry' in walkforward; did you mean 'rebalance_every'?");
    }

    @Test
    void reversedBounds_nameTheKeyPath() {
        edit("study.yaml", "bounds: [0, 0.5]", "bounds: [0.5, 0.1]");
        assertRejected("study.yaml line 14, column 14: strategies[0].bounds: [0.5, 0.1] has lower > upper;"
                + " expected [lower, upper] with lower <= upper, such as [0, 0.10]");
    }

    @Test
    void windowOfOne_isRejected() {
        edit("study.yaml", "windows: [3, 4]", "windows: [1]");
        assertRejected("study.yaml line 8, column 13: walkforward.windows[0]: 1 is not allowed; expected a whole number >= 2");
    }

    @Test
    void missingRequiredKey_isNamed() {
        edit("study.yaml", "  assets: assets.csv\n", "");
        assertRejected("study.yaml line 3, column 3: data: missing key 'assets'; it is required");
    }

    /** Three assets with upper bound 0.3: 3 · 0.3 = 0.9 < 1 (Method §5). */
    @Test
    void boundsInfeasibleForTheUniverse_areRejected() {
        edit("study.yaml", "bounds: [0, 0.5]", "bounds: [0, 0.3]");
        assertRejected("study.yaml: strategies[0].bounds [0.0, 0.3] cannot make 3 weights sum to 1;"
                + " expected 3·lower <= 1 <= 3·upper");
    }

    @Test
    void windowLongerThanTheData_isRejected() {
        edit("study.yaml", "windows: [3, 4]", "windows: [3, 12]");
        assertRejected("study.yaml: walkforward.windows: the longest window (12 rows) needs at least 14 rows of data"
                + " (a window plus two rows to hold: a spread of returns needs two), but the data have 8 (2020-01-31 to 2020-08-31)");
    }

    /** The run refuses this study before it starts (Method §11), so check must refuse it too. */
    @Test
    void nonlinearShrinkageOnAWindowTooShortForTheAssets_isRejectedAsByRun() {
        edit("study.yaml", "    risk: single-index\n", "    risk: nonlinear-shrinkage\n");
        assertRejected("study.yaml: strategies[0] (risk: nonlinear-shrinkage) with window 3 and up to 3 assets:"
                + " with more assets than L - 1 the formula needs a window of at least 13 rows;"
                + " lengthen walkforward.windows");
    }

    @Test
    void bothRebalanceKeys_areRejected() {
        edit("study.yaml", "rebalance_every: 1", "rebalance_every: 1\n  rebalance: month-end");
        assertRejected("study.yaml line 10, column 14: walkforward.rebalance: 'month-end' is given together with"
                + " walkforward.rebalance_every; expected one of the two");
    }

    @Test
    void missingStudyFile_exitsTwo() {
        int code = SigmawalkCommand.commandLine().setErr(new PrintWriter(err, true)).setOut(new PrintWriter(out, true))
                .execute("check", dir.resolve("absent.yaml").toString());
        assertEquals(SigmawalkCommand.EXIT_BAD_INPUT, code);
        assertTrue(err.toString().startsWith("sigmawalk: absent.yaml: study file not found"), err.toString());
    }
}
