package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.EstimationWindow;

import java.util.OptionalDouble;

/**
 * The full sample covariance matrix S = 1/(L-1) Σ_t (x_t - x̄)(x_t - x̄)' (Method §3), taken as
 * is from the window's moments. With fewer rows than assets ({@link SampleRank}) it is handed on
 * as its centred rows instead, S = X̃'X̃/(L−1): a {@link FactorCovariance} with B = X̃' (n×L),
 * Σ_F = I/(L−1) and no specific variance, O(L n) numbers. Then S is singular; that is left to
 * the portfolio rule to handle or report.
 */
public record SampleRiskModel() implements RiskModel {

    @Override
    public CovarianceEstimate estimate(EstimationWindow window) {
        if (SampleRank.lowRank(window.length(), window.assetCount())) {
            return lowRank(window);
        }
        var moments = window.moments();
        return new DenseCovariance(moments.assets(), moments.covariance(), OptionalDouble.empty(),
                moments.covarianceProof());
    }

    /** S as its centred rows: B = X̃' (n×L), Σ_F = I/(L−1), no specific variance, whatever the shape. */
    static FactorCovariance lowRank(EstimationWindow window) {
        int len = window.length();
        CentredColumns rows = CentredColumns.of(new CentredWindow(window));
        double[] factor = new double[len * len];
        for (int a = 0; a < len; a++) {
            factor[a * len + a] = 1.0 / (len - 1.0);
        }
        return FactorCovariance.of(rows.columns(), factor, new double[window.assetCount()]);
    }

    /** Except on the low-rank path ({@link SampleRank#lowRank}), where the estimate is the centred rows. */
    @Override
    public boolean needsDenseMoments(int window, int assets) {
        return !SampleRank.lowRank(window, assets);
    }

    @Override
    public String label() {
        return "sample";
    }
}
