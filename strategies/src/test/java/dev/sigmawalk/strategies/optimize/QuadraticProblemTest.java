package dev.sigmawalk.strategies.optimize;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.model.DenseProof;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The problem's checks of Q on matrices larger than one tile (n = 150 against tiles of 64): a
 * symmetric finite Q passes, and one bad entry anywhere, in either triangle, is found and named.
 */
class QuadraticProblemTest {
    private static final int N = 150;

    private static double[] symmetric(long seed) {
        return symmetric(N, seed);
    }

    private static double[] symmetric(int n, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        double[] q = new double[n * n];
        for (int i = 0; i < n; i++) {
            for (int j = i; j < n; j++) {
                double v = i == j ? 1 + random.nextDouble() : 0.1 * (random.nextDouble() - 0.5);
                q[i * n + j] = v;
                q[j * n + i] = v;
            }
        }
        return q;
    }

    private static QuadraticProblem problem(int n, double[] q, DenseProof proof) {
        double[] hi = new double[n];
        java.util.Arrays.fill(hi, 1.0);
        return new QuadraticProblem(n, q, new double[n], new double[n], hi, proof);
    }

    private static QuadraticProblem problem(double[] q) {
        return QuadraticProblem.uniformBounds(N, q, new double[N], 0, 1);
    }

    @Test
    void symmetricFiniteQ_passes_evenWithRoundingLevelAsymmetry() {
        double[] q = symmetric(1);
        q[3 * N + 140] *= 1 + 1e-15;
        assertDoesNotThrow(() -> problem(q));
    }

    /** Seeded loop: a NaN, an infinity or an asymmetric pair at a random place, in either triangle. */
    @Test
    void oneBadEntry_anywhere_isNamed() {
        SplittableRandom random = new SplittableRandom(7);
        for (int trial = 0; trial < 30; trial++) {
            double[] q = symmetric(100 + trial);
            int i = random.nextInt(N);
            int j = random.nextInt(N);
            if (i == j) {
                j = (j + 1) % N;
            }
            int kind = trial % 3;
            double bad = kind == 0 ? Double.NaN : kind == 1 ? Double.NEGATIVE_INFINITY : q[i * N + j] + 0.01;
            q[i * N + j] = bad;
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> problem(q),
                    "trial " + trial);
            if (kind == 2) {
                int lo = Math.min(i, j);
                int hi = Math.max(i, j);
                assertTrue(e.getMessage().contains("not symmetric at (" + lo + ", " + hi + ")"),
                        "trial " + trial + ": " + e.getMessage());
            } else {
                assertTrue(e.getMessage().contains("quadratic[" + (i * N + j) + "] (" + bad + ") must be finite"),
                        "trial " + trial + ": " + e.getMessage());
            }
        }
    }

    /**
     * A matrix that is not positive semi-definite, whose largest entry (10^6) is off the diagonal
     * (at most 2): an asymmetry of 10^-7 is within 10^-12 of the largest entry and is accepted,
     * though it is far beyond 10^-12 of the largest diagonal entry; 10^-5 is not and is named.
     */
    @Test
    void largestEntryOffTheDiagonal_setsTheTolerance() {
        double[] q = symmetric(3);
        q[5 * N + 120] = 1e6;
        q[120 * N + 5] = 1e6 + 1e-7;
        assertDoesNotThrow(() -> problem(q));
        q[120 * N + 5] = 1e6 + 1e-5;
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> problem(q));
        assertTrue(e.getMessage().contains("not symmetric at (5, 120)"), e.getMessage());
    }

    /** Seeded loop: a NaN or an infinity on the diagonal is named too. */
    @Test
    void badDiagonalEntry_isNamed() {
        SplittableRandom random = new SplittableRandom(11);
        for (int trial = 0; trial < 10; trial++) {
            double[] q = symmetric(200 + trial);
            int i = random.nextInt(N);
            double bad = trial % 2 == 0 ? Double.NaN : Double.POSITIVE_INFINITY;
            q[i * N + i] = bad;
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> problem(q),
                    "trial " + trial);
            assertTrue(e.getMessage().contains("quadratic[" + (i * N + i) + "] (" + bad + ") must be finite"),
                    "trial " + trial + ": " + e.getMessage());
        }
    }

    /**
     * Seeded loop on the path where the producer promises symmetry ({@link DenseProof#MIRRORED}):
     * finiteness is still proven for every entry. A NaN or an infinity at a random place, on the
     * diagonal or off it, and at the very last entry (n = 7 gives 49 entries, not a multiple of
     * the four sums of the finiteness pass), is named as on the full path.
     */
    @Test
    void mirroredPromise_stillProvesEveryEntryFinite() {
        SplittableRandom random = new SplittableRandom(13);
        double[] bads = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY};
        for (int n : new int[] {N, 7, 1}) {
            assertDoesNotThrow(() -> problem(n, symmetric(n, 5), DenseProof.MIRRORED), "n = " + n);
            for (int trial = 0; trial < 30; trial++) {
                double[] q = symmetric(n, 300 + trial);
                int k = trial == 0 ? n * n - 1 : trial == 1 ? 0 : random.nextInt(n * n);
                double bad = bads[trial % 3];
                q[k] = bad;
                String where = "n = " + n + ", trial " + trial;
                IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                        () -> problem(n, q, DenseProof.MIRRORED), where);
                assertTrue(e.getMessage().contains("quadratic[" + k + "] (" + bad + ") must be finite"),
                        where + ": " + e.getMessage());
            }
        }
    }

    /**
     * Seeded loop: without the promise, through either constructor, a pair that differs by 10^-3
     * is rejected and named; with either mirrored promise the same matrix is taken on its
     * producer's word, which is why only producers whose write loop mirrors every pair make it
     * (their own tests check the matrices bit for bit).
     */
    @Test
    void asymmetricPair_isRejectedUnlessSymmetryIsPromised() {
        SplittableRandom random = new SplittableRandom(17);
        for (int trial = 0; trial < 20; trial++) {
            double[] q = symmetric(400 + trial);
            int i = random.nextInt(N - 1);
            int j = i + 1 + random.nextInt(N - 1 - i);
            q[j * N + i] += 1e-3;
            String pair = "not symmetric at (" + i + ", " + j + ")";
            IllegalArgumentException plain = assertThrows(IllegalArgumentException.class, () -> problem(q));
            assertTrue(plain.getMessage().contains(pair), plain.getMessage());
            IllegalArgumentException unproven = assertThrows(IllegalArgumentException.class,
                    () -> problem(N, q, DenseProof.UNPROVEN));
            assertTrue(unproven.getMessage().contains(pair), unproven.getMessage());
            assertDoesNotThrow(() -> problem(N, q, DenseProof.MIRRORED), "trial " + trial);
            assertDoesNotThrow(() -> problem(N, q, DenseProof.MIRRORED_FINITE), "trial " + trial);
        }
    }

    /**
     * A Q whose producer proved it finite while writing it is not read again: a NaN planted after
     * the fact is not seen (the promise is the producer's to keep, and the running sums' and the
     * shrinkage's tests check it), while the same matrix with a symmetry-only promise is rejected
     * naming the entry. The linear term and the bounds are checked whatever Q's proof.
     */
    @Test
    void finitePromise_skipsReadingQ_notTheOtherChecks() {
        double[] q = symmetric(7, 9);
        q[20] = Double.NaN;
        assertDoesNotThrow(() -> problem(7, q, DenseProof.MIRRORED_FINITE));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> problem(7, q, DenseProof.MIRRORED));
        assertTrue(e.getMessage().contains("quadratic[20] (NaN) must be finite"), e.getMessage());
        double[] c = new double[7];
        c[4] = Double.POSITIVE_INFINITY;
        double[] hi = new double[7];
        java.util.Arrays.fill(hi, 1.0);
        IllegalArgumentException linear = assertThrows(IllegalArgumentException.class,
                () -> new QuadraticProblem(7, symmetric(7, 9), c, new double[7], hi, DenseProof.MIRRORED_FINITE));
        assertTrue(linear.getMessage().contains("linear[4] (Infinity) must be finite"), linear.getMessage());
    }
}
