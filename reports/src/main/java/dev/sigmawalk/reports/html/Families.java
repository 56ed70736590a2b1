package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.run.PathResult;
import dev.sigmawalk.engine.run.RunResult;
import dev.sigmawalk.engine.study.Objective;
import dev.sigmawalk.engine.study.RiskKind;
import dev.sigmawalk.engine.study.Study;
import dev.sigmawalk.engine.study.StrategySpec;
import dev.sigmawalk.reports.charts.ModelFamily;
import dev.sigmawalk.reports.charts.StyleBook;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Which colour family each strategy belongs to: equal-weight strategies form their own family
 * whatever model forecasts their risk; every other strategy belongs to its risk model's family.
 */
final class Families {
    /** The benchmark's line name in charts and tables. */
    static final String MARKET = "market";

    private Families() {
    }

    static ModelFamily of(StrategySpec spec) {
        if (spec.objective() == Objective.EQUAL_WEIGHT) {
            return ModelFamily.EQUAL_WEIGHT;
        }
        return of(spec.risk());
    }

    static ModelFamily of(RiskKind risk) {
        switch (risk) {
            case SAMPLE:
                return ModelFamily.SAMPLE;
            case SINGLE_INDEX:
                return ModelFamily.SINGLE_INDEX;
            case SHRINKAGE:
                return ModelFamily.SHRINKAGE;
            case MULTI_INDEX:
                return ModelFamily.MULTI_INDEX;
            case PRINCIPAL_COMPONENTS:
                return ModelFamily.PRINCIPAL_COMPONENTS;
            case EWMA:
                return ModelFamily.EWMA;
            case NONLINEAR_SHRINKAGE:
                return ModelFamily.NONLINEAR_SHRINKAGE;
            default:
                return ModelFamily.OTHER;
        }
    }

    /**
     * Styles for every strategy of the study in study order, then for any strategy found only in
     * the run (its family {@link ModelFamily#OTHER}), then the benchmark.
     */
    static StyleBook styles(Study study, RunResult<?> run) {
        Map<String, ModelFamily> families = new LinkedHashMap<>();
        for (StrategySpec s : study.strategies()) {
            families.put(s.name(), of(s));
        }
        for (PathResult p : run.paths()) {
            families.putIfAbsent(p.strategy(), ModelFamily.OTHER);
        }
        families.put(MARKET, ModelFamily.MARKET);
        return StyleBook.of(families);
    }
}
