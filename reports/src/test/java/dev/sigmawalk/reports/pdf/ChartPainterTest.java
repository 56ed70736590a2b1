package dev.sigmawalk.reports.pdf;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.reports.charts.ChartLine;
import dev.sigmawalk.reports.charts.ChartRenderer;
import dev.sigmawalk.reports.charts.LineCharts;
import dev.sigmawalk.reports.charts.LineOptions;
import dev.sigmawalk.reports.charts.ModelFamily;
import dev.sigmawalk.reports.charts.RenderedChart;
import dev.sigmawalk.reports.charts.SeriesStyle;
import java.nio.file.Path;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.jfree.chart.JFreeChart;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The PDF draws a chart of the page from its chart object, and any other SVG from its markup:
 * both end up as stroked vector paths on the page, read back with PDFBox.
 */
class ChartPainterTest {
    private static final String TITLE = "Turnover by window length";

    private static JFreeChart chart() {
        double[] x = {60, 120, 240};
        return LineCharts.overNumber(TITLE, "Window (periods)", LineCharts.plainAxis(), "Turnover (%)",
                LineCharts.percentAxis(), List.of(new ChartLine("sample-minvar",
                        new SeriesStyle(ModelFamily.SAMPLE, 2f, new float[0]), x, new double[] {0.3, 0.2, 0.15})),
                new LineOptions(true, false));
    }

    private static String page(String figure) {
        return "<!DOCTYPE html><html><head><title>t</title></head><body><h1>Charts</h1><div class=\"figures\">"
                + "<figure>" + figure + "<figcaption>caption</figcaption></figure></div></body></html>";
    }

    @Test
    void chartOfThePage_isDrawnFromItsChartObject_withItsTextAsText(@TempDir Path dir) throws Exception {
        RenderedChart c = RenderedChart.start("turnover", chart(), new ChartRenderer(480, 340),
                dir.resolve("turnover.png"), Runnable::run);
        ReportPdf.write(page(c.outline()), dir, List.of(c), dir.resolve("a.pdf"));
        try (PDDocument pdf = Loader.loadPDF(dir.resolve("a.pdf").toFile())) {
            assertEquals(1, pdf.getNumberOfPages(), "pages");
            String text = new PDFTextStripper().getText(pdf).replaceAll("\\s+", " ");
            assertTrue(text.contains(TITLE), "chart title printed as text: " + text);
            assertTrue(text.contains("Window (periods)"), "axis label printed as text: " + text);
            assertTrue(PdfStrokes.of(pdf) > 3, "the line and the axes are stroked: " + PdfStrokes.of(pdf));
        }
    }

    @Test
    void otherSvg_isDrawnFromItsMarkup(@TempDir Path dir) throws Exception {
        String svg = "<svg id='other' viewBox='0 0 100 50'><path d='M 0 0 L 100 50' stroke='black'"
                + " fill='none'/></svg>";
        ReportPdf.write(page(svg), dir, List.of(), dir.resolve("b.pdf"));
        try (PDDocument pdf = Loader.loadPDF(dir.resolve("b.pdf").toFile())) {
            assertTrue(PdfStrokes.of(pdf) >= 1, "the SVG's one path is stroked");
            assertFalse(new PDFTextStripper().getText(pdf).contains(TITLE), "no chart was drawn");
        }
    }
}
