package dev.sigmawalk.engine.evidence;

/**
 * Lag-window kernels k(x) for heteroskedasticity and autocorrelation consistent (HAC) long-run
 * covariances, each with its automatic bandwidth rule from Andrews (1991, Econometrica 59,
 * 817-858, §6; eq. numbers from memory: the optimal bandwidths are his (6.2)).
 *
 * <p>Both kernels have a non-negative spectral window, so the estimate they give is positive
 * semi-definite for any data and bandwidth.
 */
public enum HacKernel {
    /**
     * Bartlett: k(x) = 1 - |x| for |x| ≤ 1, else 0. With bandwidth S = ℓ + 1 this is the
     * Newey &amp; West (1987, Econometrica 55, 703-708) estimator with lag truncation ℓ.
     * Optimal bandwidth S* = 1.1447 (α(1) T)^{1/3}.
     */
    BARTLETT {
        @Override
        public double weight(double x) {
            double a = Math.abs(x);
            return a <= 1.0 ? 1.0 - a : 0.0;
        }

        @Override
        double optimalBandwidth(double alphaOne, double alphaTwo, int length) {
            return 1.1447 * Math.cbrt(alphaOne * length);
        }
    },
    /**
     * Parzen: k(x) = 1 - 6x² + 6|x|³ for |x| ≤ ½, 2(1 - |x|)³ for ½ ≤ |x| ≤ 1, else 0.
     * Optimal bandwidth S* = 2.6614 (α(2) T)^{1/5}.
     */
    PARZEN {
        @Override
        public double weight(double x) {
            double a = Math.abs(x);
            if (a <= 0.5) {
                return 1.0 - 6.0 * a * a + 6.0 * a * a * a;
            }
            if (a <= 1.0) {
                double c = 1.0 - a;
                return 2.0 * c * c * c;
            }
            return 0.0;
        }

        @Override
        double optimalBandwidth(double alphaOne, double alphaTwo, int length) {
            return 2.6614 * Math.pow(alphaTwo * length, 0.2);
        }
    };

    /** k(x); k(0) = 1, k(x) = 0 for |x| &gt; 1. */
    public abstract double weight(double x);

    /** Andrews' S* from his α(1) (Bartlett) or α(2) (Parzen) and the sample size T. */
    abstract double optimalBandwidth(double alphaOne, double alphaTwo, int length);

    /** The kernel's name in lower case, for method descriptions. */
    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
