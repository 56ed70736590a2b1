package dev.sigmawalk.strategies.risk;

import org.junit.jupiter.api.Test;

import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class FactorCovarianceTest {
    /** Arithmetic on two-digit inputs. */
    private static final double HAND_TOL = 1e-15;
    /** The same sums in different orders. */
    private static final double ROUNDING_TOL = 1e-12;

    /**
     * Hand computation, written out: B = [[1, 0], [0.5, 1]], Σ_F = [[0.04, 0.01], [0.01, 0.09]],
     * d = (0.01, 0.02). Σ_00 = 0.04 + 0.01 = 0.05; Σ_01 = 0.5·0.04 + 1·0.01 = 0.03;
     * Σ_11 = 0.25·0.04 + 2·0.5·0.01 + 0.09 + 0.02 = 0.13; for w = (0.6, 0.4),
     * w'Σw = 0.36·0.05 + 2·0.24·0.03 + 0.16·0.13 = 0.0532 and Σw = (0.042, 0.070).
     */
    @Test
    void twoFactorExample_matchesHandComputation() {
        FactorCovariance f = FactorCovariance.of(new double[] {1, 0, 0.5, 1}, new double[] {0.04, 0.01, 0.01, 0.09},
                new double[] {0.01, 0.02});

        assertEquals(0.05, f.get(0, 0), HAND_TOL, "Sigma_00");
        assertEquals(0.03, f.get(0, 1), HAND_TOL, "Sigma_01");
        assertEquals(0.03, f.get(1, 0), HAND_TOL, "Sigma_10");
        assertEquals(0.13, f.get(1, 1), HAND_TOL, "Sigma_11");
        Close.absolute(new double[] {0.05, 0.03, 0.03, 0.13}, f.dense(), HAND_TOL, "dense");
        assertEquals(0.0532, f.portfolioVariance(new double[] {0.6, 0.4}), HAND_TOL, "w'Sigma w");
        Close.absolute(new double[] {0.042, 0.070}, f.multiply(new double[] {0.6, 0.4}), HAND_TOL, "Sigma w");
        assertSame(f.dense(), f.dense(), "dense matrix is built once");
    }

    /**
     * On seeded random factor forms (n 1-30, K 0-6): entries are symmetric bit for bit and
     * equal the dense matrix; w'Σw and Σv equal the dense products; the dense matrix is the
     * triple product B Σ_F B' + diag(d) written as an explicit sum.
     */
    @Test
    void randomForms_agreeWithDenseProducts() {
        SplittableRandom rng = new SplittableRandom(0xFAC7_0001L);
        for (int c = 0; c < 40; c++) {
            int n = rng.nextInt(1, 31);
            int k = rng.nextInt(0, 7);
            FactorCovariance f = random(rng, n, k);
            String label = " (case " + c + ", n " + n + ", K " + k + ")";
            double[] s = f.dense();
            double[] b = f.loadings();
            double[] g = f.factorCovariance();
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    double triple = i == j ? f.specificVariances()[i] : 0;
                    for (int a = 0; a < k; a++) {
                        for (int e = 0; e < k; e++) {
                            triple += b[i * k + a] * g[a * k + e] * b[j * k + e];
                        }
                    }
                    assertEquals(triple, s[i * n + j], ROUNDING_TOL * (1 + Math.abs(triple)), "triple" + label);
                    assertEquals(s[i * n + j], f.get(i, j), 0.0, "get equals dense" + label);
                    assertEquals(f.get(i, j), f.get(j, i), 0.0, "symmetric" + label);
                }
            }
            double[] w = vector(rng, n);
            double quad = 0;
            double[] sw = new double[n];
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    sw[i] += s[i * n + j] * w[j];
                }
                quad += w[i] * sw[i];
            }
            Close.relative(quad, f.portfolioVariance(w), ROUNDING_TOL, "w'Sigma w" + label);
            Close.absolute(sw, f.multiply(w), ROUNDING_TOL, "Sigma w" + label);
            assertTrue(f.portfolioVariance(w) >= 0, "non-negative variance" + label);
        }
    }

    @Test
    void badShapesAndValues_areRefusedWithTheirValues() {
        var shape = assertThrows(IllegalArgumentException.class,
                () -> FactorCovariance.of(new double[3], new double[] {1}, new double[2]));
        assertTrue(shape.getMessage().contains("loadings (3 values) must be n*K with n = 2, K = 1"), shape.getMessage());
        var square = assertThrows(IllegalArgumentException.class,
                () -> FactorCovariance.of(new double[2], new double[3], new double[2]));
        assertTrue(square.getMessage().contains("must be K*K"), square.getMessage());
        var asym = assertThrows(IllegalArgumentException.class,
                () -> FactorCovariance.of(new double[4], new double[] {1, 0.2, 0.3, 1}, new double[2]));
        assertTrue(asym.getMessage().contains("not symmetric at (0, 1)"), asym.getMessage());
        var negative = assertThrows(IllegalArgumentException.class,
                () -> FactorCovariance.of(new double[2], new double[] {1}, new double[] {0.1, -1e-3}));
        assertTrue(negative.getMessage().contains("asset 1 (-0.001)"), negative.getMessage());
        var nan = assertThrows(IllegalArgumentException.class,
                () -> FactorCovariance.of(new double[] {Double.NaN, 1}, new double[] {1}, new double[2]));
        assertTrue(nan.getMessage().contains("loadings[0] (NaN) must be finite"), nan.getMessage());
    }

    /** B with entries in (-1.5, 1.5), Σ_F = A A' / K + 0.01 I (symmetric by construction), d in (0, 0.05). */
    private static FactorCovariance random(SplittableRandom rng, int n, int k) {
        double[] b = new double[n * k];
        for (int i = 0; i < b.length; i++) {
            b[i] = rng.nextDouble() * 3 - 1.5;
        }
        double[] a = vector(rng, k * k);
        double[] g = new double[k * k];
        for (int i = 0; i < k; i++) {
            for (int j = 0; j <= i; j++) {
                double s = i == j ? 0.01 : 0;
                for (int e = 0; e < k; e++) {
                    s += a[i * k + e] * a[j * k + e] / k;
                }
                g[i * k + j] = s;
                g[j * k + i] = s;
            }
        }
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            d[i] = 0.05 * rng.nextDouble();
        }
        return FactorCovariance.of(b, g, d);
    }

    private static double[] vector(SplittableRandom rng, int n) {
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = rng.nextDouble() * 2 - 1;
        }
        return v;
    }
}
