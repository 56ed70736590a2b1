package dev.sigmawalk.strategies.risk;

import org.ojalgo.matrix.decomposition.Eigenvalue;
import org.ojalgo.matrix.store.MatrixStore;
import org.ojalgo.matrix.store.R064Store;

/**
 * The m largest eigenpairs of a window's sample covariance S = X̃'X̃/(L-1) (X̃ the demeaned L×n
 * excess returns), largest first. With n ≤ L the n×n matrix S is decomposed; with n > L the L×L
 * matrix G = X̃X̃'/(L-1), which has the same non-zero eigenvalues, and each eigenvector of S is
 * u = X̃'v / √((L-1) μ) for G v = μ v (so S u = μ u and |u| = 1). That costs O(L² n + L³)
 * instead of O(n³). Symmetric decomposition by ojAlgo ({@code Eigenvalue.R064}, tridiagonal QR).
 *
 * <p>Eigenvectors are defined up to sign; every use here (V Λ V', U diag(d) U') is sign-free.
 */
final class SampleEigen {
    private final int n;
    private final int m;
    private final double[] values;
    private final double[] vectors;

    private SampleEigen(int n, int m, double[] values, double[] vectors) {
        this.n = n;
        this.m = m;
        this.values = values;
        this.vectors = vectors;
    }

    /**
     * The {@code count} largest eigenpairs of S.
     *
     * @param count m ≤ min(n, L-1): beyond that S has only null eigenvalues
     * @throws IllegalArgumentException when count is out of range
     * @throws ArithmeticException when the decomposition fails or yields a non-finite value
     */
    static SampleEigen largest(CentredWindow window, int count) {
        int n = window.assets();
        int len = window.length();
        if (!(count >= 0 && count <= Math.min(n, len - 1))) {
            throw new IllegalArgumentException("eigenpairs wanted (" + count + ") must be in [0, min(n, L-1)] = [0, "
                    + Math.min(n, len - 1) + "]");
        }
        return n <= len ? direct(window, count) : dual(window, count);
    }

    private static SampleEigen direct(CentredWindow window, int count) {
        int n = window.assets();
        double[] s = window.moments().covariance();
        R064Store matrix = R064Store.FACTORY.make(n, n);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                matrix.set(i, j, s[i * n + j]);
            }
        }
        Decomposed d = decompose(matrix, n);
        double[] values = new double[count];
        double[] vectors = new double[n * count];
        for (int a = 0; a < count; a++) {
            int col = d.order[a];
            values[a] = d.values[col];
            for (int i = 0; i < n; i++) {
                vectors[i * count + a] = d.vectors.doubleValue(i, col);
            }
        }
        return checked(new SampleEigen(n, count, values, vectors));
    }

    private static SampleEigen dual(CentredWindow window, int count) {
        int n = window.assets();
        int len = window.length();
        double[] x = new double[len * n];
        double[] row = new double[n];
        for (int t = 0; t < len; t++) {
            window.row(t, row);
            System.arraycopy(row, 0, x, t * n, n);
        }
        double div = len - 1.0;
        R064Store gram = R064Store.FACTORY.make(len, len);
        for (int t = 0; t < len; t++) {
            for (int u = t; u < len; u++) {
                double v = 0;
                for (int i = 0; i < n; i++) {
                    v += x[t * n + i] * x[u * n + i];
                }
                gram.set(t, u, v / div);
                gram.set(u, t, v / div);
            }
        }
        Decomposed d = decompose(gram, len);
        double[] values = new double[count];
        double[] vectors = new double[n * count];
        for (int a = 0; a < count; a++) {
            int col = d.order[a];
            double mu = d.values[col];
            if (!(mu > 0)) {
                throw new ArithmeticException("sample eigenvalue " + (a + 1) + " (" + mu + ") must be > 0");
            }
            values[a] = mu;
            double scale = 1.0 / Math.sqrt(div * mu);
            for (int t = 0; t < len; t++) {
                double vt = d.vectors.doubleValue(t, col) * scale;
                for (int i = 0; i < n; i++) {
                    vectors[i * count + a] += x[t * n + i] * vt;
                }
            }
        }
        return checked(new SampleEigen(n, count, values, vectors));
    }

    /** The decomposition, with the column order that sorts the eigenvalues descending. */
    private record Decomposed(double[] values, MatrixStore<Double> vectors, int[] order) {
    }

    private static Decomposed decompose(R064Store matrix, int size) {
        Eigenvalue<Double> eigen = Eigenvalue.R064.make(matrix, true);
        if (!eigen.decompose(matrix)) {
            throw new ArithmeticException("symmetric eigendecomposition of a " + size + "x" + size + " matrix failed");
        }
        MatrixStore<Double> diagonal = eigen.getD();
        double[] values = new double[size];
        Integer[] order = new Integer[size];
        for (int a = 0; a < size; a++) {
            values[a] = diagonal.doubleValue(a, a);
            order[a] = a;
        }
        // Sort explicitly (stable, ties by column) rather than rely on the library's ordering.
        java.util.Arrays.sort(order, (p, q) -> p.equals(q) ? 0
                : values[p] != values[q] ? Double.compare(values[q], values[p]) : Integer.compare(p, q));
        int[] sorted = new int[size];
        for (int a = 0; a < size; a++) {
            sorted[a] = order[a];
        }
        return new Decomposed(values, eigen.getV(), sorted);
    }

    private static SampleEigen checked(SampleEigen e) {
        for (double v : e.values) {
            if (!Double.isFinite(v)) {
                throw new ArithmeticException("sample eigenvalue (" + v + ") must be finite");
            }
        }
        for (double v : e.vectors) {
            if (!Double.isFinite(v)) {
                throw new ArithmeticException("sample eigenvector entry (" + v + ") must be finite");
            }
        }
        return e;
    }

    /** n. */
    int assets() {
        return n;
    }

    /** m, the number of pairs kept. */
    int count() {
        return m;
    }

    /** λ_a, a = 0 the largest. */
    double value(int a) {
        return values[a];
    }

    /** The eigenvalues, largest first (read-only). */
    double[] values() {
        return values;
    }

    /** V, n×m row-major: entry i of eigenvector a at {@code i*m + a} (read-only). */
    double[] vectors() {
        return vectors;
    }
}
