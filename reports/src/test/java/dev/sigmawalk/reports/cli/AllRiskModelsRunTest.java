package dev.sigmawalk.reports.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.sample.SampleUniverse;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * A study naming all seven risk models (Method §3 and §11) runs end to end on the sample
 * universe's monthly files: every strategy forms a portfolio at every rebalance and reports a
 * forecast, and both factor models appear in factor_diagnostics.csv.
 */
class AllRiskModelsRunTest {
    private static final String STRATEGIES = String.join("\n",
            "strategies:",
            "  - {name: sample, risk: sample, objective: min-variance, bounds: [0, 0.1]}",
            "  - {name: index, risk: single-index, objective: min-variance, bounds: [0, 0.1]}",
            "  - {name: shrunk, risk: shrinkage, objective: min-variance}",
            "  - {name: sectors, risk: multi-index, factors: sectors, objective: mean-variance, risk_aversion: 4,"
                    + " expected_returns: historical, bounds: [0, 0.1]}",
            "  - {name: components, risk: principal-components, components: 4, objective: max-sharpe,"
                    + " bounds: [0, 0.1]}",
            "  - {name: decaying, risk: ewma, half_life: 24, objective: min-variance, bounds: [0, 0.1]}",
            "  - {name: nonlinear, risk: nonlinear-shrinkage, objective: min-variance, bounds: [0, 0.1]}",
            "  - {name: equal, risk: multi-index, objective: equal-weight}", "");

    @Test
    void studyWithEverySevenModels_runsEndToEnd(@TempDir Path dir) throws IOException {
        Path demo = SampleUniverse.extractTo(dir);
        String text = Files.readString(demo);
        String head = text.substring(0, text.indexOf("strategies:"))
                .replace("windows: [36, 60, 120]", "windows: [60]")
                .replace("cost_bps: 10", "cost_bps: 10\n  start: 2022-06-30");
        Path study = demo.resolveSibling("all-models.yaml");
        Files.writeString(study, head + STRATEGIES);
        CommandLine cl = SigmawalkCommand.commandLine();
        StringWriter err = new StringWriter();
        cl.setErr(new PrintWriter(err));
        cl.setOut(new PrintWriter(new StringWriter()));
        Path out = dir.resolve("out");

        assertEquals(0, cl.execute("run", study.toString(), "--out", out.toString(), "--quiet"), err.toString());

        List<String> rebalances = Files.readAllLines(out.resolve("rebalances.csv"));
        for (String name : new String[] {"sample", "index", "shrunk", "sectors", "components", "decaying", "nonlinear",
                "equal"}) {
            List<String> rows = rebalances.stream().filter(l -> l.split(",")[1].equals(name)).toList();
            assertTrue(rows.size() >= 25, name + " rebalances: " + rows.size());
            for (String row : rows) {
                String forecast = row.split(",", -1)[6];
                assertTrue(!forecast.isEmpty() && Double.parseDouble(forecast) > 0, name + " forecast in " + row);
            }
        }
        String diagnostics = Files.readString(out.resolve("factor_diagnostics.csv"));
        assertTrue(diagnostics.contains(",multi-index:sectors,"), "sector model diagnosed");
        assertTrue(diagnostics.contains(",principal-components:4,"), "component model diagnosed");
        assertTrue(Files.readString(out.resolve("manifest.json")).contains("\"sectors.csv\"")
                || Files.readString(out.resolve("manifest.json")).contains("sectors.csv"), "sectors file fingerprinted");
    }
}
