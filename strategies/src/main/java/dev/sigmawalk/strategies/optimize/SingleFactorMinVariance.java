package dev.sigmawalk.strategies.optimize;

import java.util.Arrays;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

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
    /** Bisection steps on c; the interval reaches adjacent doubles long before this. */
    private static final int MAX_BISECTIONS = 200;
    /** Relative slack for a free weight computed just beyond its bound (then clipped). */
    private static final double CLIP_SLACK = 1e-12;
    /** Rounds of the partition iteration before bisection takes over. */
    private static final int MAX_PARTITION_ROUNDS = 50;
    private static final byte LOW = 0;
    private static final byte FREE = 1;
    private static final byte CAPPED = 2;

    private final SolverSettings settings;

    /** The two numbers that fix every weight: the level a (= ν) and the slope c = s β'w. */
    private record Levels(double a, double c) {
    }

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
                    partitionIteration(s, beta, d, lower, cap));
            if (quick.isPresent()) {
                return quick;
            }
        }
        return verified(form, lower, upper, cap, bisection(s, beta, d, lower, cap));
    }

    /** The weights of (a, c)'s partition, when they respect the bounds and pass the KKT check. */
    private Optional<SolveOutcome.Optimal> verified(SingleFactorForm form, double[] lower, double[] upper, double[] cap,
                                                    Levels levels) {
        if (levels == null) {
            return Optional.empty();
        }
        double[] w = exactFromPartition(form.factorVariance(), form.loadings(), form.specificVariances(), lower, cap,
                levels.a(), levels.c());
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

    /**
     * Partition iteration (a semismooth Newton method on the piecewise-linear KKT map): from the
     * all-free (a, c), classify each weight by its clamp, solve the 2×2 system for that
     * partition, and repeat until the partition reproduces itself, which is then exactly the KKT
     * partition. O(n) per round; usually a few rounds. Returns (a, c), or null when it has not
     * settled after a fixed number of rounds (it can cycle; bisection then decides).
     */
    private static Levels partitionIteration(double s, double[] beta, double[] d, double[] lower, double[] cap) {
        int n = beta.length;
        byte[] partition = new byte[n];
        Arrays.fill(partition, FREE);
        for (int round = 0; round < MAX_PARTITION_ROUNDS; round++) {
            Levels levels = solvePartition(s, beta, d, lower, cap, partition);
            if (levels == null) {
                return null;
            }
            byte[] next = classify(beta, d, lower, cap, levels.a(), levels.c());
            if (Arrays.equals(next, partition)) {
                return levels;
            }
            partition = next;
        }
        return null;
    }

    /** Each weight's side under (a, c): LOW when the clamp's argument is at or below lower, CAP at or above cap. */
    private static byte[] classify(double[] beta, double[] d, double[] lower, double[] cap, double a, double c) {
        byte[] partition = new byte[beta.length];
        for (int i = 0; i < beta.length; i++) {
            double raw = (a - c * beta[i]) / d[i];
            partition[i] = raw <= lower[i] ? LOW : raw >= cap[i] ? CAPPED : FREE;
        }
        return partition;
    }

    /** (a, c) from the 2×2 system of a partition (see the class description); null when no weight is free. */
    private static Levels solvePartition(double s, double[] beta, double[] d, double[] lower, double[] cap,
                                           byte[] partition) {
        double a0 = 0;
        double a1 = 0;
        double a2 = 0;
        double pinnedSum = 0;
        double pinnedExposure = 0;
        for (int i = 0; i < beta.length; i++) {
            if (partition[i] == FREE) {
                a0 += 1 / d[i];
                a1 += beta[i] / d[i];
                a2 += beta[i] * beta[i] / d[i];
            } else {
                double w = partition[i] == LOW ? lower[i] : cap[i];
                pinnedSum += w;
                pinnedExposure += beta[i] * w;
            }
        }
        if (a0 == 0) {
            return null;
        }
        double k = 1 + s * a2;
        double level = (1 - pinnedSum + s * a1 * pinnedExposure / k) / (a0 - s * a1 * a1 / k);
        double slope = s * (level * a1 + pinnedExposure) / k;
        return Double.isFinite(level) && Double.isFinite(slope) ? new Levels(level, slope) : null;
    }

    /** (a, c) by bisection on c and the exact level a(c); null when a level cannot be found. */
    private static Levels bisection(double s, double[] beta, double[] d, double[] lower, double[] cap) {
        OptionalDouble root = rootOfC(s, beta, d, lower, cap);
        if (root.isEmpty()) {
            return null;
        }
        double c = root.getAsDouble();
        OptionalDouble a = level(c, beta, d, lower, cap);
        return a.isPresent() ? new Levels(a.getAsDouble(), c) : null;
    }

    /** Bisection for the root of h(c) = s β'w(c) − c on [s·min β'w, s·max β'w]. */
    private static OptionalDouble rootOfC(double s, double[] beta, double[] d, double[] lower, double[] cap) {
        double mMin = 0;
        double mMax = 0;
        for (int i = 0; i < beta.length; i++) {
            double p = beta[i] * lower[i];
            double q = beta[i] * cap[i];
            mMin += Math.min(p, q);
            mMax += Math.max(p, q);
        }
        double low = s * mMin;
        double high = s * mMax;
        for (int k = 0; k < MAX_BISECTIONS && low < high; k++) {
            double mid = low + (high - low) / 2;
            if (mid <= low || mid >= high) {
                break;
            }
            OptionalDouble a = level(mid, beta, d, lower, cap);
            if (a.isEmpty()) {
                return OptionalDouble.empty();
            }
            double m = exposure(beta, d, lower, cap, a.getAsDouble(), mid);
            if (s * m - mid > 0) {
                low = mid;
            } else {
                high = mid;
            }
        }
        return OptionalDouble.of(low + (high - low) / 2);
    }

    /** a(c): Σ clamp((a − c β_i)/d_i) = 1. */
    private static OptionalDouble level(double c, double[] beta, double[] d, double[] lower, double[] cap) {
        double[] u = new double[beta.length];
        for (int i = 0; i < beta.length; i++) {
            u[i] = c * beta[i];
        }
        return LevelSolver.solve(u, d, lower, cap, 1);
    }

    /** β'w(a, c). */
    private static double exposure(double[] beta, double[] d, double[] lower, double[] cap, double a, double c) {
        double m = 0;
        for (int i = 0; i < beta.length; i++) {
            m += beta[i] * Math.max(lower[i], Math.min(cap[i], (a - c * beta[i]) / d[i]));
        }
        return m;
    }

    /** Weights from the 2×2 system for the partition found at (a, c); null when they break a bound. */
    private static double[] exactFromPartition(double s, double[] beta, double[] d, double[] lower, double[] cap,
                                               double a, double c) {
        int n = beta.length;
        boolean[] isFree = new boolean[n];
        double[] w = new double[n];
        double a0 = 0;
        double a1 = 0;
        double a2 = 0;
        double pinnedSum = 0;
        double pinnedExposure = 0;
        for (int i = 0; i < n; i++) {
            double raw = (a - c * beta[i]) / d[i];
            if (raw <= lower[i] || raw >= cap[i]) {
                w[i] = raw <= lower[i] ? lower[i] : cap[i];
                pinnedSum += w[i];
                pinnedExposure += beta[i] * w[i];
            } else {
                isFree[i] = true;
                a0 += 1 / d[i];
                a1 += beta[i] / d[i];
                a2 += beta[i] * beta[i] / d[i];
            }
        }
        if (a0 == 0) {
            // Every weight pinned: the budget decides feasibility, the KKT check the rest.
            return Math.abs(pinnedSum - 1) <= CLIP_SLACK * n ? w : null;
        }
        double k = 1 + s * a2;
        double level = (1 - pinnedSum + s * a1 * pinnedExposure / k) / (a0 - s * a1 * a1 / k);
        double slope = s * (level * a1 + pinnedExposure) / k;
        for (int i = 0; i < n; i++) {
            if (!isFree[i]) {
                continue;
            }
            double x = (level - slope * beta[i]) / d[i];
            double slackLow = CLIP_SLACK * Math.max(1, Math.abs(lower[i]));
            double slackHigh = CLIP_SLACK * Math.max(1, Math.abs(cap[i]));
            if (!(x >= lower[i] - slackLow && x <= cap[i] + slackHigh)) {
                return null;
            }
            w[i] = Math.max(lower[i], Math.min(cap[i], x));
        }
        return w;
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
