package dev.sigmawalk.strategies.rules;

import dev.sigmawalk.strategies.optimize.ActiveSetSolver;
import dev.sigmawalk.strategies.optimize.BoundSide;
import dev.sigmawalk.strategies.optimize.FactorForm;
import dev.sigmawalk.strategies.optimize.FactorMinVariance;
import dev.sigmawalk.strategies.optimize.FactorScreening;
import dev.sigmawalk.strategies.optimize.QuadraticProblem;
import dev.sigmawalk.strategies.optimize.SingleFactorForm;
import dev.sigmawalk.strategies.optimize.SingleFactorMinVariance;
import dev.sigmawalk.strategies.optimize.SolveOutcome;
import dev.sigmawalk.strategies.optimize.SolverSettings;
import dev.sigmawalk.strategies.optimize.UnboundedSolver;
import dev.sigmawalk.strategies.optimize.ZeroVarianceProjection;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Minimum variance: minimise w'Σw s.t. Σ w = 1 (and the bounds, when given).
 * <ul>
 *   <li>No bounds: the closed form Σ⁻¹1 / 1'Σ⁻¹1 (Woodbury in O(n) for a single-factor Σ,
 *       Cholesky otherwise); a singular Σ, such as a sample covariance with n ≥ L, is reported
 *       as NotFormed naming the singular matrix.</li>
 *   <li>Bounds and a single-factor Σ: the O(n log n) clamp-and-threshold rule, falling back to
 *       the exact active-set solver when it cannot certify its answer.</li>
 *   <li>Bounds and a factor form without specific variance (a sample covariance of fewer rows
 *       than assets): the screened exact solve below; when the minimum variance is zero, the
 *       zero-variance portfolio of smallest Σ w_i² ({@link ZeroVarianceProjection}, Method §5).</li>
 *   <li>Bounds and a factor-form Σ = BΣ_FB' + diag(d): the primal-dual active-set method on
 *       the factors ({@link FactorMinVariance}), without the n×n matrix, warm-started from the
 *       previous rebalance.</li>
 *   <li>A factor form that neither settles, with every lower bound 0: the exact dense solver on
 *       a screened subset of the assets, verified on all of them ({@link FactorScreening});
 *       otherwise the dense solver on the n×n matrix.</li>
 *   <li>Bounds otherwise: the exact active-set solver, warm-started from the previous rebalance.</li>
 * </ul>
 *
 * @param settings solver tolerances
 */
public record MinVariance(SolverSettings settings) implements PortfolioRule {
    static final String NAME = "min-variance";

    public MinVariance {
        Objects.requireNonNull(settings, "settings");
    }

    @Override
    public RuleOutcome apply(RuleInput input, WarmStart warm) {
        return apply(input, warm, List.of());
    }

    /** As {@link #apply(RuleInput, WarmStart)}, attaching {@code notes} to a chosen portfolio. */
    RuleOutcome apply(RuleInput input, WarmStart warm, List<String> notes) {
        // With bounds a dense Σ goes into a QuadraticProblem, which checks its entries itself
        // (or takes the finiteness its producer proved, DenseProof.MIRRORED_FINITE).
        boolean bounded = input.bounds().isPresent();
        RuleOutcome none = bounded ? Solved.unusableBeforeProblem(NAME, input) : Solved.unusable(NAME, input);
        if (none != null) {
            return none;
        }
        return Solved.guarded(NAME, input, () -> Solved.from(NAME, solve(input, warm), input, warm, notes));
    }

    private SolveOutcome solve(RuleInput input, WarmStart warm) {
        int n = input.size();
        boolean factorForm = input.covariance() instanceof SingleFactorForm;
        if (input.bounds().isEmpty()) {
            return factorForm
                    ? new SingleFactorMinVariance(settings).unbounded((SingleFactorForm) input.covariance())
                    : new UnboundedSolver(settings).minVariance(input.covariance().dense(), input.assets());
        }
        double[] lo = Solved.lower(input);
        double[] hi = Solved.upper(input);
        if (factorForm) {
            Optional<SolveOutcome.Optimal> fast = new SingleFactorMinVariance(settings)
                    .threshold((SingleFactorForm) input.covariance(), lo, hi);
            if (fast.isPresent()) {
                return fast.get();
            }
        }
        BoundSide[] guess = warm.guessFor(input.assets());
        if (input.covariance() instanceof FactorForm) {
            Optional<SolveOutcome.Optimal> structured = factorSide((FactorForm) input.covariance(), lo, hi, guess);
            if (structured.isPresent()) {
                return structured.get();
            }
        }
        QuadraticProblem problem = new QuadraticProblem(n, input.covariance().dense(), new double[n], lo, hi,
                input.covariance().proof());
        return new ActiveSetSolver(settings).solve(problem, guess);
    }

    /**
     * A factor form without specific variance (singular): the screened exact solve, and when
     * its optimum has zero variance (so that every zero-variance portfolio is optimal), the
     * minimum-norm one among them (Method §5). Otherwise the factor-side primal-dual method, then
     * the screened solve. Empty when none certifies an answer.
     */
    private Optional<SolveOutcome.Optimal> factorSide(FactorForm form, double[] lo, double[] hi, BoundSide[] guess) {
        if (!ZeroVarianceProjection.applies(form)) {
            Optional<SolveOutcome.Optimal> small = new FactorMinVariance(settings).solve(form, lo, hi, guess);
            if (small.isPresent()) {
                return small;
            }
            return FactorScreening.applies(lo) ? new FactorScreening(settings).solve(form, lo, hi, guess) : Optional.empty();
        }
        Optional<SolveOutcome.Optimal> screened = FactorScreening.applies(lo)
                ? new FactorScreening(settings).solve(form, lo, hi, guess) : Optional.empty();
        if (screened.isPresent() && !ZeroVarianceProjection.zeroVariance(form, screened.get().weights())) {
            return screened;
        }
        Optional<SolveOutcome.Optimal> zero = new ZeroVarianceProjection().solve(form, lo, hi);
        return zero.isPresent() ? zero : screened;
    }

    @Override
    public boolean needsExpectedReturns() {
        return false;
    }
}
