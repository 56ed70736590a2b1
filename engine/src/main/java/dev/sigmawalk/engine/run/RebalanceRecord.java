package dev.sigmawalk.engine.run;

import java.time.LocalDate;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * What happened at one rebalance of one path.
 *
 * @param date the rebalance date d_τ
 * @param row τ
 * @param eligible eligible assets in the window
 * @param assets the assets held after the rebalance (the eligible set when it succeeded; the
 *               drifted previous holdings when it failed)
 * @param weights their weights, aligned with {@code assets}
 * @param turnover Σ|w_new − h_drifted| (0 when the allocation failed)
 * @param cost c · turnover as a decimal return
 * @param forecastVariance w'Σw per period; empty when the allocation failed
 * @param shrinkage δ for shrinkage models
 * @param missingHeld held-asset rows without a return in the holding period this rebalance starts
 * @param failure why no portfolio was formed, when it was not
 * @param notes warnings from the rule (for example a max-Sharpe fallback)
 */
public record RebalanceRecord(LocalDate date, int row, int eligible, List<String> assets, double[] weights,
                              double turnover, double cost, OptionalDouble forecastVariance,
                              OptionalDouble shrinkage, int missingHeld, Optional<String> failure,
                              List<String> notes) {
    public RebalanceRecord {
        Objects.requireNonNull(date, "date");
        assets = List.copyOf(assets);
        Objects.requireNonNull(weights, "weights");
        if (weights.length != assets.size()) {
            throw new IllegalArgumentException("weights (" + weights.length + ") must match assets (" + assets.size() + ")");
        }
        Objects.requireNonNull(forecastVariance, "forecastVariance");
        Objects.requireNonNull(shrinkage, "shrinkage");
        Objects.requireNonNull(failure, "failure");
        notes = List.copyOf(notes);
    }

    /** √(w'Σw) per period, when a forecast exists. */
    public OptionalDouble forecastVolatility() {
        return forecastVariance.isPresent() ? OptionalDouble.of(Math.sqrt(forecastVariance.getAsDouble()))
                : OptionalDouble.empty();
    }

    /** This record with the holding period's missing-return count filled in. */
    RebalanceRecord withMissingHeld(int count) {
        return new RebalanceRecord(date, row, eligible, assets, weights, turnover, cost, forecastVariance,
                shrinkage, count, failure, notes);
    }
}
