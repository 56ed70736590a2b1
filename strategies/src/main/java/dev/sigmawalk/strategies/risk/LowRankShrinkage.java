package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.study.ShrinkageTarget;
import java.util.Arrays;

/**
 * Ledoit-Wolf shrinkage Σ = δF + (1−δ)S (Method §3) held as diagonal plus low rank, for windows
 * with fewer rows than assets. With the centred rows X̃ (L×n), S = X̃'X̃/(L−1), so
 * <ul>
 *   <li>single-index target F = s_mm ββ' + diag(d) (F_ii = S_ii):
 *       Σ = diag(δ d) + B Σ_F B' with B = [β, X̃'] (n×(L+1)) and
 *       Σ_F = diag(δ s_mm, (1−δ)/(L−1), …, (1−δ)/(L−1));</li>
 *   <li>identity target F = (tr S/n) I: Σ = (δ tr S/n) I + B Σ_F B' with B = X̃' and
 *       Σ_F = (1−δ)/(L−1) I.</li>
 * </ul>
 * The intensity comes from {@link ShrinkageIntensity#singleIndexGram} and
 * {@link ShrinkageIntensity#identityGram}, O(L² n); the result is a {@link FactorCovariance},
 * which the optimizer solves on the factor side. Entries agree with the dense estimate to
 * rounding (the diagonal is δ(s_mm β_i² + d_i) + (1−δ) Σ_t x̃_ti²/(L−1) rather than S_ii itself).
 */
final class LowRankShrinkage {
    private LowRankShrinkage() {
    }

    /**
     * @param target single-index or identity
     * @throws IllegalArgumentException for the single-index target when the market's variance is
     *                                  not positive, and for the constant-correlation target
     */
    static FactorCovariance estimate(ShrinkageTarget target, CentredWindow window) {
        CentredColumns columns = CentredColumns.of(window);
        if (target == ShrinkageTarget.SINGLE_INDEX) {
            return singleIndex(window, columns);
        }
        if (target == ShrinkageTarget.IDENTITY) {
            return identity(window, columns);
        }
        throw new IllegalArgumentException("shrinkage to " + target.spelling() + " has no low-rank form here");
    }

    private static FactorCovariance singleIndex(CentredWindow window, CentredColumns columns) {
        SingleIndexCovariance si = SingleIndexCovariance.fit(window.moments());
        double delta = ShrinkageIntensity.singleIndexGram(window, columns);
        int n = window.assets();
        int len = window.length();
        int k = len + 1;
        double[] beta = si.betas();
        double[] loadings = new double[n * k];
        double[] x = columns.columns();
        for (int i = 0; i < n; i++) {
            loadings[i * k] = beta[i];
            System.arraycopy(x, i * len, loadings, i * k + 1, len);
        }
        double[] factor = new double[k * k];
        factor[0] = delta * si.factorVariance();
        double sampleWeight = (1 - delta) / (len - 1.0);
        for (int a = 1; a < k; a++) {
            factor[a * k + a] = sampleWeight;
        }
        double[] specific = si.specificVariances().clone();
        for (int i = 0; i < n; i++) {
            specific[i] *= delta;
        }
        return FactorCovariance.of(loadings, factor, specific).withShrinkage(delta);
    }

    private static FactorCovariance identity(CentredWindow window, CentredColumns columns) {
        double delta = ShrinkageIntensity.identityGram(window, columns);
        int n = window.assets();
        int len = window.length();
        double trace = 0;
        for (double v : window.moments().variances()) {
            trace += v;
        }
        double[] factor = new double[len * len];
        double sampleWeight = (1 - delta) / (len - 1.0);
        for (int a = 0; a < len; a++) {
            factor[a * len + a] = sampleWeight;
        }
        double[] specific = new double[n];
        Arrays.fill(specific, delta * trace / n);
        return FactorCovariance.of(columns.columns().clone(), factor, specific).withShrinkage(delta);
    }
}
