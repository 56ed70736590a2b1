package dev.sigmawalk.strategies.rules;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.study.Bounds;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * What a portfolio rule sees at one rebalance.
 *
 * @param assets the eligible asset ids, aligned with the covariance and expected returns (used
 *               to carry warm-start state across rebalances whose asset sets differ)
 * @param covariance the per-period forecast Σ for those assets
 * @param expectedReturns per-period expected excess returns μ, length n; {@code null} for rules
 *                        that need none (min-variance, equal-weight). Held as given, not copied.
 * @param bounds per-asset weight bounds; empty means short sales are allowed, no bounds
 */
public record RuleInput(List<String> assets, CovarianceEstimate covariance, double[] expectedReturns,
                        Optional<Bounds> bounds) {
    public RuleInput {
        assets = List.copyOf(assets);
        Objects.requireNonNull(covariance, "covariance");
        Objects.requireNonNull(bounds, "bounds");
        if (covariance.size() != assets.size()) {
            throw new IllegalArgumentException("covariance size (" + covariance.size() + ") must match the "
                    + assets.size() + " assets");
        }
        if (expectedReturns != null) {
            if (expectedReturns.length != assets.size()) {
                throw new IllegalArgumentException("expected returns (" + expectedReturns.length
                        + ") must match the " + assets.size() + " assets");
            }
            for (int i = 0; i < expectedReturns.length; i++) {
                if (!Double.isFinite(expectedReturns[i])) {
                    throw new IllegalArgumentException("expected return of " + assets.get(i) + " ("
                            + expectedReturns[i] + ") must be finite");
                }
            }
        }
    }

    /** n. */
    public int size() {
        return assets.size();
    }
}
