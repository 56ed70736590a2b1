package dev.sigmawalk.reports.sweep;

import com.github.mustachejava.DefaultMustacheFactory;
import com.github.mustachejava.Mustache;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;

/**
 * Writes {@code sweep.html}: one self-contained page (inline CSS, no script, no web address) in
 * the report's look, whose stylesheet it takes from the report's own stylesheet template so the
 * two never drift apart. Output depends only on its inputs.
 */
final class SweepPage {
    private static final String REPORT_STYLE = "/dev/sigmawalk/reports/html/report-style.mustache";
    /** Template sections (the report's per-strategy colours) and tags have no meaning outside the report. */
    private static final Pattern SECTION = Pattern.compile("\\{\\{#(\\w+)}}.*?\\{\\{/\\1}}\\n?", Pattern.DOTALL);
    private static final Pattern TAG = Pattern.compile("\\{\\{[^}]*}}");
    /** Light and dark ends of the cells' colour ramp (the report's tint, and a deep blue). */
    private static final int[] LIGHT = {0xf3, 0xf5, 0xf7};
    private static final int[] DARK = {0x1f, 0x4e, 0x79};
    private static final double DARK_INK_LIMIT = 0.55;

    private final Mustache template = new DefaultMustacheFactory("dev/sigmawalk/reports/sweep").compile("sweep.mustache");

    /** Everything the page shows. */
    record Content(SweepPlan plan, List<PointOutcome> outcomes, List<HeatMap> maps, GridEvidence evidence,
                   String engine, Instant started, Instant finished) {
    }

    void write(Path file, Content c) {
        try (Writer out = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            template.execute(out, view(c));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file, e);
        }
    }

    static SweepView view(Content c) {
        SweepPlan plan = c.plan();
        List<SweepView.AxisLine> axes = new ArrayList<>();
        for (Axis a : plan.sweep().axes()) {
            List<String> shown = new ArrayList<>();
            for (int i = 0; i < a.values().size(); i++) {
                shown.add(a.label(i));
            }
            axes.add(new SweepView.AxisLine(a.key(), String.join("; ", shown)));
        }
        List<SweepView.HeatTable> maps = c.maps().stream().map(SweepPage::table).toList();
        List<SweepView.PointLine> points = new ArrayList<>();
        for (PointOutcome o : c.outcomes()) {
            GridPoint p = plan.points().get(o.number() - 1);
            points.add(new SweepView.PointLine(p.label(), values(plan, p), o.status().spelling(), o.reason(),
                    o.hasOutputs() ? SweepPlan.POINTS + "/" + p.label() + "/report.html" : ""));
        }
        String subtitle = "Base study " + plan.sweep().study().getFileName() + ", " + count(plan.points().size(), "point")
                + ", run " + c.engine() + ".";
        List<String> leftOut = GridWords.leftOut(c.evidence());
        return new SweepView(style(), plan.sweep().title(), subtitle, axes, counts(c.outcomes()),
                GridWords.answer(plan, c.evidence(), failed(c.outcomes())), GridWords.method(c.evidence()), !leftOut.isEmpty(), leftOut, maps,
                points, c.started().toString(), c.finished().toString());
    }

    private static String values(SweepPlan plan, GridPoint p) {
        List<String> parts = new ArrayList<>();
        for (int a = 0; a < plan.keys().size(); a++) {
            parts.add(plan.keys().get(a) + " = " + p.values().get(a));
        }
        return String.join(", ", parts);
    }

    private static String counts(List<PointOutcome> outcomes) {
        long ran = outcomes.stream().filter(o -> o.status() == PointOutcome.Status.RAN).count();
        long reused = outcomes.stream().filter(o -> o.status() == PointOutcome.Status.REUSED).count();
        return ran + " ran, " + reused + " reused from an earlier run of the same study and inputs, " + failed(outcomes)
                + " failed.";
    }

    private static long failed(List<PointOutcome> outcomes) {
        return outcomes.stream().filter(o -> o.status() == PointOutcome.Status.FAILED).count();
    }

    static String count(long n, String noun) {
        return n + " " + noun + (n == 1 ? "" : "s");
    }

    private static SweepView.HeatTable table(HeatMap m) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double[] row : m.cells()) {
            for (double v : row) {
                if (Double.isFinite(v)) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
            }
        }
        double best = m.measure().higherIsBetter() ? hi : lo;
        List<SweepView.Row> rows = new ArrayList<>();
        for (int i = 0; i < m.cells().length; i++) {
            List<SweepView.Cell> cells = new ArrayList<>();
            for (double v : m.cells()[i]) {
                cells.add(cell(m.measure(), v, lo, hi, best));
            }
            rows.add(new SweepView.Row(m.rowLabels().get(i), cells));
        }
        String note = m.pooled() > 1 ? "Each cell is the median of up to " + m.pooled()
                + " results over the other varied keys and windows." : "Each cell is one result.";
        return new SweepView.HeatTable(m.strategy() + ": " + m.measure().title() + " (" + m.measure().unit() + ")",
                note, m.rowKey(), m.columnKey(), m.columnLabels(), rows);
    }

    private static SweepView.Cell cell(HeatMap.Measure measure, double v, double lo, double hi, double best) {
        if (!Double.isFinite(v)) {
            return new SweepView.Cell("\u2013", "#ffffff", "#59616b", false);
        }
        double t = hi > lo ? (v - lo) / (hi - lo) : 0.5;
        StringBuilder colour = new StringBuilder("#");
        for (int k = 0; k < 3; k++) {
            colour.append(String.format(Locale.ROOT, "%02x", Math.round(LIGHT[k] + t * (DARK[k] - LIGHT[k]))));
        }
        String text = measure == HeatMap.Measure.VOLATILITY
                ? String.format(Locale.ROOT, "%.2f", 100 * v) : String.format(Locale.ROOT, "%.2f", v);
        return new SweepView.Cell(text, colour.toString(), t > DARK_INK_LIMIT ? "#ffffff" : "#1f2328", v == best);
    }

    /** The report's stylesheet (its template partial) without its template tags. */
    static String style() {
        try (InputStream in = SweepPage.class.getResourceAsStream(REPORT_STYLE)) {
            if (in == null) {
                throw new IllegalStateException("the report's stylesheet " + REPORT_STYLE + " is missing");
            }
            String css = new String(in.readAllBytes(), StandardCharsets.UTF_8);
            return TAG.matcher(SECTION.matcher(css).replaceAll("")).replaceAll("").strip();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the report's stylesheet", e);
        }
    }
}
