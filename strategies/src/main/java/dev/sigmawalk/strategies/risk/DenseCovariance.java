package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.Symmetry;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * A covariance estimate held as a full n×n row-major matrix (both triangles), optionally carrying
 * the shrinkage intensity that produced it and the symmetry its producer promises. The matrix
 * is owned by this object and never modified.
 */
final class DenseCovariance implements CovarianceEstimate {
    private final int size;
    private final double[] matrix;
    private final OptionalDouble shrinkage;
    private final Symmetry symmetry;

    /**
     * @param symmetry {@link Symmetry#MIRRORED} only when the producer's write loop makes every
     *                 pair equal bit for bit; {@link Symmetry#UNPROVEN} otherwise
     */
    DenseCovariance(int size, double[] matrix, OptionalDouble shrinkage, Symmetry symmetry) {
        if (!(size >= 0) || matrix.length != size * size) {
            throw new IllegalArgumentException("covariance matrix (" + matrix.length + " values) must be n*n with n = "
                    + size);
        }
        this.size = size;
        this.matrix = matrix;
        this.shrinkage = shrinkage;
        this.symmetry = Objects.requireNonNull(symmetry, "symmetry");
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
    public Symmetry symmetry() {
        return symmetry;
    }

    @Override
    public OptionalDouble shrinkage() {
        return shrinkage;
    }
}
