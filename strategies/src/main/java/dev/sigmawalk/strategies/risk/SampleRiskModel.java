package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.EstimationWindow;

import java.util.OptionalDouble;

/**
 * The full sample covariance matrix S = 1/(L-1) Σ_t (x_t - x̄)(x_t - x̄)' (Method §3), taken as
 * is from the window's moments. With n ≥ L it is singular; that is left to the portfolio rule to
 * report.
 */
public record SampleRiskModel() implements RiskModel {

    @Override
    public CovarianceEstimate estimate(EstimationWindow window) {
        var moments = window.moments();
        return new DenseCovariance(moments.assets(), moments.covariance(), OptionalDouble.empty());
    }

    @Override
    public String label() {
        return "sample";
    }
}
