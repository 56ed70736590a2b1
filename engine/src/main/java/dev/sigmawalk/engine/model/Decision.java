package dev.sigmawalk.engine.model;

import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;

/** What a strategy decided at one rebalance. */
public sealed interface Decision permits Decision.Chosen, Decision.Failed {

    /**
     * New target weights, aligned with the window's eligible assets.
     *
     * @param weights sum to 1
     * @param forecastVariance w'Σw per period under the strategy's risk model
     * @param shrinkage δ for shrinkage models, else empty
     * @param notes warnings worth recording (for example a max-Sharpe fallback)
     */
    record Chosen(double[] weights, double forecastVariance, OptionalDouble shrinkage, List<String> notes)
            implements Decision {
        public Chosen {
            Objects.requireNonNull(weights, "weights");
            Objects.requireNonNull(shrinkage, "shrinkage");
            notes = List.copyOf(notes);
            if (!(forecastVariance >= 0)) {
                throw new IllegalArgumentException("forecast variance (" + forecastVariance + ") must be >= 0");
            }
        }
    }

    /**
     * No portfolio could be formed (singular matrix, infeasible bounds, solver failure). The engine
     * then keeps the drifted previous portfolio without trading (before the first successful
     * rebalance: cash, earning the risk-free rate) and records the reason.
     */
    record Failed(String reason, OptionalDouble shrinkage) implements Decision {
        public Failed {
            Objects.requireNonNull(reason, "reason");
            Objects.requireNonNull(shrinkage, "shrinkage");
        }
    }
}
