package dev.sigmawalk.strategies;

import dev.sigmawalk.engine.data.AlphaTable;
import dev.sigmawalk.engine.data.FactorTable;
import dev.sigmawalk.engine.data.InputException;
import dev.sigmawalk.engine.data.StudyData;
import dev.sigmawalk.engine.study.FactorSource;
import dev.sigmawalk.engine.study.RiskKind;
import dev.sigmawalk.engine.study.Study;
import dev.sigmawalk.engine.model.StrategyDefinition;
import dev.sigmawalk.engine.study.StrategySpec;
import dev.sigmawalk.strategies.optimize.SolverSettings;
import dev.sigmawalk.strategies.returns.ExpectedReturnModel;
import dev.sigmawalk.strategies.risk.NonlinearShrinkageRiskModel;
import dev.sigmawalk.strategies.risk.RiskModel;
import dev.sigmawalk.strategies.rules.PortfolioRule;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

/**
 * Turns the strategies of a study file into runnable {@link StrategyDefinition}s: a risk model,
 * an expected-return model where the objective needs one, and a portfolio rule.
 */
public final class StrategyCatalog {
    private static final Function<FactorSource.File, FactorTable> NO_FACTOR_FILES = f -> {
        throw new IllegalArgumentException("factor file " + f.written() + " was not read with the study");
    };

    private StrategyCatalog() {
    }

    /**
     * @param specs the study's strategies, in study order
     * @param alphas the alpha table of a strategy (empty table when it names none)
     */
    public static List<StrategyDefinition> build(List<StrategySpec> specs, Function<StrategySpec, AlphaTable> alphas) {
        return build(specs, alphas, Map.of(), NO_FACTOR_FILES);
    }

    /**
     * The study's strategies with everything their models read from the data: alphas, sectors
     * ({@code factors: sectors}) and factor files ({@code factors: FILE}).
     */
    public static List<StrategyDefinition> build(Study study, StudyData data) {
        requireLongEnoughWindows(study, data.panel().assetCount());
        return build(study.strategies(), data::alphasFor, data.sectors(), data::factorsFor);
    }

    /**
     * Method §11: nonlinear shrinkage with more assets than L - 1 needs L ≥ 13; a study that
     * could meet such a window is an input error before anything runs.
     */
    private static void requireLongEnoughWindows(Study study, int assets) {
        for (int i = 0; i < study.strategies().size(); i++) {
            if (study.strategies().get(i).risk() != RiskKind.NONLINEAR_SHRINKAGE) {
                continue;
            }
            for (int length : study.walkForward().windows()) {
                if (length < NonlinearShrinkageRiskModel.SHORTEST_WIDE_WINDOW && assets > length - 1) {
                    throw new InputException(new InputException.Location(study.file(), 0, null), "strategies[" + i
                            + "] (risk: nonlinear-shrinkage) with window " + length + " and up to " + assets
                            + " assets: with more assets than L - 1 the formula needs a window of at least "
                            + NonlinearShrinkageRiskModel.SHORTEST_WIDE_WINDOW + " rows; lengthen walkforward.windows");
                }
            }
        }
    }

    static List<StrategyDefinition> build(List<StrategySpec> specs, Function<StrategySpec, AlphaTable> alphas,
                                                  Map<String, String> sectors,
                                                  Function<FactorSource.File, FactorTable> factorFiles) {
        List<StrategyDefinition> out = new ArrayList<>(specs.size());
        for (StrategySpec s : specs) {
            out.add(build(s, RiskModel.of(s, sectors, factorFiles), alphas.apply(s), SolverSettings.standard()));
        }
        return out;
    }

    static StrategyDefinition build(StrategySpec s, AlphaTable alphas, SolverSettings settings) {
        return build(s, RiskModel.of(s, Map.of(), NO_FACTOR_FILES), alphas, settings);
    }

    private static StrategyDefinition build(StrategySpec s, RiskModel risk, AlphaTable alphas, SolverSettings settings) {
        PortfolioRule rule = PortfolioRule.of(s.objective(), s.riskAversion(), settings);
        ExpectedReturnModel returns = rule.needsExpectedReturns()
                ? ExpectedReturnModel.of(s.expectedReturns(), alphas::latest, s.marketPremium())
                : null;
        return new ComposedStrategy(s.name(), risk, returns, rule, s.bounds());
    }
}
