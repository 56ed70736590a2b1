package dev.sigmawalk.engine.moments;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class CrossProductsTest {
    /** Blocked and plain summation orders differ; each entry is a sum of at most a few hundred terms. */
    private static final double RELATIVE = 1e-13;
    private static final double SENTINEL = -777.0;

    /**
     * Hand computation: X = [[1, 2], [3, 4], [5, 6]] gives X'X = [[1+9+25, 2+12+30], [·, 4+16+36]]
     * = [[35, 44], [·, 56]]; the entry below the diagonal is left alone.
     */
    @Test
    void smallMatrix_matchesHandComputation_andLeavesLowerTriangleAlone() {
        double[] x = {1, 2, 3, 4, 5, 6};
        double[] c = {0, 0, SENTINEL, 0};
        CrossProducts.accumulate(x, x, 3, 2, c);
        assertEquals(35.0, c[0], 0.0, "C00");
        assertEquals(44.0, c[1], 0.0, "C01");
        assertEquals(56.0, c[3], 0.0, "C11");
        assertEquals(SENTINEL, c[2], 0.0, "C10 untouched");
    }

    /**
     * Against the definition C_ij = Σ_t U_ti V_tj written as a plain loop, for shapes that cross
     * the tile edges (n above {@value CrossProducts#TILE_COLUMNS}, rows not a multiple of four).
     * The fused order keeps every entry within a few units of rounding of the plain sum.
     */
    @Test
    void shapesAcrossTileEdges_matchPlainDefinition() {
        int[][] shapes = {{1, 1}, {3, 17}, {7, 33}, {41, 100}, {9, 530}};
        SplittableRandom rng = new SplittableRandom(3_141_592L);
        for (int[] shape : shapes) {
            int rows = shape[0];
            int n = shape[1];
            double[] u = random(rng, rows * n);
            double[] v = random(rng, rows * n);
            double[] c = new double[n * n];
            CrossProducts.accumulate(u, v, rows, n, c);
            for (int i = 0; i < n; i++) {
                for (int j = i; j < n; j++) {
                    double expected = 0;
                    double scale = 0;
                    for (int t = 0; t < rows; t++) {
                        expected += u[t * n + i] * v[t * n + j];
                        scale += Math.abs(u[t * n + i] * v[t * n + j]);
                    }
                    assertEquals(expected, c[i * n + j], RELATIVE * scale,
                            "C(" + i + "," + j + ") for " + rows + "x" + n);
                }
            }
        }
    }

    /**
     * The documented summation order, bit for bit: every entry equals the plain triple loop
     * c ← Math.fma(U_ti, V_tj, c) over t in order (IEEE 754 fusedMultiplyAdd, one rounding a term),
     * starting from a non-zero C, for shapes on both sides of the tile edges
     * ({@value CrossProducts#TILE_ROWS} rows, {@value CrossProducts#TILE_COLUMNS} columns) and
     * every row count modulo four. So the tiling can never change a result.
     */
    @Test
    void anyShape_equalsPlainFusedLoopBitForBit() {
        int[][] shapes = {{1, 1}, {2, 3}, {3, 64}, {4, 65}, {5, 255}, {6, 257}, {7, 300}, {42, 70}, {11, 513}};
        SplittableRandom rng = new SplittableRandom(2_718_281L);
        for (int[] shape : shapes) {
            int rows = shape[0];
            int n = shape[1];
            double[] u = random(rng, rows * n);
            double[] v = random(rng, rows * n);
            double[] start = random(rng, n * n);
            double[] c = start.clone();
            CrossProducts.accumulate(u, v, rows, n, c);
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    double expected = start[i * n + j];
                    if (j >= i) {
                        for (int t = 0; t < rows; t++) {
                            expected = Math.fma(u[t * n + i], v[t * n + j], expected);
                        }
                    }
                    assertEquals(Double.doubleToRawLongBits(expected), Double.doubleToRawLongBits(c[i * n + j]),
                            "C(" + i + "," + j + ") for " + rows + "x" + n);
                }
            }
        }
    }

    /** Adding rows and then the same rows with U = −V leaves zeros up to rounding. */
    @Test
    void addingThenRemovingRows_returnsToZero() {
        SplittableRandom rng = new SplittableRandom(27L);
        int rows = 13;
        int n = 21;
        double[] x = random(rng, rows * n);
        double[] minus = new double[x.length];
        for (int k = 0; k < x.length; k++) {
            minus[k] = -x[k];
        }
        double[] c = new double[n * n];
        CrossProducts.accumulate(x, x, rows, n, c);
        CrossProducts.accumulate(minus, x, rows, n, c);
        for (int i = 0; i < n; i++) {
            for (int j = i; j < n; j++) {
                assertTrue(Math.abs(c[i * n + j]) <= 1e-14 * rows, "C(" + i + "," + j + ") = " + c[i * n + j]);
            }
        }
    }

    @Test
    void shortArray_isRejectedWithSizes() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> CrossProducts.accumulate(new double[5], new double[6], 2, 3, new double[9]));
        assertTrue(e.getMessage().contains("u 5"), e.getMessage());
    }

    private static double[] random(SplittableRandom rng, int size) {
        double[] a = new double[size];
        for (int k = 0; k < size; k++) {
            a[k] = rng.nextDouble(-1, 1);
        }
        return a;
    }
}
