package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.strategies.optimize.FactorForm;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * A covariance matrix in factor form, Σ = B Σ_F B' + diag(d) (Method §11): n assets load on K
 * factors with loadings B (n×K), the factors have covariance Σ_F (K×K, symmetric positive
 * semi-definite) and each asset has a specific variance d_i ≥ 0. The multi-index and
 * principal-components models produce it; K = 0 is a purely diagonal matrix.
 *
 * <p>Only O(nK + K²) numbers are stored. {@link #portfolioVariance} costs O(nK + K²) and
 * {@link #multiply} O(nK + K²) without the n×n matrix, so a solver can work with the low-rank
 * structure (Woodbury identity: Σ⁻¹ = D⁻¹ - D⁻¹B (Σ_F⁻¹ + B'D⁻¹B)⁻¹ B'D⁻¹ where D and Σ_F are
 * invertible). {@link #dense()} builds the n×n matrix once, on first request, in O(n²K); every
 * consumer that needs entries can fall back to it. Instances are not meant to be shared between
 * threads while {@link #dense()} is first being built.
 *
 * <p>Arrays are owned by this object (the factory copies nothing, so callers hand over arrays
 * they no longer touch) and the accessors return them read-only. Entries are symmetric bit for
 * bit: Σ_ij is always computed from the smaller index's row.
 */
public final class FactorCovariance implements CovarianceEstimate, FactorForm {
    private final int n;
    private final int k;
    private final double[] loadings;
    private final double[] factorCovariance;
    private final double[] specific;
    /** Σ_F off its diagonal is exactly 0: products then cost O(K) per asset instead of O(K²). */
    private final boolean diagonalFactors;
    private final OptionalDouble shrinkage;
    private double[] dense;

    private FactorCovariance(int n, int k, double[] loadings, double[] factorCovariance, double[] specific,
                             OptionalDouble shrinkage) {
        this.n = n;
        this.k = k;
        this.loadings = loadings;
        this.factorCovariance = factorCovariance;
        this.specific = specific;
        this.diagonalFactors = FactorForm.isDiagonal(factorCovariance, k);
        this.shrinkage = shrinkage;
    }

    /**
     * The same matrix reporting the Ledoit-Wolf intensity δ that made it (Method §3), for a
     * shrinkage estimate handed on in factor form; shares the arrays.
     *
     * @param delta δ in [0, 1]
     */
    public FactorCovariance withShrinkage(double delta) {
        if (!(delta >= 0 && delta <= 1)) {
            throw new IllegalArgumentException("shrinkage intensity (" + delta + ") must be in [0, 1]");
        }
        return new FactorCovariance(n, k, loadings, factorCovariance, specific, OptionalDouble.of(delta));
    }

    @Override
    public OptionalDouble shrinkage() {
        return shrinkage;
    }

    /**
     * Takes ownership of the three arrays.
     *
     * @param loadings         B, n×K row-major: asset i's loading on factor a at {@code i*K + a}
     * @param factorCovariance Σ_F, K×K row-major, symmetric (bit for bit) and finite
     * @param specific         d, length n, each finite and ≥ 0
     * @throws IllegalArgumentException when the shapes disagree, a value is not finite, Σ_F is
     *                                  not symmetric or some d_i is negative
     */
    public static FactorCovariance of(double[] loadings, double[] factorCovariance, double[] specific) {
        Objects.requireNonNull(loadings, "loadings");
        Objects.requireNonNull(factorCovariance, "factor covariance");
        Objects.requireNonNull(specific, "specific variances");
        int n = specific.length;
        int k = (int) Math.round(Math.sqrt(factorCovariance.length));
        if (k * k != factorCovariance.length) {
            throw new IllegalArgumentException("factor covariance (" + factorCovariance.length
                    + " values) must be K*K");
        }
        if (loadings.length != n * k) {
            throw new IllegalArgumentException("loadings (" + loadings.length + " values) must be n*K with n = "
                    + n + ", K = " + k);
        }
        checkFinite("loadings", loadings);
        checkFinite("factor covariance", factorCovariance);
        for (int a = 0; a < k; a++) {
            for (int b = a + 1; b < k; b++) {
                if (factorCovariance[a * k + b] != factorCovariance[b * k + a]) {
                    throw new IllegalArgumentException("factor covariance is not symmetric at (" + a + ", " + b + "): "
                            + factorCovariance[a * k + b] + " vs " + factorCovariance[b * k + a]);
                }
            }
        }
        for (int i = 0; i < n; i++) {
            if (!(specific[i] >= 0) || !Double.isFinite(specific[i])) {
                throw new IllegalArgumentException("specific variance of asset " + i + " (" + specific[i]
                        + ") must be finite and >= 0");
            }
        }
        return new FactorCovariance(n, k, loadings, factorCovariance, specific, OptionalDouble.empty());
    }

    /** n. */
    @Override
    public int size() {
        return n;
    }

    /** K, the number of factors. */
    @Override
    public int factorCount() {
        return k;
    }

    /** B, n×K row-major (read-only). */
    @Override
    public double[] loadings() {
        return loadings;
    }

    /** Σ_F, K×K row-major, symmetric (read-only). */
    @Override
    public double[] factorCovariance() {
        return factorCovariance;
    }

    /** d, the specific variances, length n, each ≥ 0 (read-only). */
    @Override
    public double[] specificVariances() {
        return specific;
    }

    /** Σ_ij = b_i' Σ_F b_j, plus d_i when i = j. O(K²). */
    @Override
    public double get(int i, int j) {
        Objects.checkIndex(i, n);
        Objects.checkIndex(j, n);
        int lo = Math.min(i, j);
        int hi = Math.max(i, j);
        double v = 0;
        if (diagonalFactors) {
            for (int a = 0; a < k; a++) {
                v += loadings[lo * k + a] * factorCovariance[a * k + a] * loadings[hi * k + a];
            }
            return i == j ? v + specific[i] : v;
        }
        for (int b = 0; b < k; b++) {
            double row = 0;
            for (int a = 0; a < k; a++) {
                row += loadings[lo * k + a] * factorCovariance[a * k + b];
            }
            v += row * loadings[hi * k + b];
        }
        return i == j ? v + specific[i] : v;
    }

    /**
     * The n×n matrix B Σ_F B' + diag(d), row-major, both triangles, built once on first request:
     * C = B Σ_F first (O(nK²)), then Σ_ij = c_i'b_j for j ≥ i, mirrored (O(n²K)). Entries equal
     * {@link #get} bit for bit.
     */
    @Override
    public double[] dense() {
        if (dense == null) {
            double[] c = FactorForm.loadingsTimesFactors(loadings, factorCovariance, n, k);
            double[] m = new double[n * n];
            for (int i = 0; i < n; i++) {
                for (int j = i; j < n; j++) {
                    double v = 0;
                    for (int b = 0; b < k; b++) {
                        v += c[i * k + b] * loadings[j * k + b];
                    }
                    m[i * n + j] = v;
                    m[j * n + i] = v;
                }
                m[i * n + i] += specific[i];
            }
            dense = m;
        }
        return dense;
    }

    /** w'Σw = (B'w)' Σ_F (B'w) + Σ_i d_i w_i², in O(nK + K²) without the dense matrix. */
    @Override
    public double portfolioVariance(double[] w) {
        checkLength("weights", w);
        double[] exposure = exposures(w);
        double common = 0;
        for (int a = 0; a < k; a++) {
            double row = 0;
            for (int b = 0; b < k; b++) {
                row += factorCovariance[a * k + b] * exposure[b];
            }
            common += exposure[a] * row;
        }
        double own = 0;
        for (int i = 0; i < n; i++) {
            own += specific[i] * w[i] * w[i];
        }
        return common + own;
    }

    /** Σv = B (Σ_F (B'v)) + d∘v, in O(nK + K²) without the dense matrix, into a new array. */
    public double[] multiply(double[] v) {
        checkLength("vector", v);
        double[] exposure = exposures(v);
        double[] f = new double[k];
        for (int a = 0; a < k; a++) {
            double s = 0;
            for (int b = 0; b < k; b++) {
                s += factorCovariance[a * k + b] * exposure[b];
            }
            f[a] = s;
        }
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            double s = specific[i] * v[i];
            for (int a = 0; a < k; a++) {
                s += loadings[i * k + a] * f[a];
            }
            out[i] = s;
        }
        return out;
    }

    /** B'v, the factor exposures of v, length K. O(nK). */
    public double[] exposures(double[] v) {
        checkLength("vector", v);
        double[] e = new double[k];
        for (int i = 0; i < n; i++) {
            double vi = v[i];
            if (vi == 0) {
                continue;
            }
            for (int a = 0; a < k; a++) {
                e[a] += loadings[i * k + a] * vi;
            }
        }
        return e;
    }

    private void checkLength(String role, double[] v) {
        if (v.length != n) {
            throw new IllegalArgumentException(role + " (" + v.length + ") must have length n (" + n + ")");
        }
    }

    private static void checkFinite(String role, double[] values) {
        for (int i = 0; i < values.length; i++) {
            if (!Double.isFinite(values[i])) {
                throw new IllegalArgumentException(role + "[" + i + "] (" + values[i] + ") must be finite");
            }
        }
    }
}
