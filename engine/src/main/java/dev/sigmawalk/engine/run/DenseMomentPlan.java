package dev.sigmawalk.engine.run;

import dev.sigmawalk.engine.model.StrategyDefinition;
import dev.sigmawalk.engine.timeline.Schedule;
import java.util.List;

/**
 * Which windows get the dense n×n sample matrix, decided from what their consumers declare
 * ({@link StrategyDefinition#needsDenseMoments}, {@link WindowProbe#needsDenseMoments}): a window
 * of L rows and n eligible assets gets it when any strategy or the probe needs it. A window
 * length keeps running sums of S over the panel's columns when any of its rebalances needs S
 * (their eligible counts are known before the walk starts), and then every window of that length
 * that needs S takes it from the sums; a length none of whose windows needs S keeps no n×n
 * array at all. Both choices depend on L and the eligible counts only, so every run of the same
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

    /**
     * Whether some rebalance of the schedule, with windows of {@code length} rows, needs S: the
     * choice of keeping running sums for that length. O(N) per rebalance (the eligibility rule).
     */
    boolean anyWindowNeeds(WindowBuilder builder, Schedule schedule, int length) {
        for (int j = 0; j < schedule.count(); j++) {
            if (needs(length, builder.eligible(schedule.rebalanceRow(j), length).length)) {
                return true;
            }
        }
        return false;
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
