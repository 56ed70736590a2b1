package dev.sigmawalk.engine.compare;

import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.WindowMoments;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Decides what of one estimation window the residual diagnostics (Method §8) can use, so that a
 * degenerate window is reported instead of stopping the run: a market whose excess return does
 * not vary leaves no market-model residuals at all; an asset whose residual variance is zero
 * (it moves exactly with the market) has no residual correlation and is left out, by name.
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
        if (window.assetCount() < 2) {
            return Usable.none("fewer than two eligible assets: no residual correlation");
        }
        if (window.length() < MIN_ROWS) {
            return Usable.none("a window of " + window.length() + " rows leaves no market-model residuals");
        }
        WindowMoments m = window.moments();
        double smm = m.marketVariance();
        if (!(smm > 0) || !Double.isFinite(smm)) {
            return Usable.none(CONSTANT_MARKET);
        }
        List<Integer> keep = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        for (int i = 0; i < m.assets(); i++) {
            double sii = m.covariance(i, i);
            double d = sii - m.marketCovariance()[i] * m.marketCovariance()[i] / smm;
            if (d > RELATIVE_ZERO_VARIANCE * sii && Double.isFinite(d)) {
                keep.add(i);
            } else {
                notes.add("asset '" + window.assets().get(i) + "' left out of the residual diagnostics: its"
                        + " market-model residual variance is zero (it moves exactly with the market)");
            }
        }
        if (keep.size() < 2) {
            notes.add("fewer than two assets with a residual variance: no residual correlation");
            return new Usable(Optional.empty(), List.of(), notes);
        }
        if (keep.size() == m.assets()) {
            return new Usable(Optional.of(m), window.assets(), List.of());
        }
        return new Usable(Optional.of(subset(m, keep)), names(window.assets(), keep), notes);
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
