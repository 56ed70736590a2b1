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
}
