package dev.sigmawalk.engine.moments;

/**
 * The upper triangle of a sum of outer products, C += Σ_t u_t v_t', for row-major T×n blocks
 * U and V: C_ij += Σ_t U_ti V_tj for j ≥ i. With U = V this is the cross-product matrix X'X of a
 * window; with U = −V it removes rows from one.
 *
 * <p>Every entry is summed in row order with one fused multiply-add a term,
 * c ← fma(U_ti, V_tj, c) for t = 0, 1, ..., T−1, starting from the entry's value on entry. That
 * order does not depend on how the work is cut up, so the result is bit for bit that of the plain
 * triple loop with {@link Math#fma}, on any machine, whichever compiler tier runs the code.
 *
 * <p>The work is cut into tiles of C of {@value #TILE_ROWS} rows by {@value #TILE_COLUMNS}
 * columns. A tile is copied into rows of its own (128 KiB, the core's L2 holds it) and every row
 * of the block passes over it, four rows of V at a time (four multiply-adds per load and store of
 * C), from four packed copies of the V segment (8 KiB, in L1). The inner loop indexes separate
 * arrays with one unshifted index: that is the shape the JIT's auto-vectoriser turns into SIMD
 * fused multiply-adds under the default flags (a loop reading several rows of one array at
 * different offsets, or more than four terms a pass, exceeded the JIT's limits and ran scalar:
 * 2.5 against 8-12 billion multiply-adds a second measured on one core), so no incubator module
 * is needed. Entries below the diagonal are never read or written. Non-finite input propagates as
 * usual in IEEE arithmetic.
 */
public final class CrossProducts {
    /** Rows of C in one tile. */
    static final int TILE_ROWS = 64;
    /** Columns of C in one tile: the tile (128 KiB) stays in L2, four V segments (8 KiB) in L1. */
    static final int TILE_COLUMNS = 256;
    /** Rows of V that one pass over a tile row adds. */
    private static final int DEPTH = 4;

    private CrossProducts() {
    }

    /**
     * C_ij += Σ_{t < rows} U[t*n + i] V[t*n + j] for 0 ≤ i ≤ j < n, summed in the order of t with
     * fused multiply-adds.
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
        if (rows == 0 || n == 0) {
            return;
        }
        int width = Math.min(n, TILE_COLUMNS);
        double[][] tile = new double[Math.min(n, TILE_ROWS)][width];
        double[][] seg = new double[DEPTH][width];
        for (int j0 = 0; j0 < n; j0 += TILE_COLUMNS) {
            int j1 = Math.min(n, j0 + TILE_COLUMNS);
            for (int i0 = 0; i0 < j1; i0 += TILE_ROWS) {
                tile(u, v, rows, n, c, tile, seg, i0, Math.min(i0 + TILE_ROWS, j1), j0, j1);
            }
        }
    }

    /** C_ij += U_i·V_j over one tile i0 ≤ i < i1, max(j0, i) ≤ j < j1. */
    private static void tile(double[] u, double[] v, int rows, int n, double[] c, double[][] tile,
                             double[][] seg, int i0, int i1, int j0, int j1) {
        int w = j1 - j0;
        // Columns left of the diagonal are skipped: in a diagonal tile row i starts at column i.
        int lead = Math.max(0, i0 - j0);
        for (int i = i0; i < i1; i++) {
            int from = Math.max(j0, i) - j0;
            System.arraycopy(c, i * n + j0 + from, tile[i - i0], from, w - from);
        }
        double[] s0 = seg[0];
        double[] s1 = seg[1];
        double[] s2 = seg[2];
        double[] s3 = seg[3];
        int t = 0;
        for (; t + DEPTH <= rows; t += DEPTH) {
            int b0 = t * n;
            int b1 = b0 + n;
            int b2 = b1 + n;
            int b3 = b2 + n;
            System.arraycopy(v, b0 + j0 + lead, s0, lead, w - lead);
            System.arraycopy(v, b1 + j0 + lead, s1, lead, w - lead);
            System.arraycopy(v, b2 + j0 + lead, s2, lead, w - lead);
            System.arraycopy(v, b3 + j0 + lead, s3, lead, w - lead);
            for (int i = i0; i < i1; i++) {
                fma4(tile[i - i0], s0, s1, s2, s3, Math.max(j0, i) - j0, w,
                        u[b0 + i], u[b1 + i], u[b2 + i], u[b3 + i]);
            }
        }
        if (t + 2 <= rows) {
            int b0 = t * n;
            int b1 = b0 + n;
            System.arraycopy(v, b0 + j0 + lead, s0, lead, w - lead);
            System.arraycopy(v, b1 + j0 + lead, s1, lead, w - lead);
            for (int i = i0; i < i1; i++) {
                fma2(tile[i - i0], s0, s1, Math.max(j0, i) - j0, w, u[b0 + i], u[b1 + i]);
            }
            t += 2;
        }
        if (t < rows) {
            int b = t * n;
            System.arraycopy(v, b + j0 + lead, s0, lead, w - lead);
            for (int i = i0; i < i1; i++) {
                fma1(tile[i - i0], s0, Math.max(j0, i) - j0, w, u[b + i]);
            }
        }
        for (int i = i0; i < i1; i++) {
            int from = Math.max(j0, i) - j0;
            System.arraycopy(tile[i - i0], from, c, i * n + j0 + from, w - from);
        }
    }

    /** r_k ← fma(p3, s3_k, fma(p2, s2_k, fma(p1, s1_k, fma(p0, s0_k, r_k)))) for from ≤ k < to. */
    private static void fma4(double[] r, double[] s0, double[] s1, double[] s2, double[] s3,
                             int from, int to, double p0, double p1, double p2, double p3) {
        for (int k = from; k < to; k++) {
            r[k] = Math.fma(p3, s3[k], Math.fma(p2, s2[k], Math.fma(p1, s1[k], Math.fma(p0, s0[k], r[k]))));
        }
    }

    /** r_k ← fma(p1, s1_k, fma(p0, s0_k, r_k)) for from ≤ k < to. */
    private static void fma2(double[] r, double[] s0, double[] s1, int from, int to, double p0, double p1) {
        for (int k = from; k < to; k++) {
            r[k] = Math.fma(p1, s1[k], Math.fma(p0, s0[k], r[k]));
        }
    }

    /** r_k ← fma(p, s_k, r_k) for from ≤ k < to. */
    private static void fma1(double[] r, double[] s, int from, int to, double p) {
        for (int k = from; k < to; k++) {
            r[k] = Math.fma(p, s[k], r[k]);
        }
    }
}
