package dev.sigmawalk.strategies.rules;

import dev.sigmawalk.engine.model.Decision;
import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;

/** The result of applying a portfolio rule. Record {@code equals} compares the weight array by reference. */
public sealed interface RuleOutcome permits RuleOutcome.Chosen, RuleOutcome.NotFormed {

    /** The engine's form of this outcome, carrying the risk model's shrinkage intensity. */
    Decision toDecision(OptionalDouble shrinkage);

    /**
     * Weights chosen.
     *
     * @param weights w, aligned with the input's assets, summing to 1
     * @param forecastVariance w'Σw per period under the input's covariance, ≥ 0
     * @param notes warnings worth recording, for example a max-Sharpe fallback
     */
    record Chosen(double[] weights, double forecastVariance, List<String> notes) implements RuleOutcome {
        public Chosen {
            Objects.requireNonNull(weights, "weights");
            notes = List.copyOf(notes);
            if (!(forecastVariance >= 0 && forecastVariance < Double.POSITIVE_INFINITY)) {
                throw new IllegalArgumentException("forecast variance (" + forecastVariance
                        + ") must be finite and >= 0");
            }
        }

        @Override
        public Decision toDecision(OptionalDouble shrinkage) {
            return new Decision.Chosen(weights, forecastVariance, shrinkage, notes);
        }
    }

    /** No portfolio could be formed; the reason says why (singular matrix, infeasible bounds, solver failure). */
    record NotFormed(String reason) implements RuleOutcome {
        public NotFormed {
            Objects.requireNonNull(reason, "reason");
        }

        @Override
        public Decision toDecision(OptionalDouble shrinkage) {
            return new Decision.Failed(reason, shrinkage);
        }
    }
}
