package dev.sigmawalk.engine.compare;

import dev.sigmawalk.engine.evidence.ResidualCorrelations;
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
        ResidualGuard.Usable usable = ResidualGuard.of(window);
        if (usable.moments().isEmpty()) {
            return new WindowEvidence(window.date(), window.length(), Optional.empty(), List.of(), Optional.empty(),
                    usable.notes());
        }
        ResidualCorrelations rho;
        try {
            rho = ResidualCorrelations.of(usable.moments().get(), usable.assets());
        } catch (IllegalArgumentException e) {
            List<String> notes = new ArrayList<>(usable.notes());
            notes.add("residual diagnostics not computed: " + e.getMessage());
            return new WindowEvidence(window.date(), window.length(), Optional.empty(), List.of(), Optional.empty(),
                    notes);
        }
        return new WindowEvidence(window.date(), window.length(), Optional.of(rho.diagnostics()),
                rho.largestPairs(pairs), sectors.isEmpty() ? Optional.empty() : Optional.of(rho.bySector(sectorsOf(window))),
                usable.notes());
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
