package dev.sigmawalk.engine.compare;

import dev.sigmawalk.engine.measures.SeriesStats;
import dev.sigmawalk.engine.run.PathResult;
import dev.sigmawalk.engine.run.RunResult;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * A pair of paths the report compares because it chose them from the data, not because the study
 * named a baseline: the path with the lowest realised volatility and the runner-up with the same
 * window. Its difference tests join the family the correction of Method §9 covers.
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
     * The lowest-volatility path and its runner-up with the same window, among the paths that
     * formed a portfolio at every rebalance (all paths when none did), ties to the first in run
     * order: the same ranking the report's headline uses. Empty when the window has one such path.
     */
    public static Optional<ScannedPair> lowestVolatility(RunResult<?> run) {
        List<PathResult> clean = run.paths().stream().filter(p -> p.failures() == 0).toList();
        List<PathResult> ranked = clean.isEmpty() ? run.paths() : clean;
        Comparator<PathResult> byVolatility = Comparator.comparingDouble(p -> SeriesStats.sd(p.net()));
        Optional<PathResult> best = ranked.stream().min(byVolatility);
        if (best.isEmpty()) {
            return Optional.empty();
        }
        PathResult b = best.get();
        return ranked.stream().filter(p -> p != b && p.window() == b.window()).min(byVolatility)
                .map(r -> new ScannedPair(b.strategy(), r.strategy(), b.window()));
    }

    /** True when this pair, in either order, is the strategy and baseline of a comparison at the same window. */
    public boolean sameAs(String first, String second, int atWindow) {
        return window == atWindow && (strategy.equals(first) && other.equals(second)
                || strategy.equals(second) && other.equals(first));
    }
}
