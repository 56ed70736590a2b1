package dev.sigmawalk.engine.study;

import java.time.LocalDate;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/** The {@code walkforward:} section. */
public record WalkForwardSpec(List<Integer> windows, RebalanceRule rebalance, Optional<LocalDate> start,
                              Optional<LocalDate> end, double costBps) {
    public WalkForwardSpec {
        windows = List.copyOf(windows);
        Objects.requireNonNull(rebalance, "rebalance");
        Objects.requireNonNull(start, "start");
        Objects.requireNonNull(end, "end");
        if (windows.isEmpty()) {
            throw new IllegalArgumentException("walkforward.windows must name at least one window");
        }
        for (int w : windows) {
            if (!(w >= 2)) {
                throw new IllegalArgumentException("walkforward.windows: window (" + w + ") must be >= 2");
            }
        }
        if (!(costBps >= 0) || Double.isInfinite(costBps)) {
            throw new IllegalArgumentException("walkforward.cost_bps (" + costBps + ") must be >= 0");
        }
    }

    /** L_max, the longest window. */
    public int longestWindow() {
        return windows.stream().mapToInt(Integer::intValue).max().orElseThrow();
    }
}
