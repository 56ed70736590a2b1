package dev.sigmawalk.strategies.optimize;

/**
 * Independent verification of the KKT conditions of
 * minimise ½ w'Qw − c'w s.t. Σ w = 1, lower ≤ w ≤ upper (convex: the conditions are sufficient).
 *
 * <p>With g = Qw − c, w is optimal iff it is feasible and some ν satisfies g_i = ν where
 * lower_i &lt; w_i &lt; upper_i, g_i ≥ ν where w_i = lower_i, and g_i ≤ ν where w_i = upper_i
 * (stationarity with multipliers of the right sign; complementary slackness holds by
 * construction because only weights on a bound carry a multiplier). The check does not trust any
 * partition handed in: it classifies each weight by comparing it with its bounds exactly.
 */
public final class KktCheck {
    private KktCheck() {
    }

    /** The KKT residuals of w for the problem, with the gradient and its scale computed here in O(n²). */
    public static KktReport check(QuadraticProblem problem, double[] w) {
        double[] g = gradient(problem, w);
        return check(w, g, problem.lower(), problem.upper(), scale(problem, w));
    }

    /**
     * The KKT residuals given the gradient g = Qw − c.
     *
     * @param scale divisor of the dual residual, > 0 (for example {@link #scale})
     */
    public static KktReport check(double[] w, double[] g, double[] lower, double[] upper, double scale) {
        double sum = 0;
        double primal = 0;
        double floor = Double.NEGATIVE_INFINITY;
        double ceiling = Double.POSITIVE_INFINITY;
        for (int i = 0; i < w.length; i++) {
            double wi = w[i];
            sum += wi;
            primal = Math.max(primal, Math.max(lower[i] - wi, wi - upper[i]));
            boolean atLower = wi <= lower[i];
            boolean atUpper = wi >= upper[i];
            if (!atLower) {
                floor = Math.max(floor, g[i]);
            }
            if (!atUpper) {
                ceiling = Math.min(ceiling, g[i]);
            }
        }
        primal = Math.max(primal, Math.abs(sum - 1));
        if (!Double.isFinite(sum)) {
            primal = Double.POSITIVE_INFINITY;
        }
        double gap = Math.max(0, floor - ceiling);
        double dual = Double.isNaN(gap) ? Double.POSITIVE_INFINITY : gap / (2 * scale);
        return new KktReport(primal, dual, multiplier(floor, ceiling));
    }

    /**
     * g = Qw − c. Q is symmetric, so Σ_j Q_ij w_j is built from the rows of the non-zero weights
     * (Q_ji w_j, j ascending: the same products in the same order as along row i), in
     * O(n·m) for m non-zero weights instead of O(n²).
     */
    public static double[] gradient(QuadraticProblem problem, double[] w) {
        int n = problem.size();
        double[] q = problem.quadratic();
        double[] c = problem.linear();
        double[] g = new double[n];
        for (int j = 0; j < n; j++) {
            double wj = w[j];
            if (wj == 0) {
                continue;
            }
            int row = j * n;
            for (int i = 0; i < n; i++) {
                g[i] += q[row + i] * wj;
            }
        }
        for (int i = 0; i < n; i++) {
            g[i] -= c[i];
        }
        return g;
    }

    /**
     * max_i (Σ_j |Q_ij w_j| + |c_i|), the size of the gradient's terms; 1 when that is 0. Built
     * from the rows of the non-zero weights, as in {@link #gradient}.
     */
    public static double scale(QuadraticProblem problem, double[] w) {
        int n = problem.size();
        double[] q = problem.quadratic();
        double[] terms = new double[n];
        for (int i = 0; i < n; i++) {
            terms[i] = Math.abs(problem.linear()[i]);
        }
        for (int j = 0; j < n; j++) {
            double wj = w[j];
            if (wj == 0) {
                continue;
            }
            int row = j * n;
            for (int i = 0; i < n; i++) {
                terms[i] += Math.abs(q[row + i] * wj);
            }
        }
        double largest = 0;
        for (int i = 0; i < n; i++) {
            largest = Math.max(largest, terms[i]);
        }
        return largest > 0 && Double.isFinite(largest) ? largest : 1;
    }

    private static double multiplier(double floor, double ceiling) {
        boolean lowFinite = Double.isFinite(floor);
        boolean highFinite = Double.isFinite(ceiling);
        if (lowFinite && highFinite) {
            return floor + (ceiling - floor) / 2;
        }
        if (lowFinite) {
            return floor;
        }
        return highFinite ? ceiling : 0;
    }
}
