package dev.sigmawalk.strategies.optimize;

import java.util.Arrays;
import java.util.Comparator;
import java.util.Objects;
import java.util.Optional;
import org.ojalgo.matrix.store.R064Store;
import org.ojalgo.optimisation.Optimisation;
import org.ojalgo.optimisation.convex.ConvexSolver;

/**
 * Maximum Sharpe ratio with bounds: maximise μ'w / √(w'Σw) s.t. Σ w = 1, lower ≤ w ≤ upper, for a
 * positive definite Σ and excess returns μ, where some allowed w has μ'w &gt; 0 (check with
 * {@link #highestExpectedReturn} first).
 *
 * <p>The usual change of variables y = κw, κ ≥ 0, normalised by μ'y = 1, turns it into the convex
 * quadratic program (Cornuejols &amp; Tütüncü, Optimization Methods in Finance, 2007, §8.2; cited
 * from memory)
 * <pre>
 *   minimise y'Σy   s.t.   μ'y = 1,   1'y = κ,   lower·κ ≤ y ≤ upper·κ,   κ ≥ 0,
 * </pre>
 * solved with ojAlgo's {@code ConvexSolver}, whose answer is accepted only in state OPTIMAL. It is
 * then polished: with the bounds it found active (y_B = κ b_B), the equality-constrained problem
 * in (y_F, κ) is solved exactly from its KKT system. The result is verified through the
 * equivalent mean-variance problem: w maximises the Sharpe ratio iff it solves
 * minimise ½λ w'Σw − μ'w on the same constraints with λ = μ'w / w'Σw (the two gradients differ by
 * the positive factor √(w'Σw)), checked by {@link KktCheck}. When that fails, the exact active-set
 * solver is run on that mean-variance problem to correct the partition, and the polish repeats.
 */
public final class MaxSharpeSolver {
    /** Rounds of polish and partition correction before giving up. */
    private static final int MAX_ROUNDS = 20;
    /** A weight within this of a bound in ojAlgo's answer is taken as on that bound. */
    private static final double ACTIVE_SLACK = 1e-9;

    private final SolverSettings settings;

    public MaxSharpeSolver(SolverSettings settings) {
        this.settings = Objects.requireNonNull(settings, "settings");
    }

    /**
     * max μ'w over Σ w = 1 and the bounds (a linear program solved greedily: start at the lower
     * bounds, then fill the highest μ first); +∞ when the bounds leave it unbounded, −∞ when they
     * cannot sum to 1. Lower bounds must be finite for a finite answer.
     */
    public static double highestExpectedReturn(double[] mu, double[] lower, double[] upper) {
        int n = mu.length;
        double lowSum = 0;
        double highSum = 0;
        double value = 0;
        for (int i = 0; i < n; i++) {
            lowSum += lower[i];
            highSum += upper[i];
            value += mu[i] * lower[i];
        }
        if (lowSum > 1 || highSum < 1) {
            return Double.NEGATIVE_INFINITY;
        }
        if (!Double.isFinite(lowSum)) {
            return Double.POSITIVE_INFINITY;
        }
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        Arrays.sort(order, Comparator.comparingDouble((Integer i) -> -mu[i]).thenComparingInt(i -> i));
        double left = 1 - lowSum;
        for (int i : order) {
            double room = Math.min(upper[i] - lower[i], left);
            value += mu[i] * room;
            left -= room;
            if (left <= 0) {
                break;
            }
        }
        return value;
    }

    /**
     * Without bounds: the tangency portfolio w = Σ⁻¹μ / (1'Σ⁻¹μ) (Cholesky solve, no inverse),
     * which maximises the Sharpe ratio on Σ w = 1 when 1'Σ⁻¹μ &gt; 0.
     *
     * @return empty when 1'Σ⁻¹μ ≤ 0 (then the scaling that meets the budget flips the sign of
     *         the excess return and no maximum is attained); otherwise a verified Optimal, or
     *         Failed when Σ is singular
     */
    public Optional<SolveOutcome> unbounded(double[] sigma, double[] mu) {
        int n = mu.length;
        CholeskyFactor factor = new CholeskyFactor(n);
        double[] column = new double[n];
        for (int i = 0; i < n; i++) {
            for (int r = 0; r < i; r++) {
                column[r] = sigma[r * n + i];
            }
            if (!factor.append(column, sigma[i * n + i], settings.singularPivot())) {
                return Optional.of(new SolveOutcome.Failed("the " + n + "x" + n + " covariance matrix is singular or"
                        + " not positive definite (Cholesky pivot " + i + " vanishes)"));
            }
        }
        double[] z = mu.clone();
        factor.solveInPlace(z);
        double total = WorkingSet.sum(z, n);
        if (!(total > 0)) {
            return Optional.empty();
        }
        for (int i = 0; i < n; i++) {
            z[i] /= total;
        }
        double[] lo = new double[n];
        double[] hi = new double[n];
        Arrays.fill(lo, Double.NEGATIVE_INFINITY);
        Arrays.fill(hi, Double.POSITIVE_INFINITY);
        QuadraticProblem equivalent = meanVarianceEquivalent(sigma, mu, lo, hi, z);
        if (equivalent == null) {
            return Optional.empty();
        }
        return Optional.of(UnboundedSolver.outcome(z, KktCheck.check(equivalent, z), settings.kktTolerance()));
    }

    /** Solves the bounded problem; see the class description. */
    public SolveOutcome solve(double[] sigma, double[] mu, double[] lower, double[] upper) {
        int n = mu.length;
        QuadraticProblem feasibility = new QuadraticProblem(n, sigma, mu, lower, upper);
        SolveOutcome infeasible = ActiveSetSolver.checkBudgetReachable(feasibility);
        if (infeasible != null) {
            return infeasible;
        }
        double[] start = solveTransformed(sigma, mu, lower, upper);
        if (start == null) {
            return new SolveOutcome.Failed("max-sharpe: ojAlgo's ConvexSolver did not return an OPTIMAL"
                    + " solution of the transformed program");
        }
        BoundSide[] sides = partition(start, lower, upper);
        ActiveSetSolver exact = new ActiveSetSolver(settings);
        for (int round = 0; round < MAX_ROUNDS; round++) {
            double[] w = polish(sigma, mu, lower, upper, sides);
            if (w == null) {
                return new SolveOutcome.Failed("max-sharpe: the KKT system of the polished partition is singular");
            }
            QuadraticProblem equivalent = meanVarianceEquivalent(sigma, mu, lower, upper, w);
            if (equivalent == null) {
                return new SolveOutcome.Failed("max-sharpe: the polished portfolio has no positive expected excess return");
            }
            KktReport report = KktCheck.check(equivalent, w);
            if (report.holds(settings.kktTolerance())) {
                return new SolveOutcome.Optimal(w, partition(w, lower, upper), round, report.budgetMultiplier(),
                        report.worst());
            }
            SolveOutcome corrected = exact.solve(equivalent, sides);
            if (!(corrected instanceof SolveOutcome.Optimal)) {
                return corrected;
            }
            sides = partition(((SolveOutcome.Optimal) corrected).weights(), lower, upper);
        }
        return new SolveOutcome.Failed("max-sharpe: the active set did not settle after " + MAX_ROUNDS + " rounds");
    }

    /** Minimise ½λ w'Σw − μ'w with λ = μ'w / w'Σw; null when μ'w ≤ 0. */
    private static QuadraticProblem meanVarianceEquivalent(double[] sigma, double[] mu, double[] lower,
                                                           double[] upper, double[] w) {
        int n = mu.length;
        double mean = 0;
        double variance = 0;
        for (int i = 0; i < n; i++) {
            mean += mu[i] * w[i];
            double row = 0;
            for (int j = 0; j < n; j++) {
                row += sigma[i * n + j] * w[j];
            }
            variance += w[i] * row;
        }
        if (!(mean > 0 && variance > 0)) {
            return null;
        }
        double lambda = mean / variance;
        double[] q = new double[n * n];
        for (int k = 0; k < q.length; k++) {
            q[k] = lambda * sigma[k];
        }
        return new QuadraticProblem(n, q, mu, lower, upper);
    }

    /** y = (y_1..y_n, κ) from ojAlgo, returned as w = y/κ; null unless OPTIMAL with κ &gt; 0. */
    private static double[] solveTransformed(double[] sigma, double[] mu, double[] lower, double[] upper) {
        int n = mu.length;
        int m = n + 1;
        R064Store q = R064Store.FACTORY.make(m, m);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                q.set(i, j, 2 * sigma[i * n + j]);
            }
        }
        ConvexSolver.Builder builder = ConvexSolver.newBuilder().objective(q, R064Store.FACTORY.make(m, 1));
        double[] row = new double[m];
        System.arraycopy(mu, 0, row, 0, n);
        builder.equality(1, row.clone());
        Arrays.fill(row, 1);
        row[n] = -1;
        builder.equality(0, row.clone());
        for (int i = 0; i < n; i++) {
            if (Double.isFinite(upper[i])) {
                builder.inequality(0, unitPair(m, i, 1, n, -upper[i]));
            }
            if (Double.isFinite(lower[i])) {
                builder.inequality(0, unitPair(m, i, -1, n, lower[i]));
            }
        }
        builder.inequality(0, unitPair(m, n, -1, n, 0));
        Optimisation.Result result = builder.solve();
        if (result.getState() != Optimisation.State.OPTIMAL) {
            return null;
        }
        double kappa = result.doubleValue(n);
        if (!(kappa > 0)) {
            return null;
        }
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            w[i] = result.doubleValue(i) / kappa;
        }
        return w;
    }

    /** A row with value a at index i and b at index j (a added to b when i = j). */
    private static double[] unitPair(int m, int i, double a, int j, double b) {
        double[] row = new double[m];
        row[i] += a;
        row[j] += b;
        return row;
    }

    private static BoundSide[] partition(double[] w, double[] lower, double[] upper) {
        BoundSide[] sides = new BoundSide[w.length];
        for (int i = 0; i < w.length; i++) {
            boolean atLower = Double.isFinite(lower[i]) && w[i] <= lower[i] + ACTIVE_SLACK;
            boolean atUpper = Double.isFinite(upper[i]) && w[i] >= upper[i] - ACTIVE_SLACK;
            sides[i] = atLower ? BoundSide.LOWER : atUpper ? BoundSide.UPPER : BoundSide.FREE;
        }
        return sides;
    }

    /**
     * Exact solution for a fixed partition: minimise y'Σy over z = (y_F, κ) with y_B = κ b_B,
     * subject to μ'y = 1 and 1'y = κ, from the KKT system [2M A'; A 0][z; η] = [0; r] with
     * M = P'ΣP (P maps z to y). Returns w = y/κ with pinned weights exactly on their bounds, or
     * null when the system is singular or κ ≤ 0.
     */
    private static double[] polish(double[] sigma, double[] mu, double[] lower, double[] upper, BoundSide[] sides) {
        int n = mu.length;
        int[] free = new int[n];
        int k = 0;
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            if (sides[i] == BoundSide.FREE) {
                free[k++] = i;
            } else {
                b[i] = sides[i] == BoundSide.LOWER ? lower[i] : upper[i];
            }
        }
        int m = k + 3;
        double[] a = new double[m * m];
        double[] rhs = new double[m];
        double[] sigmaB = new double[n];
        double bSigmaB = 0;
        double muB = 0;
        double sumB = 0;
        for (int i = 0; i < n; i++) {
            if (b[i] == 0) {
                continue;
            }
            muB += mu[i] * b[i];
            sumB += b[i];
            for (int j = 0; j < n; j++) {
                sigmaB[j] += sigma[j * n + i] * b[i];
            }
        }
        for (int i = 0; i < n; i++) {
            bSigmaB += b[i] * sigmaB[i];
        }
        int kappa = k;
        for (int r = 0; r < k; r++) {
            int i = free[r];
            for (int s = 0; s < k; s++) {
                a[r * m + s] = 2 * sigma[i * n + free[s]];
            }
            a[r * m + kappa] = 2 * sigmaB[i];
            a[kappa * m + r] = 2 * sigmaB[i];
            a[r * m + k + 1] = mu[i];
            a[(k + 1) * m + r] = mu[i];
            a[r * m + k + 2] = 1;
            a[(k + 2) * m + r] = 1;
        }
        a[kappa * m + kappa] = 2 * bSigmaB;
        a[kappa * m + k + 1] = muB;
        a[(k + 1) * m + kappa] = muB;
        a[kappa * m + k + 2] = sumB - 1;
        a[(k + 2) * m + kappa] = sumB - 1;
        rhs[k + 1] = 1;
        if (!DenseSystem.solveInPlace(a, rhs, m) || !(rhs[kappa] > 0)) {
            return null;
        }
        double[] w = b.clone();
        for (int r = 0; r < k; r++) {
            w[free[r]] = rhs[r] / rhs[kappa];
        }
        return w;
    }
}
