package dev.sigmawalk.reports.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.data.InputException;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import java.util.function.UnaryOperator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A study built in code is the study a file with the same keys gives (every default applied the
 * same way), and a bad key or value gets the file's message word for word, with the key path in
 * place of the file's line and column.
 */
class StudyBuilderTest {
    /** The start of a message about a study file: its name, line and column. */
    private static final String FILE_LOCATOR = "^study\\.yaml line \\d+(, column \\d+)?: ";
    private static final String CODE_LOCATOR = "^" + Study.Builder.SOURCE_NAME + ": ";

    @TempDir
    Path dir;

    private Study.Builder base() {
        return Study.builder()
                .title("From code")
                .data("assets", dir.resolve("assets.csv"))
                .data("values", "returns")
                .data("market", dir.resolve("market.csv"))
                .data("riskfree", 0.02)
                .windows(36, 60)
                .walkForward("cost_bps", 12.5)
                .walkForward("start", LocalDate.of(2006, 1, 31))
                .strategy("index", Map.of("risk", "single-index", "objective", "min-variance",
                        "bounds", List.of(0, 0.1)))
                .strategy("tilted", Map.of("risk", "shrinkage", "shrinkage_target", "identity",
                        "objective", "mean-variance", "risk_aversion", 4))
                .report("paper", "letter");
    }

    private List<String> baseYaml() {
        return List.of(
                "title: From code",
                "data:",
                "  assets: " + dir.resolve("assets.csv"),
                "  values: returns",
                "  market: " + dir.resolve("market.csv"),
                "  riskfree: 0.02",
                "walkforward:",
                "  windows: [36, 60]",
                "  cost_bps: 12.5",
                "  start: 2006-01-31",
                "strategies:",
                "  - name: index",
                "    risk: single-index",
                "    objective: min-variance",
                "    bounds: [0, 0.1]",
                "  - name: tilted",
                "    risk: shrinkage",
                "    shrinkage_target: identity",
                "    objective: mean-variance",
                "    risk_aversion: 4",
                "report:",
                "  paper: letter");
    }

    private dev.sigmawalk.engine.study.Study fromFile(List<String> lines) throws IOException {
        Path file = dir.resolve("study.yaml");
        Files.write(file, lines, StandardCharsets.UTF_8);
        return Study.fromYaml(file).spec();
    }

    @Test
    void builtStudy_isTheStudyTheFileGives() throws IOException {
        var code = base().build().spec();
        var file = fromFile(baseYaml());
        assertEquals(file.title(), code.title());
        assertEquals(file.data(), code.data());
        assertEquals(file.walkForward(), code.walkForward());
        assertEquals(file.strategies(), code.strategies());
        assertEquals(file.evidence(), code.evidence());
        assertEquals(file.report(), code.report());
        assertEquals(Path.of(Study.Builder.SOURCE_NAME).toAbsolutePath().normalize(), code.file(),
                "the study stands in the working folder");
    }

    @Test
    void badValues_getTheFilesMessages_withTheKeyPathForTheLine() throws IOException {
        record Case(String what, UnaryOperator<Study.Builder> code, String yamlFrom, String yamlTo) {
        }
        List<Case> cases = List.of(
                new Case("unknown key", b -> b.data("asset_file", "x.csv"), "  values: returns",
                        "  values: returns\n  asset_file: x.csv"),
                new Case("bad choice", b -> b.data("values", "levels"), "  values: returns", "  values: levels"),
                new Case("negative cost", b -> b.walkForward("cost_bps", -1), "  cost_bps: 12.5", "  cost_bps: -1"),
                new Case("window of one", b -> b.windows(1, 60), "  windows: [36, 60]", "  windows: [1, 60]"),
                new Case("text for a number", b -> b.walkForward("cost_bps", "ten"), "  cost_bps: 12.5",
                        "  cost_bps: ten"),
                new Case("not-a-number", b -> b.walkForward("cost_bps", Double.NaN), "  cost_bps: 12.5",
                        "  cost_bps: .nan"),
                new Case("infinite", b -> b.walkForward("cost_bps", Double.NEGATIVE_INFINITY), "  cost_bps: 12.5",
                        "  cost_bps: -.inf"),
                new Case("few resamples", b -> b.evidence("resamples", 5), "  risk_aversion: 4",
                        "  risk_aversion: 4\nevidence:\n  resamples: 5"),
                new Case("unknown paper", b -> b.report("paper", "a3"), "  paper: letter", "  paper: a3"));
        for (Case c : cases) {
            InputException fromCode = assertThrows(InputException.class, () -> c.code().apply(base()).build(), c.what());
            List<String> yaml = String.join("\n", baseYaml()).replace(c.yamlFrom(), c.yamlTo()).lines().toList();
            InputException fromYaml = assertThrows(InputException.class, () -> fromFile(yaml), c.what());
            assertTrue(fromCode.getMessage().matches(CODE_LOCATOR + ".*"), c.what() + ": " + fromCode.getMessage());
            assertTrue(fromYaml.getMessage().matches(FILE_LOCATOR + ".*"), c.what() + ": " + fromYaml.getMessage());
            assertEquals(fromYaml.getMessage().replaceFirst(FILE_LOCATOR, ""),
                    fromCode.getMessage().replaceFirst(CODE_LOCATOR, ""), c.what());
        }
    }

    @Test
    void valueOfNoStudyType_isRefusedWithItsKey() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> base().walkForward("cost_bps", new StringBuilder("10")).build());
        assertTrue(e.getMessage().startsWith("walkforward.cost_bps is a java.lang.StringBuilder"), e.getMessage());
    }

    /** A null reaches no NullPointerException: each is refused by the call that gave it, naming what it was. */
    @Test
    void nulls_areRefusedWhereTheyAreGiven_withTheKey() {
        record Case(String message, org.junit.jupiter.api.function.Executable call) {
        }
        java.util.Map<String, Object> nullRisk = new java.util.HashMap<>();
        nullRisk.put("risk", null);
        java.util.Map<String, Object> nullKey = new java.util.HashMap<>();
        nullKey.put(null, "sample");
        List<Case> cases = List.of(
                new Case("data.assets is null; leave the key out to take its default",
                        () -> Study.builder().data("assets", null)),
                new Case("data: a key is null; expected a key of a study file, such as assets",
                        () -> Study.builder().data(null, "x.csv")),
                new Case("walkforward.cost_bps is null; leave the key out to take its default",
                        () -> Study.builder().walkForward("cost_bps", null)),
                new Case("evidence: a key is null; expected a key of a study file, such as resamples",
                        () -> Study.builder().evidence(null, 500)),
                new Case("report.paper is null; leave the key out to take its default",
                        () -> Study.builder().report("paper", null)),
                new Case("title is null; expected a text such as \"Index model against the sample covariance\"",
                        () -> Study.builder().title(null)),
                new Case("a strategy's name is null; expected a text such as \"index-model\"",
                        () -> Study.builder().strategy(null, Map.of("objective", "equal-weight"))),
                new Case("strategy s: its settings are null; expected a map of its keys, such as"
                        + " Map.of(\"objective\", \"equal-weight\")", () -> Study.builder().strategy("s", null)),
                new Case("strategy s: risk is null; leave the key out to take its default",
                        () -> Study.builder().strategy("s", nullRisk)),
                new Case("strategy s: a key is null; expected a key of a study file, such as objective",
                        () -> Study.builder().strategy("s", nullKey)),
                new Case("the study file is null; expected the path of a study file", () -> Study.fromYaml(null)));
        for (Case c : cases) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, c.call(), c.message());
            assertEquals(c.message(), e.getMessage());
        }
    }

    /** A name in the settings that differs from the strategy's own would rename it without a word. */
    @Test
    void secondNameInTheSettings_isRefused_andTheSameNameIsHarmless() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> base().strategy("third", Map.of("name", "fourth", "objective", "equal-weight")));
        assertEquals("strategy third: its settings name it fourth too; expected the name once, as strategy's first"
                + " argument", e.getMessage());
        var spec = base().strategy("third", Map.of("name", "third", "objective", "equal-weight")).build().spec();
        assertEquals("third", spec.strategies().get(2).name());
    }

    /** The study's own option types and a File read as a file spells them; the result is the file's study. */
    @Test
    void optionsAndFiles_standForTheirSpelling() throws IOException {
        var code = Study.builder()
                .title("From code")
                .data("assets", dir.resolve("assets.csv").toFile())
                .data("values", dev.sigmawalk.engine.study.ValueKind.RETURNS)
                .data("market", dir.resolve("market.csv").toFile())
                .data("riskfree", 0.02)
                .windows(36, 60)
                .walkForward("cost_bps", 12.5)
                .walkForward("start", LocalDate.of(2006, 1, 31))
                .strategy("index", Map.of("risk", dev.sigmawalk.engine.study.RiskKind.SINGLE_INDEX,
                        "objective", dev.sigmawalk.engine.study.Objective.MIN_VARIANCE, "bounds", List.of(0, 0.1)))
                .strategy("tilted", Map.of("risk", "shrinkage", "shrinkage_target",
                        dev.sigmawalk.engine.study.ShrinkageTarget.IDENTITY, "objective", "mean-variance",
                        "risk_aversion", 4))
                .report("paper", dev.sigmawalk.engine.study.Paper.LETTER)
                .build().spec();
        var file = fromFile(baseYaml());
        assertEquals(file.data(), code.data());
        assertEquals(file.strategies(), code.strategies());
        assertEquals(file.report(), code.report());
    }
}
