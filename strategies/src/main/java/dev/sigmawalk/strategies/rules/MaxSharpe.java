package dev.sigmawalk.strategies.rules;

import dev.sigmawalk.strategies.optimize.MaxSharpeSolver;
import dev.sigmawalk.strategies.optimize.SolveOutcome;
import dev.sigmawalk.strategies.optimize.SolverSettings;
import java.util.List;
import java.util.Locale;
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

    /**
     * Gross exposure Σ|w| above which an unbounded tangency portfolio gets a note: ten times the
     * capital long and short together. Common practice, no source: a long-short book of a few
     * times its capital is usual, ten is far beyond it.
     */
    static final double LARGE_GROSS = 10;

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
            return Solved.from(NAME, tangency.get(), input, warm, leverageNote(tangency.get()));
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

    /**
     * The tangency portfolio Σ⁻¹μ / 1'Σ⁻¹μ grows without limit as 1'Σ⁻¹μ falls to 0 from above: it
     * stays the highest Sharpe ratio on the budget, but as a fully invested portfolio it is long
     * and short many times the capital (the next period's return can then be below −100 %). Above
     * a gross exposure Σ|w| of {@value #LARGE_GROSS} the rebalance gets a note naming its size, so
     * the run's warnings say why its turnover, forecast and returns look as they do.
     */
    private static List<String> leverageNote(SolveOutcome outcome) {
        if (!(outcome instanceof SolveOutcome.Optimal optimal)) {
            return List.of();
        }
        double gross = 0;
        double largest = 0;
        for (double w : optimal.weights()) {
            gross += Math.abs(w);
            largest = Math.max(largest, Math.abs(w));
        }
        if (!(gross > LARGE_GROSS)) {
            return List.of();
        }
        return List.of(String.format(Locale.ROOT, "max-sharpe: 1'inv(S)mu is close to 0, so the tangency portfolio"
                + " holds positions as large as %.3g times the capital (gross exposure %.3g): the highest Sharpe ratio,"
                + " but not a usable portfolio; bounds keep its positions in range", largest, gross));
    }

    private RuleOutcome fallBack(RuleInput input, WarmStart warm, String note) {
        return new MinVariance(settings).apply(input, warm, List.of(note));
    }

    @Override
    public boolean needsExpectedReturns() {
        return true;
    }
}
