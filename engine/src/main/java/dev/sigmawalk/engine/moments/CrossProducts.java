package dev.sigmawalk.engine.moments;

/**
 * The upper triangle of a sum of outer products, C += Σ_t u_t v_t', for row-major T×n blocks
 * U and V: C_ij += Σ_t U_ti V_tj for j ≥ i. With U = V this is the cross-product matrix X'X of a
 * window; with U = −V it removes rows from one.
 *
 * <p>The loop is cache-blocked: C is cut into tiles of {@value #TILE_ROWS} rows by
 * {@value #TILE_COLUMNS} columns that stay in the core's cache while every row of the block
 * passes over them, four rows at a time (four products per load and store of C). Each tile row
 * is an axpy over contiguous memory, a loop shape the JIT compiles to SIMD instructions, so no
 * incubator module is needed. Entries below the diagonal are never read or written.
 *
 * <p>The summation order differs from a plain loop over t, so results agree with one to
 * rounding, not bit for bit; they are the same on every run and every machine with the same JIT.
 * Non-finite input propagates as usual in IEEE arithmetic.
 */
public final class CrossProducts {
    /** Rows of C in one tile. */
    static final int TILE_ROWS = 16;
    /** Columns of C in one tile: four row segments of V (16 KiB) plus a tile row fit in L1. */
    static final int TILE_COLUMNS = 512;

    private CrossProducts() {
    }

    /**
     * C_ij += Σ_{t < rows} U[t*n + i] V[t*n + j] for 0 ≤ i ≤ j < n.
     *
     * @param u T×n row-major, at least rows*n long
     * @param v T×n row-major, at least rows*n long
     * @param rows T, the number of rows to use
     * @param n columns
     * @param c n×n row-major; only the upper triangle (j ≥ i) is updated
     */
    public static void accumulate(double[] u, double[] v, int rows, int n, double[] c) {
        if (!(rows >= 0 && n >= 0)) {
            throw new IllegalArgumentException("rows (" + rows + ") and n (" + n + ") must be >= 0");
        }
        if (u.length < rows * n || v.length < rows * n || c.length < n * n) {
            throw new IllegalArgumentException("arrays too short for rows = " + rows + ", n = " + n
                    + ": u " + u.length + ", v " + v.length + ", c " + c.length);
        }
        double[] seg = new double[4 * TILE_COLUMNS];
        for (int j0 = 0; j0 < n; j0 += TILE_COLUMNS) {
            int j1 = Math.min(n, j0 + TILE_COLUMNS);
            for (int i0 = 0; i0 < j1; i0 += TILE_ROWS) {
                tile(u, v, rows, n, c, seg, i0, Math.min(i0 + TILE_ROWS, j1), j0, j1);
            }
        }
    }

    /** C_ij += U_i·V_j over one tile i0 ≤ i < i1, max(j0, i) ≤ j < j1. */
    private static void tile(double[] u, double[] v, int rows, int n, double[] c, double[] seg,
                             int i0, int i1, int j0, int j1) {
        int w = j1 - j0;
        int t = 0;
        for (; t + 4 <= rows; t += 4) {
            int b0 = t * n;
            int b1 = b0 + n;
            int b2 = b1 + n;
            int b3 = b2 + n;
            // Packed copies let the inner loop read four unit-stride streams from one small array.
            System.arraycopy(v, b0 + j0, seg, 0, w);
            System.arraycopy(v, b1 + j0, seg, TILE_COLUMNS, w);
            System.arraycopy(v, b2 + j0, seg, 2 * TILE_COLUMNS, w);
            System.arraycopy(v, b3 + j0, seg, 3 * TILE_COLUMNS, w);
            for (int i = i0; i < i1; i++) {
                int from = Math.max(j0, i) - j0;
                axpy4(c, i * n + j0, seg, from, w, u[b0 + i], u[b1 + i], u[b2 + i], u[b3 + i]);
            }
        }
        for (; t < rows; t++) {
            int b = t * n;
            for (int i = i0; i < i1; i++) {
                double p = u[b + i];
                int row = i * n;
                for (int j = Math.max(j0, i); j < j1; j++) {
                    c[row + j] += p * v[b + j];
                }
            }
        }
    }

    private static void axpy4(double[] c, int row, double[] seg, int from, int to,
                              double p, double q, double r, double s) {
        for (int k = from; k < to; k++) {
            c[row + k] += p * seg[k] + q * seg[TILE_COLUMNS + k] + r * seg[2 * TILE_COLUMNS + k]
                    + s * seg[3 * TILE_COLUMNS + k];
        }
    }
}
