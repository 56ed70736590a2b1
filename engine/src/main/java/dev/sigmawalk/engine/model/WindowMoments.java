package dev.sigmawalk.engine.model;

import dev.sigmawalk.engine.moments.CrossProducts;

/**
 * Sample moments of one estimation window's excess returns, computed once and shared by every
 * model that uses them. Divisors are L-1 (unbiased), as in Method §3. Arrays are owned by this
 * record and must not be modified by callers.
 *
 * @param assets n
 * @param length L
 * @param mean x̄_i, length n
 * @param marketMean m̄
 * @param marketVariance s_mm = 1/(L-1) Σ (m_t - m̄)²
 * @param marketCovariance s_im = 1/(L-1) Σ (x_ti - x̄_i)(m_t - m̄), length n
 * @param covariance S, n×n row-major, both triangles filled
 */
public record WindowMoments(int assets, int length, double[] mean, double marketMean, double marketVariance,
                            double[] marketCovariance, double[] covariance) {
    public WindowMoments {
        if (!(length >= 2)) {
            throw new IllegalArgumentException("window length (" + length + ") must be >= 2");
        }
        if (mean.length != assets || marketCovariance.length != assets || covariance.length != assets * assets) {
            throw new IllegalArgumentException("moment arrays do not match n = " + assets);
        }
    }

    /** These moments with the market's variance and every asset's covariance with it set to exactly 0. */
    public WindowMoments withConstantMarket() {
        return new WindowMoments(assets, length, mean, marketMean, 0.0, new double[assets], covariance);
    }

    /** S_ij. */
    public double covariance(int i, int j) {
        return covariance[i * assets + j];
    }

    /**
     * Computes the moments directly from a window in two passes: the means, then the centred
     * cross-products S = 1/(L-1) Σ_t (x_t - x̄)(x_t - x̄)' of the upper triangle (mirrored),
     * s_im and s_mm the same way. O(L n²), through the cache-blocked
     * {@link CrossProducts#accumulate} kernel. Non-finite input gives non-finite moments.
     */
    public static WindowMoments of(EstimationWindow w) {
        int n = w.assetCount();
        int len = w.length();
        double[] x = w.excessReturns();
        double[] m = w.marketExcess();
        double[] mean = new double[n];
        double mMean = 0;
        for (int t = 0; t < len; t++) {
            mMean += m[t];
            int base = t * n;
            for (int i = 0; i < n; i++) {
                mean[i] += x[base + i];
            }
        }
        mMean /= len;
        for (int i = 0; i < n; i++) {
            mean[i] /= len;
        }
        double[] centred = new double[len * n];
        double smm = 0;
        double[] sim = new double[n];
        for (int t = 0; t < len; t++) {
            int base = t * n;
            double mt = m[t] - mMean;
            smm += mt * mt;
            for (int i = 0; i < n; i++) {
                double xi = x[base + i] - mean[i];
                centred[base + i] = xi;
                sim[i] += xi * mt;
            }
        }
        double[] s = new double[n * n];
        CrossProducts.accumulate(centred, centred, len, n, s);
        double div = len - 1.0;
        smm /= div;
        for (int i = 0; i < n; i++) {
            sim[i] /= div;
            for (int j = i; j < n; j++) {
                double v = s[i * n + j] / div;
                s[i * n + j] = v;
                s[j * n + i] = v;
            }
        }
        return new WindowMoments(n, len, mean, mMean, smm, sim, s);
    }
}
