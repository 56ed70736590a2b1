package dev.sigmawalk.reports.html;

import dev.sigmawalk.reports.charts.ChartRenderer;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.JFreeChart;

/**
 * Renders charts to inline SVG and writes their PNG copies into the charts folder. Remembers the
 * files it wrote so the report can list them.
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
    private final List<Path> written = new ArrayList<>();

    FigureMaker(Path chartsDir) {
        this.chartsDir = chartsDir;
        Path name = chartsDir.getFileName();
        this.chartsFolderName = name == null ? "charts" : name.toString();
    }

    Figure make(String id, JFreeChart chart, String caption, ChartRenderer renderer) {
        Path png = chartsDir.resolve(id + ".png");
        try {
            Files.createDirectories(chartsDir);
            renderer.png(chart, png);
        } catch (IOException e) {
            throw new UncheckedIOException("could not write chart " + png + ": " + e.getMessage(), e);
        }
        written.add(png);
        return new Figure(id, caption, renderer.svg(chart, id), chartsFolderName + "/" + id + ".png");
    }

    List<Path> written() {
        return List.copyOf(written);
    }
}
