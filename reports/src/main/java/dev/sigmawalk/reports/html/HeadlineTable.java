package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.measures.Summary;
import dev.sigmawalk.engine.run.PathResult;
import dev.sigmawalk.reports.charts.StyleBook;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

/**
 * The headline table: every strategy and window with every measure of {@code summary.csv},
 * then the market. In each column with a best direction, the best value among the strategies is
 * marked (the benchmark is shown for reference and not ranked); equal best values are all
 * marked; values that are empty or not finite never are.
 */
final class HeadlineTable {
    private HeadlineTable() {
    }

    static ReportView.Table of(ReportData data, StyleBook styles) {
        List<ReportView.Header> headers = new ArrayList<>();
        List<ReportView.Explanation> explanations = new ArrayList<>();
        for (Measure m : Measure.values()) {
            headers.add(new ReportView.Header(m.header(), m.unit()));
            explanations.add(new ReportView.Explanation(m.header(), m.unit(), m.explanation(), rule(m.best())));
        }
        List<PathResult> paths = data.run().paths();
        List<ReportView.Row> rows = new ArrayList<>();
        for (PathResult path : paths) {
            Summary s = data.summary(path);
            List<ReportView.Cell> cells = new ArrayList<>();
            for (Measure m : Measure.values()) {
                cells.add(new ReportView.Cell(m.format(s), isBest(m, s, data)));
            }
            rows.add(new ReportView.Row(path.strategy(), styles.family(path.strategy()).cssClass(),
                    Words.periods(path.window()), false, cells));
        }
        Summary market = data.market();
        List<ReportView.Cell> cells = new ArrayList<>();
        for (Measure m : Measure.values()) {
            cells.add(new ReportView.Cell(m.format(market), false));
        }
        rows.add(new ReportView.Row(Families.MARKET, styles.family(Families.MARKET).cssClass(), "", true, cells));
        return new ReportView.Table(headers, rows, explanations);
    }

    /** Whether {@code s} holds the best value of measure {@code m} among the strategy rows. */
    static boolean isBest(Measure m, Summary s, ReportData data) {
        OptionalDouble v = m.of(s);
        if (m.best() == Measure.Best.NONE || v.isEmpty() || !Double.isFinite(v.getAsDouble())
                || data.rankedPaths().stream().noneMatch(p -> data.summary(p) == s)) {
            return false;
        }
        for (PathResult other : data.rankedPaths()) {
            OptionalDouble o = m.of(data.summary(other));
            if (o.isPresent() && Double.isFinite(o.getAsDouble()) && m.best().better(o.getAsDouble(), v.getAsDouble())) {
                return false;
            }
        }
        return true;
    }

    private static String rule(Measure.Best best) {
        switch (best) {
            case LOWEST:
                return "lowest is marked";
            case HIGHEST:
                return "highest is marked";
            case CLOSEST_TO_ONE:
                return "closest to 1 is marked";
            default:
                return "not ranked";
        }
    }
}
