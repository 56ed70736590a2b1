package dev.sigmawalk.strategies.optimize;

import java.util.HashSet;
import java.util.Set;

/**
 * The primal-dual active-set method (Hintermüller, Ito &amp; Kunisch 2002, "The primal-dual active
 * set strategy as a semismooth Newton method", SIAM J. Optim. 13(3), 865-888) for
 * {@link QuadraticProblem}, started from a guessed partition such as the previous rebalance's.
 *
 * <p>Each step fixes the pinned weights at their bounds, solves the equality-constrained
 * subproblem for the free ones (one fresh Cholesky factor of the shifted free block, see
 * {@link WorkingSet}), computes every multiplier z_i = g_i − ν from the gradient g = Qw − c, and
 * then changes every bound that is wrong at once: a pinned weight whose multiplier has the wrong
 * sign is released, a free weight beyond a bound is pinned there. This is the update
 * A⁺ = {i : z_i + c(lower_i − w_i) &gt; 0} of the paper (and its mirror for upper bounds), which
 * with z = 0 on free weights and w on its bound for pinned ones does not depend on c. When the
 * partition no longer changes, the point satisfies the KKT conditions exactly (up to rounding);
 * it is then verified by {@link KktCheck} like every other answer.
 *
 * <p>The method is a Newton method: from a nearby partition it needs two or three steps, each
 * O(k³/3 + n·m) for k free weights and m non-zero weights, where the one-change-at-a-time loop of
 * {@link ActiveSetIteration} needs one iteration per changed bound. Its convergence is proved for
 * M-matrices only; covariance matrices are not, so a step limit and a check for a repeated
 * partition stop it, and {@link #run} then returns {@code null}: the caller falls back to the
 * exact primal loop, so an answer never depends on which of the two found it beyond rounding.
 * The same happens when a free block is numerically singular or no weight is free.
 */
final class PrimalDualActiveSet {
    /** Partition changes beyond this many steps mean the guess was far: the primal loop takes over. */
    static final int MAX_STEPS = 25;

    private final WorkingSet s;
    private final SolverSettings settings;
    private final double[] lo;
    private final double[] hi;
    private final double[] magnitude;

    PrimalDualActiveSet(WorkingSet s, SolverSettings settings) {
        this.s = s;
        this.settings = settings;
        this.lo = s.problem.lower();
        this.hi = s.problem.upper();
        this.magnitude = new double[s.n];
    }

    /**
     * Runs from the guessed partition.
     *
     * @param guess a side for every weight; a side whose bound is infinite counts as free
     * @return the verified optimum, or {@code null} when this method cannot certify one
     */
    SolveOutcome.Optimal run(BoundSide[] guess) {
        if (guess.length != s.n) {
            return null;
        }
        for (int i = 0; i < s.n; i++) {
            s.side[i] = PartitionUpdate.admissible(lo[i], hi[i], guess[i]);
        }
        Set<Long> seen = new HashSet<>();
        for (int step = 1; step <= MAX_STEPS; step++) {
            if (!seen.add(PartitionUpdate.fingerprint(s.side)) || !solveSubproblem()) {
                return null;
            }
            double scale = gradientAndScale();
            if (!PartitionUpdate.repartition(s.side, s.w, s.g, lo, hi, s.free, s.freeCount,
                    -settings.dropTolerance() * scale)) {
                return verified(step);
            }
        }
        return null;
    }

    /** Pins the bound weights, factors the free block and solves for the free weights. */
    private boolean solveSubproblem() {
        for (int i = 0; i < s.n; i++) {
            if (s.side[i] != BoundSide.FREE) {
                s.w[i] = s.side[i] == BoundSide.LOWER ? lo[i] : hi[i];
            }
        }
        s.indexFreeWeights();
        if (s.freeCount == 0 || s.refactor(settings.singularPivot()) >= 0) {
            return false;
        }
        double[] x = s.subproblemMinimiser();
        for (int r = 0; r < s.freeCount; r++) {
            double v = x[r];
            if (!Double.isFinite(v)) {
                return false;
            }
            s.w[s.free[r]] = v;
        }
        return true;
    }

    /**
     * g = Qw − c over the non-zero weights only (O(n·m)), and the scale of the dual residual
     * max_i (Σ_j |Q_ij w_j| + |c_i|) that {@link KktCheck#scale} uses, from the same rows.
     */
    private double gradientAndScale() {
        int n = s.n;
        double[] q = s.q;
        double[] c = s.problem.linear();
        double[] g = s.g;
        for (int j = 0; j < n; j++) {
            g[j] = -c[j];
            magnitude[j] = Math.abs(c[j]);
        }
        for (int i = 0; i < n; i++) {
            double wi = s.w[i];
            if (wi == 0) {
                continue;
            }
            double size = Math.abs(wi);
            int row = i * n;
            // Q is symmetric: row i of Q times w_i is column i's contribution to every g_j.
            for (int j = 0; j < n; j++) {
                double qij = q[row + j];
                g[j] += wi * qij;
                magnitude[j] += size * Math.abs(qij);
            }
        }
        double largest = 0;
        for (int j = 0; j < n; j++) {
            largest = Math.max(largest, magnitude[j]);
        }
        return largest > 0 && Double.isFinite(largest) ? largest : 1;
    }

    /** The converged point through the same independent KKT verification as the primal loop. */
    private SolveOutcome.Optimal verified(int steps) {
        KktReport report = KktCheck.check(s.problem, s.w);
        if (!report.holds(settings.kktTolerance())) {
            return null;
        }
        return new SolveOutcome.Optimal(s.w.clone(), s.side.clone(), steps, report.budgetMultiplier(),
                report.worst());
    }
}
