package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.data.FactorTable;
import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.study.FactorSource;
import dev.sigmawalk.engine.study.RiskKind;
import dev.sigmawalk.engine.study.RiskSettings;
import dev.sigmawalk.engine.study.ShrinkageTarget;
import dev.sigmawalk.engine.study.StrategySpec;

import java.util.Map;
import java.util.Objects;
import java.util.function.Function;

/**
 * A per-period covariance forecast built from one estimation window's excess returns
 * (Method §3). Every model starts from the window's shared sample moments
 * ({@link EstimationWindow#moments()}, divisor L-1) and never recomputes them.
 *
 * <p>Models are immutable values and may serve any number of windows and threads.
 */
public sealed interface RiskModel permits SampleRiskModel, SingleIndexRiskModel, ShrinkageRiskModel,
        MultiIndexRiskModel, PrincipalComponentsRiskModel, EwmaRiskModel, NonlinearShrinkageRiskModel {

    /**
     * The covariance estimate for the window's eligible assets, in the window's asset order.
     *
     * @throws IllegalArgumentException when the window cannot support the model (for example a
     *                                  market series with zero variance in the window); the
     *                                  message names the value and the rule
     */
    CovarianceEstimate estimate(EstimationWindow window);

    /** A short name for reports, for example {@code single-index}. */
    String label();

    /**
     * Whether {@link #estimate} reads the window's dense sample matrix S
     * ({@code window.moments().covariance()}) for a window of {@code window} rows and
     * {@code assets} eligible assets. A function of the two numbers only, so the engine's choice
     * of running sums is the same on every run (see
     * {@link dev.sigmawalk.engine.model.StrategyDefinition#needsDenseMoments}). The cheap moments
     * (means, variances, covariances with the market) never count.
     */
    default boolean needsDenseMoments(int window, int assets) {
        return true;
    }

    /**
     * A model of Method §3, which takes no settings beyond the shrinkage target.
     *
     * @param kind   {@code risk:}: sample, single-index or shrinkage
     * @param target {@code shrinkage_target:}; used only when {@code kind} is shrinkage
     * @throws IllegalArgumentException for a Method §11 model, which needs its settings (use
     *                                  {@link #of(StrategySpec, Map, Function)})
     */
    static RiskModel of(RiskKind kind, ShrinkageTarget target) {
        Objects.requireNonNull(kind, "risk kind");
        Objects.requireNonNull(target, "shrinkage target");
        switch (kind) {
            case SAMPLE:
                return new SampleRiskModel();
            case SINGLE_INDEX:
                return new SingleIndexRiskModel();
            case SHRINKAGE:
                return new ShrinkageRiskModel(target);
            case NONLINEAR_SHRINKAGE:
                return new NonlinearShrinkageRiskModel();
            default:
                throw new IllegalArgumentException("risk " + kind.spelling() + " needs its settings");
        }
    }

    /**
     * The model a strategy names in the study file, with its settings.
     *
     * @param spec        the strategy
     * @param sectors     asset to sector, for {@code factors: sectors}
     * @param factorFiles the table of each {@code factors: FILE}
     */
    static RiskModel of(StrategySpec spec, Map<String, String> sectors,
                        Function<FactorSource.File, FactorTable> factorFiles) {
        RiskSettings settings = spec.riskSettings();
        switch (spec.risk()) {
            case MULTI_INDEX:
                FactorSource source = settings.factors().orElseThrow();
                return new MultiIndexRiskModel(source instanceof FactorSource.File f
                        ? new FactorColumns.File(factorFiles.apply(f), f.spelling())
                        : new FactorColumns.Sectors(sectors));
            case PRINCIPAL_COMPONENTS:
                return new PrincipalComponentsRiskModel(settings.components().orElseThrow());
            case EWMA:
                return new EwmaRiskModel(settings.halfLife().orElseThrow());
            default:
                return of(spec.risk(), spec.shrinkageTarget());
        }
    }
}
