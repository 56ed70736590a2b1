package dev.sigmawalk.engine.model;

import java.util.OptionalDouble;

/**
 * A per-period covariance forecast for the eligible assets of one window. Implementations may
 * keep a factor form and build the dense matrix only on demand.
 */
public interface CovarianceEstimate {
    /** n. */
    int size();

    /** Σ_ij. */
    double get(int i, int j);

    /** The dense n×n matrix, row-major, both triangles. Callers must not modify it. */
    double[] dense();

    /** w'Σw, the per-period forecast variance of portfolio w. */
    default double portfolioVariance(double[] w) {
        int n = size();
        if (w.length != n) {
            throw new IllegalArgumentException("weights (" + w.length + ") must have length n (" + n + ")");
        }
        double[] s = dense();
        double v = 0;
        for (int i = 0; i < n; i++) {
            double wi = w[i];
            if (wi == 0) {
                continue;
            }
            double row = 0;
            int base = i * n;
            for (int j = 0; j < n; j++) {
                row += s[base + j] * w[j];
            }
            v += wi * row;
        }
        return v;
    }

    /**
     * What the producer proved about {@link #dense()} while writing it ({@link DenseProof}): by
     * default nothing, so a consumer proves symmetry and finiteness itself.
     */
    default DenseProof proof() {
        return DenseProof.UNPROVEN;
    }

    /** The Ledoit-Wolf intensity δ in [0, 1] for shrinkage estimates; empty for other models. */
    default OptionalDouble shrinkage() {
        return OptionalDouble.empty();
    }
}
