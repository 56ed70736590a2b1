package dev.sigmawalk.strategies.optimize;

import java.util.Arrays;
import java.util.OptionalDouble;

/**
 * Solves S(t) = Σ_i clamp((t − u_i)/d_i, lower_i, upper_i) = target for the level t, with all
 * d_i &gt; 0. S is continuous, piecewise linear and non-decreasing, with breakpoints
 * u_i + d_i·lower_i (weight i leaves its lower bound) and u_i + d_i·upper_i (it reaches its upper
 * bound). Sorting the 2n breakpoints and a binary search over them (S evaluated in O(n) per
 * probe) finds the piece that holds the target in O(n log n); t is then computed from a fresh sum over that piece's partition, not from running
 * sums, to avoid accumulated cancellation.
 *
 * <p>Used for the Euclidean projection onto {Σ w = 1, lower ≤ w ≤ upper} (u = −x, d = 1) and for
 * the single-factor minimum-variance level (u_i = c β_i).
 */
final class LevelSolver {
    private LevelSolver() {
    }

    /**
     * @return t, or empty when the target lies outside the range of S (the bounds cannot reach it)
     */
    static OptionalDouble solve(double[] u, double[] d, double[] lower, double[] upper, double target) {
        int n = u.length;
        double[] points = new double[2 * n];
        int count = 0;
        for (int i = 0; i < n; i++) {
            if (Double.isFinite(lower[i])) {
                points[count++] = u[i] + d[i] * lower[i];
            }
            if (Double.isFinite(upper[i])) {
                points[count++] = u[i] + d[i] * upper[i];
            }
        }
        points = Arrays.copyOf(points, count);
        Arrays.sort(points);
        if (count == 0) {
            return solveOnPiece(u, d, lower, upper, target, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY);
        }
        // Binary search for the first breakpoint where S reaches the target: O(n) per probe.
        int lo = 0;
        int hi = count;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (sum(u, d, lower, upper, points[mid]) >= target) {
                hi = mid;
            } else {
                lo = mid + 1;
            }
        }
        if (lo < count && sum(u, d, lower, upper, points[lo]) == target) {
            return OptionalDouble.of(points[lo]);
        }
        double left = lo == 0 ? Double.NEGATIVE_INFINITY : points[lo - 1];
        double right = lo == count ? Double.POSITIVE_INFINITY : points[lo];
        return solveOnPiece(u, d, lower, upper, target, left, right);
    }

    /** S(t). */
    static double sum(double[] u, double[] d, double[] lower, double[] upper, double t) {
        double s = 0;
        for (int i = 0; i < u.length; i++) {
            s += Math.max(lower[i], Math.min(upper[i], (t - u[i]) / d[i]));
        }
        return s;
    }

    /** The level on one linear piece, or empty when the target is not reached there. */
    private static OptionalDouble solveOnPiece(double[] u, double[] d, double[] lower, double[] upper,
                                               double target, double left, double right) {
        double probe = midpoint(left, right);
        double constant = 0;
        double slope = 0;
        for (int i = 0; i < u.length; i++) {
            double raw = (probe - u[i]) / d[i];
            if (raw <= lower[i]) {
                constant += lower[i];
            } else if (raw >= upper[i]) {
                constant += upper[i];
            } else {
                constant -= u[i] / d[i];
                slope += 1 / d[i];
            }
        }
        if (!Double.isFinite(constant)) {
            return OptionalDouble.empty();
        }
        if (slope == 0) {
            // A flat piece between two breakpoints is bracketed (S(left) < target <= S(right)), so
            // S equals the target on it up to rounding (for example one weight at the cap that
            // the budget implies, all others at their lower bounds); any point of it will do.
            boolean bracketed = Double.isFinite(left) && Double.isFinite(right);
            return bracketed || constant == target ? OptionalDouble.of(probe) : OptionalDouble.empty();
        }
        double t = (target - constant) / slope;
        // The binary search brackets the root, S(left) < target <= S(right); a level computed just
        // outside the piece (cancellation in the constant when the target sits at a breakpoint)
        // is rounding, so it is clamped to the piece.
        return OptionalDouble.of(Math.max(left, Math.min(right, t)));
    }

    private static double midpoint(double left, double right) {
        if (left == Double.NEGATIVE_INFINITY && right == Double.POSITIVE_INFINITY) {
            return 0;
        }
        if (left == Double.NEGATIVE_INFINITY) {
            return right - 1 - Math.abs(right);
        }
        if (right == Double.POSITIVE_INFINITY) {
            return left + 1 + Math.abs(left);
        }
        return left + (right - left) / 2;
    }
}
