package dev.sigmawalk.engine.compare;

import dev.sigmawalk.engine.evidence.ResidualCorrelations;
import dev.sigmawalk.engine.evidence.SingleIndexEstimates;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.run.WindowProbe;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Computes {@link WindowEvidence} from each estimation window, from the window's shared moments
 * (O(n²) per window, no second pass over the data).
 */
public final class WindowEvidenceProbe implements WindowProbe<WindowEvidence> {
    /** The group of assets the sectors file does not name. */
    public static final String UNLISTED = "(no sector given)";

    private final Map<String, String> sectors;
    private final int pairs;

    /**
     * @param sectors asset to sector (may be empty)
     * @param pairs how many of the most correlated residual pairs to keep per window
     */
    public WindowEvidenceProbe(Map<String, String> sectors, int pairs) {
        this.sectors = Map.copyOf(sectors);
        if (!(pairs >= 0)) {
            throw new IllegalArgumentException("pairs (" + pairs + ") must be >= 0");
        }
        this.pairs = pairs;
    }

    /**
     * Never throws for a degenerate window: {@link ResidualGuard} leaves out what cannot be
     * computed and the evidence carries a note saying so, because evidence must never stop the
     * portfolios.
     */
    @Override
    public WindowEvidence probe(EstimationWindow window) {
        Optional<SingleIndexEstimates> estimates = estimates(window);
        ResidualGuard.Usable usable = ResidualGuard.of(window);
        if (usable.moments().isEmpty()) {
            return new WindowEvidence(window.date(), window.length(), Optional.empty(), List.of(), Optional.empty(),
                    usable.notes(), estimates);
        }
        ResidualCorrelations rho;
        try {
            rho = ResidualCorrelations.of(usable.moments().get(), usable.assets());
        } catch (IllegalArgumentException e) {
            List<String> notes = new ArrayList<>(usable.notes());
            notes.add("residual diagnostics not computed: " + e.getMessage());
            return new WindowEvidence(window.date(), window.length(), Optional.empty(), List.of(), Optional.empty(),
                    notes, estimates);
        }
        return new WindowEvidence(window.date(), window.length(), Optional.of(rho.diagnostics()),
                rho.largestPairs(pairs), sectors.isEmpty() ? Optional.empty() : Optional.of(rho.bySector(sectorsOf(window))),
                usable.notes(), estimates);
    }

    /**
     * α, β and d of every eligible asset (an asset that moves exactly with the market has d = 0,
     * still an estimate); empty when the window has no asset, fewer than two rows or a market
     * that does not vary (β undefined).
     */
    private static Optional<SingleIndexEstimates> estimates(EstimationWindow window) {
        if (window.assetCount() < 1 || window.length() < 2) {
            return Optional.empty();
        }
        double smm = window.moments().marketVariance();
        if (!(smm > 0) || !Double.isFinite(smm)) {
            return Optional.empty();
        }
        return Optional.of(SingleIndexEstimates.of(window.moments(), window.assets()));
    }

    /** Every asset of the window with its sector; assets the sectors file does not list form their own group. */
    private Map<String, String> sectorsOf(EstimationWindow window) {
        Map<String, String> out = new HashMap<>();
        for (String a : window.assets()) {
            out.put(a, sectors.getOrDefault(a, UNLISTED));
        }
        return out;
    }
}
