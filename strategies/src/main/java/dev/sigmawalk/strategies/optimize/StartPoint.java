package dev.sigmawalk.strategies.optimize;

import java.util.Arrays;
import java.util.Comparator;
import java.util.OptionalDouble;

/**
 * Feasible starting points for the active-set solver, written into a {@link WorkingSet} with a
 * complete factor of its free block.
 */
final class StartPoint {
    private StartPoint() {
    }

    /**
     * Cold start at a vertex: every weight at a finite bound (lower preferred; 0 when both are
     * infinite), then weights are moved toward their other bound in order of their gradient
     * (cheapest first; ties, such as the all-zero gradient of minimum variance at w = 0, by the
     * diagonal Q_ii, lowest first) until the budget holds. The weight that absorbs the remainder is the one
     * free weight (plus any weight with no finite bound), so the first factor is tiny and
     * always positive definite.
     *
     * @return false when the weights with no finite bound already make the free block singular
     */
    static boolean cold(WorkingSet s, double singularPivot) {
        QuadraticProblem p = s.problem;
        double[] lo = p.lower();
        double[] hi = p.upper();
        for (int i = 0; i < s.n; i++) {
            if (Double.isFinite(lo[i])) {
                s.w[i] = lo[i];
                s.side[i] = BoundSide.LOWER;
            } else if (Double.isFinite(hi[i])) {
                s.w[i] = hi[i];
                s.side[i] = BoundSide.UPPER;
            } else {
                s.w[i] = 0;
                s.side[i] = BoundSide.FREE;
            }
        }
        s.recomputeGradient();
        double remainder = 1 - WorkingSet.sum(s.w, s.n);
        int last = remainder >= 0 ? raise(s, remainder) : lower(s, -remainder);
        if (!hasFree(s)) {
            s.side[last >= 0 ? last : firstMovable(s)] = BoundSide.FREE;
        }
        s.indexFreeWeights();
        s.recomputeGradient();
        return s.refactor(singularPivot) < 0;
    }

    /** Raises weights toward their upper bound, lowest gradient first; returns the last one moved or −1. */
    private static int raise(WorkingSet s, double amount) {
        Integer[] order = order(s, Comparator.comparingDouble((Integer i) -> s.g[i])
                .thenComparingDouble(i -> s.q[i * s.n + i]));
        double left = amount;
        int last = -1;
        for (int i : order) {
            if (left <= 0) {
                break;
            }
            double room = s.problem.upper()[i] - s.w[i];
            if (!(room > 0)) {
                continue;
            }
            last = i;
            if (room >= left) {
                s.w[i] += left;
                s.side[i] = BoundSide.FREE;
                left = 0;
            } else {
                s.w[i] = s.problem.upper()[i];
                s.side[i] = BoundSide.UPPER;
                left -= room;
            }
        }
        return last;
    }

    /** Lowers weights toward their lower bound, highest gradient first; returns the last one moved or −1. */
    private static int lower(WorkingSet s, double amount) {
        Integer[] order = order(s, Comparator.comparingDouble((Integer i) -> -s.g[i])
                .thenComparingDouble(i -> s.q[i * s.n + i]));
        double left = amount;
        int last = -1;
        for (int i : order) {
            if (left <= 0) {
                break;
            }
            double room = s.w[i] - s.problem.lower()[i];
            if (!(room > 0)) {
                continue;
            }
            last = i;
            if (room >= left) {
                s.w[i] -= left;
                s.side[i] = BoundSide.FREE;
                left = 0;
            } else {
                s.w[i] = s.problem.lower()[i];
                s.side[i] = BoundSide.LOWER;
                left -= room;
            }
        }
        return last;
    }

    /** Indices sorted by the comparator, ties by index, so the start is deterministic. */
    private static Integer[] order(WorkingSet s, Comparator<Integer> byKey) {
        Integer[] order = new Integer[s.n];
        for (int i = 0; i < s.n; i++) {
            order[i] = i;
        }
        Arrays.sort(order, byKey.thenComparingInt(i -> i));
        return order;
    }

    private static boolean hasFree(WorkingSet s) {
        for (BoundSide b : s.side) {
            if (b == BoundSide.FREE) {
                return true;
            }
        }
        return false;
    }

    /** The first weight whose bounds differ (0 when all are pinned). */
    private static int firstMovable(WorkingSet s) {
        for (int i = 0; i < s.n; i++) {
            if (s.problem.lower()[i] < s.problem.upper()[i]) {
                return i;
            }
        }
        return 0;
    }

    /**
     * Warm start from a previous partition: pin the guessed bound weights, solve the
     * equality-constrained subproblem for the rest, and if that point breaks a bound, project it
     * onto {Σ w = 1, lower ≤ w ≤ upper} (Euclidean projection, clamp(x + t)) and take the
     * partition the projection produces.
     *
     * @return false when the guess cannot be used (the caller then starts cold)
     */
    static boolean warm(WorkingSet s, BoundSide[] guess, double singularPivot) {
        if (guess.length != s.n) {
            return false;
        }
        double[] lo = s.problem.lower();
        double[] hi = s.problem.upper();
        for (int i = 0; i < s.n; i++) {
            BoundSide b = guess[i];
            boolean lowerOk = b == BoundSide.LOWER && Double.isFinite(lo[i]);
            boolean upperOk = b == BoundSide.UPPER && Double.isFinite(hi[i]);
            s.side[i] = lowerOk ? BoundSide.LOWER : upperOk ? BoundSide.UPPER : BoundSide.FREE;
            s.w[i] = lowerOk ? lo[i] : upperOk ? hi[i] : 0;
        }
        s.indexFreeWeights();
        if (s.freeCount == 0 || s.refactor(singularPivot) >= 0) {
            return false;
        }
        double[] x = s.subproblemMinimiser();
        boolean inside = true;
        for (int r = 0; r < s.freeCount; r++) {
            int i = s.free[r];
            s.w[i] = x[r];
            inside &= x[r] >= lo[i] && x[r] <= hi[i];
        }
        if (!inside && !project(s, singularPivot)) {
            return false;
        }
        s.recomputeGradient();
        return true;
    }

    /** Replaces w by its projection onto the feasible set and refactors for the new partition. */
    private static boolean project(WorkingSet s, double singularPivot) {
        double[] lo = s.problem.lower();
        double[] hi = s.problem.upper();
        double[] u = new double[s.n];
        double[] unit = new double[s.n];
        for (int i = 0; i < s.n; i++) {
            u[i] = -s.w[i];
            unit[i] = 1;
        }
        OptionalDouble level = LevelSolver.solve(u, unit, lo, hi, 1);
        if (level.isEmpty()) {
            return false;
        }
        double t = level.getAsDouble();
        for (int i = 0; i < s.n; i++) {
            double v = Math.max(lo[i], Math.min(hi[i], s.w[i] + t));
            s.w[i] = v;
            s.side[i] = v == lo[i] ? BoundSide.LOWER : v == hi[i] ? BoundSide.UPPER : BoundSide.FREE;
        }
        s.indexFreeWeights();
        return s.freeCount > 0 && s.refactor(singularPivot) < 0;
    }
}
