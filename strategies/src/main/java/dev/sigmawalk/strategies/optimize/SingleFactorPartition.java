package dev.sigmawalk.strategies.optimize;

import java.util.Arrays;
import java.util.OptionalDouble;

/**
 * The partition search of {@link SingleFactorMinVariance} with bounds: every weight is
 * clamp((a − c β_i)/d_i, lower_i, cap_i), and the search finds the level a and slope c whose
 * partition into lower, free and capped weights reproduces itself. See that class for the
 * derivation and the 2×2 system.
 */
final class SingleFactorPartition {
    /** Bisection steps on c; the interval reaches adjacent doubles long before this. */
    private static final int MAX_BISECTIONS = 200;
    /** Relative slack for a free weight computed just beyond its bound (then clipped). */
    private static final double CLIP_SLACK = 1e-12;
    /** Rounds of the partition iteration before bisection takes over. */
    private static final int MAX_PARTITION_ROUNDS = 50;
    private static final byte LOW = 0;
    private static final byte FREE = 1;
    private static final byte CAPPED = 2;

    /** The two numbers that fix every weight: the level a (= ν) and the slope c = s β'w. */
    record Levels(double a, double c) {
    }

    private SingleFactorPartition() {
    }

    /**
     * Partition iteration (a semismooth Newton method on the piecewise-linear KKT map): from the
     * all-free (a, c), classify each weight by its clamp, solve the 2×2 system for that
     * partition, and repeat until the partition reproduces itself, which is then exactly the KKT
     * partition. O(n) per round; usually a few rounds. Returns (a, c), or null when it has not
     * settled after a fixed number of rounds (it can cycle; bisection then decides).
     */
    static Levels iterate(double s, double[] beta, double[] d, double[] lower, double[] cap) {
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
    static Levels bisect(double s, double[] beta, double[] d, double[] lower, double[] cap) {
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
    static double[] weights(double s, double[] beta, double[] d, double[] lower, double[] cap, Levels levels) {
        double a = levels.a();
        double c = levels.c();
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
}
