package dev.sigmawalk.engine.compare;

import java.util.Objects;
import java.util.Optional;

/**
 * The baseline a strategy is compared with, or why it has none, so that every strategy can be
 * listed with one or the other ({@code check}, the report's strategy table, {@code tests.csv}).
 *
 * @param strategy the strategy's name
 * @param baseline the strategy it is compared with; empty when it is compared with none
 * @param reason in words: how the baseline was chosen, or why there is none (never blank)
 */
public record BaselineChoice(String strategy, Optional<String> baseline, String reason) {
    public BaselineChoice {
        Objects.requireNonNull(strategy, "strategy");
        Objects.requireNonNull(baseline, "baseline");
        Objects.requireNonNull(reason, "reason");
        if (reason.isBlank()) {
            throw new IllegalArgumentException("reason of strategy '" + strategy + "' must not be blank");
        }
        if (baseline.isPresent() && baseline.get().equals(strategy)) {
            throw new IllegalArgumentException("strategy '" + strategy + "' cannot be its own baseline");
        }
    }

    /** Whether the strategy is compared with a baseline. */
    public boolean compared() {
        return baseline.isPresent();
    }

    /** One phrase: {@code "baseline plain-sample (set by baseline: in the study)"} or {@code "no baseline: ..."}. */
    public String describe() {
        return baseline.map(b -> "baseline " + b + " (" + reason + ")").orElse("no baseline: " + reason);
    }
}
