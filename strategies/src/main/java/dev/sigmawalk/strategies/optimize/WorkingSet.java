package dev.sigmawalk.strategies.optimize;

import java.util.Arrays;

/**
 * The mutable state of one active-set solve: the iterate w, the gradient g = Qw − c, each
 * weight's side, the ordered list of free weights and the Cholesky factor of the shifted free
 * block Q̃_FF with Q̃ = Q + ρ11'.
 *
 * <p>Why the shift: on the budget plane 1'w = 1 the term ½ρ(1'w)² is the constant ρ/2, so Q̃ has
 * the same minimisers and the same bound multipliers as Q (only ν moves by ρ). For positive
 * semi-definite Q, Q̃_FF is positive definite exactly when Q is positive definite on the free
 * directions that keep the budget (x'Q̃x = x'Qx + ρ(1'x)²), which is the condition for the
 * equality-constrained subproblem to have a unique solution. A singular Q_FF alone (for example
 * a zero matrix with one free weight) is then no obstacle.
 */
final class WorkingSet {
    /** Rounding of a sum of weights of order one, per term; see {@link #restoreBudget}. */
    static final double BUDGET_ROUNDING = 1e-14;

    final QuadraticProblem problem;
    final int n;
    final double[] q;
    final double shift;
    final double[] w;
    final double[] g;
    final BoundSide[] side;
    /** Free weights in factor order; {@code position[i]} is i's place in it, or −1. */
    final int[] free;
    final int[] position;
    int freeCount;
    final CholeskyFactor factor;
    private final double[] column;

    WorkingSet(QuadraticProblem problem) {
        this.problem = problem;
        this.n = problem.size();
        this.q = problem.quadratic();
        this.shift = shiftFor(problem);
        this.w = new double[n];
        this.g = new double[n];
        this.side = new BoundSide[n];
        this.free = new int[n];
        this.position = new int[n];
        this.factor = new CholeskyFactor(n);
        this.column = new double[n];
    }

    /** ρ = tr(Q)/n, the size of a typical diagonal entry; 1 when Q has a zero diagonal. */
    private static double shiftFor(QuadraticProblem p) {
        double trace = 0;
        for (int i = 0; i < p.size(); i++) {
            trace += p.q(i, i);
        }
        double rho = trace / p.size();
        return rho > 0 ? rho : 1;
    }

    /** Q̃_ij. */
    double shifted(int i, int j) {
        return q[i * n + j] + shift;
    }

    /** Sets the partition from {@code side} and rebuilds the free list; does not factor. */
    void indexFreeWeights() {
        freeCount = 0;
        Arrays.fill(position, -1);
        for (int i = 0; i < n; i++) {
            if (side[i] == BoundSide.FREE) {
                position[i] = freeCount;
                free[freeCount++] = i;
            }
        }
    }

    /**
     * Refactors Q̃_FF from scratch in the current free order.
     *
     * @return the first free weight whose pivot is singular, or −1 when the factor is complete
     */
    int refactor(double singularPivot) {
        factor.clear();
        for (int r = 0; r < freeCount; r++) {
            if (!appendToFactor(free[r], singularPivot)) {
                return free[r];
            }
        }
        return -1;
    }

    /** Adds weight i's row and column to the factor (not to the free list). */
    boolean appendToFactor(int i, double singularPivot) {
        int k = factor.size();
        for (int r = 0; r < k; r++) {
            column[r] = shifted(free[r], i);
        }
        return factor.append(column, shifted(i, i), singularPivot);
    }

    /** Makes a pinned weight free (its factor row must already have been appended last). */
    void addFree(int i) {
        side[i] = BoundSide.FREE;
        position[i] = freeCount;
        free[freeCount++] = i;
    }

    /** Pins free weight i at its {@code lower} or {@code upper} bound, dropping it from the factor. */
    void pin(int i, BoundSide to) {
        int p = position[i];
        factor.remove(p);
        System.arraycopy(free, p + 1, free, p, freeCount - p - 1);
        freeCount--;
        for (int r = p; r < freeCount; r++) {
            position[free[r]] = r;
        }
        position[i] = -1;
        side[i] = to;
        w[i] = to == BoundSide.LOWER ? problem.lower()[i] : problem.upper()[i];
    }

    /** g = Qw − c from scratch, O(n²). */
    void recomputeGradient() {
        double[] c = problem.linear();
        for (int i = 0; i < n; i++) {
            double v = 0;
            int row = i * n;
            for (int j = 0; j < n; j++) {
                v += q[row + j] * w[j];
            }
            g[i] = v - c[i];
        }
    }

    /** w += α d and g += α Q d for a direction d that is non-zero only on the listed weights. */
    void move(double alpha, int[] support, double[] direction, int count) {
        for (int r = 0; r < count; r++) {
            int i = support[r];
            double step = alpha * direction[r];
            if (step == 0) {
                continue;
            }
            w[i] += step;
            // Q is symmetric: adding step times row i of Q adds step times column i.
            int row = i * n;
            for (int j = 0; j < n; j++) {
                g[j] += step * q[row + j];
            }
        }
    }

    /** The free weights' solution of the equality-constrained subproblem, by the Schur complement 1'Q̃_FF⁻¹1. */
    double[] subproblemMinimiser() {
        int k = freeCount;
        double[] c = problem.linear();
        double[] pinned = new double[n];
        double pinnedSum = 0;
        for (int b = 0; b < n; b++) {
            if (side[b] != BoundSide.FREE && w[b] != 0) {
                pinnedSum += w[b];
                int row = b * n;
                double wb = w[b];
                for (int j = 0; j < n; j++) {
                    pinned[j] += wb * q[row + j];
                }
            }
        }
        double[] a = new double[k];
        double[] u = new double[k];
        for (int r = 0; r < k; r++) {
            int i = free[r];
            a[r] = c[i] - pinned[i];
            u[r] = 1;
        }
        factor.solveInPlace(a);
        factor.solveInPlace(u);
        double nu = (1 - pinnedSum - sum(a, k)) / sum(u, k);
        for (int r = 0; r < k; r++) {
            a[r] += nu * u[r];
        }
        restoreBudget(a, k, 1 - pinnedSum);
        return a;
    }

    /**
     * The exact subproblem solution sums to 1 − Σ pinned, but a + ν u adds two vectors as large as
     * Q̃_FF⁻¹: when Q is tiny against c (mean-variance with a risk aversion near 0, a nearly linear
     * program) they are many orders above the weights, and their cancellation leaves the budget off
     * by their rounding (1e13 · 1e-16 ≈ 1e-3), far beyond the KKT tolerance. The excess is then
     * spread evenly over the free weights, which moves the gradient by Q̃_FF times it: negligible
     * exactly when Q̃ is small enough to cause it. An excess within the rounding of weights of order
     * one ({@value #BUDGET_ROUNDING} per free weight) is left alone, so well-scaled problems keep the
     * last bits the solve gave them.
     *
     * @param budget what the first k entries of x must sum to
     */
    static void restoreBudget(double[] x, int k, double budget) {
        double excess = sum(x, k) - budget;
        if (Math.abs(excess) > BUDGET_ROUNDING * k) {
            double share = excess / k;
            for (int r = 0; r < k; r++) {
                x[r] -= share;
            }
        }
    }

    /** Σ_i a_i b_i over the full length. */
    static double dot(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += a[i] * b[i];
        }
        return s;
    }

    /** Σ of the first k entries. */
    static double sum(double[] v, int k) {
        double s = 0;
        for (int r = 0; r < k; r++) {
            s += v[r];
        }
        return s;
    }
}
