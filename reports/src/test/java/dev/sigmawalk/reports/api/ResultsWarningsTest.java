package dev.sigmawalk.reports.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.reports.cli.SigmawalkCommand;
import dev.sigmawalk.sample.SampleUniverse;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * {@link Results#warnings()} holds every warning {@code sigmawalk run} prints on standard error
 * for the same study, word for word and in the same order, whether the study is read from its
 * file or built in code. The study is made to meet one warning of every kind: of the data (few
 * resamples), of a degenerate window (a suspended stock), of feasibility (bounds that need more
 * assets than the universe holds), of the results (the allocations those bounds make fail) and of
 * the evidence (an asset that moves exactly with the market leaves the residual diagnostics).
 */
class ResultsWarningsTest {
    private static final String WARNING = "sigmawalk: warning: ";
    /** TW03 returns exactly 0 over these months: a suspended stock. */
    private static final String SUSPENDED_FROM = "2010-04-30";
    private static final String SUSPENDED_TO = "2013-08-30";
    /** SM02 returns exactly the market over these months. */
    private static final String SHADOW_FROM = "2012-01-31";
    private static final String SHADOW_TO = "2014-12-31";

    @TempDir
    static Path data;
    private static Path study;

    @BeforeAll
    static void writeStudy() throws IOException {
        SampleUniverse.extractTo(data);
        List<String> market = Files.readAllLines(data.resolve("market-monthly.csv"));
        List<String> lines = Files.readAllLines(data.resolve("assets-monthly.csv"));
        List<String> header = List.of(lines.get(0).split(",", -1));
        int suspended = header.indexOf("TW03");
        int shadow = header.indexOf("SM02");
        List<String> out = new ArrayList<>(List.of(lines.get(0)));
        for (int r = 1; r < lines.size(); r++) {
            String[] cells = lines.get(r).split(",", -1);
            String date = cells[0];
            if (date.compareTo(SUSPENDED_FROM) >= 0 && date.compareTo(SUSPENDED_TO) <= 0) {
                cells[suspended] = "0";
            }
            if (date.compareTo(SHADOW_FROM) >= 0 && date.compareTo(SHADOW_TO) <= 0) {
                String[] m = market.get(r).split(",", -1);
                assertEquals(date, m[0], "market row " + r);
                cells[shadow] = m[1];
            }
            out.add(String.join(",", cells));
        }
        Files.write(data.resolve("assets.csv"), out, StandardCharsets.UTF_8);
        study = data.resolve("warnings.yaml");
        Files.write(study, List.of(
                "title: Every kind of warning",
                "data:",
                "  assets: assets.csv",
                "  values: returns",
                "  market: market-monthly.csv",
                "  riskfree: 0.02",
                "walkforward:",
                "  windows: [24]",
                "  rebalance_every: 3",
                "  start: 2011-01-01",
                "  end: 2016-12-31",
                "strategies:",
                "  - name: equal",
                "    objective: equal-weight",
                "  - name: capped",
                "    risk: single-index",
                "    objective: min-variance",
                "    bounds: [0, 0.0142]",
                "evidence:",
                "  resamples: 100",
                ""), StandardCharsets.UTF_8);
    }

    @Test
    void warnings_areTheLinesTheCommandLinePrints_fromFileAndFromCode(@TempDir Path out) {
        List<String> printed = printedWarnings(out);
        Results fromFile = Study.fromYaml(study).run(1);
        assertEquals(printed, fromFile.warnings(), "study file");
        Results fromCode = Study.builder()
                .title("Every kind of warning")
                .data("assets", data.resolve("assets.csv"))
                .data("values", "returns")
                .data("market", data.resolve("market-monthly.csv"))
                .data("riskfree", 0.02)
                .windows(24)
                .walkForward("rebalance_every", 3)
                .walkForward("start", "2011-01-01")
                .walkForward("end", "2016-12-31")
                .strategy("equal", Map.of("objective", "equal-weight"))
                .strategy("capped", Map.of("risk", "single-index", "objective", "min-variance",
                        "bounds", List.of(0, 0.0142)))
                .evidence("resamples", 100)
                .build().run(2);
        assertEquals(printed, fromCode.warnings(), "study built in code");
    }

    @Test
    void warnings_holdEveryKind() {
        List<String> w = Study.fromYaml(study).run(1).warnings();
        assertHas(w, "evidence.resamples: 100 resamples", "the data's: few resamples");
        assertHas(w, "asset 'TW03': its return is the same in every row of the 24-row window", "a degenerate window");
        assertHas(w, "strategy 'capped', 24-row window: bounds [0.0, 0.0142] cannot be met at", "feasibility");
        assertHas(w, "strategy 'capped', window 24: no portfolio formed at", "the results': failed allocations");
        assertHas(w, "residual diagnostics, 24-row window, ", "the evidence notes");
        assertHas(w, "asset 'SM02' left out of the residual diagnostics", "the evidence note names the asset");
    }

    private static void assertHas(List<String> warnings, String part, String kind) {
        assertTrue(warnings.stream().anyMatch(l -> l.contains(part)), kind + ": '" + part + "' in " + warnings);
    }

    private static List<String> printedWarnings(Path out) {
        CommandLine cl = SigmawalkCommand.commandLine();
        StringWriter stdout = new StringWriter();
        StringWriter stderr = new StringWriter();
        cl.setOut(new PrintWriter(stdout));
        cl.setErr(new PrintWriter(stderr));
        int code = cl.execute("run", study.toString(), "--out", out.toString(), "--threads", "1");
        assertEquals(0, code, stderr.toString());
        List<String> printed = stderr.toString().lines().filter(l -> l.startsWith(WARNING))
                .map(l -> l.substring(WARNING.length())).toList();
        assertTrue(printed.size() >= 5, "the study meets every kind of warning: " + stderr);
        return printed;
    }
}
