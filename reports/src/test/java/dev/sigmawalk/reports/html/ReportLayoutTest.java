package dev.sigmawalk.reports.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.compare.Comparison;
import dev.sigmawalk.engine.run.PathResult;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.select.Elements;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * The report read back as a committee member and a phone reader meet it: the answer leads with
 * the heat maps, every strategy's settings and baseline are stated, every window has its charts
 * over time, chart files are named by chart, window and strategy, and the style sheet keeps
 * tables and charts readable from 400 to 1,400 px.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class ReportLayoutTest {
    /** The smallest on-screen text of a chart (in CSS px) the style sheet must keep at 400 px (common practice for legibility). */
    private static final double LEGIBLE_PX = 10;
    /** Content width of a 400 px phone: the viewport less the phone layout's padding (0.75 rem each side at 15 px). */
    private static final double PHONE_CONTENT_PX = 400 - 2 * 0.75 * 15;

    private ReportData data;
    private Document doc;
    private String style;
    private Path charts;

    @BeforeAll
    void render(@TempDir Path dir) throws Exception {
        data = EvidenceFixture.data();
        charts = dir.resolve("charts");
        new ReportWriter().write(data, dir.resolve("report.html"), charts);
        doc = Jsoup.parse(Files.readString(dir.resolve("report.html"), StandardCharsets.UTF_8));
        style = doc.select("style").html();
    }

    @Test
    void firstSection_leadsWithTheHeatMaps_beforeAnyChart() {
        Element first = doc.selectFirst("main > section");
        assertEquals("lowest-risk", first.id(), "the answer comes first");
        Element volatility = first.getElementById("matrix-volatility");
        Element sharpe = first.getElementById("matrix-sharpe");
        assertNotNull(volatility, "volatility heat map");
        assertNotNull(sharpe, "Sharpe heat map");
        List<Element> order = first.select("table.matrix, figure");
        assertTrue(order.get(0).is("table.matrix") && order.get(1).is("table.matrix"), "heat maps before charts");
    }

    /** Each cell holds its summary value, formatted as the headline table formats it, shaded darker for better values. */
    @Test
    void heatMapCells_holdEachPathsValue_shadedDarkerWhenBetter() {
        Element table = doc.getElementById("matrix-volatility");
        List<Integer> windows = data.windows();
        List<String> headers = table.select("thead th").eachText();
        assertEquals("Strategy", headers.get(0));
        for (int k = 0; k < windows.size(); k++) {
            assertEquals(windows.get(k) + " periods", headers.get(k + 1));
        }
        double lowest = Double.POSITIVE_INFINITY;
        String darkest = null;
        for (Element row : table.select("tbody tr:not(.benchmark)")) {
            String strategy = row.selectFirst("td").text();
            for (int k = 0; k < windows.size(); k++) {
                Element cell = row.select("td").get(k + 1);
                double v = data.summary(data.run().path(strategy, windows.get(k))).volatility();
                assertEquals(Formats.percent(v), cell.ownText(), strategy + ", window " + windows.get(k));
                if (v < lowest) {
                    lowest = v;
                    darkest = cell.attr("style");
                }
            }
        }
        assertEquals("background: " + AnswerMatrix.shade(1), darkest, "the lowest volatility has the darkest shade");
        Element market = table.selectFirst("tbody tr.benchmark");
        assertEquals("market", market.selectFirst("td").text());
        assertTrue(market.select("td[style]").isEmpty(), "the market row is not shaded");
    }

    /**
     * A cell is marked ● exactly when its family-corrected p-value is at or below 5 %, ○ when it
     * was compared and is above, and carries no mark when the strategy has no baseline.
     */
    @Test
    void heatMapMarks_followTheFamilyCorrectedPValues() {
        Element table = doc.getElementById("matrix-volatility");
        int marked = 0;
        for (Element row : table.select("tbody tr:not(.benchmark)")) {
            String strategy = row.selectFirst("td").text();
            for (int k = 0; k < data.windows().size(); k++) {
                int window = data.windows().get(k);
                String mark = row.select("td").get(k + 1).selectFirst("span.mark").text();
                java.util.Optional<Comparison> c = data.evidence().comparisons().stream()
                        .filter(x -> x.strategy().equals(strategy) && x.window() == window).findFirst();
                String expected = c.filter(x -> x.variance().isPresent() && Double.isFinite(x.familyVariance()))
                        .map(x -> x.familyVariance() <= 0.05 ? AnswerMatrix.SIGNIFICANT : AnswerMatrix.NOT_SIGNIFICANT)
                        .orElse("");
                assertEquals(expected, mark, strategy + ", window " + window);
                marked += mark.isEmpty() ? 0 : 1;
            }
        }
        assertTrue(marked > 0, "the fixture compares pulled with diag, so some cells are marked");
    }

    /** Every strategy is listed with every setting; a strategy without a baseline says why. */
    @Test
    void strategyTable_statesEverySettingAndEveryBaselineOrItsReason() {
        Element table = doc.getElementById("strategy-table");
        assertEquals(StrategySettings.HEADERS, table.select("thead th").eachText());
        Elements rows = table.select("tbody tr");
        assertEquals(data.study().strategies().size(), rows.size());
        for (int k = 0; k < rows.size(); k++) {
            List<String> cells = rows.get(k).select("td").eachText();
            assertEquals(data.study().strategies().get(k).name(), cells.get(0));
            for (String c : cells) {
                assertFalse(c.isBlank(), "no blank setting in row " + k + ": " + cells);
            }
        }
        assertEquals("Sample covariance of the window", rows.get(0).select("td").get(1).text());
        assertEquals("Lowest forecast variance", rows.get(0).select("td").get(2).text());
        assertEquals("None: short sales allowed", rows.get(0).select("td").get(3).text());
        assertTrue(rows.get(1).select("td").get(8).text().startsWith("diag ("), "pulled is compared with diag");
        assertTrue(rows.get(2).select("td").get(8).text().startsWith("None: equal weight does not use"),
                "equal has no baseline, and says why: " + rows.get(2).select("td").get(8).text());
        assertEquals("The single-index covariance (Ledoit & Wolf 2003)", rows.get(1).select("td").get(7).text());
        String settings = doc.getElementById("walk-forward-settings").text();
        assertTrue(settings.contains("24 periods (about 2 years); 36 periods (about 3 years)"), settings);
        assertTrue(settings.contains("Every period"), settings);
        assertTrue(settings.contains("10 bp of wealth per unit of weight"), settings);
        assertTrue(settings.contains("out of sample " + data.run().dates()[0]), settings);
    }

    /** Untested strategies are named under the heat maps, with the reason. */
    @Test
    void untestedStrategies_areNamedUnderTheHeatMaps() {
        List<String> notes = doc.select("#lowest-risk p.untested").eachText();
        assertTrue(notes.stream().anyMatch(n -> n.startsWith("equal: not tested: equal weight does not use")), notes.toString());
        assertTrue(notes.stream().noneMatch(n -> n.startsWith("pulled")), "pulled was tested: " + notes);
    }

    /** Every window has a folded section of charts over time; the headline window's starts open. */
    @Test
    void everyWindow_hasItsChartsOverTime_inAFoldedSection() {
        Elements sections = doc.select("#over-time details.window");
        assertEquals(data.windows().size(), sections.size());
        long open = sections.stream().filter(d -> d.hasAttr("open")).count();
        assertEquals(1, open, "only the headline window is unfolded");
        for (int k = 0; k < sections.size(); k++) {
            Element d = sections.get(k);
            int w = data.windows().get(k);
            assertNotNull(d.selectFirst("summary"), "window " + w + " has a heading to unfold");
            assertNotNull(d.getElementById("drawdown-w" + w), "drawdown, window " + w);
            assertNotNull(d.getElementById("rolling-volatility-w" + w), "trailing volatility, window " + w);
        }
        assertTrue(doc.select("script").isEmpty(), "folding needs no script");
    }

    /** PNG copies are named by chart, window and strategy (never s1, s2, ...), at twice the chart's size. */
    @Test
    void pngCopies_areNamedByChartWindowAndStrategy() throws Exception {
        for (PathResult p : data.run().paths()) {
            Path png = charts.resolve("forecast-w" + p.window() + "-" + FileNames.slug(p.strategy()) + ".png");
            assertTrue(Files.isRegularFile(png), png.toString());
        }
        try (var files = Files.list(charts)) {
            assertTrue(files.noneMatch(f -> f.getFileName().toString().matches(".*-s\\d+\\.png")), "no numbered names");
        }
        Element forecast = doc.getElementById("forecast-w36-pulled");
        assertNotNull(forecast);
        String caption = forecast.selectFirst("figcaption").text();
        assertFalse(caption.toLowerCase(Locale.ROOT).startsWith("solid"), "the realised line is not always solid: " + caption);
        assertTrue(caption.contains("strategy's own colour and pattern"), caption);
    }

    /** Growth is drawn on a log scale: its axis says so and its caption explains it. */
    @Test
    void growth_isOnALogScale() {
        Element growth = doc.selectFirst("#lowest-risk figure[id^=growth-w]");
        assertNotNull(growth);
        assertTrue(growth.select("svg text").eachText().stream().anyMatch(t -> t.contains("log scale")), "chart title");
        assertTrue(growth.selectFirst("figcaption").text().contains("logarithmic"), "caption");
    }

    @Test
    void turnover_isChartedAgainstWindowLength() {
        Element chart = doc.getElementById("window-turnover");
        assertNotNull(chart);
        assertTrue(chart.select("svg text").eachText().contains("Estimation window (periods)"), "x axis is the window");
    }

    /**
     * On a 400 px phone a chart is drawn at the content width; its smallest text (tick labels,
     * read from the SVG) must stay at or above {@value #LEGIBLE_PX} px after that scaling.
     */
    @Test
    void chartText_staysLegible_onA400PxPhone() {
        Pattern size = Pattern.compile("font-size: (\\d+(?:\\.\\d+)?)px");
        for (Element figure : doc.select("figure")) {
            String svg = figure.selectFirst("svg").outerHtml();
            String[] box = figure.selectFirst("svg").attr("viewBox").trim().split("\\s+");
            assertEquals(4, box.length, "viewBox of " + figure.id());
            double scale = Math.min(1, PHONE_CONTENT_PX / Double.parseDouble(box[2]));
            Matcher m = size.matcher(svg);
            double smallest = Double.POSITIVE_INFINITY;
            while (m.find()) {
                smallest = Math.min(smallest, Double.parseDouble(m.group(1)));
            }
            assertTrue(smallest * scale >= LEGIBLE_PX, figure.id() + ": smallest text " + smallest * scale + " px");
        }
        assertTrue(style.contains("figure svg { display: block; width: 100%; height: auto; }"), "charts fit the column");
        assertTrue(style.contains("minmax(min(100%, 27rem), 1fr)"), "one chart per row when the column is narrow");
    }

    /**
     * Tables keep their first column in view when they scroll sideways, and on a 1,400 px screen
     * the content column is wide enough for the widest table (headings may wrap, so no column hides).
     */
    @Test
    void tables_haveAStickyFirstColumn_andRoomAt1400Px() {
        assertTrue(style.contains(".scroll th:first-child, .scroll td:first-child { position: sticky; left: 0;"),
                "sticky first column");
        assertTrue(style.contains("main { max-width: 86rem;"), "content up to 86 rem (1,376 px) wide");
        assertTrue(style.contains("th { vertical-align: bottom; font-weight: 600; white-space: normal;"),
                "headings wrap rather than widen the table");
        for (Element table : doc.select("table")) {
            assertTrue(table.parent().hasClass("scroll"), "every table scrolls inside its own box: " + table.id());
        }
    }
}
