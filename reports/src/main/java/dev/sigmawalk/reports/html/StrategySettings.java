package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.study.Bounds;
import dev.sigmawalk.engine.study.ExpectedReturnKind;
import dev.sigmawalk.engine.study.FactorSource;
import dev.sigmawalk.engine.study.Objective;
import dev.sigmawalk.engine.study.RiskKind;
import dev.sigmawalk.engine.study.RiskSettings;
import dev.sigmawalk.engine.study.ShrinkageTarget;
import dev.sigmawalk.engine.study.StrategySpec;
import java.util.List;
import java.util.Locale;

/**
 * Every setting of one strategy in the words a committee reads, one phrase per column of the
 * report's strategy table. A setting the strategy does not use says so ("not used") rather than
 * leaving the cell empty, so a blank never has to be interpreted.
 */
final class StrategySettings {
    /** The phrase of a setting the strategy's rule does not use. */
    static final String NOT_USED = "not used";

    /** Column headings of the strategy table, in order. */
    static final List<String> HEADERS = List.of("Strategy", "Risk model", "Portfolio rule", "Weight bounds",
            "Risk aversion", "Expected returns", "Alpha file", "Shrinkage target", "Baseline");

    private StrategySettings() {
    }

    /**
     * @param baseline the baseline cell: its name and how it was chosen, or why there is none
     * @return one cell per {@link #HEADERS} entry
     */
    static List<String> row(StrategySpec s, String baseline) {
        return List.of(s.name(), risk(s), rule(s.objective()), bounds(s), riskAversion(s), expectedReturns(s),
                alphas(s), shrinkageTarget(s), baseline);
    }

    static String risk(StrategySpec s) {
        String model = riskModel(s);
        return s.objective() == Objective.EQUAL_WEIGHT
                ? model + " (forecasts the risk only; the weights do not depend on it)" : model;
    }

    /**
     * The covariance model in words, with its own setting; a model this table has no words for
     * is shown as the study spells it.
     */
    static String riskModel(StrategySpec s) {
        RiskSettings settings = s.riskSettings();
        switch (s.risk()) {
            case SAMPLE:
                return "Sample covariance of the window";
            case SINGLE_INDEX:
                return "Single-index (market) model";
            case SHRINKAGE:
                return "Ledoit-Wolf shrinkage of the sample covariance";
            case MULTI_INDEX:
                return "Multi-index model: the market plus " + settings.factors().map(f -> f instanceof FactorSource.Sectors
                        ? "one index per sector" : "the factors of " + f.spelling()).orElse("its factors");
            case PRINCIPAL_COMPONENTS:
                return "Principal-components model with " + settings.components().orElse(0) + " components";
            case EWMA:
                return "Exponentially weighted covariance, half-life "
                        + plain(settings.halfLife().orElse(Double.NaN)) + " periods";
            case NONLINEAR_SHRINKAGE:
                return "Nonlinear shrinkage of the sample eigenvalues (Ledoit & Wolf)";
            default:
                return "Risk model " + settings.modelName(s.risk());
        }
    }

    static String rule(Objective objective) {
        switch (objective) {
            case MIN_VARIANCE:
                return "Lowest forecast variance";
            case MEAN_VARIANCE:
                return "Best trade-off of expected return against variance";
            case MAX_SHARPE:
                return "Highest forecast Sharpe ratio";
            case EQUAL_WEIGHT:
                return "Equal weight in every eligible asset";
            default:
                throw new IllegalArgumentException("no words for objective " + objective);
        }
    }

    static String bounds(StrategySpec s) {
        if (s.objective() == Objective.EQUAL_WEIGHT) {
            return NOT_USED;
        }
        return s.bounds().map(StrategySettings::bounds).orElse("None: short sales allowed");
    }

    static String bounds(Bounds b) {
        String range = "Each weight from " + Formats.percent(b.lower()) + " to " + Formats.percent(b.upper());
        return b.lower() >= 0 ? range + " (no short sales)" : range;
    }

    static String riskAversion(StrategySpec s) {
        return s.objective() == Objective.MEAN_VARIANCE
                ? "λ = " + plain(s.riskAversion()) + " (higher means less risk taken for expected return)" : NOT_USED;
    }

    static String expectedReturns(StrategySpec s) {
        if (!s.objective().needsExpectedReturns()) {
            return NOT_USED;
        }
        if (s.expectedReturns() == ExpectedReturnKind.HISTORICAL) {
            return "Each asset's mean return over the window";
        }
        String premium = s.marketPremium().isPresent()
                ? Formats.percent(s.marketPremium().getAsDouble()) + " a year, as given"
                : "the window's mean market excess return";
        return "Single-index: alpha plus beta times the market premium (" + premium + ")";
    }

    static String alphas(StrategySpec s) {
        if (!s.objective().needsExpectedReturns()) {
            return NOT_USED;
        }
        return s.alphas().map(p -> String.valueOf(p.getFileName())).orElse("None (every alpha 0)");
    }

    static String shrinkageTarget(StrategySpec s) {
        if (s.risk() != RiskKind.SHRINKAGE) {
            return NOT_USED;
        }
        return target(s.shrinkageTarget());
    }

    static String target(ShrinkageTarget t) {
        switch (t) {
            case SINGLE_INDEX:
                return "The single-index covariance (Ledoit & Wolf 2003)";
            case CONSTANT_CORRELATION:
                return "Constant correlation (Ledoit & Wolf 2004)";
            case IDENTITY:
                return "A multiple of the identity (Ledoit & Wolf 2004)";
            default:
                return t.spelling();
        }
    }

    /** A number as a reader writes it: 4 rather than 4.0, 2.5 as it is. */
    static String plain(double x) {
        if (x == Math.rint(x) && Math.abs(x) < 1e15) {
            return String.format(Locale.ROOT, "%.0f", x);
        }
        return String.valueOf(x);
    }
}
