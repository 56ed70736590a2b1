package dev.sigmawalk.strategies.optimize;

import java.util.Arrays;
import java.util.Objects;
import java.util.Optional;

/**
 * Minimum variance under a single-factor covariance Σ = s ββ' + diag(d) ({@link SingleFactorForm}),
 * without forming Σ.
 *
 * <p>Unbounded (short sales allowed), by the Woodbury identity in O(n):
 * Σ⁻¹1 = D⁻¹1 − s D⁻¹β (β'D⁻¹1) / (1 + s β'D⁻¹β), then w = Σ⁻¹1 / 1'Σ⁻¹1.
 *
 * <p>With bounds lower ≤ w ≤ upper (lower finite), the KKT conditions read, with ν the budget
 * multiplier and c = s β'w, g_i = c β_i + d_i w_i equal to ν on free weights, ≥ ν at a lower
 * bound and ≤ ν at an upper bound. Hence every weight is a clamp of one line:
 * <pre>
 *   w_i = clamp((a − c β_i)/d_i, lower_i, upper_i),   a = ν,
 * </pre>
 * so the partition splits into zero (or lower), free and capped weights. Given a partition, a
 * and c follow exactly from a 2×2 linear system, with A0 = Σ_F 1/d, A1 = Σ_F β/d, A2 = Σ_F β²/d, S_B = Σ of pinned weights,
 * M_B = Σ of β times pinned weights:
 * <pre>
 *   c = s (a A1 + M_B) / (1 + s A2),
 *   a = (1 − S_B + s A1 M_B / (1 + s A2)) / (A0 − s A1² / (1 + s A2)).
 * </pre>
 * The partition is found by iterating: classify every weight by its clamp under the current
 * (a, c), re-solve the 2×2 system, stop when the partition reproduces itself (then every KKT
 * condition holds); O(n) per round and a few rounds in practice. Should it not settle, a slower
 * but certain search takes over: for a fixed c, a(c) solves Σ w_i = 1 ({@link LevelSolver},
 * O(n log n)), and h(c) = s Σ β_i w_i(a(c), c) − c is strictly decreasing (β'w(c) is
 * non-increasing in the linear term's coefficient c), so bisection on c brackets the root and
 * its partition. With lower = 0 and no upper bound the held set is the threshold rule's: a
 * prefix of the assets sorted by β. Upper bounds tighter than 1 − Σ_{j≠i} lower_j are implied by the budget, so
 * they are replaced by that value (a redundant constraint does not move the optimum).
 *
 * <p>The result is verified against the KKT conditions in O(n); when the fast path cannot
 * certify its answer (a zero specific variance, an infinite lower bound, a failed check),
 * {@link #solve} falls back to the general {@link ActiveSetSolver}, which is always exact.
 */
public final class SingleFactorMinVariance {

    private final SolverSettings settings;

    public SingleFactorMinVariance(SolverSettings settings) {
        this.settings = Objects.requireNonNull(settings, "settings");
    }

    /** Unbounded minimum variance by the Woodbury identity; falls back to the dense closed form when some d_i ≤ 0. */
    public SolveOutcome unbounded(SingleFactorForm form) {
        double s = form.factorVariance();
        double[] beta = form.loadings();
        double[] d = form.specificVariances();
        int n = beta.length;
        if (!allPositive(d) || !(s >= 0)) {
            return new UnboundedSolver(settings).minVariance(dense(form), n);
        }
        double a0 = 0;
        double a1 = 0;
        double a2 = 0;
        for (int i = 0; i < n; i++) {
            a0 += 1 / d[i];
            a1 += beta[i] / d[i];
            a2 += beta[i] * beta[i] / d[i];
        }
        double factor = s * a1 / (1 + s * a2);
        double[] w = new double[n];
        double total = 0;
        for (int i = 0; i < n; i++) {
            w[i] = (1 - factor * beta[i]) / d[i];
            total += w[i];
        }
        for (int i = 0; i < n; i++) {
            w[i] /= total;
        }
        double[] lo = new double[n];
        double[] hi = new double[n];
        Arrays.fill(lo, Double.NEGATIVE_INFINITY);
        Arrays.fill(hi, Double.POSITIVE_INFINITY);
        return UnboundedSolver.outcome(w, report(form, w, lo, hi), settings.kktTolerance());
    }

    /** Bounded minimum variance: the fast path when it certifies its answer, else the general solver. */
    public SolveOutcome solve(SingleFactorForm form, double[] lower, double[] upper) {
        Optional<SolveOutcome.Optimal> fast = threshold(form, lower, upper);
        if (fast.isPresent()) {
            return fast.get();
        }
        int n = form.loadings().length;
        QuadraticProblem problem = new QuadraticProblem(n, dense(form), new double[n], lower, upper);
        return new ActiveSetSolver(settings).solve(problem);
    }

    /**
     * The O(n log n) clamp-and-threshold solution alone, verified; empty when it does not apply or
     * cannot be certified (including infeasible bounds, which {@link #solve} reports).
     */
    public Optional<SolveOutcome.Optimal> threshold(SingleFactorForm form, double[] lower, double[] upper) {
        return certified(form, lower, upper, true);
    }

    /** The bisection search alone, without the partition iteration (so tests can reach it). */
    Optional<SolveOutcome.Optimal> thresholdByBisection(SingleFactorForm form, double[] lower, double[] upper) {
        return certified(form, lower, upper, false);
    }

    private Optional<SolveOutcome.Optimal> certified(SingleFactorForm form, double[] lower, double[] upper,
                                                     boolean iterate) {
        double s = form.factorVariance();
        double[] beta = form.loadings();
        double[] d = form.specificVariances();
        int n = beta.length;
        if (!allPositive(d) || !(s >= 0) || lower.length != n || upper.length != n || !allFinite(lower)) {
            return Optional.empty();
        }
        double[] cap = impliedUpper(lower, upper);
        if (cap == null) {
            return Optional.empty();
        }
        if (iterate) {
            Optional<SolveOutcome.Optimal> quick = verified(form, lower, upper, cap,
                    SingleFactorPartition.iterate(s, beta, d, lower, cap));
            if (quick.isPresent()) {
                return quick;
            }
        }
        return verified(form, lower, upper, cap, SingleFactorPartition.bisect(s, beta, d, lower, cap));
    }

    /** The weights of (a, c)'s partition, when they respect the bounds and pass the KKT check. */
    private Optional<SolveOutcome.Optimal> verified(SingleFactorForm form, double[] lower, double[] upper, double[] cap,
                                                    SingleFactorPartition.Levels levels) {
        if (levels == null) {
            return Optional.empty();
        }
        double[] w = SingleFactorPartition.weights(form.factorVariance(), form.loadings(), form.specificVariances(),
                lower, cap, levels);
        if (w == null) {
            return Optional.empty();
        }
        KktReport report = report(form, w, lower, upper);
        if (!report.holds(settings.kktTolerance())) {
            return Optional.empty();
        }
        return Optional.of(new SolveOutcome.Optimal(w, sides(w, lower, upper), 0, report.budgetMultiplier(),
                report.worst()));
    }

    /** min(upper_i, 1 − Σ_{j≠i} lower_j); null when the bounds cannot reach a sum of 1. */
    private static double[] impliedUpper(double[] lower, double[] upper) {
        double lowSum = 0;
        double highSum = 0;
        for (int i = 0; i < lower.length; i++) {
            lowSum += lower[i];
            highSum += upper[i];
        }
        if (lowSum > 1 || highSum < 1) {
            return null;
        }
        double[] cap = new double[lower.length];
        for (int i = 0; i < lower.length; i++) {
            cap[i] = Math.min(upper[i], 1 - lowSum + lower[i]);
        }
        return cap;
    }

    /** KKT residuals in O(n) with g_i = s β_i (β'w) + d_i w_i. */
    private static KktReport report(SingleFactorForm form, double[] w, double[] lower, double[] upper) {
        double s = form.factorVariance();
        double[] beta = form.loadings();
        double[] d = form.specificVariances();
        double exposure = 0;
        double absExposure = 0;
        for (int i = 0; i < w.length; i++) {
            exposure += beta[i] * w[i];
            absExposure += Math.abs(beta[i] * w[i]);
        }
        double[] g = new double[w.length];
        double scale = 0;
        for (int i = 0; i < w.length; i++) {
            g[i] = s * beta[i] * exposure + d[i] * w[i];
            scale = Math.max(scale, s * Math.abs(beta[i]) * absExposure + d[i] * Math.abs(w[i]));
        }
        return KktCheck.check(w, g, lower, upper, scale > 0 ? scale : 1);
    }

    private static BoundSide[] sides(double[] w, double[] lower, double[] upper) {
        BoundSide[] sides = new BoundSide[w.length];
        for (int i = 0; i < w.length; i++) {
            sides[i] = w[i] <= lower[i] ? BoundSide.LOWER : w[i] >= upper[i] ? BoundSide.UPPER : BoundSide.FREE;
        }
        return sides;
    }

    /** s ββ' + diag(d), row-major. */
    public static double[] dense(SingleFactorForm form) {
        double s = form.factorVariance();
        double[] beta = form.loadings();
        double[] d = form.specificVariances();
        int n = beta.length;
        double[] sigma = new double[n * n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                sigma[i * n + j] = s * beta[i] * beta[j];
            }
            sigma[i * n + i] += d[i];
        }
        return sigma;
    }

    private static boolean allPositive(double[] values) {
        for (double v : values) {
            if (!(v > 0 && v < Double.POSITIVE_INFINITY)) {
                return false;
            }
        }
        return true;
    }

    private static boolean allFinite(double[] values) {
        for (double v : values) {
            if (!Double.isFinite(v)) {
                return false;
            }
        }
        return true;
    }
}
