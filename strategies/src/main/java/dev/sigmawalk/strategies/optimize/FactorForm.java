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
}
