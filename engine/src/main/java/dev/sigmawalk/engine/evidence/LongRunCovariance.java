package dev.sigmawalk.engine.evidence;

import java.util.Objects;

/**
 * Kernel (HAC) estimate of the long-run covariance Ψ of a stationary d-vector series y_t,
 * t = 1..T, so that the variance of its mean is approximately Ψ / T.
 *
 * <pre>
 *   Γ(j) = (1/T) Σ_{t=j+1}^{T} (y_t - ȳ)(y_{t-j} - ȳ)',   j >= 0   (divisor T, not T - j),
 *   Ψ    = Γ(0) + Σ_{j=1}^{T-1} k(j / S) (Γ(j) + Γ(j)'),
 * </pre>
 * with kernel k and bandwidth S (Andrews 1991, Econometrica 59, 817-858, without his small
 * sample factor T/(T - r), which callers that estimate r parameters apply themselves). The
 * Bartlett kernel with S = ℓ + 1 is Newey &amp; West (1987). S = 0 keeps Γ(0) alone, the iid
 * case. Ψ is symmetric and, for both kernels offered, positive semi-definite.
 *
 * @param dimension d
 * @param length T
 * @param kernel k
 * @param bandwidth S >= 0
 * @param matrix Ψ, d×d row-major; owned by the record, not to be modified
 */
public record LongRunCovariance(int dimension, int length, HacKernel kernel, double bandwidth, double[] matrix) {
    public LongRunCovariance {
        Objects.requireNonNull(kernel, "kernel");
        if (!(dimension >= 1) || matrix.length != dimension * dimension) {
            throw new IllegalArgumentException("long-run covariance must be d×d with d (" + dimension + ") >= 1, got "
                    + matrix.length + " entries");
        }
        if (!(length >= 2)) {
            throw new IllegalArgumentException("series length (" + length + ") must be >= 2");
        }
        if (!(bandwidth >= 0) || Double.isInfinite(bandwidth)) {
            throw new IllegalArgumentException("bandwidth (" + bandwidth + ") must be finite and >= 0");
        }
    }

    /**
     * Ψ with a bandwidth chosen by Andrews' AR(1) plug-in rule for the kernel
     * ({@link AndrewsBandwidth}).
     *
     * @param components d series of equal length T >= 2, finite values
     */
    public static LongRunCovariance automatic(double[][] components, HacKernel kernel) {
        double[][] centred = centred(components);
        return estimate(centred, kernel, AndrewsBandwidth.of(centred, kernel));
    }

    /**
     * Ψ with a given bandwidth S (for Newey-West with ℓ lags pass S = ℓ + 1 and
     * {@link HacKernel#BARTLETT}).
     */
    public static LongRunCovariance fixed(double[][] components, HacKernel kernel, double bandwidth) {
        return estimate(centred(components), kernel, bandwidth);
    }

    /** HAC variance of the mean of one series with automatic bandwidth: Ψ / T. */
    public static double varianceOfMean(double[] series, HacKernel kernel) {
        LongRunCovariance psi = automatic(new double[][] {series}, kernel);
        return psi.varianceOfMean(0, 0);
    }

    /** Ψ_ij. */
    public double entry(int i, int j) {
        return matrix[i * dimension + j];
    }

    /** Cov(ȳ_i, ȳ_j) ≈ Ψ_ij / T. */
    public double varianceOfMean(int i, int j) {
        return entry(i, j) / length;
    }

    /** g'Ψg, the long-run variance of the linear combination g'y_t. */
    public double quadraticForm(double[] g) {
        if (g.length != dimension) {
            throw new IllegalArgumentException("gradient length (" + g.length + ") must be d (" + dimension + ")");
        }
        double q = 0;
        for (int i = 0; i < dimension; i++) {
            double row = 0;
            for (int j = 0; j < dimension; j++) {
                row += matrix[i * dimension + j] * g[j];
            }
            q += g[i] * row;
        }
        return q;
    }

    private static LongRunCovariance estimate(double[][] centred, HacKernel kernel, double bandwidth) {
        Objects.requireNonNull(kernel, "kernel");
        if (!(bandwidth >= 0) || Double.isInfinite(bandwidth)) {
            throw new IllegalArgumentException("bandwidth (" + bandwidth + ") must be finite and >= 0");
        }
        int d = centred.length;
        int length = centred[0].length;
        double[] psi = new double[d * d];
        int maxLag = (int) Math.min(length - 1, Math.ceil(bandwidth));
        for (int lag = 0; lag <= maxLag; lag++) {
            double w = lag == 0 ? 1.0 : kernel.weight(lag / bandwidth);
            if (w == 0.0) {
                continue;
            }
            for (int a = 0; a < d; a++) {
                for (int b = 0; b < d; b++) {
                    double gamma = autocovariance(centred[a], centred[b], lag);
                    // Γ(j)_ab + Γ(j)'_ab = Γ(j)_ab + Γ(j)_ba; the lag-0 term enters once.
                    psi[a * d + b] += w * gamma;
                    if (lag > 0) {
                        psi[b * d + a] += w * gamma;
                    }
                }
            }
        }
        return new LongRunCovariance(d, length, kernel, bandwidth, psi);
    }

    /** Γ(j)_ab = (1/T) Σ_{t=j}^{T-1} y_{t,a} y_{t-j,b} (zero-based t). */
    private static double autocovariance(double[] a, double[] b, int lag) {
        double s = 0;
        for (int t = lag; t < a.length; t++) {
            s += a[t] * b[t - lag];
        }
        return s / a.length;
    }

    private static double[][] centred(double[][] components) {
        if (components == null || !(components.length >= 1)) {
            throw new IllegalArgumentException("a long-run covariance needs >= 1 component series");
        }
        int length = components[0] == null ? 0 : components[0].length;
        double[][] out = new double[components.length][];
        for (int a = 0; a < components.length; a++) {
            SeriesChecks.requireFinite("component " + a, components[a], 2);
            if (components[a].length != length) {
                throw new IllegalArgumentException("component " + a + " has " + components[a].length
                        + " values; component 0 has " + length);
            }
            double mean = 0;
            for (double v : components[a]) {
                mean += v;
            }
            mean /= length;
            double[] c = new double[length];
            for (int t = 0; t < length; t++) {
                c[t] = components[a][t] - mean;
            }
            out[a] = c;
        }
        return out;
    }
}
