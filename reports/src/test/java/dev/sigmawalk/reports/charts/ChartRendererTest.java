package dev.sigmawalk.reports.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import javax.imageio.ImageIO;
import org.jfree.chart.JFreeChart;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ChartRendererTest {
    private static final String HOSTILE = "<script>alert(1)</script>";

    private static JFreeChart chart() {
        double[] x = {1, 2, 3, 4};
        return LineCharts.overNumber("Test", "Window (periods)", LineCharts.plainAxis(), "Volatility (% a year)",
                LineCharts.percentAxis(), List.of(
                        new ChartLine(HOSTILE, new SeriesStyle(ModelFamily.SAMPLE, 2f, new float[0]), x,
                                new double[] {0.1, 0.12, Double.NaN, 0.09}),
                        new ChartLine("\" onload=\"x", new SeriesStyle(ModelFamily.MARKET, 2f, ModelFamily.MARKET.dash()),
                                x, new double[] {0.15, 0.15, 0.15, 0.15})),
                new LineOptions(true, false));
    }

    @Test
    void svg_scalesWithWidth_andCarriesNoAddress() {
        String svg = new ChartRenderer(640, 320).svg(chart(), "fig-a");
        assertTrue(svg.startsWith("<svg"), svg.substring(0, 40));
        assertTrue(svg.contains("viewBox='0.0 0.0 640.0 320.0'") || svg.contains("viewBox=\"0 0 640 320\""),
                "viewBox present");
        assertFalse(svg.matches("(?s)<svg[^>]*\\swidth=.*"), "no fixed width on the root element");
        assertFalse(svg.contains("http"), "no web address, not even a namespace");
        assertTrue(svg.contains("id='fig-a-clip-0'"), "ids carry the given prefix");
    }

    @Test
    void svg_escapesUserText() {
        String svg = new ChartRenderer(640, 320).svg(chart(), "fig-b");
        assertFalse(svg.contains(HOSTILE), "raw markup must not survive");
        assertTrue(svg.contains("&lt;script&gt;alert(1)&lt;/script&gt;"), "legend text escaped");
        assertTrue(svg.contains("&quot; onload=&quot;x"), "quotes escaped");
    }

    @Test
    void svg_isTheSameOnEveryRun() {
        ChartRenderer r = new ChartRenderer(640, 320);
        assertEquals(r.svg(chart(), "fig-c"), r.svg(chart(), "fig-c"));
    }

    @Test
    void png_isTwiceTheRequestedSize_andIsNotBlank(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("chart.png");
        new ChartRenderer(640, 320).png(chart(), file);
        BufferedImage img = ImageIO.read(file.toFile());
        assertEquals(1280, img.getWidth());
        assertEquals(640, img.getHeight());
        Set<Integer> colours = new HashSet<>();
        for (int y = 0; y < img.getHeight(); y += 3) {
            for (int x = 0; x < img.getWidth(); x += 3) {
                colours.add(img.getRGB(x, y));
            }
        }
        assertTrue(colours.size() > 1, "picture has more than one colour: " + colours.size());
        assertTrue(colours.contains(ModelFamily.SAMPLE.colour().getRGB()), "the sample family's colour is drawn");
    }

    /**
     * The namespace pass removes exactly what the pattern {@code \s+xmlns(:[A-Za-z]+)?=("[^"]*"|'[^']*')}
     * replaced by nothing removes (java.util.regex as the reference), on seeded strings built from
     * the fragments that matter: white space of every kind, the word, prefixes, both quotes, an
     * unclosed value, a missing '=' or prefix.
     */
    @Test
    void namespacePass_removesWhatThePatternRemoves() {
        java.util.regex.Pattern reference = java.util.regex.Pattern.compile("\\s+xmlns(:[A-Za-z]+)?=(\"[^\"]*\"|'[^']*')");
        String[] parts = {" ", "  ", "\t", "\n", "\r", "\f", "\u000B", "xmlns", "xmlns", ":xlink", ":", ":9", "=", "\"",
            "'", "a", "<svg", ">", "http://x", "xmlnsx", "s"};
        java.util.SplittableRandom draws = new java.util.SplittableRandom(31_337L);
        for (int c = 0; c < 20_000; c++) {
            StringBuilder s = new StringBuilder();
            for (int k = draws.nextInt(14); k >= 0; k--) {
                s.append(parts[draws.nextInt(parts.length)]);
            }
            String in = s.toString();
            assertEquals(reference.matcher(in).replaceAll(""), ChartRenderer.withoutNamespaces(in), in);
        }
        assertEquals("<svg width='2'><g/></svg>", ChartRenderer.withoutNamespaces(
                "<svg xmlns=\"http://www.w3.org/2000/svg\" xmlns:xlink='http://www.w3.org/1999/xlink' width='2'><g/></svg>"));
    }
}
