package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.WindowMoments;
import dev.sigmawalk.strategies.optimize.SingleFactorForm;

import java.util.Objects;

/**
 * The single-index covariance Σ_SI = s_mm ββ' + diag(d) in factor form (Sharpe 1963; Method §3).
 *
 * <p>Fitted from a window's sample moments (all with divisor L-1): β_i = s_im / s_mm,
 * α_i = x̄_i - β_i m̄, d_i = S_ii - β_i² s_mm. Because s_mm β_i² + d_i = S_ii, the diagonal equals
 * the sample variances. Mathematically d_i = S_ii (1 - corr(x_i, m)²) ≥ 0; a negative value can
 * only come from rounding when an asset moves exactly with the market, and is set to 0 (so the
 * diagonal can differ from S_ii by that rounding only).
 *
 * <p>Only O(n) numbers are stored. {@link #portfolioVariance} and {@link #solve} work in O(n);
 * {@link #dense()} builds the n×n matrix once, on first request. Instances are not meant to be
 * shared between threads while {@link #dense()} is first being built.
 */
public final class SingleIndexCovariance implements CovarianceEstimate, SingleFactorForm {
    private final double marketVariance;
    private final double[] alpha;
    private final double[] beta;
    private final double[] residualVariance;
    private double[] dense;

    private SingleIndexCovariance(double marketVariance, double[] alpha, double[] beta, double[] residualVariance) {
        this.marketVariance = marketVariance;
        this.alpha = alpha;
        this.beta = beta;
        this.residualVariance = residualVariance;
    }

    /**
     * Fits the market model to a window's moments.
     *
     * @throws IllegalArgumentException when s_mm is not positive and finite (β is then undefined),
     *                                  or a moment is not finite
     */
    public static SingleIndexCovariance fit(WindowMoments moments) {
        Objects.requireNonNull(moments, "moments");
        double smm = moments.marketVariance();
        if (!(smm > 0) || !Double.isFinite(smm)) {
            throw new IllegalArgumentException("market variance in the window (" + smm
                    + ") must be finite and > 0 for the single-index model");
        }
        int n = moments.assets();
        double[] alpha = new double[n];
        double[] beta = new double[n];
        double[] resid = new double[n];
        for (int i = 0; i < n; i++) {
            double b = moments.marketCovariance()[i] / smm;
            double sii = moments.covariance(i, i);
            alpha[i] = moments.mean()[i] - b * moments.marketMean();
            beta[i] = b;
            // Rounding can make S_ii - β² s_mm slightly negative when corr(x_i, m) = ±1.
            resid[i] = Math.max(0.0, sii - b * b * smm);
            if (!Double.isFinite(alpha[i]) || !Double.isFinite(resid[i])) {
                throw new IllegalArgumentException("single-index fit of asset " + i + " (alpha " + alpha[i]
                        + ", residual variance " + resid[i] + ") must be finite");
            }
        }
        return new SingleIndexCovariance(smm, alpha, beta, resid);
    }

    /** n. */
    @Override
    public int size() {
        return beta.length;
    }

    /** Σ_ij = s_mm β_i β_j, plus d_i when i = j. O(1). */
    @Override
    public double get(int i, int j) {
        Objects.checkIndex(i, beta.length);
        Objects.checkIndex(j, beta.length);
        // β_i β_j first, so that Σ_ij and Σ_ji round identically.
        double common = marketVariance * (beta[i] * beta[j]);
        return i == j ? common + residualVariance[i] : common;
    }

    /** The n×n matrix s_mm ββ' + diag(d), row-major, built once on first request. */
    @Override
    public double[] dense() {
        if (dense == null) {
            int n = beta.length;
            double[] m = new double[n * n];
            for (int i = 0; i < n; i++) {
                int row = i * n;
                for (int j = 0; j < n; j++) {
                    m[row + j] = marketVariance * (beta[i] * beta[j]);
                }
                m[row + i] += residualVariance[i];
            }
            dense = m;
        }
        return dense;
    }

    /** w'Σw = s_mm (β'w)² + Σ_i d_i w_i², in O(n) without the dense matrix. */
    @Override
    public double portfolioVariance(double[] w) {
        checkLength("weights", w);
        double exposure = 0;
        double specific = 0;
        for (int i = 0; i < w.length; i++) {
            exposure += beta[i] * w[i];
            specific += residualVariance[i] * w[i] * w[i];
        }
        return marketVariance * exposure * exposure + specific;
    }

    /**
     * Σ⁻¹b in O(n) by the Sherman-Morrison-Woodbury identity for a rank-one update of a diagonal:
     * with Σ = D + s ββ', Σ⁻¹b = D⁻¹b - D⁻¹β (β'D⁻¹b) s / (1 + s β'D⁻¹β).
     *
     * @throws ArithmeticException when some d_i is 0 (an asset moving exactly with the market),
     *                             which makes Σ singular or the identity inapplicable
     */
    public double[] solve(double[] b) {
        checkLength("right-hand side", b);
        int n = beta.length;
        double[] out = new double[n];
        double betaDb = 0;
        double betaDbeta = 0;
        for (int i = 0; i < n; i++) {
            double d = residualVariance[i];
            if (!(d > 0)) {
                throw new ArithmeticException("residual variance of asset " + i + " (" + d
                        + ") must be > 0 to invert the single-index matrix");
            }
            out[i] = b[i] / d;
            betaDb += beta[i] * out[i];
            betaDbeta += beta[i] * beta[i] / d;
        }
        double scale = betaDb * marketVariance / (1.0 + marketVariance * betaDbeta);
        for (int i = 0; i < n; i++) {
            out[i] -= beta[i] / residualVariance[i] * scale;
        }
        return out;
    }

    /** s_mm, the market's sample variance (divisor L-1). */
    public double marketVariance() {
        return marketVariance;
    }

    /** α_i = x̄_i - β_i m̄ (read-only). */
    public double[] alphas() {
        return alpha;
    }

    /** β_i = s_im / s_mm (read-only). */
    public double[] betas() {
        return beta;
    }

    /** d_i = S_ii - β_i² s_mm, ≥ 0 (read-only). */
    public double[] residualVariances() {
        return residualVariance;
    }

    /** s_mm, the factor's variance. */
    @Override
    public double factorVariance() {
        return marketVariance;
    }

    /** β. */
    @Override
    public double[] loadings() {
        return beta;
    }

    /** d. */
    @Override
    public double[] specificVariances() {
        return residualVariance;
    }

    private void checkLength(String role, double[] v) {
        if (v.length != beta.length) {
            throw new IllegalArgumentException(role + " (" + v.length + ") must have length n (" + beta.length + ")");
        }
    }
}
