package dev.sigmawalk.engine.evidence;

import java.util.Objects;

/**
 * The column space of one residual regression's regressors Z (L rows, k columns, intercept
 * included when the regression has one), kept as an orthonormal basis Q (L×k, Q'Q = I), so that
 * the projection is P = QQ' and the residual maker M = I - QQ' (Method §8, §11). Built by modified
 * Gram-Schmidt with one re-orthogonalisation pass ("twice is enough", Giraitis &amp; Parlett;
 * common practice), which keeps Q'Q within rounding of I for well-conditioned Z.
 *
 * <p>Edge cases: Z must have 1 &lt;= k &lt; L columns of L finite values; a column that is (up to
 * 1e-10 of its norm) a combination of the columns before it is rejected, since the regression
 * would then not have k regressors.
 */
public final class RegressorSpace {
    /** A column whose part outside the earlier columns is below this share of its norm is dependent. */
    static final double DEPENDENT = 1e-10;

    private final int length;
    private final double[][] basis;

    private RegressorSpace(int length, double[][] basis) {
        this.length = length;
        this.basis = basis;
    }

    /**
     * @param columns the k regressor columns, each of length L (for the single-index residuals:
     *        a column of ones and the market's excess returns)
     */
    public static RegressorSpace of(double[][] columns) {
        Objects.requireNonNull(columns, "columns");
        if (!(columns.length >= 1)) {
            throw new IllegalArgumentException("a regression needs >= 1 regressor column");
        }
        int length = columns[0].length;
        if (!(columns.length < length)) {
            throw new IllegalArgumentException(columns.length + " regressors need more than " + columns.length
                    + " rows, got " + length);
        }
        double[][] q = new double[columns.length][];
        for (int c = 0; c < columns.length; c++) {
            SeriesChecks.requireFinite("regressor column " + c, columns[c], 2);
            if (columns[c].length != length) {
                throw new IllegalArgumentException("regressor column " + c + " has " + columns[c].length
                        + " rows; column 0 has " + length);
            }
            double[] v = columns[c].clone();
            double before = norm(v);
            for (int pass = 0; pass < 2; pass++) {
                for (int p = 0; p < c; p++) {
                    double dot = dot(q[p], v);
                    for (int t = 0; t < length; t++) {
                        v[t] -= dot * q[p][t];
                    }
                }
            }
            double after = norm(v);
            if (!(after > DEPENDENT * before)) {
                throw new IllegalArgumentException("regressor column " + c
                        + " is a combination of the columns before it (or zero); the regressors must be independent");
            }
            for (int t = 0; t < length; t++) {
                v[t] /= after;
            }
            q[c] = v;
        }
        return new RegressorSpace(length, q);
    }

    /** The intercept-and-market regression of the single-index residuals (k = 2). */
    public static RegressorSpace interceptAnd(double[] market) {
        double[] ones = new double[market.length];
        java.util.Arrays.fill(ones, 1.0);
        return of(new double[][] {ones, market});
    }

    /** L. */
    public int length() {
        return length;
    }

    /** k, the number of regressors. */
    public int regressors() {
        return basis.length;
    }

    /** The least-squares residual M y = y - Q(Q'y) of a series y of L values. */
    public double[] residual(double[] y) {
        if (y.length != length) {
            throw new IllegalArgumentException("series of " + y.length + " values for a regression over " + length + " rows");
        }
        double[] e = y.clone();
        for (double[] q : basis) {
            double dot = dot(q, y);
            for (int t = 0; t < length; t++) {
                e[t] -= dot * q[t];
            }
        }
        return e;
    }

    /** Q_i' Q_j (k_i × k_j), the cosines between the two column spaces' bases. */
    double[][] cross(RegressorSpace other) {
        if (other.length != length) {
            throw new IllegalArgumentException("regressions over " + length + " and " + other.length
                    + " rows cannot be paired");
        }
        double[][] c = new double[basis.length][other.basis.length];
        for (int a = 0; a < basis.length; a++) {
            for (int b = 0; b < other.basis.length; b++) {
                c[a][b] = dot(basis[a], other.basis[b]);
            }
        }
        return c;
    }

    private static double dot(double[] x, double[] y) {
        double s = 0;
        for (int t = 0; t < x.length; t++) {
            s += x[t] * y[t];
        }
        return s;
    }

    private static double norm(double[] x) {
        return Math.sqrt(dot(x, x));
    }
}
