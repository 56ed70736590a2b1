package dev.sigmawalk.reports.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDate;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.parser.Parser;
import org.junit.jupiter.api.Test;

/**
 * Every word of a chart reaches the SVG as a {@code <text>} element, never as glyph outlines: the
 * title, both axis labels (the vertical one rotated by its transform), the tick labels of a
 * logarithmic axis and the legend. Glyph outlines show as paths drawn with curves ({@code Q} or
 * {@code C} commands), which no line or shape of these charts uses.
 */
class ChartTextTest {
    private static final String TITLE = "Growth of 1 invested";
    private static final String Y_LABEL = "Value of 1 invested (log scale)";

    private static JFreeChart logChart() {
        LocalDate[] dates = new LocalDate[48];
        double[] a = new double[48];
        double[] b = new double[48];
        for (int t = 0; t < dates.length; t++) {
            dates[t] = LocalDate.of(2010, 1, 31).plusMonths(t);
            a[t] = Math.pow(1.05, t);
            b[t] = Math.pow(1.01, t);
        }
        double[] x = TimeAxisValues.of(dates);
        return LineCharts.overTimeLog(TITLE, Y_LABEL, List.of(
                new ChartLine("fast", new SeriesStyle(ModelFamily.SAMPLE, 2f, new float[0]), x, a),
                new ChartLine("slow", new SeriesStyle(ModelFamily.MARKET, 2f, ModelFamily.MARKET.dash()), x, b)));
    }

    private static Document svg(JFreeChart chart) {
        return Jsoup.parse(new ChartRenderer(480, 300).svg(chart, "t"), "", Parser.xmlParser());
    }

    @Test
    void logChart_drawsEveryLabelAsText() {
        Document doc = svg(logChart());
        List<String> texts = doc.select("text").eachText();
        assertTrue(texts.contains(TITLE), "title: " + texts);
        assertTrue(texts.contains("Date"), "horizontal axis label: " + texts);
        assertTrue(texts.contains("fast") && texts.contains("slow"), "legend: " + texts);
        for (String tick : new String[] {"1", "2", "4", "8"}) {
            assertTrue(texts.contains(tick), "log-axis tick label " + tick + ": " + texts);
        }
        Element vertical = doc.select("text").stream().filter(t -> t.text().equals(Y_LABEL)).findFirst()
                .orElseThrow(() -> new AssertionError("vertical axis label as text: " + texts));
        String transform = vertical.hasAttr("transform") ? vertical.attr("transform") : vertical.parent().attr("transform");
        assertTrue(transform.startsWith("matrix(0") || transform.contains("rotate"), "drawn rotated: " + transform);
        assertNoGlyphOutlines(doc);
    }

    @Test
    void numberChart_drawsBothAxisLabelsAsText() {
        double[] x = {36, 60, 120};
        Document doc = svg(LineCharts.overNumber("By window", "Window (periods)", LineCharts.plainAxis(),
                "Volatility (% a year)", LineCharts.percentAxis(), List.of(new ChartLine("sample",
                        new SeriesStyle(ModelFamily.SAMPLE, 2f, new float[0]), x, new double[] {0.14, 0.13, 0.15})),
                new LineOptions(true, false)));
        List<String> texts = doc.select("text").eachText();
        assertTrue(texts.contains("Window (periods)"), texts.toString());
        assertTrue(texts.contains("Volatility (% a year)"), texts.toString());
        assertNoGlyphOutlines(doc);
    }

    private static void assertNoGlyphOutlines(Document doc) {
        for (Element path : doc.select("path")) {
            String d = path.attr("d");
            assertFalse(d.contains("Q") || d.contains("C"), "a path drawn with curves, a glyph outline: "
                    + d.substring(0, Math.min(80, d.length())));
        }
        assertEquals(0, doc.select("g[transform] > path").stream()
                .filter(p -> p.parent().attr("style").contains("stroke:none")).count(), "no rotated filled shape");
    }
}
