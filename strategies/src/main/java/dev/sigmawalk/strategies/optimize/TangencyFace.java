package dev.sigmawalk.strategies.optimize;

import java.util.Arrays;

/**
 * The maximum-Sharpe portfolio on one face of the box: with the weights of a partition pinned
 * (y_B = κ b_B after the change of variables y = κw), the remaining problem in (y_F, κ) has only
 * equality constraints and is solved exactly from its KKT system by {@link DenseSystem}, O(k³).
 */
final class TangencyFace {
    /** How far the pinned weights of a vertex may sum from 1 (rounding of the bound values). */
    private static final double VERTEX_BUDGET_SLACK = 1e-12;

    private TangencyFace() {
    }

    /**
     * The free weights (in index order) and every weight's pinned value b_i (0 for free ones).
     */
    private record Face(int[] free, double[] pinned) {
        static Face of(BoundSide[] sides, double[] lower, double[] upper) {
            int n = sides.length;
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
            return new Face(Arrays.copyOf(free, k), b);
        }
    }

    /**
     * Exact solution for a fixed partition: minimise y'Σy over z = (y_F, κ) with y_B = κ b_B,
     * subject to μ'y = 1 and 1'y = κ, from the KKT system [2M A'; A 0][z; η] = [0; r] with
     * M = P'ΣP (P maps z to y). Returns w = y/κ with pinned weights exactly on their bounds, or
     * null when the system is singular or κ ≤ 0.
     */
    static double[] solve(double[] sigma, double[] mu, double[] lower, double[] upper, BoundSide[] sides) {
        Face face = Face.of(sides, lower, upper);
        int k = face.free().length;
        if (k == 0) {
            return vertex(face.pinned());
        }
        int m = k + 3;
        double[] a = kktMatrix(sigma, mu, face);
        double[] rhs = new double[m];
        rhs[k + 1] = 1;
        if (!DenseSystem.solveInPlace(a, rhs, m) || !(rhs[k] > 0)) {
            return null;
        }
        double[] w = face.pinned().clone();
        for (int r = 0; r < k; r++) {
            w[face.free()[r]] = rhs[r] / rhs[k];
        }
        return w;
    }

    /**
     * The (k+3)×(k+3) KKT matrix, unknowns ordered (y_F, κ, η_μ, η_budget): rows 0..k-1 and k
     * hold 2M and the constraint gradients, rows k+1 and k+2 the constraints μ_F'y_F + κ μ_B'b_B
     * = 1 and 1'y_F + κ (1'b_B − 1) = 0.
     */
    private static double[] kktMatrix(double[] sigma, double[] mu, Face face) {
        int n = mu.length;
        int[] free = face.free();
        double[] b = face.pinned();
        int k = free.length;
        int m = k + 3;
        double[] sigmaB = new double[n];
        double muB = 0;
        double sumB = 0;
        for (int i = 0; i < n; i++) {
            if (b[i] != 0) {
                muB += mu[i] * b[i];
                sumB += b[i];
                for (int j = 0; j < n; j++) {
                    sigmaB[j] += sigma[j * n + i] * b[i];
                }
            }
        }
        double[] a = new double[m * m];
        for (int r = 0; r < k; r++) {
            int i = free[r];
            for (int s = 0; s < k; s++) {
                a[r * m + s] = 2 * sigma[i * n + free[s]];
            }
            setPair(a, m, r, k, 2 * sigmaB[i]);
            setPair(a, m, r, k + 1, mu[i]);
            setPair(a, m, r, k + 2, 1);
        }
        a[k * m + k] = 2 * WorkingSet.dot(b, sigmaB);
        setPair(a, m, k, k + 1, muB);
        setPair(a, m, k, k + 2, sumB - 1);
        return a;
    }

    /** a[r][c] = a[c][r] = v. */
    private static void setPair(double[] a, int m, int r, int c, double v) {
        a[r * m + c] = v;
        a[c * m + r] = v;
    }

    /**
     * With every weight pinned the face is the single point b, which only the budget can rule
     * out (the κ equation degenerates to 0 = 0 there, so the KKT system would be singular).
     */
    private static double[] vertex(double[] b) {
        double total = 0;
        for (double v : b) {
            total += v;
        }
        return Math.abs(total - 1) <= VERTEX_BUDGET_SLACK ? b : null;
    }
}
