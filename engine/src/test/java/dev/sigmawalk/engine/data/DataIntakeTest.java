package dev.sigmawalk.engine.data;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Data that load: spreadsheet exports, prices, rate conversion, warnings, cuts, side files. */
class DataIntakeTest {
    /** Decimal text to double and one division: exact up to the last bit of a double. */
    private static final double ONE_ULP_SCALE = 1e-15;
    /** An invented index's levels on the month-ends of 2020 through September, for price fixtures. */
    private static final String PRICE_MARKET = "date,IDX\n2020-01-31,100\n2020-02-29,101\n2020-03-31,99\n"
            + "2020-04-30,102\n2020-05-31,103\n2020-06-30,101\n2020-07-31,104\n2020-08-31,105\n2020-09-30,103\n";

    @TempDir
    Path dir;

    @Test
    void spreadsheetExport_withBomCrlfQuotesAndSpaces_readsTheSameValues() {
        String export = "\uFEFF\"date\",\"A01\", \"A02\" ,A03\r\n"
                + "2020-01-31,\"0.01\", 0.02 ,-0.01\r\n"
                + "\r\n"
                + "\"2020-02-29\",0.02,-0.01,0.00\r\n"
                + StudyFixture.ASSETS.substring(StudyFixture.ASSETS.indexOf("2020-03-31")).replace("\n", "\r\n");
        StudyData plain = new StudyFixture(dir).load();
        StudyData exported = new StudyFixture(dir).write("assets.csv", export).load();
        assertEquals(plain.panel().assets(), exported.panel().assets());
        for (int t = 0; t < plain.panel().rows(); t++) {
            for (int j = 0; j < 3; j++) {
                assertEquals(plain.panel().value(t, j), exported.panel().value(t, j), 0.0, "row " + t + " asset " + j);
            }
        }
        assertEquals(0.02, exported.panel().value(0, 1), 0.0);
    }

    /** Line numbers count the blank line a spreadsheet may leave: the bad cell sits on line 5. */
    @Test
    void blankLine_stillCountsForLineNumbers() {
        String text = "date,A01\r\n2020-01-31,0.01\r\n\r\n2020-02-29,0.02\r\n2020-03-31,x\r\n";
        InputException e = org.junit.jupiter.api.Assertions.assertThrows(InputException.class,
                () -> new StudyFixture(dir).write("assets.csv", text).load());
        assertEquals(5, e.location().line(), e.getMessage());
    }

    /**
     * Hand computation: prices 100, 110, 121 give 110/100 − 1 = 0.1 and 121/110 − 1 = 0.1; a
     * missing price on 2020-04-30 leaves that row and the next without a return; 99/121 − 1 after.
     * The panel starts at the second date.
     */
    @Test
    void prices_becomeReturnsFromConsecutiveRows() {
        String prices = "date,P1,P2\n2020-01-31,100,50\n2020-02-29,110,50\n2020-03-31,121,55\n"
                + "2020-04-30,,60\n2020-05-31,130,66\n2020-06-30,143,66\n2020-07-31,130,60\n2020-08-31,117,54\n";
        String market = "date,IDX\n2020-01-31,100\n2020-02-29,101\n2020-03-31,102\n2020-04-30,103\n"
                + "2020-05-31,104\n2020-06-30,105\n2020-07-31,106\n2020-08-31,107\n";
        StudyData d = new StudyFixture(dir).write("assets.csv", prices).write("market.csv", market)
                .edit("study.yaml", "values: returns", "values: prices").load();
        ReturnPanel p = d.panel();
        assertEquals(7, p.rows());
        assertEquals(LocalDate.of(2020, 2, 29), p.date(0));
        assertEquals(0.1, p.value(0, 0), ONE_ULP_SCALE);
        assertEquals(0.1, p.value(1, 0), ONE_ULP_SCALE);
        assertTrue(Double.isNaN(p.value(2, 0)), "no price on 2020-04-30");
        assertTrue(Double.isNaN(p.value(3, 0)), "no return after a missing price");
        assertEquals(0.1, p.value(4, 0), ONE_ULP_SCALE);
        assertEquals(0.0, p.value(0, 1), 0.0);
        assertEquals(0.01, p.market(0), ONE_ULP_SCALE);
        assertEquals(0.001, p.riskFree(0), 0.0);
    }

    /** (1 + 0.05)^(1/12) − 1 = 0.0040741237836483535, computed with Python 3: 1.05**(1/12)-1. */
    @Test
    void annualRiskFree_isCompoundedToAPeriodRate() {
        ReturnPanel p = new StudyFixture(dir).edit("study.yaml", "riskfree: riskfree.csv", "riskfree: 0.05").load().panel();
        assertEquals(12, p.periodsPerYear());
        for (int t = 0; t < p.rows(); t++) {
            assertEquals(0.0040741237836483535, p.riskFree(t), 1e-18, "row " + t);
        }
    }

    @Test
    void riskFreeColumnOfTheAssetsFile_isNotAnAsset() {
        String assets = StudyFixture.ASSETS.replace("date,A01,A02,A03", "date,A01,A02,A03,T-bill")
                .replaceAll("(?m)^(2020-\\d\\d-\\d\\d,[^\\n]*)$", "$1,0.002");
        ReturnPanel p = new StudyFixture(dir).write("assets.csv", assets)
                .edit("study.yaml", "riskfree: riskfree.csv", "riskfree: T-bill").load().panel();
        assertEquals(List.of("A01", "A02", "A03"), p.assets());
        assertEquals(0.002, p.riskFree(7), 0.0);
    }

    /**
     * A market column that is a rate with one rounding wiggle (0.01 and 0.0100000001) has a
     * standard deviation of 3.54e-11 per period, against a median of 0.0160 for the fixture's
     * assets (both from Python 3's statistics.stdev): warned, with both numbers. The fixture's own market
     * (sd 0.0108) draws no warning.
     */
    @Test
    void marketThatBarelyVaries_warns() {
        String market = "date,IDX\n2020-01-31,0.01\n2020-02-29,0.01\n2020-03-31,0.0100000001\n2020-04-30,0.01\n"
                + "2020-05-31,0.01\n2020-06-30,0.01\n2020-07-31,0.01\n2020-08-31,0.01\n";
        List<String> warnings = new StudyFixture(dir).write("market.csv", market).load().warnings();
        String w = warnings.stream().filter(s -> s.contains("barely varies")).findFirst().orElseThrow();
        assertTrue(w.startsWith("the market 'IDX' barely varies: its returns' standard deviation is 3.54e-11 per period"
                + " against a median of 0.0160 for the assets"), w);
        assertFalse(new StudyFixture(dir).load().warnings().stream().anyMatch(s -> s.contains("barely varies")));
    }

    @Test
    void marketEqualToTheAssetMean_warns() {
        String market = "date,EW\n2020-01-31,0.006666666666666667\n2020-02-29,0.0033333333333333335\n"
                + "2020-03-31,0\n2020-04-30,0.016666666666666666\n2020-05-31,0.006666666666666667\n"
                + "2020-06-30,0\n2020-07-31,0.016666666666666666\n2020-08-31,0.006666666666666667\n";
        List<String> warnings = new StudyFixture(dir).write("market.csv", market).load().warnings();
        assertTrue(warnings.stream().anyMatch(w -> w.contains("equals the mean of the assets' returns in every row")),
                warnings.toString());
        assertFalse(new StudyFixture(dir).load().warnings().stream().anyMatch(w -> w.contains("mean of the assets")),
                "an independent market does not warn");
    }

    @Test
    void emptyAssetColumn_isDroppedWithAWarning() {
        String assets = StudyFixture.ASSETS.replace("date,A01,A02,A03", "date,A01,A02,A03,GHOST")
                .replaceAll("(?m)^(2020-\\d\\d-\\d\\d,[^\\n]*)$", "$1,");
        StudyData d = new StudyFixture(dir).write("assets.csv", assets).load();
        assertEquals(List.of("A01", "A02", "A03"), d.panel().assets());
        assertEquals(List.of("assets.csv column 'GHOST' has no value; the asset is left out"), d.warnings());
    }

    @Test
    void implausibleReturn_warnsWithLineAndColumn() {
        List<String> w = new StudyFixture(dir).edit("assets.csv", "2020-04-30,0.04", "2020-04-30,6.5").load().warnings();
        assertEquals(1, w.size(), w.toString());
        assertTrue(w.get(0).startsWith("assets.csv line 5, column 'A01': a return of 6.5 is above +500 %"), w.get(0));
    }

    /**
     * Rows of nothing but commas, as a spreadsheet writes below its data (and sometimes between
     * blocks of it), carry no cell: they are skipped like blank lines, and the lines after them
     * keep the numbers an editor shows (the faulty cell below sits on line 11).
     */
    @Test
    void rowsOfOnlyCommas_areSkippedLikeBlankLines() {
        String assets = StudyFixture.ASSETS.replace("2020-05-31,", ",,,\n , ,\n2020-05-31,") + ",,,\n,,,\n";
        ReturnPanel plain = new StudyFixture(dir).load().panel();
        ReturnPanel exported = new StudyFixture(dir).write("assets.csv", assets).load().panel();
        assertArrayEquals(plain.dates(), exported.dates());
        assertArrayEquals(plain.rawReturns(), exported.rawReturns());
        InputException e = assertThrows(InputException.class, () -> new StudyFixture(dir)
                .write("assets.csv", assets.replace("2020-08-31,0.03", "2020-08-31,x")).load());
        assertTrue(e.getMessage().startsWith("assets.csv line 11, column 'A01': 'x' is not a number"), e.getMessage());
    }

    /**
     * Empty columns after the data make empty header cells, and a spreadsheet writes the same
     * empty cells on every row (or stops the row before them): the file is read without them, the
     * same panel as the plain file. A value under such a column is refused at its line and cell.
     */
    @Test
    void trailingEmptyHeaderCells_areReadPast_unlessARowHasAValueThere() {
        ReturnPanel plain = new StudyFixture(dir).load().panel();
        String assets = StudyFixture.ASSETS.replace("date,A01,A02,A03", "date,A01,A02,A03,,")
                .replaceAll("(?m)^(2020-0[1-5]-\\d\\d,[^\\n]*)$", "$1,,")
                .replaceAll("(?m)^(2020-0[6-9]-\\d\\d,[^\\n]*)$", "$1, ,");
        ReturnPanel exported = new StudyFixture(dir).write("assets.csv", assets).load().panel();
        assertEquals(plain.assets(), exported.assets());
        assertArrayEquals(plain.dates(), exported.dates());
        assertArrayEquals(plain.rawReturns(), exported.rawReturns());
        String stray = assets.replaceFirst("(?m)^(2020-03-31,[^\\n]*),,$", "$1,,0.5");
        InputException e = assertThrows(InputException.class, () -> new StudyFixture(dir).write("assets.csv", stray).load());
        assertEquals("assets.csv line 4: cell 6 holds '0.5' but the header names no column there (it names 4 cells,"
                + " then 2 empty); name the column or delete the value", e.getMessage());
    }

    /**
     * Month-end dates: the gaps 29, 31, 30, 31, 30, 31, 31 days have the median 31, hence 12 a year
     * (Method §1). 252 (a daily figure) and 4 are more than twice off and warn; 13 and 6 are within
     * a factor of two and are taken as meant.
     */
    @Test
    void periodsPerYearFarFromTheDates_warns() {
        StudyFixture f = new StudyFixture(dir)
                .edit("study.yaml", "  riskfree: riskfree.csv", "  riskfree: riskfree.csv\n  periods_per_year: 252");
        assertEquals(List.of("data.periods_per_year: 252 is given, but the dates of assets.csv are a median 31 days"
                + " apart, which is 12 periods a year; every annualised figure (mean return, volatility, Sharpe ratio,"
                + " CAGR, tracking error) and the conversion of an annual risk-free rate use the given 252: check the"
                + " value, or leave the key out to infer it"), f.load().warnings());
        f.edit("study.yaml", "periods_per_year: 252", "periods_per_year: 4");
        assertEquals(1, f.load().warnings().size(), "4 against 12");
        for (String near : new String[] {"13", "6"}) {
            f.edit("study.yaml", "periods_per_year: " + (near.equals("13") ? "4" : "13"), "periods_per_year: " + near);
            assertEquals(List.of(), f.load().warnings(), near + " against 12");
        }
    }

    /** A market file of index levels beside decimal returns: refused at its first level, as the assets' would be. */
    @Test
    void marketOfPricesBesideReturns_isRefused() {
        String levels = "date,IDX\n2020-01-31,1000\n2020-02-29,1004\n2020-03-31,992\n2020-04-30,1013\n"
                + "2020-05-31,1016\n2020-06-30,1010\n2020-07-31,1025\n2020-08-31,1032\n";
        InputException e = assertThrows(InputException.class, () -> new StudyFixture(dir).write("market.csv", levels).load());
        assertEquals("market.csv line 2, column 'IDX': 100 % of the market's returns are larger than 0.5 in size (this one"
                + " is 1000.0), so the market looks like prices or percent; expected decimal returns (0.012 for 1.2 %),"
                + " as data.values: returns says for the assets and the market alike: divide percent by 100, or give"
                + " prices in both with values: prices", e.getMessage());
    }

    /** A04 is A02 pasted again, gaps and all; A05 differs from A02 in one row only and is no repeat. */
    @Test
    void columnPastedTwice_warnsNamingBoth() {
        String[] lines = StudyFixture.ASSETS.strip().split("\n");
        StringBuilder assets = new StringBuilder(lines[0]).append(",A04,A05\n");
        for (int i = 1; i < lines.length; i++) {
            String a02 = lines[i].split(",", -1)[2];
            String a05 = i == 5 ? "0.0301" : a02;
            assets.append(lines[i]).append(',').append(a02).append(',').append(a05).append('\n');
        }
        String text = assets.toString().replace("2020-02-29,0.02,-0.01,0.00,-0.01,-0.01", "2020-02-29,0.02,,0.00,,-0.01");
        List<String> w = new StudyFixture(dir).write("assets.csv", text).load().warnings();
        assertEquals(List.of("assets.csv column 'A04' holds the same return as column 'A02' on every row (a column pasted"
                + " twice?): the sample covariance is singular with both, and every model and equal weight count that"
                + " asset twice; remove one of them"), w);
    }

    /** A bad tick in the index moves every beta; it draws the warning an asset's would. */
    @Test
    void implausibleMarketReturn_warnsWithLineAndColumn() {
        List<String> w = new StudyFixture(dir).edit("market.csv", "2020-04-30,0.021", "2020-04-30,50").load().warnings();
        assertTrue(w.contains("market.csv line 5, column 'IDX': a market return of 50.0 is above +500 % in one period;"
                + " check that returns are decimals, not percent"), w.toString());
    }

    /**
     * A 10-for-1 split the prices do not adjust for: 20 then 2 is a return of 2/20 − 1 = −0.9,
     * which the run would otherwise take as a real loss of 90 %.
     */
    @Test
    void unadjustedSplitInPrices_warnsAtTheLaterPrice() {
        List<String> w = new StudyFixture(dir)
                .prices("date,A01,A02\n2020-01-31,10,20\n2020-02-29,11,21\n2020-03-31,12,2\n"
                        + "2020-04-30,11,2.1\n2020-05-31,12,2.2\n2020-06-30,13,2.1\n2020-07-31,12,2.3\n"
                        + "2020-08-31,13,2.2\n2020-09-30,14,2.4\n",
                        PRICE_MARKET)
                .load().warnings();
        assertEquals(List.of("assets.csv line 4, column 'A02': a return of " + (2.0 / 21 - 1) + " is a fall of 75 % or"
                + " more in one period; check for a split or a change of unit that the prices do not adjust for, or a"
                + " bad value"), w);
    }

    @Test
    void collapsedReturns_areCountedPerColumn() {
        List<String> w = new StudyFixture(dir).edit("assets.csv", "2020-03-31,-0.03", "2020-03-31,-0.8")
                .edit("assets.csv", "2020-06-30,-0.02", "2020-06-30,-0.75").load().warnings();
        assertEquals(List.of("assets.csv line 4, column 'A01': a return of -0.8 is a fall of 75 % or more in one period"
                + " (2 such rows in this column); check for a split or a change of unit that the returns do not adjust"
                + " for, or a bad value"), w);
    }

    /**
     * A price that stops updating: A02 repeats 21 from 2020-03-31 to 2020-08-31, returns exactly 0
     * in the five rows 2020-04-30 .. 2020-08-31, more than half the 6-row window (3 rows), while
     * a single zero (A01 at 2020-03-31) is no warning. Lines: the header is line 1, 2020-04-30
     * is line 5.
     */
    @Test
    void stalePrice_warnsOfTheRunOfZeroReturns() {
        List<String> w = new StudyFixture(dir)
                .prices("date,A01,A02\n2020-01-31,10,20\n2020-02-29,11,20.5\n2020-03-31,11,21\n"
                        + "2020-04-30,12,21\n2020-05-31,11.5,21\n2020-06-30,12.5,21\n2020-07-31,12,21\n"
                        + "2020-08-31,13,21\n2020-09-30,13.5,21.4\n",
                        PRICE_MARKET)
                .edit("study.yaml", "windows: [3]", "windows: [6]")
                .load().warnings();
        assertEquals(List.of("assets.csv column 'A02': its return is exactly 0 in 5 consecutive rows, 2020-04-30 to"
                + " 2020-08-31 (lines 5 to 9), at least half of the shortest window: a stale price, or zeros standing"
                + " for missing values; every window holding them understates its risk, so minimum-variance weights"
                + " favour it: leave the cells empty where the asset had no price"), w);
    }

    /** The run's limit: half the shortest window rounded up, never below 3 rows. */
    @Test
    void staleRunLimit_isHalfTheShortestWindow() {
        assertEquals(12, IntakeChecks.staleRun(List.of(36, 24, 60)));
        assertEquals(13, IntakeChecks.staleRun(List.of(25)));
        assertEquals(3, IntakeChecks.staleRun(List.of(2)));
    }

    /** A rate of −1 a period would make every excess return r + 1; (1 − 1)^12 − 1 = −100 % a year. */
    @Test
    void riskFreeOfMinusOnePerPeriod_warns() {
        List<String> w = new StudyFixture(dir).edit("riskfree.csv", "2020-03-31,0.001", "2020-03-31,-1").load().warnings();
        assertEquals(List.of("riskfree.csv line 4, column 'rf': a risk-free rate of -1.0 per period is below -50 % a year;"
                + " rates must be per period and decimal"), w);
    }

    /** A mildly negative rate, as some bill markets paid, is no warning: 0.9995^12 − 1 ≈ −0.6 % a year. */
    @Test
    void mildlyNegativeRiskFree_doesNotWarn() {
        List<String> w = new StudyFixture(dir).edit("riskfree.csv", "2020-03-31,0.001", "2020-03-31,-0.0005").load().warnings();
        assertEquals(List.of(), w);
    }

    /**
     * The fixture's market times 30 (an index in units thirty times the assets'): its standard
     * deviation is 0.32269 against the assets' median 0.016036, 20.12 times it; times 10 gives
     * 6.71 times, under the limit of 10 (numpy.std with ddof=1 on the fixture's columns).
     */
    @Test
    void marketVaryingFarMoreThanTheAssets_warns() {
        String times30 = "date,IDX\n2020-01-31,0.33\n2020-02-29,0.12\n2020-03-31,-0.36\n2020-04-30,0.63\n"
                + "2020-05-31,0.09\n2020-06-30,-0.18\n2020-07-31,0.45\n2020-08-31,0.21\n";
        List<String> w = new StudyFixture(dir).write("market.csv", times30).load().warnings();
        assertEquals(List.of("the market 'IDX' varies far more than the assets: its returns' standard deviation is 0.323"
                + " per period against a median of 0.0160 for the assets (20.1 times it), while an index varies less"
                + " than a typical member; betas measured against it are too small by about that factor: check that"
                + " the market holds decimal returns, not percent, in the units of the assets"), w);
        String times10 = "date,IDX\n2020-01-31,0.11\n2020-02-29,0.04\n2020-03-31,-0.12\n2020-04-30,0.21\n"
                + "2020-05-31,0.03\n2020-06-30,-0.06\n2020-07-31,0.15\n2020-08-31,0.07\n";
        assertEquals(List.of(), new StudyFixture(dir).write("market.csv", times10).load().warnings());
    }

    /** 0.07 a month compounds to 1.07^12 − 1 ≈ 1.252 (125 % a year, hand computation), above 100 %. */
    @Test
    void implausibleRiskFree_warns() {
        List<String> w = new StudyFixture(dir).edit("riskfree.csv", "2020-03-31,0.001", "2020-03-31,0.07").load().warnings();
        assertEquals(1, w.size(), w.toString());
        assertTrue(w.get(0).startsWith("riskfree.csv line 4, column 'rf': a risk-free rate of 0.07 per period"), w.get(0));
    }

    @Test
    void endDate_cutsTheRowsAfterIt() {
        StudyData d = new StudyFixture(dir).edit("study.yaml", "rebalance_every: 1", "rebalance_every: 1\n  end: 2020-06-15").load();
        assertEquals(5, d.panel().rows());
        assertEquals(LocalDate.of(2020, 5, 31), d.panel().date(4));
        assertEquals(4, d.schedule().lastRow());
    }

    @Test
    void coverage_reportsFirstLastAndMissingRows() {
        StudyData d = new StudyFixture(dir).edit("assets.csv", "2020-01-31,0.01", "2020-01-31,")
                .edit("assets.csv", "2020-04-30,0.04", "2020-04-30,").load();
        AssetCoverage a01 = d.coverage().get(0);
        assertEquals(new AssetCoverage("A01", LocalDate.of(2020, 2, 29), LocalDate.of(2020, 8, 31), 6, 2, 1), a01);
        assertFalse(d.coverage().get(1).hasMissingRows());
    }

    /** A sectors file of another universe would turn every sector model into the single-index model without a word. */
    @Test
    void sectorsFileNamingNoAssetOfTheUniverse_isRefused() {
        StudyFixture f = new StudyFixture(dir)
                .write("sectors.csv", "asset,sector\nZ98,Harbour\nZ99,Orchard\n")
                .edit("study.yaml", "  riskfree: riskfree.csv", "  riskfree: riskfree.csv\n  sectors: sectors.csv");
        InputException e = assertThrows(InputException.class, f::load);
        assertEquals("sectors.csv: none of the 2 assets named here is in the universe of assets.csv (the first is 'Z98',"
                + " the universe's first is 'A01'); expected the asset names of assets.csv", e.getMessage());
    }

    /**
     * A03 alone in 'Orchard': with factors: sectors its sector factor is its own return, fitted
     * exactly (Method §11), which the user is told; a study without a sector model is not.
     */
    @Test
    void sectorOfOneAsset_warns_onlyWithTheSectorModel() {
        StudyFixture f = new StudyFixture(dir)
                .write("sectors.csv", "asset,sector\nA01,Harbour\nA02,Harbour\nA03,Orchard\n")
                .edit("study.yaml", "  riskfree: riskfree.csv", "  riskfree: riskfree.csv\n  sectors: sectors.csv");
        assertEquals(List.of(), f.load().warnings(), "no sector model");
        f.edit("study.yaml", "    risk: sample", "    risk: multi-index\n    factors: sectors");
        assertEquals(List.of("sectors.csv: sector 'Orchard' (A03) holds a single asset of the universe; with factors:"
                + " sectors its factor is that asset's own return, which the multi-index model fits exactly: the asset"
                + " gets no residual risk there and is left out of that model's residual diagnostics and sector maps;"
                + " give it a sector with other assets to estimate its own risk"), f.load().warnings());
    }

    /**
     * Alphas in percent: 1.5 a month is 2.5^12 − 1 ≈ 5 960 % a year, and −0.2 a month is
     * 0.8^12 − 1 ≈ −93 % a year (hand computation); 0.002 a month (2.4 % a year) is no warning.
     */
    @Test
    void implausibleAlphas_warnAtTheirLines() {
        StudyFixture f = new StudyFixture(dir)
                .write("alphas.csv", "date,asset,alpha\n2020-03-31,A01,0.002\n2020-03-31,A02,1.5\n2020-04-30,A03,-0.2\n")
                .edit("study.yaml", "    risk: sample\n    objective: min-variance",
                        "    risk: single-index\n    objective: max-sharpe\n    alphas: alphas.csv");
        assertEquals(List.of("alphas.csv line 3, column 'alpha': the alpha of 1.5 for 'A02' on 2020-03-31 is above 100 % a"
                        + " year as a per-period return; alphas must be per period and decimal (0.001 for 0.1 % a period),"
                        + " not percent or annual",
                "alphas.csv line 4, column 'alpha': the alpha of -0.2 for 'A03' on 2020-04-30 is below -50 % a year as a"
                        + " per-period return; alphas must be per period and decimal (0.001 for 0.1 % a period), not"
                        + " percent or annual"), f.load().warnings());
        f.write("alphas.csv", "date,asset,alpha\n2020-03-31,A01,0.002\n2020-03-31,A02,-0.001\n");
        assertEquals(List.of(), f.load().warnings());
    }

    @Test
    void sectorsAndAlphas_areReadForTheLoadedAssets() {
        StudyFixture f = new StudyFixture(dir)
                .write("sectors.csv", "asset,sector\nA01,Harbour\nA02,Harbour\nZ99,Orchard\n")
                .write("alphas.csv", "date,asset,alpha\n2020-03-31,A01,0.002\n2020-01-31,A01,0.001\n2020-02-29,A02,-0.0005\n")
                .edit("study.yaml", "  riskfree: riskfree.csv", "  riskfree: riskfree.csv\n  sectors: sectors.csv")
                .edit("study.yaml", "    risk: sample\n    objective: min-variance",
                        "    risk: single-index\n    objective: max-sharpe\n    alphas: alphas.csv");
        StudyData d = f.load();
        assertEquals(Map.of("A01", "Harbour", "A02", "Harbour"), d.sectors());
        assertTrue(d.warnings().contains("sectors.csv gives no sector for 1 of 3 assets: A03"), d.warnings().toString());
        assertTrue(d.warnings().contains("sectors.csv gives a sector for 1 asset not in the universe, which is ignored:"
                + " Z99"), d.warnings().toString());
        AlphaTable alphas = d.alphasFor(f.study().strategies().get(0));
        assertEquals(0.0, alphas.latest("A01", LocalDate.of(2019, 12, 31)), 0.0, "before the first alpha");
        assertEquals(0.001, alphas.latest("A01", LocalDate.of(2020, 1, 31)), 0.0, "on its date");
        assertEquals(0.001, alphas.latest("A01", LocalDate.of(2020, 3, 30)), 0.0, "latest before");
        assertEquals(0.002, alphas.latest("A01", LocalDate.of(2020, 12, 31)), 0.0, "latest of all");
        assertEquals(-0.0005, alphas.latest("A02", LocalDate.of(2020, 5, 31)), 0.0);
        assertEquals(0.0, alphas.latest("A03", LocalDate.of(2020, 5, 31)), 0.0, "asset without alphas");
        assertEquals(5, d.fingerprints().size(), "assets, market, risk-free, sectors, alphas: " + d.fingerprints());
    }

    @Test
    void repeatedAlpha_isAnError() {
        StudyFixture f = new StudyFixture(dir).write("alphas.csv", "date,asset,alpha\n2020-01-31,A01,0.001\n2020-01-31,A01,0.002\n");
        InputException e = org.junit.jupiter.api.Assertions.assertThrows(InputException.class,
                () -> AlphaTable.read(f.dir().resolve("alphas.csv")));
        assertEquals("alphas.csv line 3, column 'date': '2020-01-31' repeats an alpha for asset 'A01' on that date", e.getMessage());
    }

    /** An alpha is a per-period return, held to the same bounds as a return (Method §1). */
    @Test
    void alphaBeyondAnyReturn_isAnErrorAtItsCell() {
        StudyFixture f = new StudyFixture(dir).write("alphas.csv", "date,asset,alpha\n2020-01-31,A01,0.001\n2020-02-29,A01,1e300\n");
        InputException e = org.junit.jupiter.api.Assertions.assertThrows(InputException.class,
                () -> AlphaTable.read(f.dir().resolve("alphas.csv")));
        assertEquals("alphas.csv line 3, column 'alpha': '1e300' is an alpha above 1e12 per period, more than any"
                + " asset earns; expected a per-period decimal alpha such as 0.001", e.getMessage());
    }

    @Test
    void alphaBelowMinusOne_isAnErrorAtItsCell() {
        StudyFixture f = new StudyFixture(dir).write("alphas.csv", "date,asset,alpha\n2020-01-31,A01,-2.5\n");
        InputException e = org.junit.jupiter.api.Assertions.assertThrows(InputException.class,
                () -> AlphaTable.read(f.dir().resolve("alphas.csv")));
        assertEquals("alphas.csv line 2, column 'alpha': '-2.5' is an alpha below -1 per period, a loss of more than"
                + " everything; expected a per-period decimal alpha such as 0.001 (if the file holds percent,"
                + " divide every value by 100)", e.getMessage());
    }

    /**
     * The 22-byte file "date,A\n2020-01-31,0.5\n" has SHA-256
     * dcb3f09cee94e6b1144390ad0fdc8f73995d323ff8b5955df9e5be57ec529f51, computed with GNU
     * coreutils {@code sha256sum}.
     */
    @Test
    void fingerprint_matchesSha256sum() throws Exception {
        Path file = dir.resolve("h.csv");
        java.nio.file.Files.writeString(file, "date,A\n2020-01-31,0.5\n");
        FileFingerprint f = FileFingerprint.of(file);
        assertEquals("dcb3f09cee94e6b1144390ad0fdc8f73995d323ff8b5955df9e5be57ec529f51", f.sha256());
        assertEquals(22, f.bytes());
    }
}
