package dev.sigmawalk.strategies.rules;

import dev.sigmawalk.engine.study.Objective;
import dev.sigmawalk.strategies.optimize.SolverSettings;
import java.util.Objects;

/**
 * A rule that turns a covariance forecast (and, for some rules, expected excess returns) into
 * weights summing to 1 over the eligible assets, within optional per-asset bounds.
 */
public sealed interface PortfolioRule permits MinVariance, MeanVariance, MaxSharpe, EqualWeight {

    /**
     * Chooses weights for one rebalance.
     *
     * @param input the covariance, expected returns (when needed) and bounds
     * @param warm the path's warm-start memory, updated by this call
     * @return the weights with their forecast variance w'Σw, or why none could be formed; never
     *         NaN weights
     */
    RuleOutcome apply(RuleInput input, WarmStart warm);

    /** Whether the rule uses {@link RuleInput#expectedReturns()}. */
    boolean needsExpectedReturns();

    /** The rule a study's {@code objective:} names, with λ for mean-variance. */
    static PortfolioRule of(Objective objective, double riskAversion, SolverSettings settings) {
        Objects.requireNonNull(objective, "objective");
        switch (objective) {
            case MIN_VARIANCE:
                return new MinVariance(settings);
            case MEAN_VARIANCE:
                return new MeanVariance(riskAversion, settings);
            case MAX_SHARPE:
                return new MaxSharpe(settings);
            case EQUAL_WEIGHT:
                return new EqualWeight();
            default:
                throw new IllegalArgumentException("no portfolio rule for objective " + objective);
        }
    }
}
