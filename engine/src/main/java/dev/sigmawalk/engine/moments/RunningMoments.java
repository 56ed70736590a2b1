package dev.sigmawalk.engine.moments;

import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.model.WindowMoments;
import java.util.Arrays;

/**
 * Sums of one window length's excess returns over every panel column, moved forward from one
 * rebalance to the next by adding the new rows and removing the old ones: k·N² work a move of k
 * rows instead of L·N² for a fresh window.
 *
 * <p>Kept in shifted form, with a per-column shift c (the column means of the window at the last
 * full computation): s = Σ_t d_t and D = Σ_t d_t d_t' (upper triangle) with d_t = x_t − c, the
 * market as the last column. The moments follow from
 * S = (D − s s'/L) / (L − 1) and x̄ = c + s/L. Because c stays close to x̄, s/L is small and
 * the subtraction does not cancel catastrophically, which the textbook one-pass form
 * Σx x' − L x̄ x̄' does when means are large against standard deviations.
 *
 * <p>Rounding error grows with each move, so the sums are rebuilt from the window's rows (with a
 * fresh shift) once the rows slid since the last rebuild would exceed a budget of R rows (by
 * default R = L), when a move is longer than half the window (then the rebuild's L rows cost less
 * than the move's 2·k), and when a column's mean has wandered so far from its shift that s_i²/L
 * exceeds half of D_ii (the point where the subtraction starts to lose more than one bit).
 *
 * <p>Why R = L is enough: every update of D_ij is one fused multiply-add (see
 * {@link CrossProducts}), which adds a rounding error of at most u·|result| with u = 2⁻⁵³. Let
 * B_ij = Σ_t |d_ti d_tj| over the window. A fresh build sums L terms, error at most about
 * L·u·B_ij (the recursive-summation bound, Higham, Accuracy and Stability of Numerical
 * Algorithms, 2nd ed., §4.2, from memory). A move of k rows makes 2k updates whose partial sums
 * stay below B_ij plus the move's own rows, about (1 + 2k/L)·B_ij for rows of one scale, so R slid
 * rows add at most 2R·u·(1 + 2k/L)·B_ij. With R ≤ L and 2k ≤ L the sums carry at most about
 * three (never more than five) times the bound of a fresh build, two or three bits of 53; the
 * shift keeps B_ii of the order of D_ii, so the bound is relative to the entry's own size.
 * Rebuilding costs L rows of kernel work against the 2R rows of the slides before it, at most half
 * their cost, where a rebuild every 20 moves of 21 rows cost 2.4 times the slides at L = 2,000.
 * The rule counts rows only, so the rebuild points, and with them every bit of the sums, depend
 * on the schedule alone, not on threads or timing.
 *
 * <p>A missing return counts as 0 in the sums. An asset is only handed to a model when it has a
 * return in every row of the window, and then its sums are exactly those of its returns.
 *
 * <p>Only rows at or before the current end row are ever read, so no later row can reach the
 * moments. Not thread-safe: one instance belongs to one walk-forward thread.
 */
public final class RunningMoments {
    /** Rebuild when s_i²/L exceeds this fraction of D_ii (see the class comment). */
    private static final double CANCELLATION_LIMIT = 0.5;
    /** Rows of S the snapshot computes before it mirrors them below the diagonal. */
    private static final int MIRROR_ROWS = 64;

    private final ShiftedRows rows;
    private final int length;
    private final int refreshRows;
    private final int width;
    private double[] shift;
    private final double[] sum;
    private final double[] cross;
    private int endRow = -1;
    private int rowsSinceRefresh;
    private int refreshes;

    /**
     * Sums rebuilt once the rows slid since the last rebuild would exceed the window length (the
     * budget the class comment justifies).
     *
     * @param panel the returns
     * @param length L, the window length (≥ 2)
     */
    public RunningMoments(ReturnPanel panel, int length) {
        this(panel, length, length);
    }

    /**
     * @param panel the returns
     * @param length L, the window length (≥ 2)
     * @param refreshRows rebuild the sums from the rows instead of a move that would take the rows
     *     slid since the last rebuild above this many (≥ 1)
     */
    public RunningMoments(ReturnPanel panel, int length, int refreshRows) {
        if (!(length >= 2)) {
            throw new IllegalArgumentException("window length (" + length + ") must be >= 2");
        }
        if (!(refreshRows >= 1)) {
            throw new IllegalArgumentException("refreshRows (" + refreshRows + ") must be >= 1");
        }
        this.rows = new ShiftedRows(panel);
        this.length = length;
        this.refreshRows = refreshRows;
        this.width = rows.width();
        this.sum = new double[width];
        this.cross = new double[width * width];
    }

    /** L. */
    public int length() {
        return length;
    }

    /** τ of the window the sums describe, or −1 before the first move. */
    public int endRow() {
        return endRow;
    }

    /** How many times the sums were rebuilt from the rows, the first build included. */
    public int refreshes() {
        return refreshes;
    }

    /** D_ij = D_ji of the current sums, panel columns i and j (the market is N): for tests of the snapshot. */
    double crossSum(int i, int j) {
        return cross[Math.min(i, j) * width + Math.max(i, j)];
    }

    /** s_i of the current sums (the market is column N): for tests of the snapshot. */
    double columnSum(int i) {
        return sum[i];
    }

    /**
     * Moves the window to end at row τ (rows τ−L+1..τ).
     *
     * @throws IllegalArgumentException when τ is before the current end row or the window would
     *     start before row 0
     */
    public void moveTo(int tau) {
        if (!(tau >= endRow)) {
            throw new IllegalArgumentException("window end row (" + tau + ") must not go back from " + endRow);
        }
        if (!(tau - length + 1 >= 0)) {
            throw new IllegalArgumentException("window of " + length + " rows ending at row " + tau
                    + " starts before row 0");
        }
        if (tau == endRow) {
            return;
        }
        int step = tau - endRow;
        if (endRow < 0 || step > refreshRows - rowsSinceRefresh || 2 * step > length) {
            refresh(tau);
        } else {
            slide(tau, step);
            if (cancelling()) {
                refresh(tau);
            }
        }
    }

    private void refresh(int tau) {
        int first = tau - length + 1;
        shift = rows.windowMeans(first, tau);
        double[] d = new double[length * width];
        Arrays.fill(sum, 0.0);
        for (int t = 0; t < length; t++) {
            rows.fill(first + t, shift, 1.0, d, t * width, sum);
        }
        Arrays.fill(cross, 0.0);
        CrossProducts.accumulate(d, d, length, width, cross);
        endRow = tau;
        rowsSinceRefresh = 0;
        refreshes++;
    }

    /** Adds rows endRow+1..τ and removes the same number of oldest rows. */
    private void slide(int tau, int step) {
        int firstOld = endRow - length + 1;
        double[] left = new double[2 * step * width];
        double[] right = new double[2 * step * width];
        for (int k = 0; k < step; k++) {
            rows.fill(endRow + 1 + k, shift, 1.0, left, k * width, sum);
            rows.fill(firstOld + k, shift, -1.0, left, (step + k) * width, sum);
        }
        // Right factor: the same rows unsigned, so the removed rows contribute −d d'.
        System.arraycopy(left, 0, right, 0, step * width);
        for (int k = step * width; k < 2 * step * width; k++) {
            right[k] = -left[k];
        }
        CrossProducts.accumulate(left, right, 2 * step, width, cross);
        endRow = tau;
        rowsSinceRefresh += step;
    }

    private boolean cancelling() {
        for (int i = 0; i < width; i++) {
            double dii = cross[i * width + i];
            if (dii > 0 && sum[i] * sum[i] / length > CANCELLATION_LIMIT * dii) {
                return true;
            }
        }
        return false;
    }

    /**
     * S_ab = (D_ij − s_i s_j / L)/(L − 1) for the panel columns i = columns[a], j = columns[b],
     * both triangles, in blocks of {@value #MIRROR_ROWS} rows. For each row a the D_ij with
     * b ≥ a are copied into a row buffer (one copy when the columns are a run of consecutive
     * panel columns, as when every asset of the panel is in the window; otherwise gathered
     * through {@code columns}), turned into S_ab in place by a loop whose arrays all share the
     * index b, which the JIT vectorises, and copied into S. The block is then copied into its
     * columns below the diagonal while its rows are still in the cache. Every entry is the same
     * IEEE operations on the same doubles as the formula, in its order, whichever route its D_ij
     * took, so the bits are those of the plain loop (the JIT left a loop that read D and wrote S
     * at their own row offsets scalar).
     *
     * <p>Returns whether every value is finite: the sum of v·0 over the computed values is 0 when
     * they all are and NaN as soon as one is NaN or infinite. It is kept per column beside each
     * entry, so it vectorises with the rest (one running sum would chain every addition to the
     * one before); the order of those additions cannot change a sum of zeros and NaNs. The dense
     * problem then need not read the matrix again to find out.
     */
    private boolean fillCovariance(int[] columns, double[] s) {
        int n = columns.length;
        if (n == 0) {
            return true;
        }
        double[] sumOf = new double[n];
        for (int b = 0; b < n; b++) {
            sumOf[b] = sum[columns[b]];
        }
        // Strictly ascending columns form one run exactly when the last is n − 1 past the first.
        boolean run = columns[n - 1] - columns[0] == n - 1;
        double[] row = new double[n];
        double[] zeros = new double[n];
        for (int a0 = 0; a0 < n; a0 += MIRROR_ROWS) {
            int a1 = Math.min(n, a0 + MIRROR_ROWS);
            for (int a = a0; a < a1; a++) {
                int rowBase = columns[a] * width;
                if (run) {
                    System.arraycopy(cross, rowBase + columns[a], row, a, n - a);
                } else {
                    for (int b = a; b < n; b++) {
                        row[b] = cross[rowBase + columns[b]];
                    }
                }
                covarianceRow(row, sumOf, sum[columns[a]], a, zeros);
                System.arraycopy(row, a, s, a * n + a, n - a);
            }
            mirrorBlock(s, n, a0, a1);
        }
        double check = 0;
        for (double z : zeros) {
            check += z;
        }
        return check == 0.0;
    }

    /**
     * row[b] = (row[b] − si · sums[b] / L) / (L − 1) for b ≥ first, holding D_ij on entry, and v·0
     * added to zeros[b].
     */
    private void covarianceRow(double[] row, double[] sums, double si, int first, double[] zeros) {
        double len = length;
        double div = length - 1.0;
        for (int b = first; b < row.length; b++) {
            double value = (row[b] - si * sums[b] / len) / div;
            row[b] = value;
            zeros[b] += value * 0.0;
        }
    }

    /**
     * Copies rows a0..a1−1 of the upper triangle into their columns below the diagonal:
     * S_ba = S_ab for a0 ≤ a &lt; min(a1, b). Each lower row gets one short run, read from the
     * block's rows, which were written just before.
     */
    private static void mirrorBlock(double[] s, int n, int a0, int a1) {
        for (int b = a0 + 1; b < n; b++) {
            int to = b * n;
            int end = Math.min(a1, b);
            for (int a = a0; a < end; a++) {
                s[to + a] = s[a * n + b];
            }
        }
    }

    /**
     * The moments of the current window over the given panel columns (ascending), in their
     * order: x̄_i = c_i + s_i/L, S_ij = (D_ij − s_i s_j / L)/(L − 1), and the same for the market
     * pair. A variance that rounding pushes below 0 (a constant column) is reported as 0.
     *
     * @param columns panel columns, strictly ascending, each with a return in every window row
     */
    public WindowMoments snapshot(int[] columns) {
        if (endRow < 0) {
            throw new IllegalStateException("no window yet: call moveTo first");
        }
        int n = columns.length;
        int mk = rows.marketIndex();
        for (int a = 0; a < n; a++) {
            if (!(columns[a] >= 0 && columns[a] < mk) || (a > 0 && columns[a] <= columns[a - 1])) {
                throw new IllegalArgumentException("columns must be ascending panel columns in [0, " + mk
                        + "); found " + columns[a] + " at position " + a);
            }
        }
        double len = length;
        double div = length - 1.0;
        double[] mean = new double[n];
        double[] sim = new double[n];
        double sm = sum[mk];
        for (int a = 0; a < n; a++) {
            int ci = columns[a];
            double si = sum[ci];
            mean[a] = shift[ci] + si / len;
            sim[a] = (cross[ci * width + mk] - si * sm / len) / div;
        }
        double[] s = new double[n * n];
        boolean finite = fillCovariance(columns, s);
        for (int a = 0; a < n; a++) {
            s[a * n + a] = Math.max(0.0, s[a * n + a]);
        }
        double smm = Math.max(0.0, (cross[mk * width + mk] - sm * sm / len) / div);
        // fillCovariance stores each S_ba as the value computed for S_ab, and the clamp touches
        // only the diagonal and never makes a finite value non-finite, so S is symmetric bit for
        // bit and finite when every computed value was.
        return WindowMoments.mirrored(n, length, mean, shift[mk] + sm / len, smm, sim, s, finite);
    }
}
