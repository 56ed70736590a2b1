package dev.sigmawalk.strategies.rules;

import dev.sigmawalk.engine.study.Bounds;

import java.util.Arrays;
import java.util.List;

/**
 * Equal weights 1/n over the eligible assets. The covariance only supplies the reported forecast
 * variance w'Σw. With uniform bounds, 1/n lies within [lower, upper] exactly when the bounds can
 * sum to 1 (n·lower ≤ 1 ≤ n·upper), so bounds that cannot are reported, as for the other rules.
 */
public record EqualWeight() implements PortfolioRule {
    static final String NAME = "equal-weight";

    @Override
    public RuleOutcome apply(RuleInput input, WarmStart warm) {
        RuleOutcome none = Solved.unusable(NAME, input);
        if (none != null) {
            return none;
        }
        int n = input.size();
        if (input.bounds().isPresent() && !input.bounds().get().feasibleFor(n)) {
            Bounds b = input.bounds().get();
            return new RuleOutcome.NotFormed(NAME + ": bounds [" + b.lower() + ", " + b.upper() + "] cannot make " + n
                    + " weights sum to 1; they need " + n + "·lower <= 1 <= " + n + "·upper");
        }
        double[] w = new double[n];
        Arrays.fill(w, 1.0 / n);
        return Solved.chosen(w, input, List.of());
    }

    @Override
    public boolean needsExpectedReturns() {
        return false;
    }
}
