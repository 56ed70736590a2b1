package dev.sigmawalk.strategies.optimize;

import java.util.Arrays;
import org.ojalgo.matrix.store.R064Store;
import org.ojalgo.optimisation.Optimisation;
import org.ojalgo.optimisation.convex.ConvexSolver;

/**
 * The max-Sharpe program after the change of variables y = κw, handed to ojAlgo 57.1.0's
 * {@code ConvexSolver} (its Builder minimises ½x'Qx − C'x; here x = (y, κ), Q = 2Σ on the y block
 * and 0 for κ, C = 0):
 * <pre>
 *   minimise y'Σy   s.t.   μ'y = 1,   1'y − κ = 0,   y_i − upper_i κ ≤ 0,   lower_i κ − y_i ≤ 0,   −κ ≤ 0.
 * </pre>
 * Only state OPTIMAL is accepted: a time-limited or approximate state can be far from the optimum.
 */
final class TransformedProgram {
    private TransformedProgram() {
    }

    /** y = (y_1..y_n, κ) from ojAlgo, returned as w = y/κ; null unless OPTIMAL with κ &gt; 0. */
    static double[] solve(double[] sigma, double[] mu, double[] lower, double[] upper) {
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

}
