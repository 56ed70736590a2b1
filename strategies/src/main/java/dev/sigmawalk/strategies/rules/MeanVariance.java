package dev.sigmawalk.strategies.rules;

import dev.sigmawalk.strategies.optimize.ActiveSetSolver;
import dev.sigmawalk.strategies.optimize.QuadraticProblem;
import dev.sigmawalk.strategies.optimize.SolveOutcome;
import dev.sigmawalk.strategies.optimize.SolverSettings;
import dev.sigmawalk.strategies.optimize.UnboundedSolver;
import java.util.List;
import java.util.Objects;

/**
 * Mean-variance: maximise w'μ − (λ/2) w'Σw s.t. Σ w = 1 (and the bounds), that is
 * minimise ½ w'(λΣ)w − μ'w. Without bounds the closed form w = (λΣ)⁻¹(μ + ν1) with ν from the
 * budget; with bounds the exact active-set solver, warm-started from the previous rebalance.
 *
 * @param riskAversion λ &gt; 0
 * @param settings solver tolerances
 */
public record MeanVariance(double riskAversion, SolverSettings settings) implements PortfolioRule {
    static final String NAME = "mean-variance";

    public MeanVariance {
        if (!(riskAversion > 0 && riskAversion < Double.POSITIVE_INFINITY)) {
            throw new IllegalArgumentException("risk aversion (" + riskAversion + ") must be finite and > 0");
        }
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
        int n = input.size();
        double[] sigma = input.covariance().dense();
        double[] q = new double[n * n];
        for (int k = 0; k < q.length; k++) {
            q[k] = riskAversion * sigma[k];
        }
        double[] mu = input.expectedReturns();
        SolveOutcome outcome = input.bounds().isEmpty()
                ? new UnboundedSolver(settings).solve(q, mu, input.assets())
                : new ActiveSetSolver(settings).solve(
                        new QuadraticProblem(n, q, mu, Solved.lower(input), Solved.upper(input)),
                        warm.guessFor(input.assets()));
        return Solved.from(NAME, outcome, input, warm, List.of());
    }

    @Override
    public boolean needsExpectedReturns() {
        return true;
    }
}
