package dev.sigmawalk.engine.measures;

import dev.sigmawalk.engine.evidence.BiasStatistic;
import dev.sigmawalk.engine.run.PathResult;
import dev.sigmawalk.engine.run.RebalanceRecord;
import java.util.List;
import java.util.OptionalDouble;
import java.util.OptionalInt;

/** Computes the {@link Summary} of a path or of the market benchmark (Method §7). */
public final class PerformanceMeasures {
    private final double[] riskFree;
    private final double[] market;
    private final int periodsPerYear;

    /**
     * @param riskFree per-period risk-free rate of the out-of-sample rows
     * @param market market simple return of the out-of-sample rows
     * @param periodsPerYear p
     */
    public PerformanceMeasures(double[] riskFree, double[] market, int periodsPerYear) {
        if (riskFree.length != market.length) {
            throw new IllegalArgumentException("risk-free (" + riskFree.length + ") and market (" + market.length
                    + ") must cover the same rows");
        }
        if (riskFree.length < 2) {
            throw new IllegalArgumentException("performance needs at least 2 out-of-sample rows, got " + riskFree.length);
        }
        this.riskFree = riskFree.clone();
        this.market = market.clone();
        this.periodsPerYear = periodsPerYear;
    }

    /** The benchmark row: the market's own return, gross = net. */
    public Summary market() {
        return base("market", OptionalInt.empty(), market, OptionalDouble.empty(), OptionalDouble.empty(),
                OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty());
    }

    /** The summary of one strategy path, on its net returns. */
    public Summary of(PathResult path) {
        double[] r = path.net();
        double p = periodsPerYear;
        double[] active = SeriesStats.minus(r, market);
        double te = Math.sqrt(p) * SeriesStats.sd(active);
        OptionalDouble ir = te > 0 ? OptionalDouble.of(p * SeriesStats.mean(active) / te) : OptionalDouble.empty();
        return base(path.strategy(), OptionalInt.of(path.window()), r, meanTurnover(path.rebalances()),
                OptionalDouble.of(te), ir, forecastVolatility(path.rebalances()), bias(path));
    }

    private Summary base(String name, OptionalInt window, double[] r, OptionalDouble turnover, OptionalDouble te,
                         OptionalDouble ir, OptionalDouble forecast, OptionalDouble bias) {
        double p = periodsPerYear;
        double[] excess = SeriesStats.minus(r, riskFree);
        double sdExcess = SeriesStats.sd(excess);
        double sharpe = sdExcess > 0 ? Math.sqrt(p) * SeriesStats.mean(excess) / sdExcess : 0;
        return new Summary(name, window, r.length, p * SeriesStats.mean(r), Math.sqrt(p) * SeriesStats.sd(r),
                sharpe, SeriesStats.cagr(r, periodsPerYear), SeriesStats.maxDrawdown(r), turnover, te, ir, forecast,
                bias);
    }

    /** Mean turnover over rebalances after the first (the first trades from cash). */
    static OptionalDouble meanTurnover(List<RebalanceRecord> records) {
        if (records.size() < 2) {
            return OptionalDouble.empty();
        }
        double s = 0;
        for (int j = 1; j < records.size(); j++) {
            s += records.get(j).turnover();
        }
        return OptionalDouble.of(s / (records.size() - 1));
    }

    /** Mean over rebalances with a forecast of √(p · w'Σw). */
    OptionalDouble forecastVolatility(List<RebalanceRecord> records) {
        double s = 0;
        int count = 0;
        for (RebalanceRecord rec : records) {
            if (rec.forecastVariance().isPresent()) {
                s += Math.sqrt(periodsPerYear * rec.forecastVariance().getAsDouble());
                count++;
            }
        }
        return count == 0 ? OptionalDouble.empty() : OptionalDouble.of(s / count);
    }

    /**
     * Bias statistic: sd (divisor N−1) of z_t = (R_t − rf_t)/σ̂_τ over held rows with a forecast,
     * R_t gross (Menchero, Wang & Orr 2011). Empty with fewer than two such rows.
     */
    OptionalDouble bias(PathResult path) {
        return BiasStatistic.overForecastRows(path.gross(), riskFree, path.forecastVolatility())
                .map(b -> OptionalDouble.of(b.value())).orElse(OptionalDouble.empty());
    }
}
