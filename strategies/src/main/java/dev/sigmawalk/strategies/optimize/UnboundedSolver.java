package dev.sigmawalk.strategies.optimize;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.function.IntFunction;

/**
 * Closed forms for the budget-only problem minimise ½ w'Qw − c'w s.t. Σ w = 1 (short sales
 * allowed, no bounds), for positive definite Q:
 * <pre>
 *   w = Q⁻¹(c + ν1),   ν = (1 − 1'Q⁻¹c) / (1'Q⁻¹1),
 * </pre>
 * the stationarity condition Qw − c = ν1 solved together with the budget. For c = 0 it is the
 * global minimum-variance portfolio Σ⁻¹1 / (1'Σ⁻¹1) (Merton 1972, "An analytic derivation of the
 * efficient portfolio frontier", JFQA 7(4); cited from memory). Q⁻¹ is never formed: one
 * Cholesky factorisation, then triangular solves, O(n³/3) in all.
 *
 * <p>A matrix that is singular or not positive definite (a Cholesky pivot d with
 * d² ≤ {@link SolverSettings#singularPivot()} times its diagonal entry, for example a sample
 * covariance with n ≥ L) gives {@link SolveOutcome.Failed} whose reason says the matrix is
 * singular. The answer is verified by {@link KktCheck} before it is returned.
 */
public final class UnboundedSolver {
    /**
     * Weights of this size lose the budget Σ w = 1 to rounding at the KKT tolerance (their
     * sum's rounding error, about n · 1e-16 times the largest, exceeds 1e-9 from here on).
     */
    private static final double HUGE_WEIGHT = 1e6;

    private final SolverSettings settings;

    public UnboundedSolver(SolverSettings settings) {
        this.settings = Objects.requireNonNull(settings, "settings");
    }

    /** Minimum variance: minimise w'Σw s.t. Σ w = 1; {@code sigma} dense row-major n×n. */
    public SolveOutcome minVariance(double[] sigma, int n) {
        return solve(sigma, new double[n], n);
    }

    /**
     * {@link #minVariance(double[], int)} for the named assets (in Σ's order): a singular Σ is
     * reported at the asset whose pivot vanished.
     */
    public SolveOutcome minVariance(double[] sigma, List<String> assets) {
        return solve(sigma, new double[assets.size()], assets.size(), i -> "asset '" + assets.get(i) + "'");
    }

    /** minimise ½ w'Qw − c'w s.t. Σ w = 1; {@code q} dense row-major n×n. */
    public SolveOutcome solve(double[] q, double[] c, int n) {
        return solve(q, c, n, i -> "the asset at position " + i);
    }

    /** {@link #solve(double[], double[], int)} for the named assets (in Q's order). */
    public SolveOutcome solve(double[] q, double[] c, List<String> assets) {
        return solve(q, c, assets.size(), i -> "asset '" + assets.get(i) + "'");
    }

    private SolveOutcome solve(double[] q, double[] c, int n, IntFunction<String> asset) {
        QuadraticProblem problem = free(n, q, c);
        CholeskyFactor factor = new CholeskyFactor(n);
        double[] column = new double[n];
        for (int i = 0; i < n; i++) {
            for (int r = 0; r < i; r++) {
                column[r] = q[r * n + i];
            }
            if (!factor.append(column, q[i * n + i], settings.singularPivot())) {
                return new SolveOutcome.Failed("the " + n + "x" + n + " matrix is singular or not positive definite"
                        + " (Cholesky pivot " + i + " vanishes: " + asset.apply(i) + " is, to rounding, a mix of"
                        + " the assets before it); a sample covariance is singular when the window has no more"
                        + " periods than assets, or when assets move together exactly (a column repeated, one"
                        + " series a combination of others)");
            }
        }
        double[] x = c.clone();
        double[] u = new double[n];
        Arrays.fill(u, 1);
        factor.solveInPlace(x);
        factor.solveInPlace(u);
        double nu = (1 - WorkingSet.sum(x, n)) / WorkingSet.sum(u, n);
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            w[i] = x[i] + nu * u[i];
        }
        return verified(problem, w);
    }

    /** Every weight unbounded (−∞, +∞). */
    static QuadraticProblem free(int n, double[] q, double[] c) {
        return QuadraticProblem.uniformBounds(n, q, c, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY);
    }

    private SolveOutcome verified(QuadraticProblem problem, double[] w) {
        KktReport report = KktCheck.check(problem, w);
        return outcome(w, report, settings.kktTolerance());
    }

    /**
     * Optimal with every side FREE when the report holds, else Failed naming the residuals and
     * their likely cause: a budget lost to rounding beside weights of a million or more in size
     * is the scale of the optimum itself (w = Q⁻¹(c + ν1) with Q tiny against c: mean-variance
     * with a risk aversion near 0), not a singular matrix.
     */
    static SolveOutcome outcome(double[] w, KktReport report, double tolerance) {
        if (!report.holds(tolerance)) {
            double largest = 0;
            for (double x : w) {
                largest = Math.max(largest, Math.abs(x));
            }
            String cause = report.primalResidual() > tolerance && largest >= HUGE_WEIGHT
                    ? "the optimum holds positions as large as " + String.format(Locale.ROOT, "%.3g", largest)
                            + " times the capital, whose sum cannot be kept at 1 in double precision: the quadratic"
                            + " term is tiny against the linear one (for mean-variance, a risk aversion far too small"
                            + " for the expected returns; bounds or a larger risk aversion give a usable portfolio)"
                    : "the matrix is nearly singular";
            return new SolveOutcome.Failed("KKT verification failed: primal residual " + report.primalResidual()
                    + ", scaled dual residual " + report.dualResidual() + " (" + cause + ")");
        }
        BoundSide[] sides = new BoundSide[w.length];
        Arrays.fill(sides, BoundSide.FREE);
        return new SolveOutcome.Optimal(w, sides, 0, report.budgetMultiplier(), report.worst());
    }
}
