package dev.sigmawalk.strategies.optimize;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Objects;

/**
 * Exact primal active-set solver for {@link QuadraticProblem}: minimise ½ w'Qw − c'w subject to
 * Σ w = 1 and lower ≤ w ≤ upper, with Q positive semi-definite (Nocedal &amp; Wright, Numerical
 * Optimization, 2nd ed., Algorithm 16.3; cited from memory).
 *
 * <p>Each iteration holds a working set of weights pinned at a bound; the others are free. With
 * the Cholesky factor of the free block (shifted, see {@link WorkingSet}) the step to the
 * minimiser of the equality-constrained subproblem is p = Q̃_FF⁻¹(ν1 − g_F), with ν from the
 * Schur complement, ν = 1'Q̃_FF⁻¹g_F / 1'Q̃_FF⁻¹1, so that 1'p = 0. A step that would cross a
 * bound stops there and pins that weight (ratio test); at a subproblem minimiser the pinned
 * weight with the most negative multiplier (g_i − ν at a lower bound, ν − g_i at an upper one)
 * is released. The factor is updated in O(k²) per change and rebuilt every
 * {@link SolverSettings#refactorEvery()} changes; the gradient is updated in O(n) per moved
 * weight. Cost per iteration is O(n k) for k free weights, never O(n³).
 *
 * <p>Semi-definite Q: when releasing a weight would make the shifted free block singular, the
 * objective is linear (not curved) along the null direction d that keeps the budget, and it
 * decreases along d at the rate of the negative multiplier, so the solver moves along d until a
 * bound stops it (the usual treatment of a singular reduced Hessian in inertia-controlling
 * active-set methods, as in Gill, Murray &amp; Wright, Practical Optimization; cited from memory).
 * With no bound in
 * the way the problem is unbounded below and the outcome is {@link SolveOutcome.Failed}.
 *
 * <p>The final partition is polished (the free weights re-solved from a fresh factor) and the
 * KKT conditions are verified by {@link KktCheck} to {@link SolverSettings#kktTolerance()};
 * anything else is reported as Failed, never returned as weights. Bounds whose sum cannot reach 1
 * give {@link SolveOutcome.Infeasible}. Given a warm start, {@link PrimalDualActiveSet} is tried
 * first and this loop is its fallback. Stateless and thread-safe.
 */
public final class ActiveSetSolver {
    /** Absolute slack on Σ lower ≤ 1 ≤ Σ upper, as in the study's bounds check. */
    private static final double BUDGET_SLACK = 1e-12;

    private final SolverSettings settings;

    public ActiveSetSolver(SolverSettings settings) {
        this.settings = Objects.requireNonNull(settings, "settings");
    }

    /** Solves from a cold start. */
    public SolveOutcome solve(QuadraticProblem problem) {
        return solve(problem, null);
    }

    /**
     * Solves, starting from a previous partition when one is given: the primal-dual active-set
     * method ({@link PrimalDualActiveSet}) from that partition first, changing many bounds per
     * step; when it cannot certify an optimum, the primal loop from the same guess.
     *
     * @param warm a previous solve's {@link SolveOutcome.Optimal#sides()} for the same weights, or
     *             {@code null}; a guess that does not fit is ignored, so the answer never depends
     *             on it beyond the tolerance
     */
    public SolveOutcome solve(QuadraticProblem problem, BoundSide[] warm) {
        Objects.requireNonNull(problem, "problem");
        SolveOutcome infeasible = checkBudgetReachable(problem);
        if (infeasible != null) {
            return infeasible;
        }
        if (warm != null) {
            SolveOutcome.Optimal fast = new PrimalDualActiveSet(new WorkingSet(problem), settings).run(warm);
            if (fast != null) {
                return fast;
            }
        }
        return solvePrimal(problem, warm);
    }

    /**
     * The one-change-at-a-time primal loop alone, from the guess when one is given: the fallback
     * of {@link #solve(QuadraticProblem, BoundSide[])}, and the reference its faster path is
     * tested against.
     */
    SolveOutcome solvePrimal(QuadraticProblem problem, BoundSide[] warm) {
        SolveOutcome infeasible = checkBudgetReachable(problem);
        if (infeasible != null) {
            return infeasible;
        }
        WorkingSet s = new WorkingSet(problem);
        boolean started = warm != null && StartPoint.warm(s, warm, settings.singularPivot());
        if (!started && !StartPoint.cold(s, settings.singularPivot())) {
            return new SolveOutcome.Failed("the quadratic matrix is singular on the weights without finite bounds");
        }
        return new ActiveSetIteration(s, settings).run();
    }

    /**
     * A sum of bounds to 12 significant digits, so that three caps of 0.3 read 0.9, not the
     * 0.8999999999999999 their floating-point sum is; far finer than the slack the check allows.
     */
    static String shown(double sum) {
        return new BigDecimal(sum).round(new MathContext(12)).stripTrailingZeros().toPlainString();
    }

    /** Infeasible when Σ lower &gt; 1 or Σ upper &lt; 1; null otherwise. */
    static SolveOutcome checkBudgetReachable(QuadraticProblem p) {
        double lowSum = 0;
        double highSum = 0;
        for (int i = 0; i < p.size(); i++) {
            lowSum += p.lower()[i];
            highSum += p.upper()[i];
        }
        if (lowSum > 1 + BUDGET_SLACK) {
            return new SolveOutcome.Infeasible("lower bounds sum to " + shown(lowSum) + " > 1 over " + p.size()
                    + " assets: no weights can sum to 1");
        }
        if (highSum < 1 - BUDGET_SLACK) {
            return new SolveOutcome.Infeasible("upper bounds sum to " + shown(highSum) + " < 1 over " + p.size()
                    + " assets: no weights can sum to 1");
        }
        return null;
    }
}
