package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.EstimationWindow;

import java.util.Objects;

/**
 * The multi-index model (Cohen &amp; Pogue 1967; Elton &amp; Gruber; Method §11): per asset, OLS of
 * its excess return on an intercept and its factors ({@link MultiIndexFit}), and
 * Σ = B Σ_F B' + diag(d) kept in factor form ({@link FactorCovariance}). Its diagonal equals
 * S's: S_ii = b_i'Σ_F b_i + d_i is the least-squares split of the variance.
 *
 * @param factors the market plus sector means, or a factor file's columns
 */
public record MultiIndexRiskModel(FactorColumns factors) implements RiskModel {

    public MultiIndexRiskModel {
        Objects.requireNonNull(factors, "factors");
    }

    /**
     * @throws IllegalArgumentException when an asset's factors are collinear in the window
     */
    @Override
    public FactorCovariance estimate(EstimationWindow window) {
        return fit(window).covariance();
    }

    /** The per-asset fits behind the estimate, for the residual diagnostics. */
    MultiIndexFit fit(EstimationWindow window) {
        return MultiIndexFit.of(window, factors.design(window));
    }

    /** Never: the model works from the window's rows. */
    @Override
    public boolean needsDenseMoments(int window, int assets) {
        return false;
    }

    @Override
    public String label() {
        return "multi-index (" + factors.spelling() + ")";
    }
}
