package dev.sigmawalk.strategies.optimize;

import dev.sigmawalk.engine.moments.CrossProducts;

/**
 * The products of a factor form Σ = B Σ_F B' + diag(d) that the factor-side solvers share, with
 * C = B Σ_F formed once: Σ_ij = c_i'b_j + d_i δ_ij in O(K), g = Σw = C(B'w) + d∘w in O(nK), and
 * an upper bound of max_i Σ_j |Σ_ij w_j| in O(nK + K²) for scaling the dual residual.
 */
final class FactorProducts {
    private final int n;
    private final int k;
    private final double[] b;
    private final double[] c;
    private final double[] d;
    private final double[] absFactor;

    FactorProducts(FactorForm form) {
        this.d = form.specificVariances();
        this.n = d.length;
        this.k = form.factorCount();
        this.b = form.loadings();
        double[] sf = form.factorCovariance();
        if (b.length != n * k || sf.length != k * k) {
            throw new IllegalArgumentException("factor form (n = " + n + ", K = " + k + ") has loadings of "
                    + b.length + " and a factor covariance of " + sf.length + " values");
        }
        this.c = FactorForm.loadingsTimesFactors(b, sf, n, k);
        this.absFactor = new double[k * k];
        for (int e = 0; e < k * k; e++) {
            absFactor[e] = Math.abs(sf[e]);
        }
    }

    /** n. */
    int size() {
        return n;
    }

    /** K. */
    int factorCount() {
        return k;
    }

    /** Σ_ii. */
    double diagonal(int i) {
        return entry(i, i) + d[i];
    }

    /** c_i'b_j, the factor part of Σ_ij. */
    double entry(int i, int j) {
        double v = 0;
        int ri = i * k;
        int rj = j * k;
        for (int a = 0; a < k; a++) {
            v += c[ri + a] * b[rj + a];
        }
        return v;
    }

    /** C_i'e for an exposure vector e of length K. */
    double throughFactors(int i, double[] exposure) {
        double v = 0;
        for (int a = 0; a < k; a++) {
            v += c[i * k + a] * exposure[a];
        }
        return v;
    }

    /** B'w over the non-zero weights, length K. */
    double[] exposures(double[] w) {
        double[] exposure = new double[k];
        for (int i = 0; i < n; i++) {
            double wi = w[i];
            if (wi != 0) {
                for (int a = 0; a < k; a++) {
                    exposure[a] += b[i * k + a] * wi;
                }
            }
        }
        return exposure;
    }

    /** g = C(B'w) + d∘w into {@code g}, O(nK). */
    void gradient(double[] w, double[] g) {
        double[] exposure = exposures(w);
        for (int i = 0; i < n; i++) {
            g[i] = throughFactors(i, exposure) + d[i] * w[i];
        }
    }

    /** g = C(B'w) + d∘w, into a new array. */
    double[] gradient(double[] w) {
        double[] g = new double[n];
        gradient(w, g);
        return g;
    }

    /**
     * Σ over the given assets, |S|×|S| row-major, both triangles (the upper one computed and
     * mirrored, so the block is symmetric bit for bit): Σ_SS = C_S B_S' + diag(d_S) through the
     * blocked cross-product kernel, O(|S|² K).
     */
    double[] block(int[] subset) {
        int m = subset.length;
        double[] cs = new double[k * m];
        double[] bs = new double[k * m];
        for (int r = 0; r < m; r++) {
            int base = subset[r] * k;
            for (int a = 0; a < k; a++) {
                cs[a * m + r] = c[base + a];
                bs[a * m + r] = b[base + a];
            }
        }
        double[] q = new double[m * m];
        CrossProducts.accumulate(cs, bs, k, m, q);
        for (int r = 0; r < m; r++) {
            q[r * m + r] += d[subset[r]];
            for (int s = r + 1; s < m; s++) {
                q[s * m + r] = q[r * m + s];
            }
        }
        return q;
    }

    /** max_i (Σ_a |b_ia| (|Σ_F| |B|'|w|)_a + d_i |w_i|), ≥ max_i Σ_j |Σ_ij w_j|; 1 when 0. */
    double scale(double[] w) {
        double[] spread = new double[k];
        for (int i = 0; i < n; i++) {
            double wi = Math.abs(w[i]);
            if (wi != 0) {
                for (int a = 0; a < k; a++) {
                    spread[a] += Math.abs(b[i * k + a]) * wi;
                }
            }
        }
        double[] through = new double[k];
        for (int a = 0; a < k; a++) {
            double v = 0;
            for (int e = 0; e < k; e++) {
                v += absFactor[a * k + e] * spread[e];
            }
            through[a] = v;
        }
        double largest = 0;
        for (int i = 0; i < n; i++) {
            double v = d[i] * Math.abs(w[i]);
            for (int a = 0; a < k; a++) {
                v += Math.abs(b[i * k + a]) * through[a];
            }
            largest = Math.max(largest, v);
        }
        return largest > 0 && Double.isFinite(largest) ? largest : 1;
    }
}
