package dev.sigmawalk.engine.run;

import dev.sigmawalk.engine.model.StrategyDefinition;
import java.util.List;

/**
 * Which windows get the dense n×n sample matrix, decided from what their consumers declare
 * ({@link StrategyDefinition#needsDenseMoments}, {@link WindowProbe#needsDenseMoments}): a window
 * of L rows and n eligible assets gets it when any strategy or the probe needs it. A window
 * length keeps running sums of S over the panel's N columns when its consumers would need S with
 * every column eligible; otherwise a window that needs S anyway (few eligible assets) builds it
 * from its own rows. Both choices depend on (L, n) and (L, N) only, so every run of the same
 * study takes the same path whatever the thread count.
 */
final class DenseMomentPlan {
    private final List<StrategyDefinition> strategies;
    private final WindowProbe<?> probe;

    /**
     * @param strategies the study's strategies
     * @param probe the window probe, or {@code null}
     */
    DenseMomentPlan(List<StrategyDefinition> strategies, WindowProbe<?> probe) {
        this.strategies = List.copyOf(strategies);
        this.probe = probe;
    }

    /** Whether a window of {@code window} rows and {@code assets} eligible assets needs S. */
    boolean needs(int window, int assets) {
        if (probe != null && probe.needsDenseMoments(window, assets)) {
            return true;
        }
        for (StrategyDefinition s : strategies) {
            if (s.needsDenseMoments(window, assets)) {
                return true;
            }
        }
        return false;
    }
}
