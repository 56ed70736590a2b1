package dev.sigmawalk.engine.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.data.InputException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Study files: keys as the README spells them, defaults from StudyDefaults, positions in errors. */
class StudyReaderTest {
    private static final String BASE = String.join("\n",
            "title: Invented study",                 // line 1
            "data:",                                 // 2
            "  assets: data/assets.csv",             // 3
            "  values: returns",                     // 4
            "  market: market.csv",                  // 5
            "  riskfree: 0.02",                      // 6
            "walkforward:",                          // 7
            "  windows: [36, 60]",                   // 8
            "  rebalance_every: 3",                  // 9
            "strategies:",                           // 10
            "  - name: index-model",                 // 11
            "    risk: single-index",                // 12
            "    objective: min-variance",           // 13
            "    bounds: [0, 0.1]",                  // 14
            "  - name: equal",                       // 15
            "    objective: equal-weight",           // 16
            "    baseline: index-model",             // 17
            "");

    @TempDir
    Path dir;

    private Study read(String yaml) throws IOException {
        Path file = dir.resolve("demo.yaml");
        Files.writeString(file, yaml);
        return StudyReader.read(file);
    }

    private InputException fails(String yaml) {
        return assertThrows(InputException.class, () -> read(yaml));
    }

    @Test
    void contractExample_readsWithDefaultsAndResolvedPaths() throws IOException {
        Study s = read(BASE);
        assertEquals("Invented study", s.title());
        assertEquals(dir.resolve("data/assets.csv").toAbsolutePath().normalize(), s.data().assets());
        assertEquals(new SeriesSource.File(dir.resolve("market.csv").toAbsolutePath().normalize()), s.data().market());
        assertEquals(new SeriesSource.AnnualRate(0.02), s.data().riskFree());
        assertEquals(List.of(36, 60), s.walkForward().windows());
        assertEquals(new RebalanceRule.EveryRows(3), s.walkForward().rebalance());
        assertEquals(StudyDefaults.COST_BPS, s.walkForward().costBps(), 0.0);
        StrategySpec equal = s.strategies().get(1);
        assertEquals(StudyDefaults.EQUAL_WEIGHT_RISK, equal.risk());
        assertEquals(Optional.of("index-model"), equal.baseline());
        assertEquals(Optional.of(new Bounds(0, 0.1)), s.strategies().get(0).bounds());
        assertEquals(EvidenceSpec.defaults(), s.evidence());
        assertEquals(dir.resolve(StudyDefaults.OUTPUT).toAbsolutePath().normalize(), s.output());
        assertEquals(Paper.A4, s.report().paper(), "A4 unless the study says otherwise");
    }

    @Test
    void reportPaper_isRead_andAnUnknownPaperListsTheChoices() throws IOException {
        assertEquals(Paper.LETTER, read(BASE + "report:\n  paper: letter\n").report().paper());
        assertEquals(Paper.A4, read(BASE + "report:\n  paper: a4\n").report().paper());
        InputException e = fails(BASE + "report:\n  paper: legal\n");
        assertEquals("demo.yaml line 19, column 10: report.paper: 'legal' is not one of the choices; expected a4 | letter",
                e.getMessage());
        InputException key = fails(BASE + "report:\n  papers: letter\n");
        assertTrue(key.getMessage().contains("unknown key 'papers' in report; did you mean 'paper'?"), key.getMessage());
    }

    @Test
    void calendarRuleColumnsAndDates_areRead() throws IOException {
        Study s = read(BASE.replace("  rebalance_every: 3", "  rebalance: quarter-end\n  start: 2006-01-31\n  end: 2023-12-31")
                .replace("market: market.csv", "market: IDX").replace("riskfree: 0.02", "riskfree: rf"));
        assertEquals(new RebalanceRule.CalendarEnd(Calendar.QUARTER_END), s.walkForward().rebalance());
        assertEquals(Optional.of(LocalDate.of(2006, 1, 31)), s.walkForward().start());
        assertEquals(new SeriesSource.Column("IDX"), s.data().market());
        assertEquals(new SeriesSource.Column("rf"), s.data().riskFree());
    }

    @Test
    void unknownKey_suggestsTheNearestValidKey() {
        InputException e = fails(BASE.replace("  rebalance_every: 3", "  rebalance_evry: 3"));
        assertEquals("demo.yaml line 9, column 3: unknown key 'rebalance_evry' in walkforward; did you mean 'rebalance_every'?",
                e.getMessage());
    }

    @Test
    void unknownKeyFarFromAll_listsTheValidKeys() {
        InputException e = fails(BASE.replace("title: Invented study", "colour: teal"));
        assertTrue(e.getMessage().startsWith("demo.yaml line 1, column 1: unknown key 'colour'; valid keys: data, evidence"),
                e.getMessage());
    }

    @Test
    void reversedBounds_nameTheKeyPath() {
        InputException e = fails(BASE.replace("bounds: [0, 0.1]", "bounds: [0.5, 0.1]"));
        assertEquals("demo.yaml line 14, column 14: strategies[0].bounds: [0.5, 0.1] has lower > upper;"
                + " expected [lower, upper] with lower <= upper, such as [0, 0.10]", e.getMessage());
    }

    @Test
    void windowOfOne_isRejectedWithItsIndex() {
        InputException e = fails(BASE.replace("windows: [36, 60]", "windows: [1]"));
        assertEquals("demo.yaml line 8, column 13: walkforward.windows[0]: 1 is not allowed; expected a whole number >= 2",
                e.getMessage());
    }

    @Test
    void missingRequiredKey_isNamed() {
        InputException e = fails(BASE.replace("  values: returns\n", ""));
        assertEquals("demo.yaml line 3, column 3: data: missing key 'values'; it is required", e.getMessage());
    }

    @Test
    void bothRebalanceKeys_areRejected() {
        InputException e = fails(BASE.replace("  rebalance_every: 3", "  rebalance_every: 3\n  rebalance: month-end"));
        assertTrue(e.getMessage().startsWith("demo.yaml line 10, column 14: walkforward.rebalance: 'month-end' is given together"
                + " with walkforward.rebalance_every"), e.getMessage());
    }

    @Test
    void unknownChoice_listsTheChoices() {
        InputException e = fails(BASE.replace("risk: single-index", "risk: single_index"));
        assertEquals("demo.yaml line 12, column 11: strategies[0].risk: 'single_index' is not one of the choices;"
                + " expected sample | single-index | shrinkage | multi-index | principal-components | ewma"
                + " | nonlinear-shrinkage", e.getMessage());
    }

    @Test
    void baselineNamingNoStrategy_isRejected() {
        InputException e = fails(BASE.replace("baseline: index-model", "baseline: index"));
        assertEquals("demo.yaml line 17, column 15: strategies[1].baseline: 'index' names no other strategy;"
                + " expected one of index-model", e.getMessage());
    }

    @Test
    void meanVarianceWithoutRiskAversion_isRejected() {
        InputException e = fails(BASE.replace("objective: min-variance", "objective: mean-variance"));
        assertTrue(e.getMessage().contains("strategies[0].objective: 'mean-variance' needs strategies[0].risk_aversion"),
                e.getMessage());
    }

    @Test
    void expectedReturnInputsOnMinVariance_areRejected() {
        InputException e = fails(BASE.replace("    bounds: [0, 0.1]", "    bounds: [0, 0.1]\n    alphas: alphas.csv"));
        assertTrue(e.getMessage().startsWith("demo.yaml line 15, column 13: strategies[0].alphas: 'alphas.csv' is not used"),
                e.getMessage());
    }

    @Test
    void meanVariance_readsItsInputs() throws IOException {
        Study s = read(BASE.replace("objective: min-variance", "objective: mean-variance\n    risk_aversion: 4\n"
                + "    alphas: alphas.csv\n    market_premium: 0.05"));
        StrategySpec mv = s.strategies().get(0);
        assertEquals(4.0, mv.riskAversion(), 0.0);
        assertEquals(ExpectedReturnKind.SINGLE_INDEX, mv.expectedReturns());
        assertEquals(Optional.of(dir.resolve("alphas.csv").toAbsolutePath().normalize()), mv.alphas());
        assertEquals(0.05, mv.marketPremium().orElseThrow(), 0.0);
    }

    @Test
    void duplicateKey_isRejected() {
        InputException e = fails(BASE.replace("  values: returns", "  values: returns\n  values: prices"));
        assertTrue(e.getMessage().startsWith("demo.yaml line 5, column 3: key 'values' is given twice (first on line 4)"),
                e.getMessage());
    }

    @Test
    void emptyStudyFile_isRejected() {
        InputException e = fails("");
        assertTrue(e.getMessage().startsWith("demo.yaml: the study file is empty"), e.getMessage());
    }

    @Test
    void nearestKey_isLevenshteinDistance() {
        // Hand computation: kitten → sitting takes 3 edits (k→s, e→i, insert g).
        assertEquals(3, NearestKey.distance("kitten", "sitting"));
        assertEquals(0, NearestKey.distance("end", "end"));
        assertEquals("windows", NearestKey.suggest("window", java.util.Set.of("windows", "start", "end")));
    }

    @Test
    void defaults_areListedForCheck() {
        List<String> lines = StudyDefaults.describe();
        assertTrue(lines.contains("walkforward.rebalance_every: 1 (when no rebalance: is given)"), lines.toString());
        assertTrue(lines.contains("output: sigmawalk-out beside the study file"), lines.toString());
    }
}
