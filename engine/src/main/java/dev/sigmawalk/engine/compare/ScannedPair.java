package dev.sigmawalk.engine.compare;

import dev.sigmawalk.engine.measures.SeriesStats;
import dev.sigmawalk.engine.run.PathResult;
import dev.sigmawalk.engine.run.RunResult;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;

/**
 * A pair of paths the report compares because it chose them from the data, not because the study
 * named a baseline: for each window, the path with the lowest realised volatility and the
 * runner-up with the same window (the headline names the overall lowest, the window summary the
 * lowest of each window). Their difference tests join the family the correction of Method §9
 * covers.
 *
 * @param strategy the lower-volatility path's strategy
 * @param other the runner-up's strategy
 * @param window L, shared by both
 */
public record ScannedPair(String strategy, String other, int window) {
    public ScannedPair {
        Objects.requireNonNull(strategy, "strategy");
        Objects.requireNonNull(other, "other");
        if (strategy.equals(other)) {
            throw new IllegalArgumentException("a scanned pair needs two strategies, got '" + strategy + "' twice");
        }
    }

    /**
     * For each window in run order, its lowest-volatility path and the runner-up, among the paths
     * that formed a portfolio at every rebalance (all paths when none did), ties to the first in
     * run order: the same ranking the report uses. A window with one such path gives no pair.
     */
    public static List<ScannedPair> lowestVolatility(RunResult<?> run) {
        List<PathResult> clean = run.paths().stream().filter(p -> p.failures() == 0).toList();
        List<PathResult> ranked = clean.isEmpty() ? run.paths() : clean;
        Comparator<PathResult> byVolatility = Comparator.comparingDouble(p -> SeriesStats.sd(p.net()));
        List<ScannedPair> out = new ArrayList<>();
        for (int w : ranked.stream().map(PathResult::window).distinct().toList()) {
            List<PathResult> own = ranked.stream().filter(p -> p.window() == w).toList();
            PathResult best = own.stream().min(byVolatility).orElseThrow();
            own.stream().filter(p -> p != best).min(byVolatility)
                    .ifPresent(r -> out.add(new ScannedPair(best.strategy(), r.strategy(), w)));
        }
        return List.copyOf(out);
    }

    /** True when this pair, in either order, is the strategy and baseline of a comparison at the same window. */
    public boolean sameAs(String first, String second, int atWindow) {
        return window == atWindow && (strategy.equals(first) && other.equals(second)
                || strategy.equals(second) && other.equals(first));
    }
}
