package dev.sigmawalk.strategies.optimize;

import dev.sigmawalk.engine.moments.CrossProducts;
import java.util.Arrays;
import java.util.Objects;
import java.util.Optional;

/**
 * Bounded minimum variance for a singular factor form without specific variance,
 * Σ = B Σ_F B' with Σ_F diagonal and d = 0 (a sample covariance of fewer rows than assets), in
 * the case where a portfolio of zero variance exists within the bounds. Every such portfolio is
 * then optimal, so the problem needs a rule to pick one (Method §5): this class returns the one
 * of smallest Σ w_i², the minimum-norm optimum, which is unique because the zero-variance
 * portfolios form a convex set:
 * <pre>
 *   minimise ½‖w‖²  s.t.  C'w = 0, 1'w = 1, lower ≤ w ≤ upper,   C = B Σ_F^{1/2} (n×K).
 * </pre>
 * The answer does not depend on any earlier rebalance or on the order of the assets.
 *
 * <p>Method: the dual in y = (μ, ν) ∈ R^{K+1} (the projection of the origin onto a polyhedron),
 * w(y) = clip(Cμ + ν1, lower, upper), maximised by a semismooth Newton method with a
 * backtracking line search (the dual is concave with a piecewise linear gradient
 * −(C'w, 1'w − 1)); the generalised Hessian is M_F'M_F over the assets strictly inside their
 * bounds, M = [C, 1], kept up to date by rank-one changes as assets cross a bound and rebuilt
 * from the rows when many do. Each step costs O(nK) plus O(K²) per asset that changed side and
 * O(K³) for the (K+1)×(K+1) solve.
 *
 * <p>Certificate: the result is returned only when 1'w = 1 to 1e-12 and the portfolio's
 * variance ‖C'w‖² is at most {@link #ZERO_VARIANCE} times Σ_i w_i² Σ_ii, the variance it would
 * have with its risks uncorrelated, i.e. it is zero up to rounding in the products. When no such
 * portfolio exists the method returns empty as soon as it has a proof (an iterate whose factor
 * exposure separates every allowed asset from zero, or a dual value above the largest ½‖w‖² in
 * the box, by weak duality), or at the step limit, and the caller solves the problem as one with
 * a positive minimum variance.
 */
public final class ZeroVarianceProjection {
    /** w'Σw ≤ this × Σ w_i² Σ_ii counts as zero variance (a relative volatility of 1e-10). */
    static final double ZERO_VARIANCE = 1e-20;
    /** |1'w − 1| allowed at the end. */
    static final double BUDGET = 1e-12;
    static final int MAX_STEPS = 200;
    /** Assets that change side in one step above which the Hessian is rebuilt rather than updated. */
    private static final double REBUILD_FRACTION = 0.25;

    /**
     * Whether the form has no specific variance and a diagonal, non-negative Σ_F, so that this
     * class applies.
     */
    public static boolean applies(FactorForm form) {
        for (double d : form.specificVariances()) {
            if (d != 0) {
                return false;
            }
        }
        int k = form.factorCount();
        double[] sf = form.factorCovariance();
        for (int a = 0; a < k; a++) {
            for (int b = 0; b < k; b++) {
                if (a == b ? !(sf[a * k + a] >= 0) : sf[a * k + b] != 0) {
                    return false;
                }
            }
        }
        return k > 0;
    }

    /**
     * Whether w'Σw = ‖C'w‖² is at most {@link #ZERO_VARIANCE} Σ_i w_i² Σ_ii: zero variance up to
     * the rounding of the products, the test this class certifies its own answers by.
     */
    public static boolean zeroVariance(FactorForm form, double[] w) {
        int k = form.factorCount();
        double[] b = form.loadings();
        double[] sf = form.factorCovariance();
        double[] exposure = new double[k];
        double uncorrelated = 0;
        for (int i = 0; i < w.length; i++) {
            if (w[i] == 0) {
                continue;
            }
            double own = form.specificVariances()[i];
            for (int a = 0; a < k; a++) {
                exposure[a] += b[i * k + a] * w[i];
                own += b[i * k + a] * b[i * k + a] * sf[a * k + a];
            }
            uncorrelated += w[i] * w[i] * own;
        }
        double variance = 0;
        for (int a = 0; a < k; a++) {
            variance += sf[a * k + a] * exposure[a] * exposure[a];
        }
        return variance <= ZERO_VARIANCE * uncorrelated;
    }

    /**
     * The minimum-norm zero-variance portfolio within the bounds, or empty when the method finds
     * none (none exists, or it did not converge).
     *
     * @throws IllegalArgumentException when the form does not {@link #applies apply} or the
     *                                  shapes disagree
     */
    public Optional<SolveOutcome.Optimal> solve(FactorForm form, double[] lower, double[] upper) {
        Objects.requireNonNull(form, "form");
        if (!applies(form)) {
            throw new IllegalArgumentException("zero-variance projection needs d = 0 and a diagonal factor covariance");
        }
        int n = form.specificVariances().length;
        if (lower.length != n || upper.length != n) {
            throw new IllegalArgumentException("bounds (" + lower.length + ", " + upper.length
                    + ") must have length n (" + n + ")");
        }
        try {
            return Optional.ofNullable(new Run(form, lower, upper).solve());
        } catch (ArithmeticException e) {
            // A Newton system that rounding made indefinite: no certified answer from here.
            return Optional.empty();
        }
    }

    /** One solve. M = [C, 1] is stored n×(K+1) row-major. */
    private static final class Run {
        private final int n;
        private final int m;
        private final double[] rows;
        private final double[] lo;
        private final double[] hi;
        private final double[] s;
        private final double[] w;
        private final boolean[] inside;
        private final double[] hessian;
        private int insideCount;

        Run(FactorForm form, double[] lower, double[] upper) {
            int k = form.factorCount();
            this.n = lower.length;
            this.m = k + 1;
            double[] b = form.loadings();
            double[] sf = form.factorCovariance();
            this.rows = new double[n * m];
            for (int i = 0; i < n; i++) {
                for (int a = 0; a < k; a++) {
                    rows[i * m + a] = b[i * k + a] * Math.sqrt(sf[a * k + a]);
                }
                rows[i * m + k] = 1.0;
            }
            this.lo = lower;
            this.hi = upper;
            this.s = new double[n];
            this.w = new double[n];
            this.inside = new boolean[n];
            this.hessian = new double[m * m];
        }

        SolveOutcome.Optimal solve() {
            double[] y = new double[m];
            // Start from equal weights (ν = 1/n, μ = 0): every asset strictly inside its bounds
            // when the bounds allow it, so the first Hessian has full support.
            y[m - 1] = 1.0 / n;
            evaluate(y);
            rebuildHessian();
            double[] r = residual();
            double value = dual(y);
            double ceiling = largestObjective();
            for (int step = 1; step <= MAX_STEPS; step++) {
                if (separated(r)) {
                    return null;
                }
                if (value > ceiling) {
                    // Weak duality: θ(y) ≤ ½‖w‖² for every feasible w, and no w in the box has
                    // ½‖w‖² above the ceiling, so no zero-variance portfolio exists.
                    return null;
                }
                if (converged(r)) {
                    return optimal(step);
                }
                double[] dir = newtonDirection(r);
                double slope = 0;
                for (int a = 0; a < m; a++) {
                    slope -= r[a] * dir[a];
                }
                if (!(slope > 0)) {
                    return null;
                }
                boolean[] before = inside.clone();
                double[] trial = new double[m];
                double alpha = 1;
                double next;
                while (true) {
                    for (int a = 0; a < m; a++) {
                        trial[a] = y[a] + alpha * dir[a];
                    }
                    evaluate(trial);
                    next = dual(trial);
                    if (next >= value + 1e-4 * alpha * slope) {
                        break;
                    }
                    alpha *= 0.5;
                    if (alpha < 1e-12) {
                        return null;
                    }
                }
                System.arraycopy(trial, 0, y, 0, m);
                value = next;
                updateHessian(before);
                r = residual();
            }
            return null;
        }

        /**
         * A proof that no zero-variance portfolio exists, from the current iterate's factor
         * exposure z = C'w: with every lower bound ≥ 0, if c_i'z &gt; 0 for every asset that may be
         * held, then z'C'v = Σ v_i c_i'z &gt; 0 for every allowed v, so C'v ≠ 0. On returns with a
         * common market factor and long-only bounds this usually holds at the first iterate
         * (equal weights).
         */
        private boolean separated(double[] r) {
            for (int i = 0; i < n; i++) {
                if (lo[i] < 0) {
                    return false;
                }
            }
            for (int i = 0; i < n; i++) {
                if (hi[i] > 0) {
                    double v = 0;
                    int base = i * m;
                    for (int a = 0; a < m - 1; a++) {
                        v += rows[base + a] * r[a];
                    }
                    if (!(v > 0)) {
                        return false;
                    }
                }
            }
            return true;
        }

        /** ½ Σ_i max(lower_i², upper_i²), the largest ½‖w‖² in the box. */
        private double largestObjective() {
            double total = 0;
            for (int i = 0; i < n; i++) {
                total += 0.5 * Math.max(lo[i] * lo[i], hi[i] * hi[i]);
            }
            return total;
        }

        /** s = My, w = clip(s), and which assets are strictly inside their bounds. */
        private void evaluate(double[] y) {
            insideCount = 0;
            for (int i = 0; i < n; i++) {
                double v = 0;
                int base = i * m;
                for (int a = 0; a < m; a++) {
                    v += rows[base + a] * y[a];
                }
                s[i] = v;
                w[i] = Math.min(hi[i], Math.max(lo[i], v));
                inside[i] = v > lo[i] && v < hi[i];
                if (inside[i]) {
                    insideCount++;
                }
            }
        }

        /**
         * θ(y) = ν − Σ_i (s_i w_i − ½ w_i²), the dual of the projection (the conjugate of
         * ½w² plus the box's indicator, evaluated at s_i).
         */
        private double dual(double[] y) {
            double total = y[m - 1];
            for (int i = 0; i < n; i++) {
                total -= s[i] * w[i] - 0.5 * w[i] * w[i];
            }
            return total;
        }

        /** (C'w, 1'w − 1), the negative dual gradient. */
        private double[] residual() {
            double[] r = new double[m];
            for (int i = 0; i < n; i++) {
                double wi = w[i];
                if (wi != 0) {
                    int base = i * m;
                    for (int a = 0; a < m; a++) {
                        r[a] += rows[base + a] * wi;
                    }
                }
            }
            r[m - 1] -= 1.0;
            return r;
        }

        /** ‖C'w‖² ≤ ZERO_VARIANCE Σ w_i² Σ_ii and |1'w − 1| ≤ BUDGET. */
        private boolean converged(double[] r) {
            if (!(Math.abs(r[m - 1]) <= BUDGET)) {
                return false;
            }
            double variance = 0;
            for (int a = 0; a < m - 1; a++) {
                variance += r[a] * r[a];
            }
            return variance <= ZERO_VARIANCE * uncorrelatedVariance();
        }

        /** Σ_i w_i² Σ_ii with Σ_ii = ‖c_i‖². */
        private double uncorrelatedVariance() {
            double total = 0;
            for (int i = 0; i < n; i++) {
                if (w[i] != 0) {
                    double own = 0;
                    int base = i * m;
                    for (int a = 0; a < m - 1; a++) {
                        own += rows[base + a] * rows[base + a];
                    }
                    total += w[i] * w[i] * own;
                }
            }
            return total;
        }

        /**
         * Δ = −(H + τI)⁻¹ r. τ, a relative 1e-12 of H's mean diagonal (or 1 when nothing is
         * inside), keeps the system solvable when fewer than K+1 assets are inside their bounds
         * or C has dependent columns (centred rows sum to zero).
         */
        private double[] newtonDirection(double[] r) {
            double trace = 0;
            for (int a = 0; a < m; a++) {
                trace += hessian[a * m + a];
            }
            double tau = trace > 0 ? 1e-12 * trace / m : 1.0;
            CholeskyFactor factor = new CholeskyFactor(m);
            double[] column = new double[m];
            for (int p = 0; p < m; p++) {
                for (int q = 0; q < p; q++) {
                    column[q] = hessian[q * m + p];
                }
                if (!factor.append(column, hessian[p * m + p] + tau, 0.0)) {
                    throw new ArithmeticException("Newton system is not positive definite at pivot " + p);
                }
            }
            double[] rhs = new double[m];
            for (int p = 0; p < m; p++) {
                rhs[p] = -r[p];
            }
            factor.solveInPlace(rhs);
            return rhs;
        }

        /** H = Σ_{i inside} m_i m_i' (upper triangle) through the blocked kernel. */
        private void rebuildHessian() {
            double[] packed = new double[insideCount * m];
            int row = 0;
            for (int i = 0; i < n; i++) {
                if (inside[i]) {
                    System.arraycopy(rows, i * m, packed, row * m, m);
                    row++;
                }
            }
            Arrays.fill(hessian, 0.0);
            CrossProducts.accumulate(packed, packed, insideCount, m, hessian);
        }

        /** Adds the rows that came inside and removes those that left, or rebuilds when many changed. */
        private void updateHessian(boolean[] before) {
            int changed = 0;
            for (int i = 0; i < n; i++) {
                if (before[i] != inside[i]) {
                    changed++;
                }
            }
            if (changed > REBUILD_FRACTION * n) {
                rebuildHessian();
                return;
            }
            for (int i = 0; i < n; i++) {
                if (before[i] != inside[i]) {
                    double sign = inside[i] ? 1.0 : -1.0;
                    int base = i * m;
                    for (int p = 0; p < m; p++) {
                        double v = sign * rows[base + p];
                        for (int q = p; q < m; q++) {
                            hessian[p * m + q] += v * rows[base + q];
                        }
                    }
                }
            }
        }

        private SolveOutcome.Optimal optimal(int steps) {
            BoundSide[] sides = new BoundSide[n];
            for (int i = 0; i < n; i++) {
                sides[i] = w[i] <= lo[i] ? BoundSide.LOWER : w[i] >= hi[i] ? BoundSide.UPPER : BoundSide.FREE;
            }
            // Zero variance: the gradient Σw vanishes, so the budget's multiplier is 0 and the
            // KKT residual is the variance relative to its uncorrelated counterpart.
            double[] r = residual();
            double variance = 0;
            for (int a = 0; a < m - 1; a++) {
                variance += r[a] * r[a];
            }
            double scale = uncorrelatedVariance();
            return new SolveOutcome.Optimal(w.clone(), sides, steps, 0.0, scale > 0 ? variance / scale : 0.0);
        }
    }
}
