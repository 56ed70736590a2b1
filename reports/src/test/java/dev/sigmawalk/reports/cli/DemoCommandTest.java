package dev.sigmawalk.reports.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import dev.sigmawalk.reports.browser.BrowserProbe;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * The built-in demo end to end. The sample universe is generated with residuals that share a
 * sector shock in exactly three sectors (Tidewater Power ρ = 0.30, Lending Houses 0.22, Ferry and
 * Freight 0.15; sample-universe/README.md, "The model and the true parameters"): the report must
 * find those three and no other.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class DemoCommandTest {
    /** Where the browser check leaves its screenshots for a person to look at. */
    private static final Path SCREENSHOTS = Path.of("target", "browser-layout");
    private static final int PHONE = 400;
    private static final int DESKTOP = 1400;

    private Path out;

    @BeforeAll
    void runDemo(@TempDir Path out) {
        this.out = out;
        CommandLine cl = SigmawalkCommand.commandLine();
        StringWriter err = new StringWriter();
        cl.setErr(new PrintWriter(err));
        cl.setOut(new PrintWriter(new StringWriter()));
        int code = cl.execute("demo", "--out", out.resolve("demo").toString(), "--quiet");
        assertEquals(0, code, err.toString());
    }

    /**
     * The demo report in headless Chromium: at a phone's 400 px the page never scrolls sideways
     * (only a wide table may, inside its own box, its first column staying in view), and at a
     * desktop's 1,400 px no table hides a column either. Screenshots of both go to
     * {@code target/browser-layout/}. Skipped, saying so, where no Chromium is installed.
     */
    @Test
    void demoReport_inABrowser_fitsAPhoneAndHidesNoColumnOnADesktop() throws Exception {
        Optional<BrowserProbe> browser = BrowserProbe.find();
        Assumptions.assumeTrue(browser.isPresent(), "no Chromium or headless shell found (looked for "
                + BrowserProbe.lookedFor() + "): the browser layout check at 400 and 1,400 px is skipped");
        Path report = out.resolve("demo").resolve("report.html");
        for (int width : new int[] {PHONE, DESKTOP}) {
            JsonNode m = browser.get().measure(report, width, SCREENSHOTS.resolve("demo-" + width + "px.png"));
            assertTrue(m.get("page").asInt() <= m.get("viewport").asInt() + BrowserProbe.SLACK, width + " px: " + m);
            assertEquals(0, m.get("past").size(), width + " px: elements past the right edge: " + m.get("past"));
            if (width == DESKTOP) {
                assertEquals(0, m.get("hidden").size(), "tables wider than their box: " + m.get("hidden"));
            }
        }
    }

    @Test
    void demo_findsTheSectorsBuiltToCoMove() throws IOException {
        Document doc = Jsoup.parse(out.resolve("demo").resolve("report.html").toFile(), "UTF-8");
        Element section = doc.getElementById("single-index-check");
        assertTrue(section != null, "the single-index check section exists");
        String answer = section.text();
        for (String built : new String[] {"Tidewater Power", "Lending Houses", "Ferry and Freight"}) {
            assertTrue(answer.contains(built), built + " named in: " + answer);
        }
        String verdict = answer.substring(answer.indexOf("Residuals moved together within"),
                answer.indexOf("averaged over every rebalance"));
        for (String calm : new String[] {"Saltworks", "Orchard", "Glass", "Signal", "Timber"}) {
            assertFalse(verdict.contains(calm), calm + " must not be read as co-moving: " + verdict);
        }
        assertTrue(Files.size(out.resolve("demo").resolve("report.html")) < 5L * 1024 * 1024, "report under 5 MiB");
        Element map = doc.getElementById("sector-map");
        assertTrue(map != null, "the sector x sector map exists");
        java.util.List<String> sectors = map.select("thead th").eachText().subList(1, map.select("thead th").size());
        for (org.jsoup.nodes.Element row : map.select("tbody tr")) {
            String sector = row.selectFirst("td").text();
            double within = Double.parseDouble(row.select("td").get(1 + sectors.indexOf(sector)).text());
            boolean built = sector.equals("Tidewater Power") || sector.equals("Lending Houses")
                    || sector.equals("Ferry and Freight");
            // Built shocks of 0.15 to 0.30 against none: the map's diagonal tells them apart at 0.1.
            assertEquals(built, within > 0.1, sector + " within-sector residual correlation " + within);
        }
    }
}
