package dev.sigmawalk.engine.run;

import dev.sigmawalk.engine.timeline.Schedule;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * Everything a walk-forward run produced. Out-of-sample row k is panel row τ_0 + 1 + k.
 *
 * @param dates dates of the out-of-sample rows
 * @param market the market's simple return on those rows (the {@code market} benchmark)
 * @param riskFree the per-period risk-free rate on those rows
 * @param periodsPerYear p
 * @param schedule the rebalance rows
 * @param paths one per (strategy, window), strategies in study order within each window, windows
 *              in study order
 * @param probes per window length, what each {@link WindowProbe} returned at each rebalance
 */
public record RunResult<T>(LocalDate[] dates, double[] market, double[] riskFree, int periodsPerYear,
                           Schedule schedule, List<PathResult> paths, Map<Integer, List<T>> probes) {
    public RunResult {
        Objects.requireNonNull(dates, "dates");
        if (market.length != dates.length || riskFree.length != dates.length) {
            throw new IllegalArgumentException("market and risk-free must cover every out-of-sample date");
        }
        paths = List.copyOf(paths);
        probes = Map.copyOf(probes);
    }

    /** The path of {@code strategy} with window {@code window}. */
    public PathResult path(String strategy, int window) {
        for (PathResult p : paths) {
            if (p.strategy().equals(strategy) && p.window() == window) {
                return p;
            }
        }
        throw new IllegalArgumentException("no path for strategy '" + strategy + "' and window " + window);
    }
}
