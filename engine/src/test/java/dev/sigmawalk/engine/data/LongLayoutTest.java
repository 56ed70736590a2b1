package dev.sigmawalk.engine.data;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code data.layout: long}: the fixture's wide assets file rewritten as {@code date,asset,value}
 * rows gives the same panel, in any row order; its faults are located like the wide file's.
 */
class LongLayoutTest {
    @TempDir
    Path dir;

    /** The fixture's wide file as long rows, one per non-empty cell, shuffled with {@code seed} (0 = file order). */
    static String toLong(String wide, long seed) {
        String[] lines = wide.strip().split("\n");
        String[] header = lines[0].split(",");
        List<String> rows = new ArrayList<>();
        for (int i = 1; i < lines.length; i++) {
            String[] cells = lines[i].split(",", -1);
            for (int j = 1; j < header.length; j++) {
                if (!cells[j].isEmpty()) {
                    rows.add(cells[0] + "," + header[j] + "," + cells[j]);
                }
            }
        }
        if (seed != 0) {
            Collections.shuffle(rows, new Random(seed));
        }
        return "date,asset,value\n" + String.join("\n", rows) + "\n";
    }

    private StudyFixture longFixture(String assetsLong) {
        return new StudyFixture(dir).write("assets.csv", assetsLong)
                .edit("study.yaml", "  values: returns", "  values: returns\n  layout: long");
    }

    @Test
    void shuffledLongFile_givesTheWideFilesPanel() {
        ReturnPanel wide = new StudyFixture(dir).load().panel();
        for (long seed = 0; seed < 5; seed++) {
            ReturnPanel p = longFixture(toLong(StudyFixture.ASSETS, seed)).load().panel();
            assertEquals(wide.assets(), p.assets(), "seed " + seed);
            assertArrayEquals(wide.dates(), p.dates(), "seed " + seed);
            assertArrayEquals(wide.rawReturns(), p.rawReturns(), "seed " + seed);
        }
    }

    @Test
    void assetsAreOrderedByName_andAPairNotGivenIsMissing() {
        String assets = "date,asset,value\n2020-01-31,C,0.01\n2020-01-31,A,0.02\n2020-02-29,B,0.03\n2020-02-29,A,0.01\n"
                + "2020-03-31,B,0.0\n2020-04-30,A,0.01\n2020-05-31,B,0.01\n2020-06-30,C,0.01\n2020-07-31,A,0.01\n"
                + "2020-08-31,B,0.01\n";
        ReturnPanel p = longFixture(assets).load().panel();
        assertEquals(List.of("A", "B", "C"), p.assets());
        assertEquals(8, p.rows());
        assertEquals(0.02, p.value(0, 0), 0.0);
        assertTrue(Double.isNaN(p.value(0, 1)), "B has no row on 2020-01-31");
        assertEquals(0.01, p.value(0, 2), 0.0);
    }

    /**
     * Lines of nothing but commas (a spreadsheet's formatted empty rows) are skipped like blank
     * lines, here and in the alphas file, and the repeated pair below is still named at the lines
     * an editor shows: the three comma lines push the repeat from line 26 to line 29.
     */
    @Test
    void linesOfOnlyCommas_areSkipped_andLinesStayTheEditors() {
        String assets = toLong(StudyFixture.ASSETS, 0).replace("2020-04-30,A01,", ",,\n , ,\n2020-04-30,A01,") + ",,\n";
        ReturnPanel wide = new StudyFixture(dir).load().panel();
        assertArrayEquals(wide.rawReturns(), longFixture(assets).load().panel().rawReturns());
        StudyFixture f = longFixture(assets + "2020-03-31,A02,0.5\n");
        InputException again = assertThrows(InputException.class, f::load);
        assertEquals("assets.csv line 29, column 'asset': 'A02' on 2020-03-31 is already given on line 9;"
                + " expected one row per date and asset", again.getMessage());
        AlphaTable alphas = AlphaTable.read(f.write("alphas.csv", "date,asset,alpha\n,,\n2020-01-31,A01,0.001\n,,\n")
                .dir().resolve("alphas.csv"));
        assertEquals(1, alphas.size());
    }

    @Test
    void repeatedDateAndAsset_isRefusedNamingBothLines() {
        String assets = toLong(StudyFixture.ASSETS, 0) + "2020-03-31,A02,0.5\n";
        InputException e = assertThrows(InputException.class, () -> longFixture(assets).load());
        assertEquals("assets.csv line 26, column 'asset': 'A02' on 2020-03-31 is already given on line 9;"
                + " expected one row per date and asset", e.getMessage());
    }

    @Test
    void badNumber_isLocatedAtItsLine() {
        String assets = toLong(StudyFixture.ASSETS, 0).replace("2020-02-29,A03,0.00", "2020-02-29,A03,zero");
        InputException e = assertThrows(InputException.class, () -> longFixture(assets).load());
        assertEquals("assets.csv line 7, column 'value': 'zero' is not a number; expected a decimal such as 0.0123"
                + " or an empty cell", e.getMessage());
    }

    @Test
    void impossibleReturn_isLocatedAtItsLine() {
        String assets = toLong(StudyFixture.ASSETS, 0).replace("2020-02-29,A03,0.00", "2020-02-29,A03,-3");
        InputException e = assertThrows(InputException.class, () -> longFixture(assets).load());
        assertTrue(e.getMessage().startsWith("assets.csv line 7, column 'value': '-3' is a return below -1"), e.getMessage());
    }

    @Test
    void formulaLikeAsset_isRefusedAtItsLine() {
        String assets = toLong(StudyFixture.ASSETS, 0).replace("2020-02-29,A03,0.00", "2020-02-29,@A03,0.00");
        InputException e = assertThrows(InputException.class, () -> longFixture(assets).load());
        assertTrue(e.getMessage().startsWith("assets.csv line 7, column 'asset': '@A03' starts with a character"),
                e.getMessage());
    }

    @Test
    void wideFileGivenAsLong_isRefusedAtTheHeader() {
        InputException e = assertThrows(InputException.class, () -> longFixture(StudyFixture.ASSETS).load());
        assertEquals("assets.csv line 1: the header is 'date,A01,A02,A03'; expected 'date,asset,value'", e.getMessage());
    }

    @Test
    void marketColumnMissingInLongFile_isLocatedByDate() {
        String assets = toLong(StudyFixture.ASSETS, 0) + toLong(StudyFixture.MARKET, 0).substring("date,asset,value\n".length())
                .replace("2020-04-30,IDX,0.021\n", "");
        InputException e = assertThrows(InputException.class, () -> longFixture(assets)
                .edit("study.yaml", "market: market.csv", "market: IDX").load());
        assertTrue(e.getMessage().startsWith("assets.csv column 'IDX': no row of the file gives 'IDX' the value for the"
                + " return to 2020-04-30; the market needs a value"), e.getMessage());
    }
}
