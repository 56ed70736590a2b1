package dev.sigmawalk.reports.html;

import dev.sigmawalk.reports.charts.RenderedChart;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;

/**
 * The report's page as assembled while its charts are still being drawn: the markup with every
 * chart's {@code <svg>} element empty ({@link RenderedChart#outline}), the charts, and the PNG
 * files their workers write.
 *
 * @param outline the page with empty chart elements (what the PDF lays out; it draws each chart itself)
 * @param charts every chart of the page
 * @param pngs the PNG copies, in the order the charts were made
 */
public record ReportPage(String outline, List<RenderedChart> charts, List<Path> pngs) {
    public ReportPage {
        Objects.requireNonNull(outline, "outline");
        charts = List.copyOf(charts);
        pngs = List.copyOf(pngs);
    }

    /**
     * The page with every chart's full SVG markup in place of its empty element, waiting for the
     * workers still drawing. An outline occurs once: ids are unique, and text on the page is
     * escaped, so no other text can look like one.
     */
    public String html() {
        List<Placed> placed = new ArrayList<>();
        for (RenderedChart c : charts) {
            String empty = c.outline();
            int at = outline.indexOf(empty);
            if (at >= 0) {
                placed.add(new Placed(at, empty.length(), c));
            }
        }
        placed.sort(Comparator.comparingInt(Placed::at));
        StringBuilder out = new StringBuilder(outline.length() + 40_000 * placed.size());
        int from = 0;
        for (Placed p : placed) {
            out.append(outline, from, p.at()).append(p.chart().svg());
            from = p.at() + p.length();
        }
        return out.append(outline, from, outline.length()).toString();
    }

    /** Writes {@link #html} to {@code file}, creating its folder when missing. */
    public void writeHtml(Path file) throws IOException {
        Path parent = file.toAbsolutePath().getParent();
        if (parent != null) {
            Files.createDirectories(parent);
        }
        Files.writeString(file, html(), StandardCharsets.UTF_8);
    }

    private record Placed(int at, int length, RenderedChart chart) {
    }
}
