package dev.sigmawalk.reports.html;

import java.util.List;

/**
 * The single-index checks of one window length over the rebalances.
 *
 * @param window L
 * @param points one per rebalance with diagnostics, dates strictly increasing, at least one
 */
public record WindowDiagnostics(int window, List<DiagnosticsPoint> points) {
    public WindowDiagnostics {
        points = List.copyOf(points);
        if (points.isEmpty()) {
            throw new IllegalArgumentException("diagnostics of window " + window + " need at least one rebalance");
        }
        for (int k = 1; k < points.size(); k++) {
            if (!points.get(k).date().isAfter(points.get(k - 1).date())) {
                throw new IllegalArgumentException("diagnostics of window " + window + ": dates must increase, "
                        + points.get(k - 1).date() + " then " + points.get(k).date());
            }
        }
    }

    /** The latest rebalance's point. */
    public DiagnosticsPoint latest() {
        return points.get(points.size() - 1);
    }
}
