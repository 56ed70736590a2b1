package dev.sigmawalk.strategies.optimize;

/**
 * An updatable Cholesky factor A = LL' of a symmetric positive definite block of a larger matrix,
 * held in a preallocated row-major lower triangle. Appending a row and column costs O(k²) (one
 * forward substitution); removing one costs O(k²) (row shift plus Givens rotations that restore
 * the triangle, the standard downdate for a deleted row and column as described in Golub &amp;
 * Van Loan, Matrix Computations, on updating matrix factorizations; cited from memory); solves
 * cost O(k²).
 * Factoring a k×k block by k appends is the ordinary row-oriented Cholesky, k³/3 flops.
 */
final class CholeskyFactor {
    /** Room for this many rows at first; most free blocks are far smaller than n. */
    private static final int INITIAL_CAPACITY = 64;

    private final int limit;
    private int capacity;
    private double[] l;
    private double[] scratch;
    private int size;

    /**
     * @param limit the largest block this factor will hold; storage grows toward it as rows are
     *              appended (k² for k rows, not limit²)
     */
    CholeskyFactor(int limit) {
        this.limit = limit;
        this.capacity = Math.min(limit, INITIAL_CAPACITY);
        this.l = new double[capacity * capacity];
        this.scratch = new double[capacity];
    }

    /** Doubles the row stride (up to the limit), keeping the rows held so far. */
    private void grow() {
        int wider = Math.min(limit, Math.max(1, 2 * capacity));
        double[] moved = new double[wider * wider];
        for (int r = 0; r < size; r++) {
            System.arraycopy(l, r * capacity, moved, r * wider, r + 1);
        }
        l = moved;
        scratch = new double[wider];
        capacity = wider;
    }

    int size() {
        return size;
    }

    void clear() {
        size = 0;
    }

    /**
     * Extends A by one row and column.
     *
     * @param column the new off-diagonal entries A_{i,new} for the current rows i = 0..k-1
     * @param diagonal A_{new,new}
     * @param singularPivot relative pivot floor: the append is refused when the new squared pivot
     *                      is ≤ singularPivot · |diagonal| (the extended block is singular or
     *                      nearly so)
     * @return false, leaving the factor unchanged, when the extended block is not safely positive definite
     */
    boolean append(double[] column, double diagonal, double singularPivot) {
        int k = size;
        if (k == capacity) {
            grow();
        }
        int row = k * capacity;
        double sum = 0;
        for (int i = 0; i < k; i++) {
            double v = column[i];
            int ri = i * capacity;
            for (int j = 0; j < i; j++) {
                v -= l[ri + j] * scratch[j];
            }
            v /= l[ri + i];
            scratch[i] = v;
            sum += v * v;
        }
        double pivotSquared = diagonal - sum;
        if (!(pivotSquared > singularPivot * Math.abs(diagonal))) {
            return false;
        }
        System.arraycopy(scratch, 0, l, row, k);
        l[row + k] = Math.sqrt(pivotSquared);
        size = k + 1;
        return true;
    }

    /** Deletes row and column {@code position} of A, keeping the others in order. */
    void remove(int position) {
        int k = size;
        for (int r = position; r < k - 1; r++) {
            System.arraycopy(l, (r + 1) * capacity, l, r * capacity, r + 2);
        }
        // Rows position..k-2 now reach one column past the diagonal; rotate column pairs (i, i+1)
        // from the right to zero that entry, which leaves LL' unchanged.
        for (int i = position; i < k - 1; i++) {
            int ri = i * capacity;
            double a = l[ri + i];
            double b = l[ri + i + 1];
            double r = Math.hypot(a, b);
            double cos = a / r;
            double sin = b / r;
            l[ri + i] = r;
            l[ri + i + 1] = 0;
            for (int row = i + 1; row < k - 1; row++) {
                int rr = row * capacity;
                double x = l[rr + i];
                double y = l[rr + i + 1];
                l[rr + i] = cos * x + sin * y;
                l[rr + i + 1] = -sin * x + cos * y;
            }
        }
        size = k - 1;
    }

    /** Solves A x = b in place (b has at least k entries; only the first k are used). */
    void solveInPlace(double[] b) {
        int k = size;
        for (int i = 0; i < k; i++) {
            int ri = i * capacity;
            double v = b[i];
            for (int j = 0; j < i; j++) {
                v -= l[ri + j] * b[j];
            }
            b[i] = v / l[ri + i];
        }
        for (int i = k - 1; i >= 0; i--) {
            int ri = i * capacity;
            double v = b[i] / l[ri + i];
            b[i] = v;
            for (int j = 0; j < i; j++) {
                b[j] -= l[ri + j] * v;
            }
        }
    }
}
