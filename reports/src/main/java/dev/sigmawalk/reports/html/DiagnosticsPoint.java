package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.evidence.ResidualDiagnostics;
import dev.sigmawalk.engine.evidence.ResidualPair;
import dev.sigmawalk.engine.evidence.SectorCoMovement;
import java.time.LocalDate;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The single-index check of one estimation window at one rebalance.
 *
 * @param date the rebalance date
 * @param diagnostics mean |ρ|, Breusch-Pagan LM and Pesaran CD of the window's residuals
 * @param largestPairs the most correlated residual pairs, largest first (may be empty)
 * @param sectors mean residual correlation within and across sectors, when sectors are known
 */
public record DiagnosticsPoint(LocalDate date, ResidualDiagnostics diagnostics, List<ResidualPair> largestPairs,
                               Optional<SectorCoMovement> sectors) {
    public DiagnosticsPoint {
        Objects.requireNonNull(date, "date");
        Objects.requireNonNull(diagnostics, "diagnostics");
        largestPairs = List.copyOf(largestPairs);
        Objects.requireNonNull(sectors, "sectors");
    }

    /** A point without sector information. */
    public DiagnosticsPoint(LocalDate date, ResidualDiagnostics diagnostics, List<ResidualPair> largestPairs) {
        this(date, diagnostics, largestPairs, Optional.empty());
    }
}
