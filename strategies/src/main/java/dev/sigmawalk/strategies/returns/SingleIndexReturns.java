package dev.sigmawalk.strategies.returns;

import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.strategies.risk.SingleIndexCovariance;

import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;

/**
 * The single-index input list (Method §4): μ_i = α_i + β_i μ_m, where β_i = s_im / s_mm is the
 * window's market-model beta (as in {@link SingleIndexCovariance}), α_i the user's alpha for the
 * asset as known on the rebalance date (0 where none is given) and μ_m the per-period market
 * premium: the given annual premium divided by p, else the window mean m̄. The regression
 * intercept of the window is deliberately not used: a historical alpha is not a forecast.
 *
 * @param alphas        user alphas
 * @param annualPremium annual market excess return; empty = use m̄
 */
public record SingleIndexReturns(AlphaLookup alphas, OptionalDouble annualPremium) implements ExpectedReturnModel {

    public SingleIndexReturns {
        Objects.requireNonNull(alphas, "alphas");
        Objects.requireNonNull(annualPremium, "annualPremium");
        if (annualPremium.isPresent() && !Double.isFinite(annualPremium.getAsDouble())) {
            throw new IllegalArgumentException("market premium (" + annualPremium.getAsDouble() + ") must be finite");
        }
    }

    /**
     * @throws IllegalArgumentException when the market's variance in the window is not positive,
     *                                  or an alpha is not finite
     */
    @Override
    public double[] expected(EstimationWindow window) {
        double[] beta = SingleIndexCovariance.fit(window.moments()).betas();
        double premium = marketPremium(window);
        List<String> assets = window.assets();
        double[] mu = new double[beta.length];
        for (int i = 0; i < mu.length; i++) {
            String asset = assets.get(i);
            double alpha = alphas.alpha(asset, window.date());
            if (!Double.isFinite(alpha)) {
                throw new IllegalArgumentException("alpha of " + asset + " on " + window.date() + " (" + alpha
                        + ") must be finite");
            }
            mu[i] = alpha + beta[i] * premium;
        }
        return mu;
    }

    /** μ_m per period: annual premium / p, else m̄. */
    double marketPremium(EstimationWindow window) {
        if (annualPremium.isPresent()) {
            int p = window.periodsPerYear();
            if (!(p > 0)) {
                throw new IllegalArgumentException("periods per year (" + p + ") must be > 0");
            }
            return annualPremium.getAsDouble() / p;
        }
        return window.moments().marketMean();
    }
}
