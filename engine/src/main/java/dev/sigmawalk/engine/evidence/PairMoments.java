package dev.sigmawalk.engine.evidence;

/**
 * The moment vector v = (μ_a, μ_b, γ_a, γ_b), γ = E r², of two aligned return series, as in
 * Ledoit &amp; Wolf (2008, J. Empirical Finance 15, 850-859, §2): every measure compared in this
 * package is a smooth function of v, so the delta method applies. Variances are γ - μ²
 * (divisor T).
 */
record PairMoments(double meanA, double meanB, double secondA, double secondB) {
    PairMoments {
        if (!Double.isFinite(meanA) || !Double.isFinite(meanB) || !Double.isFinite(secondA) || !Double.isFinite(secondB)) {
            throw new IllegalArgumentException("moments (" + meanA + ", " + meanB + ", " + secondA + ", " + secondB
                    + ") must be finite");
        }
    }

    /** True when a series does not vary (σ² not > 0), so no measure of it is defined. */
    boolean degenerate() {
        return !(varianceA() > 0) || !(varianceB() > 0);
    }

    /** v̂ of the first {@code length} values of a and b. */
    static PairMoments of(double[] a, double[] b, int length) {
        double ma = 0;
        double mb = 0;
        double ga = 0;
        double gb = 0;
        for (int t = 0; t < length; t++) {
            ma += a[t];
            mb += b[t];
            ga += a[t] * a[t];
            gb += b[t] * b[t];
        }
        return new PairMoments(ma / length, mb / length, ga / length, gb / length);
    }

    /** σ_a² = γ_a - μ_a². */
    double varianceA() {
        return secondA - meanA * meanA;
    }

    /** σ_b² = γ_b - μ_b². */
    double varianceB() {
        return secondB - meanB * meanB;
    }

    /** The centred components y_t = (a_t - μ_a, b_t - μ_b, a_t² - γ_a, b_t² - γ_b). */
    double[][] centred(double[] a, double[] b) {
        int length = a.length;
        double[][] y = new double[4][length];
        for (int t = 0; t < length; t++) {
            y[0][t] = a[t] - meanA;
            y[1][t] = b[t] - meanB;
            y[2][t] = a[t] * a[t] - secondA;
            y[3][t] = b[t] * b[t] - secondB;
        }
        return y;
    }
}
