package dev.sigmawalk.engine.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.study.FactorSource;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code factors: FILE} (Method §11): joined on the panel's dates, complete on the rows windows read. */
class FactorFileTest {
    private static final String FACTORS = String.join("\n",
            "date,size,value",
            "2020-01-31,0.001,0.002",
            "2020-02-29,0.003,-0.001",
            "2020-03-31,-0.002,0.000",
            "2020-04-30,0.004,0.001",
            "2020-05-31,0.001,0.003",
            "2020-06-30,-0.001,0.002",
            "2020-07-31,0.002,-0.002",
            "2020-08-31,0.000,0.001", "");

    @TempDir
    Path dir;

    private StudyFixture fixture() {
        return new StudyFixture(dir).write("factors.csv", FACTORS)
                .edit("study.yaml", "    risk: sample", "    risk: multi-index\n    factors: factors.csv");
    }

    @Test
    void factorFile_isAlignedToPanelRowsAndFingerprinted() {
        StudyFixture f = fixture();
        StudyData data = f.load();
        FactorSource.File source = (FactorSource.File) f.study().strategies().get(0).riskSettings().factors().orElseThrow();
        FactorTable t = data.factorsFor(source);

        assertEquals(List.of("size", "value"), t.names());
        assertEquals(8, t.rows());
        assertEquals(0.003, t.value(1, 0), 0.0, "size on 2020-02-29");
        assertEquals(0.001, t.value(7, 1), 0.0, "value on 2020-08-31");
        assertTrue(data.fingerprints().stream().anyMatch(p -> p.path().endsWith("factors.csv")),
                "factor file is in the manifest's fingerprints");
    }

    @Test
    void emptyCellOnAWindowRow_namesFileLineAndColumn() {
        StudyFixture f = fixture().edit("factors.csv", "2020-04-30,0.004,0.001", "2020-04-30,0.004,");
        InputException e = assertThrows(InputException.class, f::load);
        assertEquals(new InputException.Location(dir.resolve("factors.csv").toAbsolutePath().normalize(), 5, "value"),
                e.location());
        assertTrue(e.getMessage().contains("factors need a value on every date from 2020-01-31"), e.getMessage());
    }

    @Test
    void missingDate_namesTheAssetsFileLine() {
        StudyFixture f = fixture().edit("factors.csv", "2020-06-30,-0.001,0.002\n", "");
        InputException e = assertThrows(InputException.class, f::load);
        assertTrue(e.getMessage().contains("'2020-06-30' has no row in factors.csv"), e.getMessage());
        assertEquals(7, e.location().line(), e.getMessage());
    }

    /** A column pasted twice: every regression's loadings would be unidentified, so the file is refused. */
    @Test
    void factorRepeatingAnother_isRefusedAtItsColumn() {
        StringBuilder twin = new StringBuilder("date,size,copy\n");
        FACTORS.lines().skip(1).forEach(l -> twin.append(l, 0, l.lastIndexOf(',')).append(',')
                .append(l.substring(11, l.lastIndexOf(','))).append('\n'));
        StudyFixture f = fixture().write("factors.csv", twin.toString());
        InputException e = assertThrows(InputException.class, f::load);
        assertEquals(new InputException.Location(dir.resolve("factors.csv").toAbsolutePath().normalize(), 1, "copy"),
                e.location());
        assertTrue(e.getMessage().endsWith("factor 'copy' has the same return as 'size' on every date from 2020-01-31"
                + " (the start of the longest window before the first rebalance on 2020-03-31) to 2020-08-31, so no model"
                + " can tell their loadings apart; expected distinct factors: remove one of the two columns"),
                e.getMessage());
        f.write("factors.csv", twin.toString().replace("2020-08-31,0.000,0.000", "2020-08-31,0.000,0.001"));
        assertEquals(List.of("size", "copy"), f.load().factorsFor((FactorSource.File) f.study().strategies().get(0)
                .riskSettings().factors().orElseThrow()).names(), "one differing row is enough");
    }
}
