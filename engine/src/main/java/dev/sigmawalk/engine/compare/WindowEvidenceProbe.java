package dev.sigmawalk.engine.compare;

import dev.sigmawalk.engine.evidence.PairScan;
import dev.sigmawalk.engine.evidence.ResidualCorrelations;
import dev.sigmawalk.engine.evidence.ResidualDiagnostics;
import dev.sigmawalk.engine.evidence.ResidualPair;
import dev.sigmawalk.engine.evidence.ResidualRows;
import dev.sigmawalk.engine.evidence.SectorCoMovement;
import dev.sigmawalk.engine.evidence.SingleIndexEstimates;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.run.WindowProbe;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * Computes {@link WindowEvidence} from each estimation window (Method §8) by the cheaper of two
 * exact routes. When L ≥ n, or when a model already had the window's dense moments built, from
 * those moments: O(n²). Otherwise from the window's rows alone, never asking for an n×n moment
 * matrix: the residuals are fitted in O(L n), CD, LM and LM_adj follow from sum
 * identities in O(L² n) and the sector means in O(L n + L s²) ({@link ResidualRows}); the
 * mean |ρ| and the largest pairs need every pair, O(L n²/2) in tiles ({@link PairScan}), and
 * are computed at the rebalances the {@link PairScanPlan} names.
 */
public final class WindowEvidenceProbe implements WindowProbe<WindowEvidence> {
    /** The group of assets the sectors file does not name. */
    public static final String UNLISTED = "(no sector given)";

    private final Map<String, String> sectors;
    private final int pairs;
    private final PairScanPlan plan;

    /**
     * @param sectors asset to sector (may be empty)
     * @param pairs how many of the most correlated residual pairs to keep per window
     * @param plan at which rebalances every pair is scanned
     */
    public WindowEvidenceProbe(Map<String, String> sectors, int pairs, PairScanPlan plan) {
        this.sectors = Map.copyOf(sectors);
        if (!(pairs >= 0)) {
            throw new IllegalArgumentException("pairs (" + pairs + ") must be >= 0");
        }
        this.pairs = pairs;
        this.plan = Objects.requireNonNull(plan, "plan");
    }

    /** Every pair scanned at every rebalance. */
    public WindowEvidenceProbe(Map<String, String> sectors, int pairs) {
        this(sectors, pairs, PairScanPlan.always());
    }

    /** Only when L ≥ n: with fewer rows than assets the evidence comes from the window's rows. */
    @Override
    public boolean needsDenseMoments(int window, int assets) {
        return window >= assets;
    }

    /**
     * Never throws for a degenerate window: {@link ResidualGuard} leaves out what cannot be
     * computed and the evidence carries a note saying so, because evidence must never stop the
     * portfolios.
     */
    @Override
    public WindowEvidence probe(EstimationWindow window) {
        Optional<SingleIndexEstimates> estimates = estimates(window);
        boolean scan = plan.scans(window.endRow(), window.assetCount());
        Found found;
        try {
            found = readsMoments(window) ? fromMoments(window, scan) : fromRows(window, scan);
        } catch (IllegalArgumentException e) {
            // The guard applies the correlations' own rules, so this is a non-finite input only.
            found = new Found(Optional.empty(), List.of(), Optional.empty(),
                    List.of("residual diagnostics not computed: " + e.getMessage()));
        }
        return new WindowEvidence(window.date(), window.length(), found.diagnostics, found.largest, found.sectors,
                found.notes, estimates);
    }

    /**
     * The moment route when L ≥ n (declared in {@link #needsDenseMoments}) or when some model
     * already had the dense S built for this window: reading it is O(n²), less than the rows
     * route's O(L² n) sums and O(L n²) scan. Otherwise the rows, and S is never built for the
     * evidence.
     */
    private static boolean readsMoments(EstimationWindow window) {
        return window.length() >= window.assetCount() || window.moments().hasCovariance();
    }

    /** What one route found. */
    private record Found(Optional<ResidualDiagnostics> diagnostics, List<ResidualPair> largest,
                         Optional<SectorCoMovement> sectors, List<String> notes) {
    }

    private Found fromMoments(EstimationWindow window, boolean scan) {
        ResidualGuard.Usable usable = ResidualGuard.of(window);
        if (usable.moments().isEmpty()) {
            return new Found(Optional.empty(), List.of(), Optional.empty(), usable.notes());
        }
        if (!scan && sectors.isEmpty()) {
            // Nothing reads single pairs: the sums alone, without storing n(n-1)/2 correlations.
            ResidualDiagnostics d = ResidualCorrelations.diagnostics(usable.moments().get(), usable.assets());
            return new Found(Optional.of(d.withMeanAbsCorrelation(Double.NaN)), List.of(), Optional.empty(),
                    usable.notes());
        }
        ResidualCorrelations rho = ResidualCorrelations.of(usable.moments().get(), usable.assets());
        ResidualDiagnostics d = rho.diagnostics();
        return new Found(Optional.of(scan ? d : d.withMeanAbsCorrelation(Double.NaN)),
                scan ? rho.largestPairs(pairs) : List.of(),
                sectors.isEmpty() ? Optional.empty() : Optional.of(rho.bySector(sectorsOf(usable.assets()))),
                usable.notes());
    }

    private Found fromRows(EstimationWindow window, boolean scan) {
        ResidualGuard.UsableRows usable = ResidualGuard.rows(window);
        if (usable.rows().isEmpty()) {
            return new Found(Optional.empty(), List.of(), Optional.empty(), usable.notes());
        }
        ResidualRows z = usable.rows().get();
        ResidualDiagnostics d = z.diagnostics();
        List<ResidualPair> largest = List.of();
        if (scan) {
            PairScan all = z.scan(pairs);
            d = d.withMeanAbsCorrelation(all.meanAbsCorrelation());
            largest = all.largest();
        }
        return new Found(Optional.of(d), largest,
                sectors.isEmpty() ? Optional.empty() : Optional.of(z.bySector(sectorsOf(z.assets()))), usable.notes());
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

    /** Every given asset with its sector; assets the sectors file does not list form their own group. */
    private Map<String, String> sectorsOf(List<String> assets) {
        Map<String, String> out = new HashMap<>();
        for (String a : assets) {
            out.put(a, sectors.getOrDefault(a, UNLISTED));
        }
        return out;
    }
}
