package dev.sigmawalk.strategies.optimize;

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
     * Exact solution for a fixed partition: minimise y'Σy over z = (y_F, κ) with y_B = κ b_B,
     * subject to μ'y = 1 and 1'y = κ, from the KKT system [2M A'; A 0][z; η] = [0; r] with
     * M = P'ΣP (P maps z to y). Returns w = y/κ with pinned weights exactly on their bounds, or
     * null when the system is singular or κ ≤ 0.
     */
    static double[] solve(double[] sigma, double[] mu, double[] lower, double[] upper, BoundSide[] sides) {
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
        if (k == 0) {
            return vertex(b);
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
