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
        double sumAbs = 0;
        double sumSquares = 0;
        for (int i0 = 0; i0 < n; i0 += TILE_ROWS) {
            int i1 = Math.min(n, i0 + TILE_ROWS);
            for (int j0 = i0; j0 < n; j0 += TILE_COLUMNS) {
                int j1 = Math.min(n, j0 + TILE_COLUMNS);
                int width = j1 - j0;
                java.util.Arrays.fill(tile, 0.0);
                fill(z, len, n, tile, packed, i0, i1, j0, width);
                for (int i = i0; i < i1; i++) {
                    int base = (i - i0) * TILE_COLUMNS - j0;
                    double threshold = top.threshold();
                    for (int j = Math.max(j0, i + 1); j < j1; j++) {
                        double r = tile[base + j];
                        sumSquares += r * r;
                        sumAbs += Math.min(1.0, Math.abs(r));
                        if (r >= threshold) {
                            top.offer(r, i, j);
                            threshold = top.threshold();
                        }
                    }
                }
            }
        }
        long pairs = (long) n * (n - 1) / 2;
        return new PairScan(pairs, Math.min(1.0, sumAbs / pairs), sumSquares, top.pairs(rows.assets()));
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
