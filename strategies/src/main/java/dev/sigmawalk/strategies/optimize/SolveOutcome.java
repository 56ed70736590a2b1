package dev.sigmawalk.strategies.optimize;

import java.util.Objects;

/**
 * What a solve produced. Record {@code equals} on the arrays compares references, not contents.
 */
public sealed interface SolveOutcome permits SolveOutcome.Optimal, SolveOutcome.Infeasible, SolveOutcome.Failed {

    /** Whether this is an {@link Optimal} outcome. */
    default boolean isOptimal() {
        return this instanceof Optimal;
    }

    /**
     * A verified optimum.
     *
     * @param weights w, summing to 1 within the bounds
     * @param sides the final partition, usable as the next solve's warm start
     * @param iterations active-set changes made (0 for closed forms)
     * @param budgetMultiplier ν, the multiplier of Σ w_i = 1 (gradient Qw − c equals ν on free weights)
     * @param kktResidual the largest scaled KKT violation found by the verification, ≤ the tolerance
     */
    record Optimal(double[] weights, BoundSide[] sides, int iterations, double budgetMultiplier, double kktResidual)
            implements SolveOutcome {
        public Optimal {
            Objects.requireNonNull(weights, "weights");
            Objects.requireNonNull(sides, "sides");
            if (sides.length != weights.length) {
                throw new IllegalArgumentException("sides (" + sides.length + ") must match weights (" + weights.length + ")");
            }
            if (iterations < 0) {
                throw new IllegalArgumentException("iterations (" + iterations + ") must be >= 0");
            }
            if (!(kktResidual >= 0)) {
                throw new IllegalArgumentException("kkt residual (" + kktResidual + ") must be >= 0");
            }
        }
    }

    /** No weights satisfy the constraints; the reason names the bounds that cannot sum to 1. */
    record Infeasible(String reason) implements SolveOutcome {
        public Infeasible {
            Objects.requireNonNull(reason, "reason");
        }
    }

    /** The problem is well posed but could not be solved exactly (singular matrix, unbounded, no convergence). */
    record Failed(String reason) implements SolveOutcome {
        public Failed {
            Objects.requireNonNull(reason, "reason");
        }
    }
}
