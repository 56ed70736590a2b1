package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.EstimationWindow;

/**
 * The per-asset least-squares fits of a multi-index model on one window (Method §11): for asset
 * i with factor columns J_i, OLS of x_i on [1, G_J] gives loadings b_i, residuals e_i and
 * d_i = Σ_t e_it² / (L - 1); Σ_F is the sample covariance of G (divisor L - 1).
 *
 * <p>With an intercept the slopes are those of the demeaned data, b_i = F_JJ⁻¹ c_J with
 * F = G̃'G̃/(L-1) and c = G̃'x̃_i/(L-1) (the normal equations), solved by Cholesky on the small
 * q×q block. The residuals are then formed explicitly for d_i, which keeps S_ii = b'F b + d_i
 * exact up to rounding even when a factor explains nearly all of an asset's variance. Cost
 * O(L n K + n K³).
 */
final class MultiIndexFit {
    private final FactorDesign design;
    private final int n;
    private final double[] factorCovariance;
    private final double[] crossCovariance;
    private final double[] loadings;
    private final double[] specific;

    private MultiIndexFit(FactorDesign design, int n, double[] factorCovariance, double[] crossCovariance,
                          double[] loadings, double[] specific) {
        this.design = design;
        this.n = n;
        this.factorCovariance = factorCovariance;
        this.crossCovariance = crossCovariance;
        this.loadings = loadings;
        this.specific = specific;
    }

    /**
     * @throws IllegalArgumentException when some asset's factor columns are collinear in the
     *                                  window (F_JJ not positive definite), so its loadings are
     *                                  not identified
     */
    static MultiIndexFit of(EstimationWindow window, FactorDesign design) {
        CentredWindow centred = new CentredWindow(window);
        int n = centred.assets();
        int len = centred.length();
        int k = design.factorCount();
        if (design.length() != len || design.columnsOf().length != n) {
            throw new IllegalArgumentException("factor design (L = " + design.length() + ", " + design.columnsOf().length
                    + " assets) must match the window (L = " + len + ", n = " + n + ")");
        }
        requireMovingFactors(design);
        double[] g = centredFactors(design);
        double div = len - 1.0;
        double[] f = new double[k * k];
        double[] c = new double[k * n];
        double[] row = new double[n];
        for (int t = 0; t < len; t++) {
            centred.row(t, row);
            for (int a = 0; a < k; a++) {
                double ga = g[t * k + a];
                for (int b = a; b < k; b++) {
                    f[a * k + b] += ga * g[t * k + b];
                }
                for (int i = 0; i < n; i++) {
                    c[a * n + i] += ga * row[i];
                }
            }
        }
        for (int a = 0; a < k; a++) {
            for (int b = a; b < k; b++) {
                f[a * k + b] /= div;
                f[b * k + a] = f[a * k + b];
            }
            for (int i = 0; i < n; i++) {
                c[a * n + i] /= div;
            }
        }
        double[] loadings = new double[n * k];
        for (int i = 0; i < n; i++) {
            int[] cols = design.columnsOf()[i];
            double[] b = solve(f, k, c, n, i, cols, window.assets().get(i), design);
            for (int q = 0; q < cols.length; q++) {
                loadings[i * k + cols[q]] = b[q];
            }
        }
        double[] specific = residualVariances(centred, g, k, loadings, design.columnsOf());
        return new MultiIndexFit(design, n, f, c, loadings, specific);
    }

    /**
     * A factor some asset loads on must take more than one value in the window: centred, a
     * constant column is rounding noise (0.01 has no exact binary form), which the pivot test
     * in {@link #solve} measures against itself and so cannot catch.
     */
    private static void requireMovingFactors(FactorDesign design) {
        int len = design.length();
        int k = design.factorCount();
        double[] v = design.values();
        boolean[] used = new boolean[k];
        for (int[] cols : design.columnsOf()) {
            for (int a : cols) {
                used[a] = true;
            }
        }
        for (int a = 0; a < k; a++) {
            if (!used[a] || len == 0) {
                continue;
            }
            double first = v[a];
            boolean moves = false;
            for (int t = 1; t < len && !moves; t++) {
                moves = v[t * k + a] != first;
            }
            if (!moves) {
                throw new IllegalArgumentException("factor '" + design.names().get(a) + "' has the same value ("
                        + first + ") in every row of the window, so its loadings are not identified");
            }
        }
    }

    private static double[] centredFactors(FactorDesign design) {
        int len = design.length();
        int k = design.factorCount();
        double[] g = design.values().clone();
        for (int a = 0; a < k; a++) {
            double mean = 0;
            for (int t = 0; t < len; t++) {
                mean += g[t * k + a];
            }
            mean /= len;
            for (int t = 0; t < len; t++) {
                g[t * k + a] -= mean;
            }
        }
        return g;
    }

    /** The normal equations F_JJ b = c_J for asset i, by Cholesky. */
    private static double[] solve(double[] f, int k, double[] c, int n, int i, int[] cols, String asset,
                                  FactorDesign design) {
        int q = cols.length;
        double[] l = new double[q * q];
        for (int r = 0; r < q; r++) {
            for (int s = 0; s <= r; s++) {
                double v = f[cols[r] * k + cols[s]];
                for (int p = 0; p < s; p++) {
                    v -= l[r * q + p] * l[s * q + p];
                }
                if (r == s) {
                    // A pivot at rounding level relative to the factor's variance: collinear columns.
                    if (!(v > 1e-12 * f[cols[r] * k + cols[r]])) {
                        throw new IllegalArgumentException("factor '" + design.names().get(cols[r]) + "' is collinear with"
                                + " the other factors of asset '" + asset + "' in the window (or has no variance),"
                                + " so its loadings are not identified");
                    }
                    l[r * q + r] = Math.sqrt(v);
                } else {
                    l[r * q + s] = v / l[s * q + s];
                }
            }
        }
        double[] y = new double[q];
        for (int r = 0; r < q; r++) {
            double v = c[cols[r] * n + i];
            for (int p = 0; p < r; p++) {
                v -= l[r * q + p] * y[p];
            }
            y[r] = v / l[r * q + r];
        }
        for (int r = q - 1; r >= 0; r--) {
            double v = y[r];
            for (int p = r + 1; p < q; p++) {
                v -= l[p * q + r] * y[p];
            }
            y[r] = v / l[r * q + r];
        }
        return y;
    }

    private static double[] residualVariances(CentredWindow centred, double[] g, int k, double[] loadings,
                                              int[][] columnsOf) {
        int n = centred.assets();
        int len = centred.length();
        double[] ss = new double[n];
        double[] row = new double[n];
        for (int t = 0; t < len; t++) {
            centred.row(t, row);
            for (int i = 0; i < n; i++) {
                double e = row[i];
                for (int a : columnsOf[i]) {
                    e -= g[t * k + a] * loadings[i * k + a];
                }
                ss[i] += e * e;
            }
        }
        for (int i = 0; i < n; i++) {
            ss[i] /= len - 1.0;
        }
        return ss;
    }

    /** Σ = B Σ_F B' + diag(d) in factor form; hands over copies, so the fit stays usable. */
    FactorCovariance covariance() {
        return FactorCovariance.of(loadings.clone(), factorCovariance.clone(), specific.clone());
    }

    /** The design the fit used. */
    FactorDesign design() {
        return design;
    }

    /** n. */
    int assets() {
        return n;
    }

    /** d_i, Σ_t e_it² / (L-1). */
    double residualVariance(int i) {
        return specific[i];
    }

    /**
     * cov(e_i, e_j) with divisor L-1, without forming the residuals: with B the loadings, C the
     * factor-asset cross-covariances and F = Σ_F,
     * cov(e_i, e_j) = S_ij - b_i'c_j - b_j'c_i + b_i' F b_j (every e has mean 0). O(K²).
     *
     * @param sij S_ij from the window's moments
     */
    double residualCovariance(int i, int j, double sij) {
        int k = design.factorCount();
        double v = sij;
        for (int a = 0; a < k; a++) {
            double bia = loadings[i * k + a];
            double bja = loadings[j * k + a];
            v -= bia * crossCovariance[a * n + j] + bja * crossCovariance[a * n + i];
            if (bia != 0) {
                double fb = 0;
                for (int b = 0; b < k; b++) {
                    fb += factorCovariance[a * k + b] * loadings[j * k + b];
                }
                v += bia * fb;
            }
        }
        return v;
    }
}
