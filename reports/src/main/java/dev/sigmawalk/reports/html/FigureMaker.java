package dev.sigmawalk.reports.html;

import dev.sigmawalk.reports.charts.ChartRenderer;
import dev.sigmawalk.reports.charts.RenderedChart;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Executor;
import org.jfree.chart.JFreeChart;

/**
 * Hands each chart to the workers that draw its inline SVG and its PNG copy in the charts
 * folder. Remembers the charts in page order so the report can list their files and the PDF can
 * draw them.
 */
final class FigureMaker {
    /**
     * Size of a chart, pixels. Charts sit side by side in a grid on a wide screen and one under
     * another on a phone, so one size of about half a desktop column keeps text legible on both.
     */
    static final ChartRenderer WIDE = new ChartRenderer(480, 340);
    /** Size of a small multiple (one panel of a set), pixels. */
    static final ChartRenderer SMALL = new ChartRenderer(480, 300);

    private final Path chartsDir;
    private final String chartsFolderName;
    private final Executor workers;
    private final List<Path> written = new ArrayList<>();
    private final List<RenderedChart> charts = new ArrayList<>();

    /** @param workers draw the charts; {@code Runnable::run} draws each one at once */
    FigureMaker(Path chartsDir, Executor workers) {
        this.chartsDir = chartsDir;
        this.workers = workers;
        Path name = chartsDir.getFileName();
        this.chartsFolderName = name == null ? "charts" : name.toString();
    }

    Figure make(String id, JFreeChart chart, String caption, ChartRenderer renderer) {
        Path png = chartsDir.resolve(id + ".png");
        if (charts.isEmpty()) {
            try {
                Files.createDirectories(chartsDir);
            } catch (IOException e) {
                throw new UncheckedIOException("could not create the charts folder " + chartsDir + ": "
                        + e.getMessage(), e);
            }
        }
        RenderedChart rendered = RenderedChart.start(id, chart, renderer, png, workers);
        written.add(png);
        charts.add(rendered);
        return new Figure(id, caption, rendered, chartsFolderName + "/" + id + ".png");
    }

    List<Path> written() {
        return List.copyOf(written);
    }

    /** Every chart handed over so far, in page order. */
    List<RenderedChart> charts() {
        return List.copyOf(charts);
    }
}
