package dev.sigmawalk.reports.files;

import dev.sigmawalk.engine.measures.Summary;
import dev.sigmawalk.engine.run.PathResult;
import dev.sigmawalk.engine.run.RebalanceRecord;
import dev.sigmawalk.engine.run.RunResult;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;

/**
 * Writes the result CSV files the README lists under "Outputs": returns, rebalances, weights and
 * summary. Rows come in a fixed order (paths in study order, then dates), so the same run gives
 * byte-identical files.
 */
public final class ResultFiles {
    private ResultFiles() {
    }

    /** {@code returns.csv}: date,strategy,window,gross_return,net_return; the market last. */
    public static void writeReturns(Path file, RunResult<?> run) {
        LocalDate[] dates = run.dates();
        try (CsvWriter csv = new CsvWriter(file, "date", "strategy", "window", "gross_return", "net_return")) {
            CsvCell[] dateCells = new CsvCell[dates.length];
            for (int k = 0; k < dates.length; k++) {
                dateCells[k] = CsvCell.of(dates[k].toString());
            }
            for (PathResult p : run.paths()) {
                CsvCell strategy = CsvCell.of(p.strategy());
                for (int k = 0; k < dates.length; k++) {
                    csv.cell(dateCells[k]).cell(strategy).integer(p.window())
                            .number(p.gross()[k]).number(p.net()[k]).end();
                }
            }
            double[] m = run.market();
            for (int k = 0; k < dates.length; k++) {
                csv.cell(dateCells[k]).text("market").empty().number(m[k]).number(m[k]).end();
            }
        }
    }

    /**
     * {@code rebalances.csv}: date,strategy,window,assets,turnover,cost,forecast_volatility,
     * shrinkage,missing_held, then (added columns) status and note. {@code assets} is the
     * eligible count; forecast volatility is per period.
     */
    public static void writeRebalances(Path file, RunResult<?> run) {
        try (CsvWriter csv = new CsvWriter(file, "date", "strategy", "window", "assets", "turnover", "cost",
                "forecast_volatility", "shrinkage", "missing_held", "status", "note")) {
            for (PathResult p : run.paths()) {
                for (RebalanceRecord r : p.rebalances()) {
                    csv.text(r.date().toString()).text(p.strategy()).integer(p.window()).integer(r.eligible())
                            .number(r.turnover()).number(r.cost()).number(r.forecastVolatility())
                            .number(r.shrinkage()).integer(r.missingHeld())
                            .text(r.failure().isPresent() ? "failed" : "ok")
                            .text(r.failure().orElse(String.join("; ", r.notes()))).end();
                }
            }
        }
    }

    /**
     * {@code weights.csv}: date,strategy,window,asset,weight, every eligible asset at every
     * successful rebalance; after a failed one, the drifted holdings that were kept.
     */
    public static void writeWeights(Path file, RunResult<?> run) {
        try (CsvWriter csv = new CsvWriter(file, "date", "strategy", "window", "asset", "weight")) {
            CsvCell.Cache names = new CsvCell.Cache();
            for (PathResult p : run.paths()) {
                CsvCell strategy = CsvCell.of(p.strategy());
                for (RebalanceRecord r : p.rebalances()) {
                    CsvCell start = CsvCell.of(r.date().toString()).then(strategy).then(CsvCell.integer(p.window()));
                    List<String> assets = r.assets();
                    double[] weights = r.weights();
                    for (int i = 0; i < assets.size(); i++) {
                        csv.cell(start).cell(names.of(assets.get(i))).number(weights[i]).end();
                    }
                }
            }
        }
    }

    /** {@code summary.csv}, one row per path and one for the market, annualised (Method §7). */
    public static void writeSummary(Path file, List<Summary> rows) {
        try (CsvWriter csv = new CsvWriter(file, "strategy", "window", "periods", "mean_return", "volatility",
                "sharpe", "cagr", "max_drawdown", "mean_turnover", "tracking_error", "information_ratio",
                "forecast_volatility", "bias")) {
            for (Summary s : rows) {
                csv.text(s.strategy()).integer(s.window()).integer(s.periods()).number(s.meanReturn())
                        .number(s.volatility()).number(s.sharpe()).number(s.cagr()).number(s.maxDrawdown())
                        .number(s.meanTurnover()).number(s.trackingError()).number(s.informationRatio())
                        .number(s.forecastVolatility()).number(s.bias()).end();
            }
        }
    }
}
