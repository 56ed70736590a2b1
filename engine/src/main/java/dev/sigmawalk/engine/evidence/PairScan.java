package dev.sigmawalk.engine.evidence;

import java.util.List;

/**
 * One pass over every pair i &lt; j of a window's standardised residuals (Method §8): the mean
 * |ρ|, Σ ρ² and the k largest ρ. The statistics that need every pair by definition are these
 * two; the rest of Method §8 follows from sums ({@link ResidualRows}).
 *
 * <p>ρ_ij = Σ_t z_ti z_tj is computed in tiles of {@value #TILE_ROWS} assets by
 * {@value #TILE_COLUMNS} assets, only on and above the diagonal tile (each pair once), and each
 * tile is read as soon as it is complete, so memory stays O(L n) plus one tile. A tile is built
 * four rows t at a time from packed copies of the rows' column segments: four products per load
 * and store of the tile, each an axpy over contiguous memory, which the JIT compiles to SIMD
 * instructions. Cost L n(n−1)/2 multiply-adds.
 *
 * @param pairs n(n−1)/2
 * @param meanAbsCorrelation mean |ρ_ij|, each ρ clamped to [−1, 1], in [0, 1]
 * @param sumOfSquares Σ_{i&lt;j} ρ_ij² (unclamped)
 * @param largest the largest ρ_ij, largest first, ties by (i, j) ascending
 */
public record PairScan(long pairs, double meanAbsCorrelation, double sumOfSquares, List<ResidualPair> largest) {
    /** Assets (rows of the tile) whose correlations with a column tile are built together. */
    static final int TILE_ROWS = 16;
    /** Assets in one column tile: four packed row segments (16 KiB) fit in the core's L1 cache. */
    static final int TILE_COLUMNS = 512;

    public PairScan {
        largest = List.copyOf(largest);
        if (!(pairs >= 1) || !(meanAbsCorrelation >= 0 && meanAbsCorrelation <= 1) || !(sumOfSquares >= 0)) {
            throw new IllegalArgumentException("pair scan of " + pairs + " pairs: mean |rho| " + meanAbsCorrelation
                    + " must be in [0, 1] and the sum of squares " + sumOfSquares + " >= 0");
        }
    }

    static PairScan of(ResidualRows rows, int largest) {
        if (!(largest >= 0)) {
            throw new IllegalArgumentException("pair count (" + largest + ") must be >= 0");
        }
        int n = rows.assetCount();
        int len = rows.length();
        double[] z = rows.values();
        double[] tile = new double[TILE_ROWS * TILE_COLUMNS];
        double[] packed = new double[4 * TILE_COLUMNS];
        LargestPairs top = new LargestPairs(largest);
        double[] sums = new double[2];
        for (int i0 = 0; i0 < n; i0 += TILE_ROWS) {
            int i1 = Math.min(n, i0 + TILE_ROWS);
            for (int j0 = i0; j0 < n; j0 += TILE_COLUMNS) {
                int j1 = Math.min(n, j0 + TILE_COLUMNS);
                int width = j1 - j0;
                java.util.Arrays.fill(tile, 0.0);
                fill(z, len, n, tile, packed, i0, i1, j0, width);
                for (int i = i0; i < i1; i++) {
                    int base = (i - i0) * TILE_COLUMNS - j0;
                    int from = Math.max(j0, i + 1);
                    addRow(tile, base + from, base + j1, sums);
                    double threshold = top.threshold();
                    for (int j = from; j < j1; j++) {
                        if (tile[base + j] >= threshold) {
                            top.offer(tile[base + j], i, j);
                            threshold = top.threshold();
                        }
                    }
                }
            }
        }
        long pairs = (long) n * (n - 1) / 2;
        return new PairScan(pairs, Math.min(1.0, sums[0] / pairs), sums[1], top.pairs(rows.assets()));
    }

    /**
     * Adds Σ min(1, |v|) and Σ v² over tile[from..to) to sums[0] and sums[1], each in four
     * interleaved partial sums so that the additions pipeline instead of waiting on each other.
     */
    private static void addRow(double[] tile, int from, int to, double[] sums) {
        double a0 = 0;
        double a1 = 0;
        double a2 = 0;
        double a3 = 0;
        double q0 = 0;
        double q1 = 0;
        double q2 = 0;
        double q3 = 0;
        int k = from;
        for (; k + 4 <= to; k += 4) {
            double r0 = tile[k];
            double r1 = tile[k + 1];
            double r2 = tile[k + 2];
            double r3 = tile[k + 3];
            a0 += Math.min(1.0, Math.abs(r0));
            a1 += Math.min(1.0, Math.abs(r1));
            a2 += Math.min(1.0, Math.abs(r2));
            a3 += Math.min(1.0, Math.abs(r3));
            q0 += r0 * r0;
            q1 += r1 * r1;
            q2 += r2 * r2;
            q3 += r3 * r3;
        }
        for (; k < to; k++) {
            a0 += Math.min(1.0, Math.abs(tile[k]));
            q0 += tile[k] * tile[k];
        }
        sums[0] += (a0 + a1) + (a2 + a3);
        sums[1] += (q0 + q1) + (q2 + q3);
    }

    /** tile[(i − i0) * TILE_COLUMNS + (j − j0)] = Σ_t z_ti z_tj for i0 ≤ i &lt; i1, j0 ≤ j &lt; j0 + width. */
    private static void fill(double[] z, int len, int n, double[] tile, double[] packed, int i0, int i1, int j0,
                             int width) {
        int t = 0;
        for (; t + 4 <= len; t += 4) {
            int r0 = t * n;
            int r1 = r0 + n;
            int r2 = r1 + n;
            int r3 = r2 + n;
            System.arraycopy(z, r0 + j0, packed, 0, width);
            System.arraycopy(z, r1 + j0, packed, TILE_COLUMNS, width);
            System.arraycopy(z, r2 + j0, packed, 2 * TILE_COLUMNS, width);
            System.arraycopy(z, r3 + j0, packed, 3 * TILE_COLUMNS, width);
            for (int i = i0; i < i1; i++) {
                addFour(tile, (i - i0) * TILE_COLUMNS, packed, width, z[r0 + i], z[r1 + i], z[r2 + i], z[r3 + i]);
            }
        }
        for (; t < len; t++) {
            int r = t * n;
            for (int i = i0; i < i1; i++) {
                double a = z[r + i];
                int at = (i - i0) * TILE_COLUMNS;
                for (int k = 0; k < width; k++) {
                    tile[at + k] += a * z[r + j0 + k];
                }
            }
        }
    }

    private static void addFour(double[] tile, int at, double[] packed, int width, double a, double b, double c,
                                double d) {
        for (int k = 0; k < width; k++) {
            tile[at + k] += a * packed[k] + b * packed[TILE_COLUMNS + k] + c * packed[2 * TILE_COLUMNS + k]
                    + d * packed[3 * TILE_COLUMNS + k];
        }
    }
}
