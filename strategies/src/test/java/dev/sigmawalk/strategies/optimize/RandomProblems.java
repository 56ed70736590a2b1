package dev.sigmawalk.strategies.optimize;

import java.util.Random;

/** Seeded random test matrices: covariances of simulated returns and single-factor forms. */
public final class RandomProblems {
    private RandomProblems() {
    }

    /**
     * The 1/(T−1) sample covariance of T×n returns with one common factor and a spread of
     * volatilities, positive definite for T &gt; n.
     */
    public static double[] covariance(Random random, int n, int periods) {
        return sampleCovariance(returns(random, n, periods), periods, n);
    }

    /** T×n row-major returns with one common factor and a spread of volatilities. */
    public static double[] returns(Random random, int n, int periods) {
        double[] x = new double[periods * n];
        double[] loading = new double[n];
        double[] vol = new double[n];
        for (int i = 0; i < n; i++) {
            loading[i] = 0.2 + 1.3 * random.nextDouble();
            vol[i] = 0.02 + 0.06 * random.nextDouble();
        }
        for (int t = 0; t < periods; t++) {
            double f = 0.04 * random.nextGaussian();
            for (int i = 0; i < n; i++) {
                x[t * n + i] = loading[i] * f + vol[i] * random.nextGaussian();
            }
        }
        return x;
    }

    /** 1/(T−1) Σ (x_t − x̄)(x_t − x̄)'. */
    public static double[] sampleCovariance(double[] x, int periods, int n) {
        double[] mean = new double[n];
        for (int t = 0; t < periods; t++) {
            for (int i = 0; i < n; i++) {
                mean[i] += x[t * n + i] / periods;
            }
        }
        double[] s = new double[n * n];
        for (int t = 0; t < periods; t++) {
            for (int i = 0; i < n; i++) {
                double xi = x[t * n + i] - mean[i];
                for (int j = 0; j < n; j++) {
                    s[i * n + j] += xi * (x[t * n + j] - mean[j]) / (periods - 1);
                }
            }
        }
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < i; j++) {
                s[i * n + j] = s[j * n + i];
            }
        }
        return s;
    }

    /** A single-factor form with s in [0.001, 0.004], β in [−0.3, 1.8], d in [0.0005, 0.01]. */
    public static SingleFactorForm singleFactor(Random random, int n) {
        double s = 0.001 + 0.003 * random.nextDouble();
        double[] beta = new double[n];
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            beta[i] = -0.3 + 2.1 * random.nextDouble();
            d[i] = 0.0005 + 0.0095 * random.nextDouble();
        }
        return form(s, beta, d);
    }

    public static SingleFactorForm form(double s, double[] beta, double[] d) {
        return new SingleFactorForm() {
            @Override
            public double factorVariance() {
                return s;
            }

            @Override
            public double[] loadings() {
                return beta;
            }

            @Override
            public double[] specificVariances() {
                return d;
            }
        };
    }

    /** Expected returns around 0.005 per period with spread 0.01. */
    public static double[] expectedReturns(Random random, int n) {
        double[] mu = new double[n];
        for (int i = 0; i < n; i++) {
            mu[i] = 0.005 + 0.01 * random.nextGaussian();
        }
        return mu;
    }
}
