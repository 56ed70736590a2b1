package dev.sigmawalk.strategies.optimize;

import java.util.Arrays;
import java.util.Comparator;
import java.util.Objects;
import java.util.Optional;

/**
 * Maximum Sharpe ratio with bounds: maximise μ'w / √(w'Σw) s.t. Σ w = 1, lower ≤ w ≤ upper, for a
 * positive definite Σ and excess returns μ, where some allowed w has μ'w &gt; 0 (check with
 * {@link #highestExpectedReturn} first).
 *
 * <p>The usual change of variables y = κw, κ ≥ 0, normalised by μ'y = 1, turns it into the convex
 * quadratic program (Cornuejols &amp; Tütüncü, Optimization Methods in Finance, 2007, §8.2; cited
 * from memory)
 * <pre>
 *   minimise y'Σy   s.t.   μ'y = 1,   1'y = κ,   lower·κ ≤ y ≤ upper·κ,   κ ≥ 0.
 * </pre>
 * Once the partition (which weights sit on which bound) is known, that program restricted to its
 * face has only equality constraints and is solved exactly ({@code TangencyFace}). The answer is
 * verified through the equivalent mean-variance problem: w maximises the Sharpe ratio iff it
 * solves minimise ½λ w'Σw − μ'w on the same constraints with λ = μ'w / w'Σw (the two gradients
 * differ by the positive factor √(w'Σw)), checked by {@link KktCheck}. When the check fails, the
 * exact active-set solver run on that mean-variance problem gives the next partition.
 *
 * <p>Two starting partitions are tried in turn. First the exact mean-variance optimum for the λ
 * implied by the minimum-variance portfolio (a few exact active-set solves, milliseconds at
 * n = 500). Should that not verify within 20 rounds, the transformed program
 * is solved with ojAlgo's {@code ConvexSolver} ({@code TransformedProgram}; OPTIMAL only, and
 * about 1 s at n = 100), whose active set seeds the same polish-and-verify loop. Either way the
 * weights returned have passed the KKT check.
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
        double lowSum = 0;
        double highSum = 0;
        for (int i = 0; i < mu.length; i++) {
            lowSum += lower[i];
            highSum += upper[i];
        }
        if (lowSum > 1 || highSum < 1) {
            return Double.NEGATIVE_INFINITY;
        }
        double[] w = highestReturnPortfolio(mu, lower, upper);
        if (w == null) {
            return Double.POSITIVE_INFINITY;
        }
        double value = 0;
        for (int i = 0; i < mu.length; i++) {
            value += mu[i] * w[i];
        }
        return value;
    }

    /**
     * The greedy maximiser of μ'w: lower bounds first, then the highest μ filled to its upper
     * bound, and so on until the budget is spent. Null when a lower bound is infinite.
     */
    static double[] highestReturnPortfolio(double[] mu, double[] lower, double[] upper) {
        int n = mu.length;
        double lowSum = 0;
        for (int i = 0; i < n; i++) {
            lowSum += lower[i];
        }
        if (!Double.isFinite(lowSum)) {
            return null;
        }
        double[] w = lower.clone();
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        Arrays.sort(order, Comparator.comparingDouble((Integer i) -> -mu[i]).thenComparingInt(i -> i));
        double left = 1 - lowSum;
        for (int i : order) {
            if (left <= 0) {
                break;
            }
            double room = Math.min(upper[i] - lower[i], left);
            w[i] += room;
            left -= room;
        }
        return w;
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
        SolveOutcome infeasible = ActiveSetSolver.checkBudgetReachable(new QuadraticProblem(n, sigma, mu, lower,
                upper));
        if (infeasible != null) {
            return infeasible;
        }
        Optional<SolveOutcome.Optimal> quick = solveFromOwnStart(sigma, mu, lower, upper);
        return quick.isPresent() ? quick.get() : solveFromConvexSolver(sigma, mu, lower, upper);
    }

    /** The route without ojAlgo alone; empty when it does not verify (then ojAlgo's route decides). */
    Optional<SolveOutcome.Optimal> solveFromOwnStart(double[] sigma, double[] mu, double[] lower, double[] upper) {
        BoundSide[] own = ownStart(sigma, mu, lower, upper);
        return Optional.ofNullable(own == null ? null : refine(sigma, mu, lower, upper, own));
    }

    /**
     * The route through ojAlgo alone: its OPTIMAL answer of the transformed program gives the
     * starting partition, which is then polished and verified.
     */
    SolveOutcome solveFromConvexSolver(double[] sigma, double[] mu, double[] lower, double[] upper) {
        double[] start = TransformedProgram.solve(sigma, mu, lower, upper);
        if (start == null) {
            return new SolveOutcome.Failed("max-sharpe: ojAlgo's ConvexSolver did not return an OPTIMAL"
                    + " solution of the transformed program");
        }
        SolveOutcome.Optimal refined = refine(sigma, mu, lower, upper, partition(start, lower, upper));
        if (refined != null) {
            return refined;
        }
        String cause = positiveDefinite(sigma, mu.length) ? ""
                : " (the covariance matrix is singular, so the highest Sharpe ratio may not be attained)";
        return new SolveOutcome.Failed("max-sharpe: no partition passed the KKT check after " + MAX_ROUNDS
                + " rounds of polishing" + cause);
    }

    /** Whether every Cholesky pivot of Σ clears the settings' singularity floor. */
    private boolean positiveDefinite(double[] sigma, int n) {
        CholeskyFactor factor = new CholeskyFactor(n);
        double[] column = new double[n];
        for (int i = 0; i < n; i++) {
            for (int r = 0; r < i; r++) {
                column[r] = sigma[r * n + i];
            }
            if (!factor.append(column, sigma[i * n + i], settings.singularPivot())) {
                return false;
            }
        }
        return true;
    }

    /**
     * A starting partition without ojAlgo: the exact mean-variance optimum for the λ implied by
     * the minimum-variance portfolio (λ = μ'w / w'Σw), or by the highest-return portfolio when
     * the minimum-variance one has μ'w ≤ 0. Null when neither gives a usable λ.
     */
    private BoundSide[] ownStart(double[] sigma, double[] mu, double[] lower, double[] upper) {
        int n = mu.length;
        ActiveSetSolver exact = new ActiveSetSolver(settings);
        SolveOutcome minimum = exact.solve(new QuadraticProblem(n, sigma, new double[n], lower, upper));
        QuadraticProblem equivalent = minimum instanceof SolveOutcome.Optimal
                ? meanVarianceEquivalent(sigma, mu, lower, upper, ((SolveOutcome.Optimal) minimum).weights())
                : null;
        if (equivalent == null) {
            double[] richest = highestReturnPortfolio(mu, lower, upper);
            equivalent = richest == null ? null : meanVarianceEquivalent(sigma, mu, lower, upper, richest);
        }
        if (equivalent == null) {
            return null;
        }
        SolveOutcome first = exact.solve(equivalent);
        return first instanceof SolveOutcome.Optimal
                ? partition(((SolveOutcome.Optimal) first).weights(), lower, upper)
                : null;
    }

    /**
     * Polish and correct from a partition: the exact tangency on the partition's face, verified
     * through the equivalent mean-variance problem; when the check fails, that problem's exact
     * optimum gives the next partition. Null when no round passes within {@link #MAX_ROUNDS}.
     */
    private SolveOutcome.Optimal refine(double[] sigma, double[] mu, double[] lower, double[] upper,
                                        BoundSide[] start) {
        ActiveSetSolver exact = new ActiveSetSolver(settings);
        BoundSide[] sides = start;
        for (int round = 0; round < MAX_ROUNDS; round++) {
            double[] w = TangencyFace.solve(sigma, mu, lower, upper, sides);
            QuadraticProblem equivalent = w == null ? null : meanVarianceEquivalent(sigma, mu, lower, upper, w);
            if (equivalent == null) {
                return null;
            }
            KktReport report = KktCheck.check(equivalent, w);
            if (report.holds(settings.kktTolerance())) {
                return new SolveOutcome.Optimal(w, partition(w, lower, upper), round, report.budgetMultiplier(),
                        report.worst());
            }
            SolveOutcome corrected = exact.solve(equivalent, sides);
            if (!(corrected instanceof SolveOutcome.Optimal)) {
                return null;
            }
            BoundSide[] next = partition(((SolveOutcome.Optimal) corrected).weights(), lower, upper);
            if (Arrays.equals(next, sides)) {
                return null;
            }
            sides = next;
        }
        return null;
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

    private static BoundSide[] partition(double[] w, double[] lower, double[] upper) {
        BoundSide[] sides = new BoundSide[w.length];
        for (int i = 0; i < w.length; i++) {
            boolean atLower = Double.isFinite(lower[i]) && w[i] <= lower[i] + ACTIVE_SLACK;
            boolean atUpper = Double.isFinite(upper[i]) && w[i] >= upper[i] - ACTIVE_SLACK;
            sides[i] = atLower ? BoundSide.LOWER : atUpper ? BoundSide.UPPER : BoundSide.FREE;
        }
        return sides;
    }

}
