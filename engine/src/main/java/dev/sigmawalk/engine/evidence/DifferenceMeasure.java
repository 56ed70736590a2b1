package dev.sigmawalk.engine.evidence;

/**
 * What two return series are compared on, each as a function f(v) of the moment vector
 * v = (μ_a, μ_b, γ_a, γ_b) with σ² = γ - μ² (divisor T), and the gradient ∇f for the delta
 * method.
 */
public enum DifferenceMeasure {
    /**
     * Per-period Sharpe ratios of excess returns (Ledoit &amp; Wolf 2008, J. Empirical Finance
     * 15, §2): f(v) = μ_a/√(γ_a - μ_a²) - μ_b/√(γ_b - μ_b²),
     * ∇f = (γ_a/σ_a³, -γ_b/σ_b³, -μ_a/(2σ_a³), μ_b/(2σ_b³)).
     */
    SHARPE_RATIO {
        @Override
        double estimate(double mean, double variance) {
            return mean / Math.sqrt(variance);
        }

        @Override
        double difference(PairMoments v) {
            return estimate(v.meanA(), v.varianceA()) - estimate(v.meanB(), v.varianceB());
        }

        @Override
        double[] gradient(PairMoments v) {
            double cubeA = Math.pow(v.varianceA(), 1.5);
            double cubeB = Math.pow(v.varianceB(), 1.5);
            return new double[] {v.secondA() / cubeA, -v.secondB() / cubeB, -v.meanA() / (2 * cubeA),
                v.meanB() / (2 * cubeB)};
        }
    },
    /**
     * Variances, tested on the log scale (Ledoit &amp; Wolf 2011, Wilmott Magazine, "Robust
     * performance hypothesis testing with the variance"): f(v) = log σ_a² - log σ_b²,
     * ∇f = (-2μ_a/σ_a², 2μ_b/σ_b², 1/σ_a², -1/σ_b²). The per-series estimates reported are σ².
     */
    VARIANCE {
        @Override
        double estimate(double mean, double variance) {
            return variance;
        }

        @Override
        double difference(PairMoments v) {
            return Math.log(v.varianceA()) - Math.log(v.varianceB());
        }

        @Override
        double[] gradient(PairMoments v) {
            double va = v.varianceA();
            double vb = v.varianceB();
            return new double[] {-2 * v.meanA() / va, 2 * v.meanB() / vb, 1 / va, -1 / vb};
        }
    };

    /** The measure of one series from its mean and variance (divisor T). */
    abstract double estimate(double mean, double variance);

    /** Δ = f(v). */
    abstract double difference(PairMoments v);

    /** ∇f(v), length 4. */
    abstract double[] gradient(PairMoments v);

    /** Lower-case name for method descriptions and files. */
    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
    }
}
