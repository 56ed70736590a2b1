package dev.sigmawalk.reports.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
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

        sectorMaps_showTheCsvCells_andTheBuiltBlocksFade(doc, dir);
    }

    /** The sum of the red, green and blue of a cell's {@code background: #rrggbb}. */
    private static double lightness(String style) {
        String hex = style.replace("background: #", "");
        return Integer.parseInt(hex.substring(0, 2), 16) + Integer.parseInt(hex.substring(2, 4), 16)
                + Integer.parseInt(hex.substring(4, 6), 16);
    }

    /**
     * The single index's and the sector model's sector x sector maps stand side by side in the
     * report, over the same sectors and on one colour scale; each cell's text and title carry the
     * value {@code sector_correlations.csv} holds for that window, model and pair; and the three
     * built sector shocks, warm on the single index's diagonal, fade on the sector model's.
     */
    private static void sectorMaps_showTheCsvCells_andTheBuiltBlocksFade(Document doc, Path dir) throws IOException {
        Element single = doc.getElementById("sector-map");
        Element sector = doc.getElementById("sector-map-multi-index-sectors");
        assertTrue(single != null && sector != null, "both maps exist");
        assertEquals(single.closest(".sector-maps"), sector.closest(".sector-maps"), "the maps stand together");
        List<String> names = single.select("thead th").eachText();
        assertEquals(names, sector.select("thead th").eachText(), "the same sectors");
        int window = Integer.parseInt(single.selectFirst("caption").text().replaceAll(".*\\((\\d+)-period window.*", "$1"));
        Map<String, Double> csv = new HashMap<>();
        List<String> lines = Files.readAllLines(dir.resolve("sector_correlations.csv"));
        assertEquals("window,model,sector,other_sector,rebalances,mean_residual_corr", lines.get(0));
        for (String line : lines.subList(1, lines.size())) {
            String[] c = line.split(",");
            csv.put(c[0] + "|" + c[1] + "|" + c[2] + "|" + c[3], Double.parseDouble(c[5]));
        }
        List<double[]> shades = new ArrayList<>();
        for (Element map : List.of(single, sector)) {
            String model = map == single ? "single-index" : "multi-index:sectors";
            for (Element row : map.select("tbody tr")) {
                String a = row.selectFirst("td").text();
                for (int k = 1; k < names.size(); k++) {
                    String b = names.get(k);
                    Element td = row.select("td").get(k);
                    Double value = csv.get(window + "|" + model + "|" + (a.compareTo(b) <= 0 ? a + "|" + b : b + "|" + a));
                    assertTrue(value != null, model + " " + a + " x " + b + " in sector_correlations.csv");
                    String shown = String.format(Locale.ROOT, "%.2f", value);
                    assertEquals(shown, td.text(), model + " " + a + " x " + b);
                    assertTrue(td.attr("title").contains("mean residual correlation " + shown), td.attr("title"));
                    shades.add(new double[] {value, lightness(td.attr("style"))});
                }
            }
        }
        // One colour scale for both maps: of two cells of the same sign, the larger in size is never lighter.
        for (double[] x : shades) {
            for (double[] y : shades) {
                if (x[0] * y[0] >= 0 && Math.abs(x[0]) < Math.abs(y[0])) {
                    assertTrue(x[1] >= y[1], "shade of " + x[0] + " against " + y[0]);
                }
            }
        }
        assertEquals(5, doc.select("ul.shade-key li").size(), "the shared colour key");
        for (String built : new String[] {"Tidewater Power", "Lending Houses", "Ferry and Freight"}) {
            double before = csv.get(window + "|single-index|" + built + "|" + built);
            double after = csv.get(window + "|multi-index:sectors|" + built + "|" + built);
            assertTrue(before > 0.1 && after < before / 2, built + " within-sector residual correlation "
                    + before + " -> " + after);
        }
    }
}
