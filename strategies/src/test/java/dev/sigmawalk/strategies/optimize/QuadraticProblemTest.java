package dev.sigmawalk.strategies.optimize;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The problem's checks of Q on matrices larger than one tile (n = 150 against tiles of 64): a
 * symmetric finite Q passes, and one bad entry anywhere, in either triangle, is found and named.
 */
class QuadraticProblemTest {
    private static final int N = 150;

    private static double[] symmetric(long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        double[] q = new double[N * N];
        for (int i = 0; i < N; i++) {
            for (int j = i; j < N; j++) {
                double v = i == j ? 1 + random.nextDouble() : 0.1 * (random.nextDouble() - 0.5);
                q[i * N + j] = v;
                q[j * N + i] = v;
            }
        }
        return q;
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
}
