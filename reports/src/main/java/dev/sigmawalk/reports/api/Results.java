package dev.sigmawalk.reports.api;

import dev.sigmawalk.engine.compare.Comparison;
import dev.sigmawalk.engine.compare.WindowEvidence;
import dev.sigmawalk.engine.evidence.DifferenceTest;
import dev.sigmawalk.engine.measures.Summary;
import dev.sigmawalk.engine.run.PathResult;
import dev.sigmawalk.engine.run.RebalanceRecord;
import dev.sigmawalk.engine.run.RunResult;
import java.time.LocalDate;
import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;
import tech.tablesaw.api.DateColumn;
import tech.tablesaw.api.DoubleColumn;
import tech.tablesaw.api.IntColumn;
import tech.tablesaw.api.StringColumn;
import tech.tablesaw.api.Table;

/**
 * The results of one run, in memory. The tables have the columns of the CSV files of the same
 * names (README, "Outputs"), with dates as dates and absent values missing; each call builds a
 * fresh table the caller may change freely. The records behind them are there too.
 *
 * @param study the study as read
 * @param run every path's returns, rebalances and weights
 * @param summaries one per path in run order, then the market's
 * @param comparisons every strategy against its baseline, per window
 * @param warnings every warning the command line prints for the same study, in the same words
 *                 and order: the data's, the preview's (constant series, empty windows, bounds
 *                 that cannot be met), then the results' (residual diagnostics left out, failed
 *                 or noted rebalances)
 */
public record Results(dev.sigmawalk.engine.study.Study study, RunResult<WindowEvidence> run, List<Summary> summaries,
                      List<Comparison> comparisons, List<String> warnings) {
    public Results {
        Objects.requireNonNull(study, "study");
        Objects.requireNonNull(run, "run");
        summaries = List.copyOf(summaries);
        comparisons = List.copyOf(comparisons);
        warnings = List.copyOf(warnings);
    }

    /** {@code date, strategy, window, gross_return, net_return}: every out-of-sample row of every path, then the market's (window missing). */
    public Table returns() {
        DateColumn date = DateColumn.create("date");
        StringColumn strategy = StringColumn.create("strategy");
        IntColumn window = IntColumn.create("window");
        DoubleColumn gross = DoubleColumn.create("gross_return");
        DoubleColumn net = DoubleColumn.create("net_return");
        LocalDate[] dates = run.dates();
        for (PathResult p : run.paths()) {
            for (int k = 0; k < dates.length; k++) {
                date.append(dates[k]);
                strategy.append(p.strategy());
                window.append(p.window());
                gross.append(p.gross()[k]);
                net.append(p.net()[k]);
            }
        }
        for (int k = 0; k < dates.length; k++) {
            date.append(dates[k]);
            strategy.append("market");
            window.appendMissing();
            gross.append(run.market()[k]);
            net.append(run.market()[k]);
        }
        return Table.create("returns", date, strategy, window, gross, net);
    }

    /**
     * {@code date, strategy, window, assets, turnover, cost, forecast_volatility, shrinkage,
     * missing_held, status, note}: one row per rebalance of every path.
     */
    public Table rebalances() {
        DateColumn date = DateColumn.create("date");
        StringColumn strategy = StringColumn.create("strategy");
        IntColumn window = IntColumn.create("window");
        IntColumn assets = IntColumn.create("assets");
        DoubleColumn turnover = DoubleColumn.create("turnover");
        DoubleColumn cost = DoubleColumn.create("cost");
        DoubleColumn forecast = DoubleColumn.create("forecast_volatility");
        DoubleColumn shrinkage = DoubleColumn.create("shrinkage");
        IntColumn missingHeld = IntColumn.create("missing_held");
        StringColumn status = StringColumn.create("status");
        StringColumn note = StringColumn.create("note");
        for (PathResult p : run.paths()) {
            for (RebalanceRecord r : p.rebalances()) {
                date.append(r.date());
                strategy.append(p.strategy());
                window.append(p.window());
                assets.append(r.eligible());
                turnover.append(r.turnover());
                cost.append(r.cost());
                append(forecast, r.forecastVolatility());
                append(shrinkage, r.shrinkage());
                missingHeld.append(r.missingHeld());
                status.append(r.failure().isPresent() ? "failed" : "ok");
                note.append(r.failure().orElse(String.join("; ", r.notes())));
            }
        }
        return Table.create("rebalances", date, strategy, window, assets, turnover, cost, forecast, shrinkage,
                missingHeld, status, note);
    }

    /** {@code date, strategy, window, asset, weight}: every eligible asset at every rebalance of every path. */
    public Table weights() {
        DateColumn date = DateColumn.create("date");
        StringColumn strategy = StringColumn.create("strategy");
        IntColumn window = IntColumn.create("window");
        StringColumn asset = StringColumn.create("asset");
        DoubleColumn weight = DoubleColumn.create("weight");
        for (PathResult p : run.paths()) {
            for (RebalanceRecord r : p.rebalances()) {
                List<String> names = r.assets();
                double[] w = r.weights();
                for (int i = 0; i < names.size(); i++) {
                    date.append(r.date());
                    strategy.append(p.strategy());
                    window.append(p.window());
                    asset.append(names.get(i));
                    weight.append(w[i]);
                }
            }
        }
        return Table.create("weights", date, strategy, window, asset, weight);
    }

    /**
     * {@code strategy, window, periods, mean_return, volatility, sharpe, cagr, max_drawdown,
     * mean_turnover, tracking_error, information_ratio, forecast_volatility, bias}, annualised
     * (Method §7); the market last, its window missing.
     */
    public Table summary() {
        StringColumn strategy = StringColumn.create("strategy");
        IntColumn window = IntColumn.create("window");
        IntColumn periods = IntColumn.create("periods");
        DoubleColumn mean = DoubleColumn.create("mean_return");
        DoubleColumn volatility = DoubleColumn.create("volatility");
        DoubleColumn sharpe = DoubleColumn.create("sharpe");
        DoubleColumn cagr = DoubleColumn.create("cagr");
        DoubleColumn drawdown = DoubleColumn.create("max_drawdown");
        DoubleColumn turnover = DoubleColumn.create("mean_turnover");
        DoubleColumn trackingError = DoubleColumn.create("tracking_error");
        DoubleColumn information = DoubleColumn.create("information_ratio");
        DoubleColumn forecast = DoubleColumn.create("forecast_volatility");
        DoubleColumn bias = DoubleColumn.create("bias");
        for (Summary s : summaries) {
            strategy.append(s.strategy());
            if (s.window().isPresent()) {
                window.append(s.window().getAsInt());
            } else {
                window.appendMissing();
            }
            periods.append(s.periods());
            mean.append(s.meanReturn());
            volatility.append(s.volatility());
            sharpe.append(s.sharpe());
            cagr.append(s.cagr());
            drawdown.append(s.maxDrawdown());
            append(turnover, s.meanTurnover());
            append(trackingError, s.trackingError());
            append(information, s.informationRatio());
            append(forecast, s.forecastVolatility());
            append(bias, s.bias());
        }
        return Table.create("summary", strategy, window, periods, mean, volatility, sharpe, cagr, drawdown, turnover,
                trackingError, information, forecast, bias);
    }

    /**
     * {@code strategy, baseline, window, measure, estimate, baseline_estimate, difference,
     * standard_error, statistic, hac_pvalue, bootstrap_pvalue, holm_pvalue, family_pvalue}: one
     * row per compared pair, window and measure ({@code sharpe_ratio}, {@code variance}) that
     * could be tested (Method §9).
     */
    public Table tests() {
        StringColumn strategy = StringColumn.create("strategy");
        StringColumn baseline = StringColumn.create("baseline");
        IntColumn window = IntColumn.create("window");
        StringColumn measure = StringColumn.create("measure");
        DoubleColumn[] numbers = {DoubleColumn.create("estimate"), DoubleColumn.create("baseline_estimate"),
            DoubleColumn.create("difference"), DoubleColumn.create("standard_error"), DoubleColumn.create("statistic"),
            DoubleColumn.create("hac_pvalue"), DoubleColumn.create("bootstrap_pvalue"),
            DoubleColumn.create("holm_pvalue"), DoubleColumn.create("family_pvalue")};
        for (Comparison c : comparisons) {
            for (TestRow row : TestRow.of(c)) {
                strategy.append(c.strategy());
                baseline.append(c.baseline());
                window.append(c.window());
                measure.append(row.measure());
                DifferenceTest t = row.test();
                double[] values = {t.first(), t.second(), t.difference(), t.standardError(), t.statistic(),
                    t.hacPValue(), t.bootstrapPValue(), row.holm(), row.family()};
                for (int k = 0; k < values.length; k++) {
                    numbers[k].append(values[k]);
                }
            }
        }
        Table out = Table.create("tests", strategy, baseline, window, measure);
        out.addColumns(numbers);
        return out;
    }

    /** One tested measure of a comparison. */
    private record TestRow(String measure, DifferenceTest test, double holm, double family) {
        static List<TestRow> of(Comparison c) {
            java.util.ArrayList<TestRow> out = new java.util.ArrayList<>();
            c.sharpe().ifPresent(t -> out.add(new TestRow("sharpe_ratio", t, c.holmSharpe(), c.familySharpe())));
            c.variance().ifPresent(t -> out.add(new TestRow("variance", t, c.holmVariance(), c.familyVariance())));
            return out;
        }
    }

    private static void append(DoubleColumn column, OptionalDouble value) {
        if (value.isPresent()) {
            column.append(value.getAsDouble());
        } else {
            column.appendMissing();
        }
    }
}
