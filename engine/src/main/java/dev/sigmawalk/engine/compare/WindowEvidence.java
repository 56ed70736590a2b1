package dev.sigmawalk.engine.compare;

import dev.sigmawalk.engine.evidence.ResidualDiagnostics;
import dev.sigmawalk.engine.evidence.ResidualPair;
import dev.sigmawalk.engine.evidence.SectorCoMovement;
import dev.sigmawalk.engine.evidence.SingleIndexEstimates;
import java.time.LocalDate;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Single-index adequacy of one estimation window (Method §8), kept small: the statistics, the
 * most correlated residual pairs and, where sectors are known, the within-sector co-movement.
 *
 * @param date rebalance date
 * @param window L
 * @param diagnostics mean |ρ| (NaN where not computed), Breusch-Pagan LM, Pesaran CD and LM_adj; empty
 *        with fewer than two assets
 * @param largestPairs the pairs with the largest residual correlation, largest first; empty where
 *        the all-pairs statistics were not computed at this rebalance ({@link PairScanPlan})
 * @param sectors residual correlation within and across sectors, when sectors are known
 * @param notes what the diagnostics left out of this window and why (a constant market, an asset
 *              that moves exactly with the market); empty for an ordinary window
 * @param estimates every usable asset's α, β and residual variance (Method §12); empty where the
 *        market did not vary
 */
public record WindowEvidence(LocalDate date, int window, Optional<ResidualDiagnostics> diagnostics,
                             List<ResidualPair> largestPairs, Optional<SectorCoMovement> sectors, List<String> notes,
                             Optional<SingleIndexEstimates> estimates) {
    public WindowEvidence {
        Objects.requireNonNull(date, "date");
        Objects.requireNonNull(diagnostics, "diagnostics");
        largestPairs = List.copyOf(largestPairs);
        Objects.requireNonNull(sectors, "sectors");
        notes = List.copyOf(notes);
        Objects.requireNonNull(estimates, "estimates");
    }

    /** Evidence without written estimates. */
    public WindowEvidence(LocalDate date, int window, Optional<ResidualDiagnostics> diagnostics,
                          List<ResidualPair> largestPairs, Optional<SectorCoMovement> sectors, List<String> notes) {
        this(date, window, diagnostics, largestPairs, sectors, notes, Optional.empty());
    }

    /** Evidence of an ordinary window, with nothing left out. */
    public WindowEvidence(LocalDate date, int window, Optional<ResidualDiagnostics> diagnostics,
                          List<ResidualPair> largestPairs, Optional<SectorCoMovement> sectors) {
        this(date, window, diagnostics, largestPairs, sectors, List.of());
    }
}
