package dev.sigmawalk.strategies.optimize;

/**
 * Gaussian elimination with partial pivoting for one small dense square system (for example a
 * KKT matrix, which is symmetric but indefinite, so Cholesky does not apply). O(m³).
 */
final class DenseSystem {
    /** A pivot below this fraction of the largest entry of A marks the system as singular. */
    private static final double SINGULAR_PIVOT = 1e-14;

    private DenseSystem() {
    }

    /**
     * Solves A x = b.
     *
     * @param a row-major m×m, overwritten
     * @param b length m, overwritten by x
     * @return false when A is singular to working precision (b is then meaningless)
     */
    static boolean solveInPlace(double[] a, double[] b, int m) {
        double largest = 0;
        for (double v : a) {
            largest = Math.max(largest, Math.abs(v));
        }
        double floor = SINGULAR_PIVOT * largest;
        for (int col = 0; col < m; col++) {
            int pivot = col;
            for (int r = col + 1; r < m; r++) {
                if (Math.abs(a[r * m + col]) > Math.abs(a[pivot * m + col])) {
                    pivot = r;
                }
            }
            if (!(Math.abs(a[pivot * m + col]) > floor)) {
                return false;
            }
            if (pivot != col) {
                swapRows(a, b, m, pivot, col);
            }
            double diagonal = a[col * m + col];
            for (int r = col + 1; r < m; r++) {
                double factor = a[r * m + col] / diagonal;
                if (factor == 0) {
                    continue;
                }
                for (int j = col; j < m; j++) {
                    a[r * m + j] -= factor * a[col * m + j];
                }
                b[r] -= factor * b[col];
            }
        }
        for (int r = m - 1; r >= 0; r--) {
            double v = b[r];
            for (int j = r + 1; j < m; j++) {
                v -= a[r * m + j] * b[j];
            }
            b[r] = v / a[r * m + r];
        }
        return true;
    }

    private static void swapRows(double[] a, double[] b, int m, int i, int j) {
        for (int k = 0; k < m; k++) {
            double t = a[i * m + k];
            a[i * m + k] = a[j * m + k];
            a[j * m + k] = t;
        }
        double t = b[i];
        b[i] = b[j];
        b[j] = t;
    }
}
