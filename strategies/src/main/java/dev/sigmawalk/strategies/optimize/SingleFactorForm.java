package dev.sigmawalk.strategies.optimize;

/**
 * A covariance matrix with one common factor: Σ = s ββ' + diag(d), where s is the factor's
 * variance, β the assets' loadings on it and d their specific (residual) variances. The
 * single-index (market) model of Sharpe (1963) has this form with s = s_mm, the sample variance
 * of the market's excess return.
 *
 * <p>The optimizer uses this form for O(n) and O(n log n) minimum-variance solutions instead of
 * the O(n³) dense ones. Arrays are owned by the implementation and must not be modified.
 */
public interface SingleFactorForm {
    /** s, the variance of the common factor; finite and ≥ 0. */
    double factorVariance();

    /** β_i, the loading of asset i on the factor; length n. */
    double[] loadings();

    /** d_i, the specific variance of asset i; length n, each finite and ≥ 0. */
    double[] specificVariances();
}
