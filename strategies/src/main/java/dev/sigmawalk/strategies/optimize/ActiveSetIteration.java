package dev.sigmawalk.strategies.optimize;

/**
 * One run of the primal active-set loop of {@link ActiveSetSolver} over a started
 * {@link WorkingSet}: steps with a ratio test, releases of the most negative multiplier, the
 * null-direction move for a singular block, periodic refactorisation, and the final polish and
 * KKT verification.
 */
final class ActiveSetIteration {
    /** The longest feasible step along a direction and the weight that limits it (−1 when none). */
    private record Ratio(double step, int blocking) {
    }

    /** A polished free weight beyond its bound by up to this (relative) is rounding; it is clipped. */
    private static final double POLISH_SLACK = 1e-12;

    private final WorkingSet s;
    private final SolverSettings settings;
    private final double[] lo;
    private final double[] hi;
    private final double[] step;
    private final double[] aux;
    private final int[] support;
    private int changes;
    private int sinceRefactor;
    private boolean singular;

    ActiveSetIteration(WorkingSet s, SolverSettings settings) {
        this.s = s;
        this.settings = settings;
        this.lo = s.problem.lower();
        this.hi = s.problem.upper();
        this.step = new double[s.n];
        this.aux = new double[s.n];
        this.support = new int[s.n];
    }

    SolveOutcome run() {
        boolean atMinimum = false;
        double scale = KktCheck.scale(s.problem, s.w);
        while (true) {
            if (changes > settings.maxIterations()) {
                return new SolveOutcome.Failed("active-set solver did not converge after " + changes
                        + " changes of the working set (n = " + s.n + ")");
            }
            if (!atMinimum) {
                atMinimum = takeStep();
                if (singular) {
                    return singularFreeBlock();
                }
                continue;
            }
            int release = mostNegativeMultiplier(scale);
            if (release < 0) {
                return finish();
            }
            String problem = release(release);
            if (problem != null) {
                return new SolveOutcome.Failed(problem);
            }
            atMinimum = false;
            if (!maintain()) {
                return singularFreeBlock();
            }
            scale = KktCheck.scale(s.problem, s.w);
        }
    }

    /**
     * Moves toward the subproblem minimiser; returns whether it was reached. Sets
     * {@code singular} when a periodic refactorisation finds the free block singular.
     */
    private boolean takeStep() {
        int k = s.freeCount;
        computeStep(k);
        double size = 0;
        double reach = 1;
        for (int r = 0; r < k; r++) {
            size = Math.max(size, Math.abs(step[r]));
            reach = Math.max(reach, Math.abs(s.w[s.free[r]]));
        }
        if (size <= 1e-15 * reach) {
            return true;
        }
        System.arraycopy(s.free, 0, support, 0, k);
        Ratio ratio = ratioTest(support, step, k);
        double alpha = Math.min(1, ratio.step());
        s.move(alpha, support, step, k);
        changes++;
        if (ratio.step() < 1) {
            int blocking = ratio.blocking();
            s.pin(blocking, step[s.position[blocking]] < 0 ? BoundSide.LOWER : BoundSide.UPPER);
            singular = !maintain();
            return false;
        }
        return true;
    }

    /** p = Q̃_FF⁻¹(ν1 − g_F) with 1'p = 0, written to step[0..k). */
    private void computeStep(int k) {
        for (int r = 0; r < k; r++) {
            step[r] = s.g[s.free[r]];
            aux[r] = 1;
        }
        s.factor.solveInPlace(step);
        s.factor.solveInPlace(aux);
        double nu = WorkingSet.sum(step, k) / WorkingSet.sum(aux, k);
        for (int r = 0; r < k; r++) {
            step[r] = nu * aux[r] - step[r];
        }
    }

    /**
     * The largest α ≤ +∞ keeping w + α d within the bounds on the support, and the weight
     * that stops it (−1 when none). Ties go to the first in support order.
     */
    private Ratio ratioTest(int[] on, double[] d, int count) {
        double best = Double.POSITIVE_INFINITY;
        int blocking = -1;
        for (int r = 0; r < count; r++) {
            int i = on[r];
            double dr = d[r];
            double limit;
            if (dr < 0 && Double.isFinite(lo[i])) {
                limit = (lo[i] - s.w[i]) / dr;
            } else if (dr > 0 && Double.isFinite(hi[i])) {
                limit = (hi[i] - s.w[i]) / dr;
            } else {
                continue;
            }
            limit = Math.max(0, limit);
            if (limit < best) {
                best = limit;
                blocking = i;
            }
        }
        return new Ratio(best, blocking);
    }

    /** The pinned weight whose multiplier is most negative below −dropTolerance·scale, or −1. */
    private int mostNegativeMultiplier(double scale) {
        double nu = 0;
        for (int r = 0; r < s.freeCount; r++) {
            nu += s.g[s.free[r]];
        }
        nu /= s.freeCount;
        double worst = -settings.dropTolerance() * scale;
        int release = -1;
        for (int i = 0; i < s.n; i++) {
            if (s.side[i] == BoundSide.FREE || lo[i] == hi[i]) {
                continue;
            }
            double multiplier = s.side[i] == BoundSide.LOWER ? s.g[i] - nu : nu - s.g[i];
            if (multiplier < worst) {
                worst = multiplier;
                release = i;
            }
        }
        return release;
    }

    /** Frees weight j, or moves along the null direction when that would make the block singular. */
    private String release(int j) {
        if (s.appendToFactor(j, settings.singularPivot())) {
            s.addFree(j);
            changes++;
            return null;
        }
        return moveAlongNullDirection(j);
    }

    /**
     * d_j = σ (σ = +1 off a lower bound, −1 off an upper one), d_F = −σ Q̃_FF⁻¹ q̃_Fj + τ Q̃_FF⁻¹1
     * with τ making 1'd = 0. Q̃ is singular on F ∪ {j}, so d carries (numerically) no curvature
     * and the objective falls linearly along it; move to the first bound in the way.
     */
    private String moveAlongNullDirection(int j) {
        int k = s.freeCount;
        double sigma = s.side[j] == BoundSide.LOWER ? 1 : -1;
        for (int r = 0; r < k; r++) {
            step[r] = -sigma * s.shifted(s.free[r], j);
            aux[r] = 1;
        }
        s.factor.solveInPlace(step);
        s.factor.solveInPlace(aux);
        double tau = (-sigma - WorkingSet.sum(step, k)) / WorkingSet.sum(aux, k);
        for (int r = 0; r < k; r++) {
            step[r] += tau * aux[r];
            support[r] = s.free[r];
        }
        step[k] = sigma;
        support[k] = j;
        Ratio ratio = ratioTest(support, step, k + 1);
        if (!Double.isFinite(ratio.step())) {
            return "objective is unbounded below: the quadratic matrix is singular along a direction"
                    + " no bound limits (weight " + j + ")";
        }
        BoundSide from = s.side[j];
        s.move(ratio.step(), support, step, k + 1);
        changes++;
        int blocking = ratio.blocking();
        if (blocking == j) {
            s.side[j] = from == BoundSide.LOWER ? BoundSide.UPPER : BoundSide.LOWER;
            s.w[j] = s.side[j] == BoundSide.LOWER ? lo[j] : hi[j];
            return null;
        }
        s.pin(blocking, step[s.position[blocking]] < 0 ? BoundSide.LOWER : BoundSide.UPPER);
        if (!s.appendToFactor(j, settings.singularPivot())) {
            return "the quadratic matrix is singular on the free weights even after pinning weight " + blocking;
        }
        s.addFree(j);
        return null;
    }

    /** Periodic refactorisation and gradient refresh; false when the refreshed block is singular. */
    private boolean maintain() {
        if (++sinceRefactor < settings.refactorEvery()) {
            return true;
        }
        sinceRefactor = 0;
        s.recomputeGradient();
        return s.refactor(settings.singularPivot()) < 0;
    }

    private SolveOutcome singularFreeBlock() {
        return new SolveOutcome.Failed("the quadratic matrix is numerically singular on the " + s.freeCount
                + " free weights");
    }

    /** Polishes the free weights from a fresh factor, then verifies the KKT conditions. */
    private SolveOutcome finish() {
        if (s.refactor(settings.singularPivot()) >= 0) {
            return singularFreeBlock();
        }
        double[] polished = s.subproblemMinimiser();
        if (consistent(polished)) {
            for (int r = 0; r < s.freeCount; r++) {
                int i = s.free[r];
                s.w[i] = Math.max(lo[i], Math.min(hi[i], polished[r]));
            }
        }
        KktReport report = KktCheck.check(s.problem, s.w);
        if (!report.holds(settings.kktTolerance())) {
            return new SolveOutcome.Failed("KKT verification failed: primal residual " + report.primalResidual()
                    + ", scaled dual residual " + report.dualResidual() + " (tolerance "
                    + settings.kktTolerance() + ")");
        }
        return new SolveOutcome.Optimal(s.w.clone(), s.side.clone(), changes, report.budgetMultiplier(),
                report.worst());
    }

    /** Whether every polished free weight is within its bounds up to rounding. */
    private boolean consistent(double[] polished) {
        for (int r = 0; r < s.freeCount; r++) {
            int i = s.free[r];
            double x = polished[r];
            double slackLow = POLISH_SLACK * Math.max(1, Math.abs(lo[i]));
            double slackHigh = POLISH_SLACK * Math.max(1, Math.abs(hi[i]));
            if (!(x >= lo[i] - slackLow && x <= hi[i] + slackHigh)) {
                return false;
            }
        }
        return true;
    }
}
