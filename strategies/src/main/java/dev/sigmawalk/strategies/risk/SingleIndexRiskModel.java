package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.EstimationWindow;

/**
 * The single-index (market) model of Sharpe (1963): Σ_SI = s_mm ββ' + diag(d), fitted to the
 * window's moments as {@link SingleIndexCovariance#fit} describes. The estimate keeps the factor
 * form, so the optimizer can use O(n) algebra instead of a dense matrix.
 */
public record SingleIndexRiskModel() implements RiskModel {

    /**
     * @throws IllegalArgumentException when the market's sample variance in the window is not
     *                                  positive and finite
     */
    @Override
    public SingleIndexCovariance estimate(EstimationWindow window) {
        return SingleIndexCovariance.fit(window.moments());
    }

    /** Never: the model reads the cheap moments only. */
    @Override
    public boolean needsDenseMoments(int window, int assets) {
        return false;
    }

    @Override
    public String label() {
        return "single-index";
    }
}
