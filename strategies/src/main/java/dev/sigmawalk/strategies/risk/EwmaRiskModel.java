package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.DenseProof;
import dev.sigmawalk.engine.moments.CrossProducts;

import java.util.OptionalDouble;

/**
 * Exponentially weighted covariance with zero mean (RiskMetrics 1996 technical document; Method
 * §11): over the window rows t = τ-L+1..τ, ω_t = λ^(τ-t) / Σ_s λ^(τ-s) with λ = 0.5^(1/h), and
 * Σ = Σ_t ω_t x_t x_t'. The weights sum to 1 over the window, so the estimate is a weighted mean
 * of the outer products of raw excess returns; its diagonal is not S's. Cost O(L n²), through the
 * same blocked kernel as the window's moments, on the rows scaled by √ω_t.
 *
 * @param halfLife h, in periods: a row h periods older weighs half as much; finite and > 0
 */
public record EwmaRiskModel(double halfLife) implements RiskModel {

    public EwmaRiskModel {
        if (!(halfLife > 0) || !Double.isFinite(halfLife)) {
            throw new IllegalArgumentException("half_life (" + halfLife + ") must be finite and > 0");
        }
    }

    @Override
    public CovarianceEstimate estimate(EstimationWindow window) {
        int n = window.assetCount();
        int len = window.length();
        double[] weights = weights(len);
        double[] x = window.excessReturns();
        double[] scaled = new double[len * n];
        for (int t = 0; t < len; t++) {
            double root = Math.sqrt(weights[t]);
            int base = t * n;
            for (int i = 0; i < n; i++) {
                scaled[base + i] = root * x[base + i];
            }
        }
        double[] s = new double[n * n];
        CrossProducts.accumulate(scaled, scaled, len, n, s);
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                s[j * n + i] = s[i * n + j];
            }
        }
        return new DenseCovariance(n, s, OptionalDouble.empty(), DenseProof.UNPROVEN);
    }

    /**
     * ω_t for t = 0 (oldest) .. L-1 (row τ), summing to 1. λ^(τ-t) is formed as 0.5^((τ-t)/h)
     * directly rather than as a running product, so no rounding accumulates over long windows.
     */
    double[] weights(int length) {
        double[] w = new double[length];
        double total = 0;
        for (int t = 0; t < length; t++) {
            w[t] = Math.pow(0.5, (length - 1 - t) / halfLife);
            total += w[t];
        }
        for (int t = 0; t < length; t++) {
            w[t] /= total;
        }
        return w;
    }

    /** Never: the model works from the window's rows. */
    @Override
    public boolean needsDenseMoments(int window, int assets) {
        return false;
    }

    @Override
    public String label() {
        return "ewma (half-life " + Formats.number(halfLife) + ")";
    }
}
