package dev.sigmawalk.reports.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * The demo closes the loop (Method §11): its study has a multi-index model with sector factors,
 * and the sample universe's residuals share a sector shock in exactly three sectors (Tidewater
 * Power ρ = 0.30, Lending Houses 0.22, Ferry and Freight 0.15; sample-universe/README.md). The
 * report must say that the sector model removed (or at least reduced) that co-movement in each of
 * the three, and factor_diagnostics.csv must hold one row per rebalance and window for it.
 */
class FactorLoopDemoTest {

    @Test
    void demo_reportsTheSectorModelTakingUpTheCoMovement(@TempDir Path out) throws IOException {
        CommandLine cl = SigmawalkCommand.commandLine();
        StringWriter err = new StringWriter();
        cl.setErr(new PrintWriter(err));
        cl.setOut(new PrintWriter(new StringWriter()));
        Path dir = out.resolve("demo");
        assertEquals(0, cl.execute("demo", "--out", dir.toString(), "--quiet"), err.toString());

        Document doc = Jsoup.parse(dir.resolve("report.html").toFile(), "UTF-8");
        Element section = doc.getElementById("factor-loop");
        assertTrue(section != null, "the factor-model section exists");
        String answer = section.selectFirst("p.answer").text();
        for (String built : new String[] {"Tidewater Power", "Lending Houses", "Ferry and Freight"}) {
            int at = answer.indexOf(built);
            assertTrue(at >= 0, built + " named in: " + answer);
            String verdict = answer.substring(at, answer.indexOf(')', at) + 1);
            assertTrue(verdict.endsWith("(removed)") || verdict.endsWith("(reduced)"), verdict);
        }
        assertTrue(section.text().contains("sector-minvar"), "the sector strategy's out-of-sample row");

        List<String> lines = Files.readAllLines(dir.resolve("factor_diagnostics.csv"));
        assertEquals("date,window,model,assets,mean_abs_residual_corr,lm_adj_stat,lm_adj_pvalue,cd_stat,cd_pvalue",
                lines.get(0));
        List<String> rebalances = Files.readAllLines(dir.resolve("rebalances.csv")).stream()
                .filter(l -> l.contains(",sector-minvar,")).toList();
        long rows = lines.stream().filter(l -> l.contains(",multi-index:sectors,")).count();
        assertEquals(rebalances.size(), rows, "one row per rebalance and window of the sector model");
    }
}
