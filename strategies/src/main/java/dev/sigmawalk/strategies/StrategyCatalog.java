package dev.sigmawalk.strategies;

import dev.sigmawalk.engine.data.AlphaTable;
import dev.sigmawalk.engine.model.StrategyDefinition;
import dev.sigmawalk.engine.study.StrategySpec;
import dev.sigmawalk.strategies.optimize.SolverSettings;
import dev.sigmawalk.strategies.returns.ExpectedReturnModel;
import dev.sigmawalk.strategies.risk.RiskModel;
import dev.sigmawalk.strategies.rules.PortfolioRule;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;

/**
 * Turns the strategies of a study file into runnable {@link StrategyDefinition}s: a risk model,
 * an expected-return model where the objective needs one, and a portfolio rule.
 */
public final class StrategyCatalog {
    private StrategyCatalog() {
    }

    /**
     * @param specs the study's strategies, in study order
     * @param alphas the alpha table of a strategy (empty table when it names none)
     */
    public static List<StrategyDefinition> build(List<StrategySpec> specs, Function<StrategySpec, AlphaTable> alphas) {
        List<StrategyDefinition> out = new ArrayList<>(specs.size());
        for (StrategySpec s : specs) {
            out.add(build(s, alphas.apply(s), SolverSettings.standard()));
        }
        return out;
    }

    static StrategyDefinition build(StrategySpec s, AlphaTable alphas, SolverSettings settings) {
        RiskModel risk = RiskModel.of(s.risk(), s.shrinkageTarget());
        PortfolioRule rule = PortfolioRule.of(s.objective(), s.riskAversion(), settings);
        ExpectedReturnModel returns = rule.needsExpectedReturns()
                ? ExpectedReturnModel.of(s.expectedReturns(), alphas::latest, s.marketPremium())
                : null;
        return new ComposedStrategy(s.name(), risk, returns, rule, s.bounds());
    }
}
