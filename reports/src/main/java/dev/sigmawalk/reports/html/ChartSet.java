package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.measures.SeriesStats;
import dev.sigmawalk.engine.measures.Summary;
import dev.sigmawalk.engine.run.PathResult;
import dev.sigmawalk.engine.run.RebalanceRecord;
import dev.sigmawalk.reports.charts.ChartLine;
import dev.sigmawalk.reports.charts.Concentration;
import dev.sigmawalk.reports.charts.Growth;
import dev.sigmawalk.reports.charts.LineCharts;
import dev.sigmawalk.reports.charts.LineOptions;
import dev.sigmawalk.reports.charts.RollingVolatility;
import dev.sigmawalk.reports.charts.StyleBook;
import dev.sigmawalk.reports.charts.TimeAxisValues;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.ToDoubleFunction;
import org.jfree.chart.JFreeChart;

/**
 * The charts of the report. Time-series charts show the strategies of one window beside the
 * market, split into one panel per model family when more than four lines would overlap; the
 * shrinkage and window-length charts cover every window. PNG copies are named by chart, window
 * and strategy or family, for example {@code forecast-w60-index-model.png}.
 */
final class ChartSet {
    /** Up to this many points a rebalance series is drawn with a dot at each rebalance. */
    private static final int MARKER_LIMIT = 40;

    private final ReportData data;
    private final StyleBook styles;
    private final FigureMaker maker;
    private final int p;
    private final int span;
    private final FileNames names;

    ChartSet(ReportData data, StyleBook styles, FigureMaker maker) {
        this.data = data;
        this.names = FileNames.of(strategies());
        this.styles = styles;
        this.maker = maker;
        this.p = data.run().periodsPerYear();
        this.span = RollingVolatility.span(p);
    }

    int rollingSpan() {
        return span;
    }

    /** Growth of 1 on a log scale, split by family when more than four lines would overlap. */
    List<Figure> growth(int window) {
        List<ChartLine> lines = new ArrayList<>();
        for (PathResult path : data.paths(window)) {
            lines.add(line(path.strategy(), rowX(), Growth.ofOne(path.net())));
        }
        ChartLine market = line(Families.MARKET, rowX(), Growth.ofOne(data.run().market()));
        return panels("growth-w" + window, "Growth of 1 invested, net, log scale (" + window + "-period window)",
                lines, Optional.of(market), false, true, (title, panel) -> LineCharts.overTimeLog(title,
                        "Value of 1 invested (log scale)", panel),
                "Each line starts at 1 just before the first out-of-sample period and compounds net returns; "
                        + "the scale is logarithmic, so each grid line up is a doubling and equal slopes are equal "
                        + "rates of growth. The grey dash-dot line is the market.");
    }

    List<Figure> drawdown(int window) {
        List<ChartLine> lines = new ArrayList<>();
        for (PathResult path : data.paths(window)) {
            lines.add(line(path.strategy(), rowX(), negated(SeriesStats.drawdowns(path.net()))));
        }
        ChartLine market = line(Families.MARKET, rowX(), negated(SeriesStats.drawdowns(data.run().market())));
        return panels("drawdown-w" + window, "Drawdown (" + window + "-period window)", lines, Optional.of(market),
                true, false, (title, panel) -> LineCharts.overTime(title, "Below the previous peak (%)",
                        LineCharts.percentAxis(), panel, new LineOptions(false, true)),
                "How far wealth stood below its previous high at each date; 0 % means at a new high.");
    }

    List<Figure> rollingVolatility(int window) {
        List<ChartLine> lines = new ArrayList<>();
        for (PathResult path : data.paths(window)) {
            lines.add(line(path.strategy(), rowX(), RollingVolatility.annualised(path.net(), span, p)));
        }
        ChartLine market = line(Families.MARKET, rowX(), RollingVolatility.annualised(data.run().market(), span, p));
        return panels("rolling-volatility-w" + window, "Volatility over the last " + span + " periods ("
                + window + "-period window)", lines, Optional.of(market), true, false,
                (title, panel) -> LineCharts.overTime(title, "Annualised volatility (% a year)",
                        LineCharts.percentAxis(), panel, new LineOptions(false, true)),
                "Standard deviation of net returns over a trailing " + span + "-period span, annualised; the line "
                        + "starts once a full span is available.");
    }

    List<Figure> turnover(int window) {
        List<ChartLine> lines = new ArrayList<>();
        for (PathResult path : data.paths(window)) {
            List<RebalanceRecord> later = path.rebalances().subList(Math.min(1, path.rebalances().size()),
                    path.rebalances().size());
            lines.add(line(path.strategy(), dateX(later), values(later, RebalanceRecord::turnover)));
        }
        boolean markers = markers(window);
        return panels("turnover-w" + window, "Turnover at each rebalance (" + window + "-period window)", lines,
                Optional.empty(), true, false, (title, panel) -> LineCharts.overTime(title,
                        "Bought plus sold (% of portfolio)", LineCharts.percentAxis(), panel,
                        new LineOptions(markers, true)),
                "Share of the portfolio traded at each rebalance; the first purchase from cash is left out.");
    }

    /** Forecast against realised volatility, one small chart per strategy of the window. */
    List<Figure> forecasts(int window) {
        List<Figure> out = new ArrayList<>();
        for (PathResult path : data.paths(window)) {
            double[] forecast = path.forecastVolatility();
            double[] annual = new double[forecast.length];
            for (int t = 0; t < forecast.length; t++) {
                annual[t] = forecast[t] > 0 ? Math.sqrt(p) * forecast[t] : Double.NaN;
            }
            List<ChartLine> lines = List.of(
                    new ChartLine(path.strategy() + ": realised", styles.style(path.strategy()), rowX(),
                            RollingVolatility.annualised(path.gross(), span, p)),
                    new ChartLine(path.strategy() + ": forecast", styles.companion(path.strategy()), rowX(), annual));
            JFreeChart c = LineCharts.overTime(path.strategy() + " (" + window + "-period window)",
                    "Volatility (% a year)", LineCharts.percentAxis(), lines, new LineOptions(false, true));
            out.add(maker.make("forecast-w" + window + "-" + names.of(path.strategy()), c, "Thick line, in the "
                    + "strategy's own colour and pattern: realised volatility of gross returns over the last " + span
                    + " periods. Thin short dashes: the volatility forecast when the portfolio held on that date was "
                    + "formed. Both annualised.", FigureMaker.SMALL));
        }
        return out;
    }

    /** Builds one chart of a panel: its title and its lines. */
    private interface PanelChart {
        JFreeChart draw(String title, List<ChartLine> lines);
    }

    /**
     * One figure, or one per model family when more than four lines would overlap; the panels of
     * a set share their y axis.
     */
    private List<Figure> panels(String id, String title, List<ChartLine> lines, Optional<ChartLine> reference,
                                boolean includeZero, boolean log, PanelChart draw, String caption) {
        List<FamilyPanels.Panel> panels = FamilyPanels.of(lines, reference, styles);
        Optional<FamilyPanels.Range> range = panels.size() > 1 ? FamilyPanels.range(panels, includeZero, log)
                : Optional.empty();
        List<Figure> out = new ArrayList<>();
        for (FamilyPanels.Panel panel : panels) {
            JFreeChart c = draw.draw(title + panel.titleSuffix(), panel.lines());
            range.ifPresent(r -> LineCharts.fixRange(c, r.low(), r.high()));
            String note = panels.size() > 1 ? " One panel per model family, all on the same scale"
                    + (reference.isPresent() ? ", each with the market for reference." : ".") : "";
            out.add(maker.make(id + panel.idSuffix(), c, caption + note,
                    panels.size() > 1 ? FigureMaker.SMALL : FigureMaker.WIDE));
        }
        return out;
    }

    List<Figure> effectiveHoldings(int window) {
        return concentration(window, "effective-holdings-w", "Effective number of holdings (" + window
                        + "-period window)", "1 / sum of squared weights", LineCharts.plainAxis(),
                r -> hasHoldings(r) ? Concentration.effectiveHoldings(r.weights()) : Double.NaN,
                "The number of equal positions that would be as concentrated as the portfolio: "
                        + "higher means more spread out.");
    }

    List<Figure> largestWeight(int window) {
        return concentration(window, "largest-weight-w", "Largest single weight (" + window + "-period window)",
                "Largest weight (% of portfolio)", LineCharts.percentAxis(),
                r -> hasHoldings(r) ? Concentration.largestWeight(r.weights()) : Double.NaN,
                "The biggest position right after each rebalance.");
    }

    /** δ over time for every shrinkage path, one line per strategy and window; empty when none. */
    Optional<Figure> shrinkage() {
        List<ChartLine> lines = new ArrayList<>();
        List<Integer> windows = data.windows();
        for (PathResult path : data.run().paths()) {
            List<RebalanceRecord> withDelta = path.rebalances().stream().filter(r -> r.shrinkage().isPresent()).toList();
            if (!withDelta.isEmpty()) {
                lines.add(new ChartLine(path.strategy() + ", " + path.window() + " periods",
                        styles.variant(path.strategy(), windows.indexOf(path.window())), dateX(withDelta),
                        values(withDelta, r -> r.shrinkage().getAsDouble())));
            }
        }
        if (lines.isEmpty()) {
            return Optional.empty();
        }
        boolean dense = lines.stream().anyMatch(l -> l.x().length > MARKER_LIMIT);
        JFreeChart c = LineCharts.overTime("Shrinkage intensity at each rebalance", "Weight on the target, δ (0 to 1)",
                LineCharts.plainAxis(), lines, new LineOptions(!dense, true));
        return Optional.of(maker.make("shrinkage", c, "δ = 0 keeps the sample covariance as it is; δ = 1 replaces "
                + "it by the target. One line per window, told apart by dash pattern.", FigureMaker.WIDE));
    }

    /**
     * One point per window length and strategy.
     *
     * @param withMarket draw the market flat across the windows (for measures the market has)
     */
    Figure byWindow(String id, String title, String yLabel, boolean percent, ToDoubleFunction<Summary> measure,
                    boolean withMarket) {
        List<Integer> windows = data.windows();
        double[] x = new double[windows.size()];
        for (int k = 0; k < x.length; k++) {
            x[k] = windows.get(k);
        }
        List<ChartLine> lines = new ArrayList<>();
        for (String strategy : strategies()) {
            double[] y = new double[windows.size()];
            for (int k = 0; k < y.length; k++) {
                y[k] = measure.applyAsDouble(data.summary(data.run().path(strategy, windows.get(k))));
            }
            lines.add(line(strategy, x, y));
        }
        if (withMarket) {
            double[] flat = new double[x.length];
            java.util.Arrays.fill(flat, measure.applyAsDouble(data.market()));
            lines.add(line(Families.MARKET, x, flat));
        }
        JFreeChart c = LineCharts.overNumber(title, "Estimation window (periods)", LineCharts.plainAxis(), yLabel,
                percent ? LineCharts.percentAxis() : LineCharts.plainAxis(), lines, new LineOptions(true, false));
        return maker.make(id, c, "One point per window length and strategy, over the same out-of-sample period"
                + (withMarket ? "; the market does not depend on the window and is drawn flat." : "."),
                FigureMaker.WIDE);
    }

    private List<Figure> concentration(int window, String idStem, String title, String yLabel,
                                       java.text.NumberFormat format, ToDoubleFunction<RebalanceRecord> measure,
                                       String caption) {
        List<ChartLine> lines = new ArrayList<>();
        for (PathResult path : data.paths(window)) {
            lines.add(line(path.strategy(), dateX(path.rebalances()), values(path.rebalances(), measure)));
        }
        boolean markers = markers(window);
        return panels(idStem + window, title, lines, Optional.empty(), true, false,
                (t, panel) -> LineCharts.overTime(t, yLabel, format, panel, new LineOptions(markers, true)), caption);
    }

    /** Strategy names in run order, each once. */
    private List<String> strategies() {
        return data.run().paths().stream().map(PathResult::strategy).distinct().toList();
    }

    private boolean markers(int window) {
        return data.paths(window).stream().allMatch(pa -> pa.rebalances().size() <= MARKER_LIMIT);
    }

    private ChartLine line(String name, double[] x, double[] y) {
        return new ChartLine(name, styles.style(name), x, y);
    }

    private double[] rowX() {
        return TimeAxisValues.of(data.run().dates());
    }

    private static double[] dateX(List<RebalanceRecord> records) {
        LocalDate[] d = new LocalDate[records.size()];
        for (int k = 0; k < d.length; k++) {
            d[k] = records.get(k).date();
        }
        return TimeAxisValues.of(d);
    }

    private static double[] values(List<RebalanceRecord> records, ToDoubleFunction<RebalanceRecord> f) {
        double[] y = new double[records.size()];
        for (int k = 0; k < y.length; k++) {
            y[k] = f.applyAsDouble(records.get(k));
        }
        return y;
    }

    private static double[] negated(double[] x) {
        double[] out = new double[x.length];
        for (int k = 0; k < x.length; k++) {
            out[k] = -x[k];
        }
        return out;
    }

    private static boolean hasHoldings(RebalanceRecord r) {
        for (double w : r.weights()) {
            if (w != 0) {
                return true;
            }
        }
        return false;
    }
}
