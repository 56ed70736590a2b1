package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.DenseProof;
import dev.sigmawalk.engine.model.WindowMoments;
import dev.sigmawalk.engine.study.ShrinkageTarget;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * Ledoit-Wolf shrinkage Σ = δF + (1-δ)S (Method §3), with S the sample matrix (divisor L-1), F a
 * structured target built from S and δ ∈ [0, 1] the estimated optimal intensity of the paper
 * that introduced the target (see {@link ShrinkageIntensity}):
 * <ul>
 *   <li>single-index: F = Σ_SI with F_ii = S_ii (Ledoit &amp; Wolf 2003, J. Empirical Finance);</li>
 *   <li>constant-correlation: F_ij = r̄ √(S_ii S_jj), F_ii = S_ii (Ledoit &amp; Wolf 2004,
 *       J. Portfolio Management);</li>
 *   <li>identity: F = (tr S / n) I (Ledoit &amp; Wolf 2004, J. Multivariate Analysis).</li>
 * </ul>
 * The estimate reports δ through {@link CovarianceEstimate#shrinkage()}. Cost O(L n + n²) on top
 * of the window's moments; with far fewer rows than assets ({@link SampleRank#lowRank}) the
 * single-index and identity targets give Σ as diagonal plus low rank instead, in O(L² n) without any n×n matrix
 * ({@link LowRankShrinkage}).
 *
 * @param target the structured matrix shrunk toward
 */
public record ShrinkageRiskModel(ShrinkageTarget target) implements RiskModel {

    public ShrinkageRiskModel {
        Objects.requireNonNull(target, "shrinkage target");
    }

    /**
     * @throws IllegalArgumentException for the single-index target when the market's variance in
     *                                  the window is not positive, for the constant-correlation
     *                                  target when an asset's variance is not positive
     */
    @Override
    public CovarianceEstimate estimate(EstimationWindow window) {
        if (structured(window.length(), window.assetCount())) {
            return LowRankShrinkage.estimate(target, new CentredWindow(window));
        }
        return dense(window);
    }

    /** The estimate as a dense n×n matrix, whatever the window's shape. */
    CovarianceEstimate dense(EstimationWindow window) {
        CentredWindow centred = new CentredWindow(window);
        WindowMoments moments = centred.moments();
        int n = moments.assets();
        if (target == ShrinkageTarget.SINGLE_INDEX) {
            return singleIndexDense(centred);
        }
        ProductVariances pi = ProductVariances.of(centred);
        double[] f;
        double delta;
        if (target == ShrinkageTarget.CONSTANT_CORRELATION) {
            ConstantCorrelationTarget cc = ConstantCorrelationTarget.of(moments.covariance(), n);
            f = cc.matrix();
            delta = ShrinkageIntensity.constantCorrelation(centred, cc.meanCorrelation(), f, pi);
        } else {
            f = identityTarget(moments);
            delta = ShrinkageIntensity.identity(centred, f, pi);
        }
        return new DenseCovariance(n, combine(delta, f, moments.covariance()), OptionalDouble.of(delta),
                DenseProof.UNPROVEN);
    }

    /**
     * Toward the single index without storing the target F: one read of half of S for the
     * intensity's sums ({@link SingleIndexTargetSums}), one sweep of the rows, and one pass that
     * writes δF + (1-δ)S with F_ij = s_mm β_i β_j (i ≠ j) and F_ii = S_ii made on the fly. The
     * paper's target has the sample variances on its diagonal; taking them from S directly keeps
     * rounding in d_i out of γ̂.
     */
    private static CovarianceEstimate singleIndexDense(CentredWindow centred) {
        WindowMoments moments = centred.moments();
        int n = moments.assets();
        SingleIndexCovariance si = SingleIndexCovariance.fit(moments);
        double[] s = moments.covariance();
        double smm = si.marketVariance();
        double[] beta = si.betas();
        double delta = ShrinkageIntensity.singleIndex(centred, SingleIndexTargetSums.of(s, n, smm, beta));
        double keep = 1.0 - delta;
        double[] out = new double[n * n];
        // Σ v·0 over the stored values: 0 when all are finite, NaN as soon as one is not.
        double check = 0;
        for (int i = 0; i < n; i++) {
            int row = i * n;
            double bi = beta[i];
            for (int j = 0; j < n; j++) {
                // δ (s_mm (β_i β_j)) rounds the same for (i, j) and (j, i), so Σ stays exactly symmetric.
                double v = delta * (smm * (bi * beta[j])) + keep * s[row + j];
                out[row + j] = v;
                check += v * 0.0;
            }
            double d = delta * s[row + i] + keep * s[row + i];
            out[row + i] = d;
            check += d * 0.0;
        }
        // Mirrored inputs give a mirrored Σ: each (i, j) and (j, i) is the same expression of
        // equal doubles (β_i β_j = β_j β_i exactly; S_ij = S_ji bit for bit when S is mirrored).
        // The check above covers every stored value, whatever S's own proof says of finiteness.
        DenseProof proof = moments.covarianceProof().mirrored() ? DenseProof.mirrored(check == 0.0) : DenseProof.UNPROVEN;
        return new DenseCovariance(n, out, OptionalDouble.of(delta), proof);
    }

    /**
     * Not when the estimate is handed on as diagonal plus low rank ({@link LowRankShrinkage}:
     * the single-index and identity targets with 8L &lt; n, {@link SampleRank#lowRank}).
     */
    @Override
    public boolean needsDenseMoments(int window, int assets) {
        return !structured(window, assets);
    }

    private boolean structured(int window, int assets) {
        return target != ShrinkageTarget.CONSTANT_CORRELATION && SampleRank.lowRank(window, assets);
    }

    @Override
    public String label() {
        return "shrinkage to " + target.spelling();
    }

    /** (tr S / n) I. */
    private static double[] identityTarget(WindowMoments moments) {
        int n = moments.assets();
        double trace = 0;
        for (int i = 0; i < n; i++) {
            trace += moments.covariance(i, i);
        }
        double[] f = new double[n * n];
        for (int i = 0; i < n; i++) {
            f[i * n + i] = trace / n;
        }
        return f;
    }

    /** δF + (1-δ)S, elementwise, into a new array. */
    private static double[] combine(double delta, double[] f, double[] s) {
        double[] out = new double[s.length];
        for (int k = 0; k < s.length; k++) {
            out[k] = delta * f[k] + (1.0 - delta) * s[k];
        }
        return out;
    }
}
