package dev.sigmawalk.strategies.optimize;

/**
 * A covariance matrix with K common factors: Σ = B Σ_F B' + diag(d), with B the n×K loadings,
 * Σ_F the K×K factor covariance (symmetric positive semi-definite) and d the specific variances.
 * A sample covariance of L &lt; n rows is one too (B the centred rows, Σ_F = I/(L−1), d = 0).
 *
 * <p>The optimizer uses this form to solve on the K-dimensional side ({@link FactorMinVariance})
 * instead of the n×n matrix. Arrays are owned by the implementation and must not be modified.
 */
public interface FactorForm {
    /** K ≥ 0. */
    int factorCount();

    /** B, n×K row-major: asset i's loading on factor a at {@code i*K + a}. */
    double[] loadings();

    /** Σ_F, K×K row-major, symmetric. */
    double[] factorCovariance();

    /** d_i ≥ 0, length n. */
    double[] specificVariances();

    /**
     * C = B Σ_F (n×K row-major) for loadings B (n×K) and a factor covariance Σ_F (K×K):
     * O(nK²), or O(nK) when Σ_F is diagonal (as for a sample matrix or shrinkage handed on as its
     * centred rows, where K is the window length; the products are then b_ia σ_aa exactly).
     */
    static double[] loadingsTimesFactors(double[] b, double[] sf, int n, int k) {
        double[] c = new double[n * k];
        if (isDiagonal(sf, k)) {
            for (int i = 0; i < n; i++) {
                for (int a = 0; a < k; a++) {
                    c[i * k + a] = b[i * k + a] * sf[a * k + a];
                }
            }
            return c;
        }
        for (int i = 0; i < n; i++) {
            for (int a = 0; a < k; a++) {
                double v = 0;
                for (int e = 0; e < k; e++) {
                    v += b[i * k + e] * sf[e * k + a];
                }
                c[i * k + a] = v;
            }
        }
        return c;
    }

    /** Whether a K×K matrix is exactly 0 off its diagonal. */
    static boolean isDiagonal(double[] m, int k) {
        for (int a = 0; a < k; a++) {
            for (int e = 0; e < k; e++) {
                if (a != e && m[a * k + e] != 0) {
                    return false;
                }
            }
        }
        return true;
    }
}
