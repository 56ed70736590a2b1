package dev.sigmawalk.strategies.risk;

/**
 * The eigenvalue map of Ledoit &amp; Wolf (2020, "Analytical nonlinear shrinkage of large-dimensional
 * covariance matrices", Annals of Statistics 48(5)) with the Epanechnikov kernel, as Method §11
 * writes it: the sample eigenvalues' density f̃ and its Hilbert transform H̃ are estimated with a
 * variable bandwidth h_j = h λ_j, h = N^(-1/3), and each eigenvalue is replaced by the
 * oracle-approximating d̃_i of the paper's eq. (4.9) (n ≤ N) or of §4.5 (n &gt; N).
 */
final class AnalyticalShrinkage {
    private static final double ROOT5 = Math.sqrt(5.0);
    /** Beyond this |x| the closed form of H_K cancels catastrophically; the series is used. */
    private static final double SERIES_FROM = 4.0 * ROOT5;

    private AnalyticalShrinkage() {
    }

    /**
     * The shrunk eigenvalues.
     *
     * @param lambda the m = min(n, N) largest sample eigenvalues, each finite and > 0
     * @param n assets
     * @param sampleSize N = L - 1 (the demeaned window's degrees of freedom)
     * @return d̃_1..d̃_m aligned with {@code lambda}, then (only when n &gt; N) d̃_0 for the n - N
     *         null eigenvalues as the last element
     * @throws IllegalArgumentException when an eigenvalue is not positive, or when n &gt; N and
     *                                  √5 h ≥ 1 (N &lt; 12), where H̃(0) is undefined
     */
    static double[] shrink(double[] lambda, int n, int sampleSize) {
        int m = lambda.length;
        for (int j = 0; j < m; j++) {
            if (!(lambda[j] > 0) || !Double.isFinite(lambda[j])) {
                throw new IllegalArgumentException("sample eigenvalue " + (j + 1) + " (" + lambda[j]
                        + ") must be finite and > 0 for nonlinear shrinkage; some combination of the assets has no"
                        + " variance in the window");
            }
        }
        double h = Math.pow(sampleSize, -1.0 / 3.0);
        double c = (double) n / sampleSize;
        boolean wide = n > sampleSize;
        if (wide && !(ROOT5 * h < 1)) {
            throw new IllegalArgumentException("nonlinear shrinkage with n (" + n + ") > N (" + sampleSize
                    + ") needs sqrt(5) N^(-1/3) < 1, that is a window of at least 13 rows; the window has "
                    + (sampleSize + 1));
        }
        double[] out = new double[wide ? m + 1 : m];
        for (int i = 0; i < m; i++) {
            double f = 0;
            double hilbert = 0;
            for (int j = 0; j < m; j++) {
                double hj = h * lambda[j];
                double x = (lambda[i] - lambda[j]) / hj;
                f += kernel(x) / hj;
                hilbert += hilbertOfKernel(x) / hj;
            }
            f /= m;
            hilbert /= m;
            double li = lambda[i];
            if (wide) {
                out[i] = li / (Math.PI * Math.PI * li * li * (f * f + hilbert * hilbert));
            } else {
                double a = Math.PI * c * li * f;
                double b = 1.0 - c - Math.PI * c * li * hilbert;
                out[i] = li / (a * a + b * b);
            }
        }
        if (wide) {
            out[m] = 1.0 / (Math.PI * ((double) (n - sampleSize) / sampleSize) * hilbertAtZero(lambda, h));
        }
        return out;
    }

    /** K(x) = 3/(4√5) max(1 - x²/5, 0), the Epanechnikov kernel with unit variance. */
    static double kernel(double x) {
        return 3.0 / (4.0 * ROOT5) * Math.max(1.0 - x * x / 5.0, 0.0);
    }

    /**
     * H_K(x) = -3x/(10π) + 3/(4√5 π) (1 - x²/5) log|(√5 - x)/(√5 + x)|, which is -3x/(10π) at
     * |x| = √5. For |x| &gt; 4√5 the two terms nearly cancel, so there the exact series
     * H_K(x) = -(3/(√5 π)) Σ_{k≥1} u^(2k-1)/(4k² - 1), u = √5/x, is summed instead (|u| &lt; 1/4:
     * each term is at most 1/16 of the one before, so 14 terms reach double precision).
     */
    static double hilbertOfKernel(double x) {
        double ax = Math.abs(x);
        if (ax > SERIES_FROM) {
            double u = ROOT5 / x;
            double u2 = u * u;
            double power = u;
            double sum = 0;
            for (int k = 1; k <= 30; k++) {
                double term = power / (4.0 * k * k - 1.0);
                sum += term;
                if (Math.abs(term) <= 1e-18 * Math.abs(sum)) {
                    break;
                }
                power *= u2;
            }
            return -3.0 / (ROOT5 * Math.PI) * sum;
        }
        double linear = -3.0 * x / (10.0 * Math.PI);
        if (ax == ROOT5) {
            return linear;
        }
        return linear + 3.0 / (4.0 * ROOT5 * Math.PI) * (1.0 - x * x / 5.0)
                * Math.log(Math.abs((ROOT5 - x) / (ROOT5 + x)));
    }

    /**
     * H̃(0) = (1/π) [3/(10h²) + 3/(4√5 h) (1 - 1/(5h²)) log((1 + √5h)/(1 - √5h))] · mean_j(1/λ_j),
     * the Hilbert transform of the null eigenvalues' density at 0 (Ledoit &amp; Wolf 2020, §4.5).
     */
    static double hilbertAtZero(double[] lambda, double h) {
        double meanInverse = 0;
        for (double l : lambda) {
            meanInverse += 1.0 / l;
        }
        meanInverse /= lambda.length;
        double bracket = 3.0 / (10.0 * h * h)
                + 3.0 / (4.0 * ROOT5 * h) * (1.0 - 1.0 / (5.0 * h * h)) * Math.log((1.0 + ROOT5 * h) / (1.0 - ROOT5 * h));
        return bracket / Math.PI * meanInverse;
    }
}
