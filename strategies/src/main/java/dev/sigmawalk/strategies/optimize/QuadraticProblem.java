package dev.sigmawalk.strategies.optimize;

import dev.sigmawalk.engine.model.DenseProof;
import java.util.Arrays;
import java.util.Objects;

/**
 * The budget-constrained box quadratic program
 * <pre>
 *   minimise ½ w'Qw − c'w   subject to   Σ_i w_i = 1,   lower_i ≤ w_i ≤ upper_i.
 * </pre>
 * Q is symmetric positive semi-definite, dense, row-major n×n with both triangles filled; c may
 * be all zeros (minimum variance). Bounds may be infinite (−∞ lower, +∞ upper) but never NaN.
 * Arrays are held as given (not copied, for speed at n = 500) and must not be modified while
 * the problem is in use.
 *
 * <p>Validation proves Q finite and symmetric, pair by pair in tiles (the transposed read is
 * strided), unless the producer of Q promises symmetry by construction
 * ({@link DenseProof#MIRRORED}); then one row-major pass proves finiteness alone, at a fraction of
 * the cost for n = 2,000, and a producer whose write loop also saw every value finite
 * ({@link DenseProof#MIRRORED_FINITE}) spares even that pass.
 *
 * @param size n ≥ 1
 * @param quadratic Q, length n², finite and symmetric
 * @param linear c, length n, finite
 * @param lower lower_i, length n, never NaN or +∞
 * @param upper upper_i, length n, never NaN or −∞, each ≥ lower_i
 * @param proof what the producer of Q proved about it ({@link DenseProof#UNPROVEN} for a matrix
 *              from anywhere else)
 */
public record QuadraticProblem(int size, double[] quadratic, double[] linear, double[] lower, double[] upper,
                               DenseProof proof) {
    /** Relative tolerance for asymmetry of Q, against the largest |Q_ij|. */
    private static final double SYMMETRY_TOLERANCE = 1e-12;
    /** Side of the square tiles the symmetry check walks. */
    private static final int SYMMETRY_TILE = 64;

    public QuadraticProblem {
        if (!(size >= 1)) {
            throw new IllegalArgumentException("problem size (" + size + ") must be >= 1");
        }
        requireLength("quadratic", quadratic, size * size);
        requireLength("linear", linear, size);
        requireLength("lower", lower, size);
        requireLength("upper", upper, size);
        Objects.requireNonNull(proof, "proof");
        boolean mirrored = proof.mirrored();
        boolean quadraticFine = proof == DenseProof.MIRRORED_FINITE
                || (mirrored ? allFinite(quadratic) : quadraticPasses(size, quadratic));
        if (!quadraticFine) {
            checkFinite("quadratic", quadratic);
        }
        checkFinite("linear", linear);
        checkBounds(lower, upper);
        if (!quadraticFine && !mirrored) {
            checkSymmetric(size, quadratic);
        }
    }

    /** A problem whose Q carries no proof from its producer: finiteness and symmetry are proven here. */
    public QuadraticProblem(int size, double[] quadratic, double[] linear, double[] lower, double[] upper) {
        this(size, quadratic, linear, lower, upper, DenseProof.UNPROVEN);
    }

    /**
     * True when every entry is finite, in one row-major pass without a branch per entry: v·0 is
     * 0 for a finite v and NaN for a NaN or an infinity, so a sum of them is NaN exactly when some
     * entry is not finite. Four sums keep the additions independent; the pass streams the matrix
     * once, where the tiled symmetry pass also reads it transposed.
     */
    private static boolean allFinite(double[] q) {
        double a = 0;
        double b = 0;
        double c = 0;
        double d = 0;
        int k = 0;
        for (int end = q.length - 3; k < end; k += 4) {
            a += q[k] * 0.0;
            b += q[k + 1] * 0.0;
            c += q[k + 2] * 0.0;
            d += q[k + 3] * 0.0;
        }
        for (; k < q.length; k++) {
            a += q[k] * 0.0;
        }
        return (a + b + c + d) == 0.0;
    }

    /**
     * One tiled pass over the pairs (Q_ij, Q_ji) that proves a good matrix good: true when every
     * entry is finite and every pair agrees within the symmetry tolerance, which is all the two
     * checks below can say of a good matrix; only a matrix it cannot prove is walked again, by
     * them, to name the offending entry or to accept it after all.
     *
     * <p>The pass keeps no running maximum. The largest diagonal |Q_ii| is a lower bound of the
     * largest |Q_ij|, so a pair within the tolerance times that bound is within the tolerance of
     * the largest entry too; for a positive semi-definite Q, what every covariance is, the bound
     * is the largest entry itself (|Q_ij| ≤ √(Q_ii Q_jj)), so no good covariance is walked twice.
     * The comparison of a pair is false when either entry is NaN or infinite (the gap is then NaN
     * or infinite; a diagonal entry is paired with itself), so the flag also proves every entry
     * finite. That leaves one subtraction and one comparison a pair, without the branches of two
     * running maxima: about a fifth less time at n = 2,000, where the pass is bound by reading the
     * 32 MB matrix.
     */
    private static boolean quadraticPasses(int n, double[] q) {
        double bound = 0;
        for (int i = 0; i < n; i++) {
            double d = Math.abs(q[i * n + i]);
            bound = d > bound ? d : bound;
        }
        double allowed = SYMMETRY_TOLERANCE * bound;
        boolean fine = true;
        for (int i0 = 0; i0 < n; i0 += SYMMETRY_TILE) {
            int i1 = Math.min(n, i0 + SYMMETRY_TILE);
            for (int j0 = i0; j0 < n; j0 += SYMMETRY_TILE) {
                int j1 = Math.min(n, j0 + SYMMETRY_TILE);
                for (int i = i0; i < i1; i++) {
                    int row = i * n;
                    for (int j = Math.max(j0, i); j < j1; j++) {
                        fine &= Math.abs(q[row + j] - q[j * n + i]) <= allowed;
                    }
                }
            }
        }
        return fine;
    }

    /** A problem with the same bound on every weight. */
    public static QuadraticProblem uniformBounds(int size, double[] quadratic, double[] linear, double lower,
                                                 double upper) {
        double[] lo = new double[size];
        double[] hi = new double[size];
        Arrays.fill(lo, lower);
        Arrays.fill(hi, upper);
        return new QuadraticProblem(size, quadratic, linear, lo, hi);
    }

    /** Q_ij. */
    public double q(int i, int j) {
        return quadratic[i * size + j];
    }

    private static void requireLength(String role, double[] values, int expected) {
        if (values == null || values.length != expected) {
            throw new IllegalArgumentException(role + " has length " + (values == null ? "null" : values.length)
                    + ", expected " + expected);
        }
    }

    private static void checkFinite(String role, double[] values) {
        for (int i = 0; i < values.length; i++) {
            if (!Double.isFinite(values[i])) {
                throw new IllegalArgumentException(role + "[" + i + "] (" + values[i] + ") must be finite");
            }
        }
    }

    private static void checkBounds(double[] lower, double[] upper) {
        for (int i = 0; i < lower.length; i++) {
            double lo = lower[i];
            double hi = upper[i];
            if (!(lo <= hi) || lo == Double.POSITIVE_INFINITY || hi == Double.NEGATIVE_INFINITY) {
                throw new IllegalArgumentException("bounds of weight " + i + " [" + lo + ", " + hi
                        + "] need lower <= upper, lower < +inf and upper > -inf");
            }
        }
    }

    private static void checkSymmetric(int n, double[] q) {
        double largest = 0;
        for (double v : q) {
            largest = Math.max(largest, Math.abs(v));
        }
        double allowed = SYMMETRY_TOLERANCE * largest;
        // Square tiles, so the column walk of the lower triangle stays in the cache.
        for (int i0 = 0; i0 < n; i0 += SYMMETRY_TILE) {
            int i1 = Math.min(n, i0 + SYMMETRY_TILE);
            for (int j0 = i0; j0 < n; j0 += SYMMETRY_TILE) {
                int j1 = Math.min(n, j0 + SYMMETRY_TILE);
                for (int i = i0; i < i1; i++) {
                    for (int j = Math.max(j0, i + 1); j < j1; j++) {
                        double a = q[i * n + j];
                        double b = q[j * n + i];
                        if (!(Math.abs(a - b) <= allowed)) {
                            throw new IllegalArgumentException("quadratic is not symmetric at (" + i + ", " + j
                                    + "): " + a + " vs " + b);
                        }
                    }
                }
            }
        }
    }
}
