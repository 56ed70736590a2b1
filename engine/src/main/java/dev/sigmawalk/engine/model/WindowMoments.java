package dev.sigmawalk.engine.model;

import dev.sigmawalk.engine.moments.CrossProducts;
import java.util.function.Supplier;

/**
 * Sample moments of one estimation window's excess returns, computed once and shared by every
 * model that uses them. Divisors are L-1 (unbiased), as in Method §3. Arrays are owned by this
 * object and must not be modified by callers.
 *
 * <p>The cheap parts, O(n) numbers computed in O(L n), are always present: the means x̄_i, the
 * market's mean m̄ and variance s_mm, each asset's variance S_ii and covariance with the market
 * s_im. The dense n×n matrix S is either handed in (from the running sums, when a consumer of
 * the window declared that it needs it) or computed from the window's rows on first request,
 * once, under this object's lock, in O(L n²); its diagonal is then the variances already
 * published, so {@link #variance} and {@link #covariance(int, int)} never disagree.
 */
public final class WindowMoments {
    private final int assets;
    private final int length;
    private final double[] mean;
    private final double marketMean;
    private final double marketVariance;
    private final double[] marketCovariance;
    private final double[] variances;
    private final DenseProof proof;
    private Supplier<double[]> denseSource;
    private double[] covariance;

    /**
     * Moments with the dense matrix given.
     *
     * @param assets n
     * @param length L
     * @param mean x̄_i, length n
     * @param marketMean m̄
     * @param marketVariance s_mm = 1/(L-1) Σ (m_t - m̄)²
     * @param marketCovariance s_im = 1/(L-1) Σ (x_ti - x̄_i)(m_t - m̄), length n
     * @param covariance S, n×n row-major, both triangles filled; its diagonal gives the variances
     */
    public WindowMoments(int assets, int length, double[] mean, double marketMean, double marketVariance,
                         double[] marketCovariance, double[] covariance) {
        this(assets, length, mean, marketMean, marketVariance, marketCovariance, diagonal(covariance, assets),
                covariance, null, DenseProof.UNPROVEN);
    }

    /**
     * As the public constructor, for a producer that stores each S_ji as the very double it
     * computed for S_ij ({@link DenseProof#MIRRORED}): consumers then skip proving S symmetric,
     * and finite too when {@code finite} says its write loop saw every value finite. Any other
     * caller uses the constructor, which promises nothing.
     */
    public static WindowMoments mirrored(int assets, int length, double[] mean, double marketMean,
                                         double marketVariance, double[] marketCovariance, double[] covariance,
                                         boolean finite) {
        return new WindowMoments(assets, length, mean, marketMean, marketVariance, marketCovariance,
                diagonal(covariance, assets), covariance, null, DenseProof.mirrored(finite));
    }

    private WindowMoments(int assets, int length, double[] mean, double marketMean, double marketVariance,
                          double[] marketCovariance, double[] variances, double[] covariance,
                          Supplier<double[]> denseSource, DenseProof proof) {
        if (!(length >= 2)) {
            throw new IllegalArgumentException("window length (" + length + ") must be >= 2");
        }
        if (mean.length != assets || marketCovariance.length != assets || variances.length != assets
                || (covariance != null && covariance.length != assets * assets)) {
            throw new IllegalArgumentException("moment arrays do not match n = " + assets);
        }
        this.assets = assets;
        this.length = length;
        this.mean = mean;
        this.marketMean = marketMean;
        this.marketVariance = marketVariance;
        this.marketCovariance = marketCovariance;
        this.variances = variances;
        this.covariance = covariance;
        this.denseSource = denseSource;
        this.proof = proof;
    }

    private static double[] diagonal(double[] covariance, int n) {
        if (covariance.length != n * n) {
            throw new IllegalArgumentException("covariance (" + covariance.length + " values) must be n*n with n = " + n);
        }
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            d[i] = covariance[i * n + i];
        }
        return d;
    }

    /** n. */
    public int assets() {
        return assets;
    }

    /** L. */
    public int length() {
        return length;
    }

    /** x̄_i, length n (read-only). */
    public double[] mean() {
        return mean;
    }

    /** m̄. */
    public double marketMean() {
        return marketMean;
    }

    /** s_mm. */
    public double marketVariance() {
        return marketVariance;
    }

    /** s_im, length n (read-only). */
    public double[] marketCovariance() {
        return marketCovariance;
    }

    /** S_ii, O(1) without the dense matrix. */
    public double variance(int i) {
        return variances[i];
    }

    /** S_ii for every asset, length n (read-only). */
    public double[] variances() {
        return variances;
    }

    /** Whether the dense matrix is already at hand (asking for it then costs nothing). */
    public synchronized boolean hasCovariance() {
        return covariance != null;
    }

    /**
     * S, n×n row-major, both triangles (read-only). Built from the window's rows on the first
     * request when it was not handed in: O(L n²) time and 8n² bytes.
     */
    public synchronized double[] covariance() {
        if (covariance == null) {
            double[] s = denseSource.get();
            for (int i = 0; i < assets; i++) {
                s[i * assets + i] = variances[i];
            }
            covariance = s;
            denseSource = null;
        }
        return covariance;
    }

    /** What the producer of S proved about it (symmetry, finiteness); the diagonal fix-ups keep it. */
    public DenseProof covarianceProof() {
        return proof;
    }

    /** S_ij; the diagonal without the dense matrix, other entries through {@link #covariance()}. */
    public double covariance(int i, int j) {
        return i == j ? variances[i] : covariance()[i * assets + j];
    }

    /** These moments with the market's variance and every asset's covariance with it set to exactly 0. */
    public synchronized WindowMoments withConstantMarket() {
        return new WindowMoments(assets, length, mean, marketMean, 0.0, new double[assets], variances, covariance,
                denseSource, proof);
    }

    /**
     * Computes the moments directly from a window in two passes: the means, then the centred
     * cross-products S = 1/(L-1) Σ_t (x_t - x̄)(x_t - x̄)' of the upper triangle (mirrored),
     * s_im and s_mm the same way. O(L n²), through the cache-blocked
     * {@link CrossProducts#accumulate} kernel. Non-finite input gives non-finite moments.
     */
    public static WindowMoments of(EstimationWindow w) {
        Centred c = Centred.of(w.excessReturns(), w.marketExcess(), w.assetCount());
        return mirrored(c.n, c.len, c.mean, c.marketMean, c.smm, c.sim, c.dense(), false);
    }

    /**
     * The cheap moments of a window, O(L n) time and O(n) memory beyond the rows; the dense S
     * is built from the same rows only if someone asks for it ({@link #covariance()}). The
     * variances are Σ_t (x_ti − x̄_i)²/(L−1) summed in row order.
     *
     * @param excess L×n row-major excess returns (not copied; must not change afterwards)
     * @param market L market excess returns
     * @param n assets
     */
    public static WindowMoments withoutCovariance(double[] excess, double[] market, int n) {
        Centred c = Centred.of(excess, market, n);
        double[] variances = c.variances();
        return new WindowMoments(n, c.len, c.mean, c.marketMean, c.smm, c.sim, variances, null,
                () -> Centred.of(excess, market, n).dense(), DenseProof.MIRRORED);
    }

    /** A window's centred rows and the moments of the market, from the two-pass computation. */
    private static final class Centred {
        final int n;
        final int len;
        final double[] mean;
        final double marketMean;
        final double smm;
        final double[] sim;
        final double[] rows;

        private Centred(int n, int len, double[] mean, double marketMean, double smm, double[] sim, double[] rows) {
            this.n = n;
            this.len = len;
            this.mean = mean;
            this.marketMean = marketMean;
            this.smm = smm;
            this.sim = sim;
            this.rows = rows;
        }

        static Centred of(double[] x, double[] m, int n) {
            int len = m.length;
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
            double div = len - 1.0;
            for (int i = 0; i < n; i++) {
                sim[i] /= div;
            }
            return new Centred(n, len, mean, mMean, smm / div, sim, centred);
        }

        /** Σ_t x̃_ti² / (L−1), in row order. */
        double[] variances() {
            double[] v = new double[n];
            for (int t = 0; t < len; t++) {
                int base = t * n;
                for (int i = 0; i < n; i++) {
                    double xi = rows[base + i];
                    v[i] += xi * xi;
                }
            }
            double div = len - 1.0;
            for (int i = 0; i < n; i++) {
                v[i] /= div;
            }
            return v;
        }

        /** S through the blocked kernel, upper triangle mirrored: each S_ji stored as S_ij ({@link DenseProof#MIRRORED}). */
        double[] dense() {
            double[] s = new double[n * n];
            CrossProducts.accumulate(rows, rows, len, n, s);
            double div = len - 1.0;
            for (int i = 0; i < n; i++) {
                for (int j = i; j < n; j++) {
                    double v = s[i * n + j] / div;
                    s[i * n + j] = v;
                    s[j * n + i] = v;
                }
            }
            return s;
        }
    }
}
