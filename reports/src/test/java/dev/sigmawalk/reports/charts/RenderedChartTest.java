package dev.sigmawalk.reports.charts;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import org.jfree.chart.JFreeChart;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RenderedChartTest {
    private static final ChartRenderer SIZE = new ChartRenderer(480, 300);

    private static JFreeChart chart(int k) {
        double[] x = new double[50];
        double[] y = new double[50];
        for (int t = 0; t < x.length; t++) {
            x[t] = t;
            y[t] = Math.sin(0.2 * t + k) + 0.01 * k * t;
        }
        return LineCharts.overNumber("Chart " + k, "x", LineCharts.plainAxis(), "y", LineCharts.plainAxis(),
                List.of(new ChartLine("line " + k, new SeriesStyle(ModelFamily.SAMPLE, 2f, new float[0]), x, y)),
                new LineOptions(false, false));
    }

    /** Twelve charts drawn by four threads at once give the SVG and PNG bytes of the renderer on one thread. */
    @Test
    void chartsDrawnSideBySide_giveTheBytesOfOneThread(@TempDir Path dir) throws Exception {
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<RenderedChart> charts = new ArrayList<>();
            for (int k = 0; k < 12; k++) {
                charts.add(RenderedChart.start("c" + k, chart(k), SIZE, dir.resolve("c" + k + ".png"), pool));
            }
            for (int k = 0; k < 12; k++) {
                Path alone = dir.resolve("alone" + k + ".png");
                SIZE.png(chart(k), alone);
                assertEquals(SIZE.svg(chart(k), "c" + k), charts.get(k).svg(), "SVG of chart " + k);
                assertArrayEquals(Files.readAllBytes(alone), Files.readAllBytes(dir.resolve("c" + k + ".png")),
                        "PNG of chart " + k);
            }
        } finally {
            pool.shutdownNow();
        }
    }

    @Test
    void outline_isTheEmptyElementWithTheChartsIdAndViewBox(@TempDir Path dir) {
        RenderedChart c = RenderedChart.start("growth-w60", chart(1), SIZE, dir.resolve("g.png"), Runnable::run);
        assertEquals("<svg id='growth-w60' viewBox='0 0 480 300'></svg>", c.outline());
        assertTrue(c.svg().startsWith("<svg id='growth-w60' viewBox='0.0 0.0 480.0 300.0'>"), c.svg().substring(0, 60));
    }

    @Test
    void unwritablePng_isReportedWithItsPath_whenTheMarkupIsAskedFor(@TempDir Path dir) {
        Path png = dir.resolve("missing-folder").resolve("c.png");
        RenderedChart c = RenderedChart.start("c", chart(2), SIZE, png, Runnable::run);
        UncheckedIOException e = assertThrows(UncheckedIOException.class, c::svg);
        assertTrue(e.getMessage().contains("could not write chart " + png), e.getMessage());
    }
}
