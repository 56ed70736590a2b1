package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.study.RiskKind;
import dev.sigmawalk.engine.study.ShrinkageTarget;

import java.util.Objects;

/**
 * A per-period covariance forecast built from one estimation window's excess returns
 * (Method §3). Every model starts from the window's shared sample moments
 * ({@link EstimationWindow#moments()}, divisor L-1) and never recomputes them.
 *
 * <p>Models are immutable values and may serve any number of windows and threads.
 */
public sealed interface RiskModel permits SampleRiskModel, SingleIndexRiskModel, ShrinkageRiskModel {

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
     * The model a strategy names in the study file.
     *
     * @param kind   {@code risk:}
     * @param target {@code shrinkage_target:}; used only when {@code kind} is shrinkage
     */
    static RiskModel of(RiskKind kind, ShrinkageTarget target) {
        Objects.requireNonNull(kind, "risk kind");
        Objects.requireNonNull(target, "shrinkage target");
        if (kind == RiskKind.SAMPLE) {
            return new SampleRiskModel();
        }
        if (kind == RiskKind.SINGLE_INDEX) {
            return new SingleIndexRiskModel();
        }
        return new ShrinkageRiskModel(target);
    }
}
