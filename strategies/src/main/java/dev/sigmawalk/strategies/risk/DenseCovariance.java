package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.DenseProof;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * A covariance estimate held as a full n×n row-major matrix (both triangles), optionally carrying
 * the shrinkage intensity that produced it and what its producer proved about it. The matrix
 * is owned by this object and never modified.
 */
final class DenseCovariance implements CovarianceEstimate {
    private final int size;
    private final double[] matrix;
    private final OptionalDouble shrinkage;
    private final DenseProof proof;

    /**
     * @param proof a mirrored promise only when the producer's write loop makes every pair equal
     *              bit for bit (and saw every value finite, for {@link DenseProof#MIRRORED_FINITE});
     *              {@link DenseProof#UNPROVEN} otherwise
     */
    DenseCovariance(int size, double[] matrix, OptionalDouble shrinkage, DenseProof proof) {
        if (!(size >= 0) || matrix.length != size * size) {
            throw new IllegalArgumentException("covariance matrix (" + matrix.length + " values) must be n*n with n = "
                    + size);
        }
        this.size = size;
        this.matrix = matrix;
        this.shrinkage = shrinkage;
        this.proof = Objects.requireNonNull(proof, "proof");
    }

    @Override
    public int size() {
        return size;
    }

    @Override
    public double get(int i, int j) {
        return matrix[Objects.checkIndex(i, size) * size + Objects.checkIndex(j, size)];
    }

    @Override
    public double[] dense() {
        return matrix;
    }

    @Override
    public DenseProof proof() {
        return proof;
    }

    @Override
    public OptionalDouble shrinkage() {
        return shrinkage;
    }
}
