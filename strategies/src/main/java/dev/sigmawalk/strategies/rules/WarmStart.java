package dev.sigmawalk.strategies.rules;

import dev.sigmawalk.strategies.optimize.BoundSide;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The active set of a path's previous rebalance, keyed by asset id, so the next solve can start
 * near it. One instance per (strategy, window) path, used by one thread in date order. It only
 * changes where the exact solver starts, never its answer beyond the solver tolerance.
 */
public final class WarmStart {
    private final Map<String, BoundSide> sides = new HashMap<>();

    /** A path with no history yet. */
    public WarmStart() {
    }

    /**
     * The remembered side of each asset, or {@code null} when nothing is remembered. Assets new to
     * the eligible set are guessed at their lower bound: minimum-variance portfolios hold few
     * assets, so most weights sit there.
     */
    BoundSide[] guessFor(List<String> assets) {
        if (sides.isEmpty()) {
            return null;
        }
        BoundSide[] guess = new BoundSide[assets.size()];
        for (int i = 0; i < guess.length; i++) {
            guess[i] = sides.getOrDefault(assets.get(i), BoundSide.LOWER);
        }
        return guess;
    }

    /** Replaces the memory by this rebalance's partition. */
    void remember(List<String> assets, BoundSide[] partition) {
        sides.clear();
        for (int i = 0; i < partition.length; i++) {
            sides.put(assets.get(i), partition[i]);
        }
    }

    /** Forgets the partition (after a failed rebalance). */
    void forget() {
        sides.clear();
    }
}
