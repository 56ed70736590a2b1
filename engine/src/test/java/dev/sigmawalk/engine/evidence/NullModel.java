package dev.sigmawalk.engine.evidence;

import java.util.SplittableRandom;

/**
 * Shock distributions of the size study (all with mean 0 and variance 1): iid normal, iid Student
 * t with 5 degrees of freedom (kurtosis 9), and a GARCH(1,1) process with normal innovations,
 * σ_t² = ω + a e_{t-1}² + b σ_{t-1}², a = 0.10, b = 0.85, ω = 1 - a - b (Bollerslev 1986; the
 * parameters are common practice for monthly and daily returns, from memory), started from a
 * burn-in of 200 periods.
 */
enum NullModel {
    NORMAL("iid normal"),
    STUDENT_T5("iid t5"),
    GARCH("GARCH(1,1)");

    private static final double ARCH = 0.10;
    private static final double PERSISTENCE = 0.85;
    private static final int BURN_IN = 200;

    private final String label;

    NullModel(String label) {
        this.label = label;
    }

    String label() {
        return label;
    }

    /** One series of unit-variance shocks. */
    double[] series(SplittableRandom random, int length) {
        double[] x = new double[length];
        switch (this) {
            case NORMAL -> {
                for (int t = 0; t < length; t++) {
                    x[t] = normal(random);
                }
            }
            case STUDENT_T5 -> {
                for (int t = 0; t < length; t++) {
                    x[t] = studentFive(random);
                }
            }
            case GARCH -> {
                double[] v = volatility(random, length);
                for (int t = 0; t < length; t++) {
                    x[t] = v[t] * normal(random);
                }
            }
            default -> throw new IllegalStateException(name());
        }
        return x;
    }

    /**
     * Two aligned series with the same distribution and correlation ρ, so that every measure
     * compared (mean, variance, Sharpe ratio) is equal for both: under GARCH they share one
     * conditional volatility path, as two portfolios of the same market do.
     */
    double[][] pair(SplittableRandom random, int length, double correlation) {
        double[] u;
        double[] v;
        if (this == GARCH) {
            double[] s = volatility(random, length);
            u = new double[length];
            v = new double[length];
            for (int t = 0; t < length; t++) {
                // Unit-variance normal innovations scaled by the shared volatility.
                u[t] = s[t] * normal(random);
                v[t] = s[t] * normal(random);
            }
        } else {
            u = series(random, length);
            v = series(random, length);
        }
        double[] b = new double[length];
        double rest = Math.sqrt(1 - correlation * correlation);
        for (int t = 0; t < length; t++) {
            b[t] = correlation * u[t] + rest * v[t];
        }
        return new double[][] {u, b};
    }

    /** σ_t of a GARCH(1,1) path with normal innovations and unconditional variance 1. */
    private static double[] volatility(SplittableRandom random, int length) {
        double omega = 1 - ARCH - PERSISTENCE;
        double variance = 1;
        double previous = 0;
        double[] out = new double[length];
        for (int t = -BURN_IN; t < length; t++) {
            variance = omega + ARCH * previous * previous + PERSISTENCE * variance;
            double sd = Math.sqrt(variance);
            previous = sd * normal(random);
            if (t >= 0) {
                out[t] = sd;
            }
        }
        return out;
    }

    /** Box-Muller; SplittableRandom has no nextGaussian in Java 17. */
    static double normal(SplittableRandom random) {
        return Math.sqrt(-2 * Math.log(1 - random.nextDouble())) * Math.cos(2 * Math.PI * random.nextDouble());
    }

    /** t₅ = Z / √(χ²₅ / 5), scaled by √(3/5) to unit variance. */
    private static double studentFive(SplittableRandom random) {
        double chi = 0;
        for (int i = 0; i < 5; i++) {
            double g = normal(random);
            chi += g * g;
        }
        return normal(random) / Math.sqrt(chi / 5) * Math.sqrt(3.0 / 5.0);
    }
}
