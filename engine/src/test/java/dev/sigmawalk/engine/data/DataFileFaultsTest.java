package dev.sigmawalk.engine.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Data files as real exports arrive: other encodings, binary files, folders, unclosed quotes,
 * impossible or percent-scaled values, names a spreadsheet would run as formulas, alphas for
 * assets that are not there. Every fault is located (file, line, column where there is one).
 * Line numbers were counted by hand in {@link StudyFixture}.
 */
class DataFileFaultsTest {
    private static final Charset WINDOWS_1252 = Charset.forName("windows-1252");

    @TempDir
    Path dir;

    private InputException loadFails(StudyFixture f) {
        return assertThrows(InputException.class, f::load);
    }

    private void writeBytes(String name, byte[] bytes) throws IOException {
        Files.write(dir.resolve(name), bytes);
    }

    @Test
    void windows1252File_isRefusedWithLineAndHint() throws IOException {
        StudyFixture f = new StudyFixture(dir);
        writeBytes("assets.csv", StudyFixture.ASSETS.replace("2020-05-31,0.01,0.03,-0.02", "2020-05-31,0.01,n\u00e9ant,-0.02")
                .getBytes(WINDOWS_1252));
        InputException e = loadFails(f);
        assertEquals(6, e.location().line(), e.getMessage());
        assertTrue(e.getMessage().startsWith("assets.csv line 6: the file is not UTF-8: byte 0xE9 in '2020-05-31,0.01,n\u00e9ant"),
                e.getMessage());
        assertTrue(e.getMessage().contains("looks like Windows-1252 or Latin-1 (ISO-8859-1) (there it is '\u00e9')"),
                e.getMessage());
        assertTrue(e.getMessage().contains("re-save the file as UTF-8"), e.getMessage());
    }

    /** 0x92 is a right single quote in Windows-1252 and a control code in Latin-1, so only the first fits. */
    @Test
    void windows1252OnlyByte_isNamedAsWindows1252() throws IOException {
        StudyFixture f = new StudyFixture(dir);
        writeBytes("sectors.csv", "asset,sector\nA01,Harbour\u2019s\n".getBytes(WINDOWS_1252));
        f.edit("study.yaml", "  riskfree: riskfree.csv", "  riskfree: riskfree.csv\n  sectors: sectors.csv");
        InputException e = loadFails(f);
        assertTrue(e.getMessage().startsWith("sectors.csv line 2: the file is not UTF-8: byte 0x92"), e.getMessage());
        assertTrue(e.getMessage().contains("it looks like Windows-1252 (there it is '\u2019')"), e.getMessage());
    }

    @Test
    void utf16File_isRefusedNamingUtf16() throws IOException {
        StudyFixture f = new StudyFixture(dir);
        writeBytes("market.csv", ("\uFEFF" + StudyFixture.MARKET).getBytes(StandardCharsets.UTF_16LE));
        InputException e = loadFails(f);
        assertTrue(e.getMessage().startsWith("market.csv line 1: the file is UTF-16 text (it starts with a UTF-16"
                + " byte-order mark"), e.getMessage());
    }

    @Test
    void utf16FileWithoutByteOrderMark_isRefusedNamingUtf16() throws IOException {
        StudyFixture f = new StudyFixture(dir);
        writeBytes("market.csv", StudyFixture.MARKET.getBytes(StandardCharsets.UTF_16BE));
        InputException e = loadFails(f);
        assertTrue(e.getMessage().startsWith("market.csv line 1: the file looks like UTF-16 text without a byte-order mark"),
                e.getMessage());
    }

    @Test
    void utf8FileWithByteOrderMarkAndCrlf_isRead() {
        StudyFixture f = new StudyFixture(dir).write("assets.csv", "\uFEFF" + StudyFixture.ASSETS.replace("\n", "\r\n"));
        assertEquals(List.of("A01", "A02", "A03"), f.load().panel().assets());
    }

    @Test
    void workbookGivenAsCsv_isRefusedAsAZipArchive() throws IOException {
        StudyFixture f = new StudyFixture(dir);
        writeBytes("assets.csv", new byte[] {'P', 'K', 3, 4, 20, 0, 6, 0, 8, 0, 0, 0, 33, 0});
        InputException e = loadFails(f);
        assertTrue(e.getMessage().startsWith("assets.csv line 1: the file is a zip archive, such as a spreadsheet workbook"),
                e.getMessage());
    }

    @Test
    void binaryFile_isRefusedAsBinary() throws IOException {
        StudyFixture f = new StudyFixture(dir);
        byte[] bytes = StudyFixture.RISK_FREE.getBytes(StandardCharsets.UTF_8);
        bytes[40] = 0;
        writeBytes("riskfree.csv", bytes);
        InputException e = loadFails(f);
        assertTrue(e.getMessage().startsWith("riskfree.csv line 1: the file holds NUL bytes, so it is binary"), e.getMessage());
    }

    @Test
    void controlByteInsideText_isRefusedAtItsLine() {
        StudyFixture f = new StudyFixture(dir).edit("assets.csv", "2020-03-31,-0.03", "2020-03-31,-0.03\u0007");
        InputException e = loadFails(f);
        assertEquals("assets.csv line 4: the file holds the control byte 0x07, so it is binary or damaged, not CSV text;"
                + " expected a UTF-8 text file", e.getMessage());
    }

    @Test
    void folderGivenAsDataFile_isRefusedAsAFolder() throws IOException {
        StudyFixture f = new StudyFixture(dir);
        Files.createDirectory(dir.resolve("rates"));
        f.edit("study.yaml", "riskfree: riskfree.csv", "riskfree: rates/");
        InputException e = loadFails(f);
        assertTrue(e.getMessage().startsWith("rates: is a folder"), e.getMessage());
        assertTrue(e.getMessage().endsWith("expected a data file"), e.getMessage());
    }

    @Test
    void unclosedQuote_isReportedAtTheLineWhereItOpened() {
        StudyFixture f = new StudyFixture(dir).write("sectors.csv", "asset,sector\nA01,Harbour\nA02,\"Orchard\nA03,Quay\n"
                + "A04,Quay\nA05,Quay\n")
                .edit("study.yaml", "  riskfree: riskfree.csv", "  riskfree: riskfree.csv\n  sectors: sectors.csv");
        InputException e = loadFails(f);
        assertEquals("sectors.csv line 3: a quote opens a cell here and is not closed on this line (it never closes);"
                + " expected a closing quote before the end of the line, or no quote", e.getMessage());
    }

    @Test
    void quoteClosedLinesLater_isReportedAtTheLineWhereItOpened() {
        StudyFixture f = new StudyFixture(dir).write("sectors.csv", "asset,sector\nA01,Harbour\nA02,\"Orchard\nA03,Quay\n"
                + "A04,Quay\"\nA05,Quay\n")
                .edit("study.yaml", "  riskfree: riskfree.csv", "  riskfree: riskfree.csv\n  sectors: sectors.csv");
        InputException e = loadFails(f);
        assertTrue(e.getMessage().startsWith("sectors.csv line 3: a quote opens a cell here and is not closed on this line"
                + " (the next quote is on line 5)"), e.getMessage());
    }

    @Test
    void returnBelowMinusOne_isRefusedAtItsCellWithThePercentHint() {
        InputException e = loadFails(new StudyFixture(dir).edit("assets.csv", "2020-03-31,-0.03", "2020-03-31,-1.5"));
        assertEquals(4, e.location().line());
        assertEquals("A01", e.location().column());
        assertTrue(e.getMessage().startsWith("assets.csv line 4, column 'A01': '-1.5' is a return below -1"), e.getMessage());
        assertTrue(e.getMessage().endsWith("if the file holds percent, divide every value by 100"), e.getMessage());
    }

    /**
     * A return so large that its fourth power overflows used to end the run in a non-finite
     * statistic (exit 1); it is refused at its cell instead, with the prices hint. 1e12 itself
     * passes (with the warning every return above +500 % draws).
     */
    @Test
    void absurdlyLargeReturn_isRefusedAtItsCell() {
        InputException e = loadFails(new StudyFixture(dir).edit("assets.csv", "2020-03-31,-0.03", "2020-03-31,1e200"));
        assertEquals(4, e.location().line());
        assertEquals("A01", e.location().column());
        assertTrue(e.getMessage().startsWith("assets.csv line 4, column 'A01': '1e200' is a return above 1e12"),
                e.getMessage());
        assertTrue(e.getMessage().endsWith("if an assets or market file holds prices, set values: prices in the study"
                + " file (risk-free and factor files hold per-period rates and returns whatever values says)"),
                e.getMessage());
        StudyData d = new StudyFixture(dir).edit("assets.csv", "2020-03-31,-0.03", "2020-03-31,1e12").load();
        assertEquals(1e12, d.panel().value(2, 0), 0.0);
    }

    /**
     * The same bound in a risk-free file, which holds rates even in a study of prices: the message
     * must not send the user to values: prices as the only fix.
     */
    @Test
    void absurdlyLargeRate_isRefused_withoutSendingTheUserToPrices() {
        InputException e = loadFails(new StudyFixture(dir).edit("riskfree.csv", "2020-03-31,0.001", "2020-03-31,1e300"));
        assertEquals("riskfree.csv", e.location().file().getFileName().toString());
        assertEquals(4, e.location().line());
        assertTrue(e.getMessage().contains("risk-free and factor files hold per-period rates and returns whatever"
                + " values says"), e.getMessage());
    }

    private static final String PRICES = "date,P1,P2\n2020-01-31,100,50\n2020-02-29,110,50\n2020-03-31,121,55\n"
            + "2020-04-30,125,60\n2020-05-31,130,66\n2020-06-30,143,66\n2020-07-31,130,60\n2020-08-31,117,54\n";
    private static final String MARKET_PRICES = "date,IDX\n2020-01-31,100\n2020-02-29,101\n2020-03-31,102\n"
            + "2020-04-30,103\n2020-05-31,104\n2020-06-30,105\n2020-07-31,106\n2020-08-31,107\n";

    private StudyFixture prices(String assets, String market) {
        return new StudyFixture(dir).write("assets.csv", assets).write("market.csv", market)
                .edit("study.yaml", "values: returns", "values: prices");
    }

    /**
     * A placeholder price (1e-200 standing for "no price") followed by a real one gives a return
     * of about 1e202, whose fourth power overflows: refused at the later price's cell with both
     * prices and their lines, exit 2 (it used to end the run with an internal error).
     */
    @Test
    void priceJumpBeyondTheLargestReturn_isRefusedAtTheLaterPrice() {
        InputException e = loadFails(prices(PRICES.replace("2020-03-31,121,55", "2020-03-31,1e-200,55"),
                MARKET_PRICES));
        assertEquals(5, e.location().line());
        assertEquals("P1", e.location().column());
        assertTrue(e.getMessage().startsWith("assets.csv line 5, column 'P1': the price 125.0 after 1.0E-200 (line 4)"
                + " gives a return of 1.25E202, above 1e12"), e.getMessage());
        assertTrue(e.getMessage().endsWith("a placeholder standing for a missing price (leave the cell empty)"),
                e.getMessage());
    }

    /** 1e-300 then 1e300: the quotient overflows to +∞, which is refused the same way. */
    @Test
    void priceJumpThatOverflows_isRefused() {
        InputException e = loadFails(prices(PRICES.replace("2020-05-31,130,66", "2020-05-31,1e-300,66")
                .replace("2020-06-30,143,66", "2020-06-30,1e300,66"), MARKET_PRICES));
        assertEquals(7, e.location().line());
        assertTrue(e.getMessage().contains("gives a return too large for a number, above 1e12"), e.getMessage());
    }

    /** The market's prices obey the same bound, reported in the market file: 1e15/100 − 1 = 9999999999999 (Python 3: 1e15/100-1). */
    @Test
    void marketPriceJump_isRefusedInTheMarketFile() {
        InputException e = loadFails(prices(PRICES, MARKET_PRICES.replace("2020-02-29,101", "2020-02-29,1e15")));
        assertEquals("market.csv", e.location().file().getFileName().toString());
        assertEquals(3, e.location().line());
        assertEquals("IDX", e.location().column());
        assertTrue(e.getMessage().contains("the price 1.0E15 after 100.0 (line 2) gives a return of 9.999999999999E12"),
                e.getMessage());
    }

    /** 1 then 1e12 is a return of 1e12 − 1, inside the bound: it loads (with the +500 % warning). */
    @Test
    void priceJumpJustInsideTheBound_loads() {
        StudyData d = prices(PRICES.replace("2020-03-31,121,55", "2020-03-31,1,55")
                .replace("2020-04-30,125,60", "2020-04-30,1e12,60"), MARKET_PRICES).load();
        assertEquals(1e12 - 1, d.panel().value(2, 0), 0.0);
    }

    @Test
    void riskFreeRateAboveTheLargestReturn_isRefused() {
        InputException e = loadFails(new StudyFixture(dir).edit("riskfree.csv", "2020-03-31,0.001", "2020-03-31,2e12"));
        assertTrue(e.getMessage().startsWith("riskfree.csv line 4, column 'rf': '2e12' is a return above 1e12"),
                e.getMessage());
    }

    @Test
    void returnOfExactlyMinusOne_isATotalLossAndAccepted() {
        StudyData d = new StudyFixture(dir).edit("assets.csv", "2020-03-31,-0.03", "2020-03-31,-1").load();
        assertEquals(-1.0, d.panel().value(2, 0), 0.0);
    }

    @Test
    void riskFreeRateBelowMinusOne_isRefused() {
        InputException e = loadFails(new StudyFixture(dir).edit("riskfree.csv", "2020-03-31,0.001", "2020-03-31,-2"));
        assertTrue(e.getMessage().startsWith("riskfree.csv line 4, column 'rf': '-2' is a return below -1"), e.getMessage());
    }

    /** Every value of the fixture times 100 (each row's cells stay between -1 and 4 in size, so no -1 rule fires first). */
    @Test
    void percentReturns_areRefusedWithTheHint() {
        String percent = String.join("\n", "date,A01,A02,A03", "2020-01-31,1,2,-1", "2020-02-29,2,-1,0.7",
                "2020-03-31,-0.9,1,2", "2020-04-30,4,0.6,1", "2020-05-31,1,3,-1", "2020-06-30,-0.8,1,1",
                "2020-07-31,0.6,2,3", "2020-08-31,3,-1,0.9", "");
        InputException e = loadFails(new StudyFixture(dir).write("assets.csv", percent));
        assertEquals("assets.csv: 100 % of the returns are larger than 0.5 in size (line 2, column 'A01' holds 1.0), so"
                + " the file looks like percent; expected decimal returns (0.012 for 1.2 %): divide every value by 100",
                e.getMessage());
    }

    @Test
    void columnWithManyReturnsBeyondOne_warns() {
        StudyFixture f = new StudyFixture(dir).edit("assets.csv", "2020-01-31,0.01", "2020-01-31,1.2")
                .edit("assets.csv", "2020-02-29,0.02", "2020-02-29,-0.99");
        List<String> w = f.edit("assets.csv", "2020-04-30,0.04", "2020-04-30,1.4")
                .edit("assets.csv", "2020-06-30,-0.02", "2020-06-30,2.5").load().warnings();
        assertTrue(w.contains("assets.csv column 'A01': 3 of 8 returns exceed 100 % in size in one period;"
                + " check that they are decimals, not percent"), w.toString());
    }

    @Test
    void formulaLikeAssetName_isRefusedInTheHeader() {
        InputException e = loadFails(new StudyFixture(dir).edit("assets.csv", "date,A01,A02,A03",
                "date,A01,\"=HYPERLINK(\"\"x\"\")\",A03"));
        assertTrue(e.getMessage().startsWith("assets.csv line 1: '=HYPERLINK(\"x\")' starts with a character that a"
                + " spreadsheet runs as a formula"), e.getMessage());
    }

    @Test
    void namesStartingWithPlusMinusOrAt_areRefused() {
        for (String name : List.of("+A02", "-A02", "@A02")) {
            InputException e = loadFails(new StudyFixture(dir).edit("assets.csv", "date,A01,A02,A03", "date,A01," + name + ",A03"));
            assertTrue(e.getMessage().startsWith("assets.csv line 1: '" + name + "' starts with a character"), e.getMessage());
        }
    }

    @Test
    void formulaLikeSectorName_isRefusedAtItsLine() {
        StudyFixture f = new StudyFixture(dir).write("sectors.csv", "asset,sector\nA01,Harbour\nA02,=Orchard\n")
                .edit("study.yaml", "  riskfree: riskfree.csv", "  riskfree: riskfree.csv\n  sectors: sectors.csv");
        InputException e = loadFails(f);
        assertTrue(e.getMessage().startsWith("sectors.csv line 3, column 'sector': '=Orchard' starts with a character"),
                e.getMessage());
    }

    @Test
    void alphaForAnAssetNotInTheUniverse_isWarnedByName() {
        StudyFixture f = new StudyFixture(dir)
                .write("alphas.csv", "date,asset,alpha\n2020-01-31,A01,0.001\n2020-01-31,GHOST,0.002\n2020-02-29,A09,0.001\n")
                .edit("study.yaml", "    risk: sample\n    objective: min-variance",
                        "    risk: single-index\n    objective: max-sharpe\n    alphas: alphas.csv");
        List<String> w = f.load().warnings();
        assertTrue(w.contains("alphas.csv gives alphas for 2 assets not in the universe, which are ignored: A09, GHOST"),
                w.toString());
    }

    /** The fixture's last rebalance is 2020-07-31 (window 3, every row, 8 rows): alphas dated later change nothing. */
    @Test
    void alphasAllDatedAfterTheLastRebalance_areWarnedAsNeverUsed() {
        String never = "alphas.csv: its first alpha is dated 2020-08-31, after the last rebalance (2020-07-31), so no"
                + " rebalance uses any of its alphas";
        StudyFixture f = new StudyFixture(dir)
                .write("alphas.csv", "date,asset,alpha\n2021-01-31,A01,0.001\n2020-08-31,A02,0.002\n")
                .edit("study.yaml", "    risk: sample\n    objective: min-variance",
                        "    risk: single-index\n    objective: max-sharpe\n    alphas: alphas.csv");
        assertTrue(f.load().warnings().contains(never), f.load().warnings().toString());
        f.write("alphas.csv", "date,asset,alpha\n2021-01-31,A01,0.001\n2020-07-31,A02,0.002\n");
        assertTrue(f.load().warnings().stream().noneMatch(w -> w.startsWith("alphas.csv")),
                "one alpha on the last rebalance is used: " + f.load().warnings());
    }

    @Test
    void fewResamples_warnAboutCoarsePValues() {
        List<String> w = new StudyFixture(dir).edit("study.yaml", "strategies:", "evidence:\n  resamples: 200\nstrategies:")
                .load().warnings();
        assertTrue(w.stream().anyMatch(s -> s.startsWith("evidence.resamples: 200 resamples resolve bootstrap p-values"
                + " only in steps of 1/201")), w.toString());
    }
}
