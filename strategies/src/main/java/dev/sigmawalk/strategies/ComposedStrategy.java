package dev.sigmawalk.strategies;

import dev.sigmawalk.engine.model.Allocator;
import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.Decision;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.StrategyDefinition;
import dev.sigmawalk.engine.study.Bounds;
import dev.sigmawalk.strategies.returns.ExpectedReturnModel;
import dev.sigmawalk.strategies.risk.RiskModel;
import dev.sigmawalk.strategies.rules.PortfolioRule;
import dev.sigmawalk.strategies.rules.RuleInput;
import dev.sigmawalk.strategies.rules.WarmStart;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * A strategy made of a risk model, an optional expected-return model and a portfolio rule. Each
 * path gets its own allocator with its own warm-start memory.
 */
final class ComposedStrategy implements StrategyDefinition {
    private final String name;
    private final RiskModel risk;
    private final ExpectedReturnModel returns;
    private final PortfolioRule rule;
    private final Optional<Bounds> bounds;

    ComposedStrategy(String name, RiskModel risk, ExpectedReturnModel returns, PortfolioRule rule,
                     Optional<Bounds> bounds) {
        this.name = Objects.requireNonNull(name, "name");
        this.risk = Objects.requireNonNull(risk, "risk");
        this.rule = Objects.requireNonNull(rule, "rule");
        this.bounds = Objects.requireNonNull(bounds, "bounds");
        if (rule.needsExpectedReturns() && returns == null) {
            throw new IllegalArgumentException("strategy '" + name + "' needs expected returns but has no model for them");
        }
        this.returns = returns;
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public String riskLabel() {
        return risk.label();
    }

    /** The risk model decides: expected returns and the rules read only the estimate and the cheap moments. */
    @Override
    public boolean needsDenseMoments(int window, int assets) {
        return risk.needsDenseMoments(window, assets);
    }

    @Override
    public Allocator newAllocator(int window) {
        WarmStart warm = new WarmStart();
        return w -> decide(w, warm);
    }

    private Decision decide(EstimationWindow window, WarmStart warm) {
        CovarianceEstimate sigma;
        try {
            sigma = risk.estimate(window);
        } catch (IllegalArgumentException | ArithmeticException e) {
            return new Decision.Failed(risk.label() + " model could not be estimated: " + e.getMessage(),
                    OptionalDouble.empty());
        }
        double[] mu;
        try {
            mu = returns == null ? null : returns.expected(window);
        } catch (IllegalArgumentException | ArithmeticException e) {
            // For example single-index expected returns in a window where the market is constant.
            return new Decision.Failed("expected returns could not be estimated: " + e.getMessage(),
                    sigma.shrinkage());
        }
        return rule.apply(new RuleInput(window.assets(), sigma, mu, bounds), warm).toDecision(sigma.shrinkage());
    }
}
