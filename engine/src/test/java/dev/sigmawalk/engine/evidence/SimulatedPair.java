package dev.sigmawalk.engine.evidence;

import java.util.Random;

/**
 * Seeded bivariate normal return pairs for the difference tests: a_t = μ_a + σ_a u_t,
 * b_t = μ_b + σ_b (ρ u_t + √(1-ρ²) v_t), where (u, v) are independent standard normal
 * innovations, optionally AR(1) with coefficient φ and unit variance (u_t = φ u_{t-1} + √(1-φ²) ε_t).
 */
record SimulatedPair(double[] first, double[] second) {
    static SimulatedPair normal(long seed, int periods, double meanA, double meanB, double sdA, double sdB,
                                double correlation, double autocorrelation) {
        Random random = new Random(seed);
        double[] a = new double[periods];
        double[] b = new double[periods];
        double scale = Math.sqrt(1 - autocorrelation * autocorrelation);
        double u = random.nextGaussian();
        double v = random.nextGaussian();
        for (int t = 0; t < periods; t++) {
            u = autocorrelation * u + scale * random.nextGaussian();
            v = autocorrelation * v + scale * random.nextGaussian();
            a[t] = meanA + sdA * u;
            b[t] = meanB + sdB * (correlation * u + Math.sqrt(1 - correlation * correlation) * v);
        }
        return new SimulatedPair(a, b);
    }
}
