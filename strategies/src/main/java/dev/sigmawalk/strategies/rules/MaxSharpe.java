package dev.sigmawalk.strategies.rules;

import dev.sigmawalk.strategies.optimize.MaxSharpeSolver;
import dev.sigmawalk.strategies.optimize.SolveOutcome;
import dev.sigmawalk.strategies.optimize.SolverSettings;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Maximum Sharpe ratio: maximise w'μ / √(w'Σw) s.t. Σ w = 1 (and the bounds), μ the expected
 * excess returns.
 * <ul>
 *   <li>No bounds: the tangency portfolio Σ⁻¹μ / 1'Σ⁻¹μ when 1'Σ⁻¹μ &gt; 0; otherwise no
 *       portfolio on the budget attains the supremum and the rule falls back to min-variance
 *       with a note.</li>
 *   <li>Bounds: when no allowed portfolio has w'μ &gt; 0 (the largest w'μ, a linear program,
 *       is ≤ 0) the rule falls back to min-variance and records
 *       {@value #FALLBACK_NOTE}; otherwise {@link MaxSharpeSolver}.</li>
 * </ul>
 *
 * @param settings solver tolerances
 */
public record MaxSharpe(SolverSettings settings) implements PortfolioRule {
    static final String NAME = "max-sharpe";
    /** The note recorded when no allowed portfolio has a positive expected excess return. */
    public static final String FALLBACK_NOTE =
            "max-sharpe: no portfolio with positive expected excess return; fell back to min-variance";
    /** The note recorded when, without bounds, 1'Σ⁻¹μ ≤ 0 leaves the maximum unattained. */
    public static final String NO_TANGENCY_NOTE =
            "max-sharpe: 1'inv(S)mu <= 0, so no fully invested portfolio attains the highest Sharpe ratio;"
                    + " fell back to min-variance";

    public MaxSharpe {
        Objects.requireNonNull(settings, "settings");
    }

    @Override
    public RuleOutcome apply(RuleInput input, WarmStart warm) {
        return Solved.guarded(NAME, () -> applyChecked(input, warm));
    }

    private RuleOutcome applyChecked(RuleInput input, WarmStart warm) {
        RuleOutcome none = Solved.unusableWithoutReturns(NAME, input);
        if (none != null) {
            return none;
        }
        MaxSharpeSolver solver = new MaxSharpeSolver(settings);
        double[] sigma = input.covariance().dense();
        double[] mu = input.expectedReturns();
        if (input.bounds().isEmpty()) {
            Optional<SolveOutcome> tangency = solver.unbounded(sigma, mu);
            if (tangency.isEmpty()) {
                return fallBack(input, warm, NO_TANGENCY_NOTE);
            }
            return Solved.from(NAME, tangency.get(), input, warm, List.of());
        }
        double[] lo = Solved.lower(input);
        double[] hi = Solved.upper(input);
        double best = MaxSharpeSolver.highestExpectedReturn(mu, lo, hi);
        if (best == Double.NEGATIVE_INFINITY) {
            // The bounds cannot sum to 1: let the min-variance solver name them.
            return new MinVariance(settings).apply(input, warm);
        }
        if (!(best > 0)) {
            return fallBack(input, warm, FALLBACK_NOTE);
        }
        return Solved.from(NAME, solver.solve(sigma, mu, lo, hi), input, warm, List.of());
    }

    private RuleOutcome fallBack(RuleInput input, WarmStart warm, String note) {
        return new MinVariance(settings).apply(input, warm, List.of(note));
    }

    @Override
    public boolean needsExpectedReturns() {
        return true;
    }
}
