package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.EstimationWindow;

/**
 * A k-factor statistical model (Connor &amp; Korajczyk 1986, as compared in Chan, Karceski &amp;
 * Lakonishok 1999; Method §11): the k largest eigenpairs (V_k, Λ_k) of the sample matrix S and
 * Σ = V_k Λ_k V_k' + diag(d), d_i = S_ii - (V_k Λ_k V_k')_ii, so the diagonal equals S's. The
 * estimate is a {@link FactorCovariance} with B = V_k and Σ_F = Λ_k. Mathematically d_i ≥ 0 (the
 * discarded eigenpairs' share of S_ii); a rounding-negative value is set to 0.
 *
 * @param components k ≥ 1; a window with fewer than k non-null sample eigenvalues
 *                   (min(n, L-1) &lt; k) cannot support the model
 */
public record PrincipalComponentsRiskModel(int components) implements RiskModel {

    public PrincipalComponentsRiskModel {
        if (!(components >= 1)) {
            throw new IllegalArgumentException("components (" + components + ") must be >= 1");
        }
    }

    /**
     * @throws IllegalArgumentException when min(n, L-1) &lt; k
     */
    @Override
    public FactorCovariance estimate(EstimationWindow window) {
        CentredWindow centred = new CentredWindow(window);
        int n = centred.assets();
        if (Math.min(n, centred.length() - 1) < components) {
            throw new IllegalArgumentException("components (" + components + ") must be at most min(n, L-1) = "
                    + Math.min(n, centred.length() - 1) + " (n = " + n + " assets, L = " + centred.length() + ")");
        }
        SampleEigen eigen = SampleEigen.largest(centred, components);
        double[] v = eigen.vectors();
        double[] lambda = new double[components * components];
        for (int a = 0; a < components; a++) {
            lambda[a * components + a] = eigen.value(a);
        }
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            double common = 0;
            for (int a = 0; a < components; a++) {
                double via = v[i * components + a];
                common += via * via * eigen.value(a);
            }
            d[i] = Math.max(0.0, window.moments().covariance(i, i) - common);
        }
        return FactorCovariance.of(v, lambda, d);
    }

    /** The residuals' regressors per asset: the intercept and the k components (Method §11). */
    public int regressors() {
        return components + 1;
    }

    /** Only when n ≤ L: with more assets than rows the eigenpairs come from the L×L dual ({@link SampleEigen}). */
    @Override
    public boolean needsDenseMoments(int window, int assets) {
        return assets <= window;
    }

    @Override
    public String label() {
        return "principal components (" + components + ")";
    }
}
