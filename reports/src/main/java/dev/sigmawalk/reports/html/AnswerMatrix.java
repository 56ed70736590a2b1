package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.compare.Comparison;
import dev.sigmawalk.engine.evidence.DifferenceTest;
import dev.sigmawalk.engine.measures.Summary;
import dev.sigmawalk.engine.run.PathResult;
import dev.sigmawalk.reports.charts.StyleBook;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Function;
import java.util.function.ToDoubleFunction;

/**
 * The study's answer at a glance: one heat map per headline measure, strategies down, window
 * lengths across, each cell shaded by its value (darker is better) and marked by whether the
 * difference from the strategy's baseline survived the correction for the whole family of tests.
 * The market row is shown for reference, unshaded.
 */
final class AnswerMatrix {
    /** Marks of a cell, shown after its value. */
    static final String SIGNIFICANT = "\u25CF";
    static final String NOT_SIGNIFICANT = "\u25CB";
    /**
     * Lightest and darkest shade of the ramp, a blue-green of this report and no family's colour.
     * The darkest still gives the report's dark ink a contrast above 4.5:1 (WCAG 2.1, 1.4.3), so
     * every cell keeps one text colour.
     */
    private static final int[] LIGHT = {0xF4, 0xF8, 0xF7};
    private static final int[] DARK = {0x6A, 0xA9, 0xA2};

    private final ReportData data;
    private final StyleBook styles;

    AnswerMatrix(ReportData data, StyleBook styles) {
        this.data = data;
        this.styles = styles;
    }

    List<ReportView.Matrix> both() {
        return List.of(
                matrix("matrix-volatility", "Realised volatility (% a year); darker is lower", Summary::volatility,
                        Formats::percent, true, Comparison::variance, Comparison::familyVariance),
                matrix("matrix-sharpe", "Sharpe ratio (annualised); darker is higher", Summary::sharpe,
                        Formats::ratio, false, Comparison::sharpe, Comparison::familySharpe));
    }

    private ReportView.Matrix matrix(String id, String title, ToDoubleFunction<Summary> measure,
                                     java.util.function.DoubleFunction<String> format, boolean lowerIsBetter,
                                     Function<Comparison, Optional<DifferenceTest>> test,
                                     ToDoubleFunction<Comparison> familyP) {
        List<Integer> windows = data.windows();
        double low = Double.POSITIVE_INFINITY;
        double high = Double.NEGATIVE_INFINITY;
        for (PathResult p : data.run().paths()) {
            double v = measure.applyAsDouble(data.summary(p));
            if (Double.isFinite(v)) {
                low = Math.min(low, v);
                high = Math.max(high, v);
            }
        }
        List<ReportView.MatrixRow> rows = new ArrayList<>();
        for (String strategy : strategies()) {
            List<ReportView.MatrixCell> cells = new ArrayList<>();
            for (int w : windows) {
                cells.add(cell(strategy, w, measure, format, lowerIsBetter, low, high, test, familyP));
            }
            rows.add(new ReportView.MatrixRow(strategy, styles.family(strategy).cssClass(), false, cells));
        }
        String market = format.apply(measure.applyAsDouble(data.market()));
        List<ReportView.MatrixCell> flat = new ArrayList<>();
        for (int k = 0; k < windows.size(); k++) {
            flat.add(new ReportView.MatrixCell(market, "", "", "the market does not depend on the window"));
        }
        rows.add(new ReportView.MatrixRow(Families.MARKET, styles.family(Families.MARKET).cssClass(), true, flat));
        List<String> headers = windows.stream().map(Words::periods).toList();
        return new ReportView.Matrix(id, title, headers, rows);
    }

    private ReportView.MatrixCell cell(String strategy, int window, ToDoubleFunction<Summary> measure,
                                       java.util.function.DoubleFunction<String> format, boolean lowerIsBetter,
                                       double low, double high, Function<Comparison, Optional<DifferenceTest>> test,
                                       ToDoubleFunction<Comparison> familyP) {
        PathResult path = data.run().path(strategy, window);
        double v = measure.applyAsDouble(data.summary(path));
        double share = !Double.isFinite(v) || !(high > low) ? 0 : (lowerIsBetter ? high - v : v - low) / (high - low);
        String background = Double.isFinite(v) ? shade(share) : "";
        Optional<Comparison> c = data.evidence().comparisons().stream()
                .filter(x -> x.strategy().equals(strategy) && x.window() == window).findFirst();
        String mark = "";
        String note;
        if (c.isEmpty()) {
            note = "not tested: no baseline";
        } else if (test.apply(c.get()).isEmpty() || !Double.isFinite(familyP.applyAsDouble(c.get()))) {
            note = "not tested against " + c.get().baseline() + c.get().skipped().map(s -> ": " + s).orElse("");
        } else {
            double p = familyP.applyAsDouble(c.get());
            boolean significant = p <= EvidenceSections.LEVEL;
            mark = significant ? SIGNIFICANT : NOT_SIGNIFICANT;
            note = (significant ? "differs from " : "not distinguishable from ") + c.get().baseline()
                    + " (family-corrected p = " + Formats.pValue(p) + ")";
        }
        return new ReportView.MatrixCell(format.apply(v), mark, background, note);
    }

    /** The ramp's colour at {@code share} in [0, 1], as CSS hex. */
    static String shade(double share) {
        double t = Math.max(0, Math.min(1, share));
        int[] rgb = new int[3];
        for (int k = 0; k < 3; k++) {
            rgb[k] = (int) Math.round(LIGHT[k] + t * (DARK[k] - LIGHT[k]));
        }
        return String.format(Locale.ROOT, "#%02x%02x%02x", rgb[0], rgb[1], rgb[2]);
    }

    private List<String> strategies() {
        return data.run().paths().stream().map(PathResult::strategy).distinct().toList();
    }
}
