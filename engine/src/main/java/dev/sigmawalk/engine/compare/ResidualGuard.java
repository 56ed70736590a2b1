package dev.sigmawalk.engine.compare;

import dev.sigmawalk.engine.evidence.ResidualFit;
import dev.sigmawalk.engine.evidence.ResidualRows;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.WindowMoments;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Decides what of one estimation window the residual diagnostics (Method §8) can use, so that a
 * degenerate window is reported instead of stopping the run: a market whose excess return does
 * not vary leaves no market-model residuals at all; an asset whose excess return does not vary,
 * or whose residual variance is zero (it moves exactly with the market), has no residual
 * correlation and is left out, by name.
 *
 * <p>Two routes, the same decisions: {@link #of} reads the window's dense moments (the route
 * when L ≥ n, where any model needs them anyway), {@link #rows} fits the residuals from the
 * window's rows in O(L n) and never asks for a moment matrix (the route when L &lt; n).
 */
final class ResidualGuard {
    /**
     * A residual variance at or below this share of the asset's variance counts as zero: the rule
     * the residual correlations themselves apply, so that no asset that passes here fails there.
     */
    static final double RELATIVE_ZERO_VARIANCE = 1e-12;
    /** The note of a window whose market excess return does not vary (already warned of by the window scan). */
    static final String CONSTANT_MARKET = "the market's excess return does not vary in the window:"
            + " no market-model residuals";
    private static final String TOO_FEW = "fewer than two assets with a residual variance: no residual correlation";
    /** Market-model residuals need more rows than the two regressors (intercept, market). */
    static final int MIN_ROWS = 3;

    /**
     * What the diagnostics may use.
     *
     * @param moments the moments of the usable assets; empty when nothing can be computed
     * @param assets the usable assets, in the moments' order
     * @param notes what was left out and why, in words
     */
    record Usable(Optional<WindowMoments> moments, List<String> assets, List<String> notes) {
        Usable {
            Objects.requireNonNull(moments, "moments");
            assets = List.copyOf(assets);
            notes = List.copyOf(notes);
        }

        static Usable none(String note) {
            return new Usable(Optional.empty(), List.of(), List.of(note));
        }
    }

    private ResidualGuard() {
    }

    static Usable of(EstimationWindow window) {
        Optional<String> refused = refusal(window);
        if (refused.isPresent()) {
            return Usable.none(refused.get());
        }
        WindowMoments m = window.moments();
        double smm = m.marketVariance();
        if (!(smm > 0) || !Double.isFinite(smm)) {
            return Usable.none(CONSTANT_MARKET);
        }
        List<Integer> keep = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        for (int i = 0; i < m.assets(); i++) {
            if (constant(window, i)) {
                notes.add(constantNote(window.assets().get(i)));
                continue;
            }
            double sii = m.covariance(i, i);
            double d = sii - m.marketCovariance()[i] * m.marketCovariance()[i] / smm;
            if (d > RELATIVE_ZERO_VARIANCE * sii && Double.isFinite(d)) {
                keep.add(i);
            } else {
                notes.add(leftOut(window.assets().get(i)));
            }
        }
        if (keep.size() < 2) {
            notes.add(TOO_FEW);
            return new Usable(Optional.empty(), List.of(), notes);
        }
        if (keep.size() == m.assets()) {
            return new Usable(Optional.of(m), window.assets(), List.of());
        }
        return new Usable(Optional.of(subset(m, keep)), names(window.assets(), keep), notes);
    }

    /**
     * The standardised residuals of the usable assets, from the window's rows alone.
     *
     * @param rows the residuals of the usable assets; empty when nothing can be computed
     * @param notes what was left out and why, in words (the same notes {@link #of} gives)
     */
    record UsableRows(Optional<ResidualRows> rows, List<String> notes) {
        UsableRows {
            Objects.requireNonNull(rows, "rows");
            notes = List.copyOf(notes);
        }
    }

    static UsableRows rows(EstimationWindow window) {
        Optional<String> refused = refusal(window);
        if (refused.isPresent()) {
            return new UsableRows(Optional.empty(), List.of(refused.get()));
        }
        ResidualFit fit = ResidualFit.of(window);
        int[] keep = new int[fit.assetCount()];
        int kept = 0;
        List<String> notes = new ArrayList<>();
        for (int i = 0; i < fit.assetCount(); i++) {
            if (constant(window, i)) {
                notes.add(constantNote(window.assets().get(i)));
            } else if (fit.hasResidual(i)) {
                keep[kept++] = i;
            } else {
                notes.add(leftOut(window.assets().get(i)));
            }
        }
        if (kept < 2) {
            notes.add(TOO_FEW);
            return new UsableRows(Optional.empty(), notes);
        }
        return new UsableRows(Optional.of(fit.standardised(java.util.Arrays.copyOf(keep, kept))), notes);
    }

    /** Why a window gives no residuals at all (too few assets or rows, a market that does not vary). */
    private static Optional<String> refusal(EstimationWindow window) {
        if (window.assetCount() < 2) {
            return Optional.of("fewer than two eligible assets: no residual correlation");
        }
        if (window.length() < MIN_ROWS) {
            return Optional.of("a window of " + window.length() + " rows leaves no market-model residuals");
        }
        return window.marketVaries() ? Optional.empty() : Optional.of(CONSTANT_MARKET);
    }

    /**
     * Whether asset i's excess return is the same number in every row, compared exactly: centring
     * such a column leaves rounding dust (the mean of L copies of 0.1 is not 0.1), whose
     * "residual" would pass the relative rule and give correlations of noise. The walk-forward
     * never hands the probe such a column (the window builder leaves it out); a window built by
     * hand may. O(1) for a column that varies, which exits at its first change.
     */
    private static boolean constant(EstimationWindow window, int i) {
        int n = window.assetCount();
        double[] x = window.excessReturns();
        for (int t = 1; t < window.length(); t++) {
            if (x[t * n + i] != x[i]) {
                return false;
            }
        }
        return true;
    }

    private static String constantNote(String asset) {
        return "asset '" + asset + "' left out of the residual diagnostics: its excess return does not vary in the"
                + " window";
    }

    private static String leftOut(String asset) {
        return "asset '" + asset + "' left out of the residual diagnostics: its"
                + " market-model residual variance is zero (it moves exactly with the market)";
    }

    private static List<String> names(List<String> assets, List<Integer> keep) {
        List<String> out = new ArrayList<>(keep.size());
        for (int i : keep) {
            out.add(assets.get(i));
        }
        return out;
    }

    /** The moments of the kept assets only (the market's own moments unchanged). */
    private static WindowMoments subset(WindowMoments m, List<Integer> keep) {
        int k = keep.size();
        double[] mean = new double[k];
        double[] sim = new double[k];
        double[] s = new double[k * k];
        for (int a = 0; a < k; a++) {
            int i = keep.get(a);
            mean[a] = m.mean()[i];
            sim[a] = m.marketCovariance()[i];
            for (int b = 0; b < k; b++) {
                s[a * k + b] = m.covariance(i, keep.get(b));
            }
        }
        return new WindowMoments(k, m.length(), mean, m.marketMean(), m.marketVariance(), sim, s);
    }
}
