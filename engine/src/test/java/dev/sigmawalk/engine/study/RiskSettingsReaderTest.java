package dev.sigmawalk.engine.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.data.InputException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The keys of the Method §11 models: spellings, defaults, and errors on models that ignore them. */
class RiskSettingsReaderTest {
    private static final String HEAD = String.join("\n",
            "data:",                                 // line 1
            "  assets: assets.csv",                  // 2
            "  values: returns",                     // 3
            "  market: market.csv",                  // 4
            "  riskfree: 0.02",                      // 5
            "  sectors: sectors.csv",                // 6
            "walkforward:",                          // 7
            "  windows: [36]",                       // 8
            "strategies:",                           // 9
            "");

    @TempDir
    Path dir;

    private Study read(String strategies) throws IOException {
        return read(HEAD, strategies);
    }

    private Study read(String head, String strategies) throws IOException {
        Path file = dir.resolve("study.yaml");
        Files.writeString(file, head + strategies);
        return StudyReader.read(file);
    }

    private InputException fails(String head, String strategies) {
        return assertThrows(InputException.class, () -> read(head, strategies));
    }

    @Test
    void allFourModels_readWithTheirSettings() throws IOException {
        Study s = read(String.join("\n",
                "  - {name: sectors, risk: multi-index, factors: sectors, objective: min-variance}",
                "  - {name: styles, risk: multi-index, factors: data/styles.csv, objective: max-sharpe}",
                "  - {name: pcs, risk: principal-components, components: 5, objective: min-variance}",
                "  - {name: decay, risk: ewma, half_life: 24, objective: equal-weight}",
                "  - {name: nls, risk: nonlinear-shrinkage, objective: min-variance, bounds: [0, 0.2]}",
                "  - {name: default-factors, risk: multi-index, objective: min-variance}", ""));

        assertEquals(new RiskSettings(Optional.of(new FactorSource.Sectors()), OptionalInt.empty(), OptionalDouble.empty()),
                s.strategies().get(0).riskSettings());
        assertEquals(Optional.of(new FactorSource.File(dir.resolve("data/styles.csv").toAbsolutePath().normalize(),
                "data/styles.csv")), s.strategies().get(1).riskSettings().factors());
        assertEquals(OptionalInt.of(5), s.strategies().get(2).riskSettings().components());
        assertEquals(OptionalDouble.of(24), s.strategies().get(3).riskSettings().halfLife());
        assertEquals(RiskSettings.none(), s.strategies().get(4).riskSettings());
        assertEquals(RiskKind.NONLINEAR_SHRINKAGE, s.strategies().get(4).risk());
        assertEquals(Optional.of(StudyDefaults.FACTORS), s.strategies().get(5).riskSettings().factors());
        assertEquals("multi-index:sectors", s.strategies().get(0).riskModelName());
        assertEquals("multi-index:data/styles.csv", s.strategies().get(1).riskModelName());
        assertEquals("principal-components:5", s.strategies().get(2).riskModelName());
        assertEquals("ewma:24", s.strategies().get(3).riskModelName());
        assertEquals("nonlinear-shrinkage", s.strategies().get(4).riskModelName());
    }

    @Test
    void settingOnAnotherModel_isALocatedError() {
        InputException e = fails(HEAD, "  - {name: a, risk: sample, components: 3, objective: min-variance}\n");
        assertTrue(e.getMessage().contains("line 10"), e.getMessage());
        assertTrue(e.getMessage().contains("strategies[0].components"), e.getMessage());
        assertTrue(e.getMessage().contains("only used with risk: principal-components"), e.getMessage());

        InputException h = fails(HEAD, "  - {name: a, risk: principal-components, components: 2, half_life: 12,"
                + " objective: min-variance}\n");
        assertTrue(h.getMessage().contains("strategies[0].half_life"), h.getMessage());
        assertTrue(h.getMessage().contains("only used with risk: ewma"), h.getMessage());

        InputException f = fails(HEAD, "  - {name: a, risk: ewma, half_life: 12, factors: sectors, objective: min-variance}\n");
        assertTrue(f.getMessage().contains("only used with risk: multi-index"), f.getMessage());
    }

    @Test
    void missingOrImpossibleSettings_areLocatedErrors() {
        InputException k = fails(HEAD, "  - {name: a, risk: principal-components, objective: min-variance}\n");
        assertTrue(k.getMessage().contains("needs strategies[0].components, which has no default"), k.getMessage());
        InputException zero = fails(HEAD, "  - {name: a, risk: principal-components, components: 0, objective: min-variance}\n");
        assertTrue(zero.getMessage().contains("expected a whole number >= 1"), zero.getMessage());
        InputException h = fails(HEAD, "  - {name: a, risk: ewma, objective: min-variance}\n");
        assertTrue(h.getMessage().contains("needs strategies[0].half_life"), h.getMessage());
        InputException negative = fails(HEAD, "  - {name: a, risk: ewma, half_life: -3, objective: min-variance}\n");
        assertTrue(negative.getMessage().contains("expected a half-life in periods > 0"), negative.getMessage());
    }

    @Test
    void sectorFactorsWithoutSectorsFile_isALocatedError() {
        String head = HEAD.replace("  sectors: sectors.csv\n", "");
        InputException e = fails(head, "  - {name: a, risk: multi-index, objective: min-variance}\n");
        assertTrue(e.getMessage().contains("line 9"), e.getMessage());
        assertTrue(e.getMessage().contains("needs data.sectors"), e.getMessage());
        InputException given = fails(head, "  - {name: a, risk: multi-index, factors: sectors, objective: min-variance}\n");
        assertTrue(given.getMessage().contains("strategies[0].factors"), given.getMessage());
    }
}
