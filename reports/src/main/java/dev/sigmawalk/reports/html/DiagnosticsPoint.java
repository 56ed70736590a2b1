package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.evidence.ResidualDiagnostics;
import dev.sigmawalk.engine.evidence.ResidualPair;
import java.time.LocalDate;
import java.util.List;
import java.util.Objects;

/**
 * The single-index check of one estimation window at one rebalance.
 *
 * @param date the rebalance date
 * @param diagnostics mean |ρ|, Breusch-Pagan LM and Pesaran CD of the window's residuals
 * @param largestPairs the most correlated residual pairs, largest first (may be empty)
 */
public record DiagnosticsPoint(LocalDate date, ResidualDiagnostics diagnostics, List<ResidualPair> largestPairs) {
    public DiagnosticsPoint {
        Objects.requireNonNull(date, "date");
        Objects.requireNonNull(diagnostics, "diagnostics");
        largestPairs = List.copyOf(largestPairs);
    }
}
