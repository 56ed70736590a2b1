package dev.sigmawalk.strategies.optimize;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Random;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The primal-dual active-set path of {@link ActiveSetSolver#solve(QuadraticProblem, BoundSide[])}
 * against the one-change-at-a-time primal loop ({@link ActiveSetSolver#solvePrimal}), which it
 * must match to rounding whatever partition it starts from, on seeded random problems including
 * degenerate ones. Cases are drawn from fixed seeds.
 */
class PrimalDualActiveSetTest {
    /** Two exact solvers of the same problem with a unique optimum differ by rounding only. */
    private static final double SAME_WEIGHTS = 1e-12;
    private static final double KKT = 1e-9;
    /** A portfolio variance below this share of an asset's variance is zero up to rounding. */
    private static final double ZERO_VARIANCE = 1e-14;

    private final SolverSettings settings = SolverSettings.standard();
    private final ActiveSetSolver solver = new ActiveSetSolver(settings);

    /**
     * Long-only minimum variance with a cap, warm-started from the partition of the window one
     * step earlier (the same returns shifted by a few rows), as in a walk-forward run; the
     * primal-dual method itself must certify these (no fallback) and agree with the primal loop.
     * The 40 cases (n from 5 to 120) are drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("rollingCases")
    void rollingWindow_warmStart_matchesPrimalLoop_withoutFallback(int n, long seed) {
        Random random = new Random(seed);
        int periods = n + 10 + random.nextInt(3 * n + 10);
        int shift = 1 + random.nextInt(Math.max(1, periods / 10));
        double[] returns = RandomProblems.returns(random, n, periods + shift);
        double cap = (1.5 + 4 * random.nextDouble()) / n;
        QuadraticProblem before = capped(RandomProblems.sampleCovariance(returns, periods, n), n, cap);
        QuadraticProblem now = capped(RandomProblems.sampleCovariance(
                Arrays.copyOfRange(returns, shift * n, (shift + periods) * n), periods, n), n, cap);
        BoundSide[] guess = optimum(solver.solvePrimal(before, null)).sides();
        SolveOutcome.Optimal reference = optimum(solver.solvePrimal(now, null));
        SolveOutcome.Optimal dual = new PrimalDualActiveSet(new WorkingSet(now), settings).run(guess);
        String problem = describe(n, seed);
        assertTrue(dual != null, "the primal-dual method certifies a nearby start" + problem);
        assertClose(reference.weights(), dual.weights(), SAME_WEIGHTS, problem);
        assertClose(reference.weights(), optimum(solver.solve(now, guess)).weights(), SAME_WEIGHTS, problem);
    }

    static Stream<Arguments> rollingCases() {
        return cases(0x9DA5_0001L, 5, 120, 40);
    }

    /**
     * Any partition as a start (random sides, or everything at one bound): the answer is the
     * primal loop's, by the primal-dual method or by its fallback. Bounds allow short positions
     * half the time; the objective is minimum variance or mean-variance. The 60 cases (n from 1
     * to 60) are drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("anyStartCases")
    void anyStartingPartition_matchesPrimalLoop(int n, long seed) {
        Random random = new Random(seed);
        QuadraticProblem p = randomProblem(random, n, n + 5 + random.nextInt(40));
        SolveOutcome reference = solver.solvePrimal(p, null);
        if (!(reference instanceof SolveOutcome.Optimal)) {
            assertEquals(reference.getClass(), solver.solve(p, randomSides(random, n)).getClass(), describe(n, seed));
            return;
        }
        double[] expected = ((SolveOutcome.Optimal) reference).weights();
        for (BoundSide[] guess : new BoundSide[][] {randomSides(random, n), uniform(n, BoundSide.LOWER),
                uniform(n, BoundSide.UPPER), uniform(n, BoundSide.FREE)}) {
            assertClose(expected, optimum(solver.solve(p, guess)).weights(), SAME_WEIGHTS,
                    describe(n, seed) + " from " + Arrays.toString(guess));
        }
    }

    static Stream<Arguments> anyStartCases() {
        return cases(0x9DA5_0002L, 1, 60, 60);
    }

    /**
     * A singular Σ: the sample covariance of fewer periods than assets (rank T − 1 &lt; n), long
     * only with a cap. Both methods keep the shifted free block positive definite, so when the
     * optimum is unique they land on the same weights. It is not unique when some long-only
     * portfolio has no variance at all (a mix of assets whose centred returns cancel in every
     * period, which exists in the box for most T much smaller than n): then every such portfolio
     * is optimal and only the objective, 0, is compared. The 30 cases (n from 20 to 150) are
     * drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("singularCases")
    void singularSampleCovariance_moreAssetsThanPeriods_matchesPrimalLoop(int n, long seed) {
        Random random = new Random(seed);
        int periods = 5 + random.nextInt(n / 2);
        int shift = 1 + random.nextInt(3);
        double[] returns = RandomProblems.returns(random, n, periods + shift);
        double cap = Math.max(1.0 / (periods - 2), 1.5 / n) * (1 + random.nextDouble());
        QuadraticProblem before = capped(RandomProblems.sampleCovariance(returns, periods, n), n, cap);
        QuadraticProblem now = capped(RandomProblems.sampleCovariance(
                Arrays.copyOfRange(returns, shift * n, (shift + periods) * n), periods, n), n, cap);
        SolveOutcome previous = solver.solvePrimal(before, null);
        SolveOutcome reference = solver.solvePrimal(now, null);
        String problem = describe(n, seed) + ", T = " + periods + ", cap " + cap;
        if (!(previous instanceof SolveOutcome.Optimal) || !(reference instanceof SolveOutcome.Optimal)) {
            return;
        }
        SolveOutcome.Optimal warm = optimum(solver.solve(now, ((SolveOutcome.Optimal) previous).sides()));
        assertTrue(KktCheck.check(now, warm.weights()).holds(KKT), "kkt" + problem);
        double[] r = ((SolveOutcome.Optimal) reference).weights();
        double floor = ZERO_VARIANCE * now.q(0, 0);
        if (objective(now, r) <= floor) {
            // A long-only portfolio with no variance at all exists: every such portfolio is
            // optimal, so only the objective is determined.
            assertTrue(Math.abs(objective(now, warm.weights())) <= floor, "zero variance" + problem);
            return;
        }
        assertClose(r, warm.weights(), SAME_WEIGHTS, problem);
    }

    static Stream<Arguments> singularCases() {
        return cases(0x9DA5_0003L, 20, 150, 30);
    }

    /**
     * An optimum built by hand, degenerate on purpose: w* puts some weights on the lower bound with
     * multiplier exactly 0, some on the lower or upper bound with a multiplier of the right sign,
     * the rest strictly inside; c = Qw* − ν1 − z makes it the KKT point of min ½w'Qw − c'w
     * (convex, Q positive definite, so w* is the unique optimum: the KKT conditions written out
     * by hand, no solver involved). Both methods must return w*, from a wrong start too. The 40
     * cases (n from 4 to 80) are drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("degenerateCases")
    void builtOptimum_withZeroMultipliersOnBounds_isFoundExactly(int n, long seed) {
        Random random = new Random(seed);
        double[] q = RandomProblems.covariance(random, n, n + 20);
        double lo = 0;
        double hi = 3.0 / n;
        double[] w = new double[n];
        double[] z = new double[n];
        BoundSide[] sides = new BoundSide[n];
        double freeRoom = 1;
        int free = 0;
        for (int i = 0; i < n; i++) {
            int kind = random.nextInt(5);
            if (kind == 0 || kind == 1) {
                sides[i] = BoundSide.LOWER;
                z[i] = kind == 0 ? 0 : 1e-4 * random.nextDouble();
            } else if (kind == 2 && freeRoom > 2 * hi) {
                sides[i] = BoundSide.UPPER;
                w[i] = hi;
                z[i] = -1e-4 * random.nextDouble();
                freeRoom -= hi;
            } else {
                sides[i] = BoundSide.FREE;
                free++;
            }
        }
        if (free == 0) {
            sides[0] = BoundSide.FREE;
            z[0] = 0;
            free = 1;
        }
        // Spread what the caps leave over the free weights, each strictly inside (0, hi).
        double[] share = new double[n];
        double total = 0;
        for (int i = 0; i < n; i++) {
            if (sides[i] == BoundSide.FREE) {
                share[i] = 0.5 + random.nextDouble();
                total += share[i];
            }
        }
        for (int i = 0; i < n; i++) {
            if (sides[i] == BoundSide.FREE) {
                w[i] = freeRoom * share[i] / total;
            }
        }
        double upper = Math.max(hi, 1.01 * Arrays.stream(w).max().orElse(hi));
        double nu = 0.01 * random.nextDouble();
        double[] c = new double[n];
        for (int i = 0; i < n; i++) {
            double g = 0;
            for (int j = 0; j < n; j++) {
                g += q[i * n + j] * w[j];
            }
            c[i] = g - nu - z[i];
        }
        double[] hiAll = new double[n];
        double[] loAll = new double[n];
        for (int i = 0; i < n; i++) {
            hiAll[i] = sides[i] == BoundSide.UPPER ? hi : upper;
            loAll[i] = lo;
        }
        QuadraticProblem p = new QuadraticProblem(n, q, c, loAll, hiAll);
        String problem = describe(n, seed);
        assertClose(w, optimum(solver.solvePrimal(p, null)).weights(), 1e-10, "primal" + problem);
        assertClose(w, optimum(solver.solve(p, uniform(n, BoundSide.LOWER))).weights(), 1e-10, "from lower" + problem);
        assertClose(w, optimum(solver.solve(p, randomSides(random, n))).weights(), 1e-10, "from random" + problem);
        assertClose(w, optimum(solver.solve(p, sides)).weights(), 1e-10, "from the answer" + problem);
    }

    static Stream<Arguments> degenerateCases() {
        return cases(0x9DA5_0004L, 4, 80, 40);
    }

    /**
     * Duplicated assets: two identical columns make Q singular and the split between the twins
     * arbitrary. Every answer must still pass the KKT check, hold the twins' total and every other
     * weight of the primal loop's optimum, and reach its objective. The 30 cases (n from 4 to 60)
     * are drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("duplicateCases")
    void duplicatedAssets_sameObjectiveAndSameOtherWeights(int n, long seed) {
        Random random = new Random(seed);
        int base = n - 1;
        double[] returns = RandomProblems.returns(random, base, base + 30);
        int twin = random.nextInt(base);
        double[] wide = new double[(base + 30) * n];
        for (int t = 0; t < base + 30; t++) {
            System.arraycopy(returns, t * base, wide, t * n, base);
            wide[t * n + base] = returns[t * base + twin];
        }
        double[] sigma = RandomProblems.sampleCovariance(wide, base + 30, n);
        QuadraticProblem p = capped(sigma, n, (1.5 + 3 * random.nextDouble()) / n);
        String problem = describe(n, seed) + ", twin of " + twin;
        SolveOutcome.Optimal reference = optimum(solver.solvePrimal(p, null));
        for (BoundSide[] guess : new BoundSide[][] {randomSides(random, n), reference.sides(),
                uniform(n, BoundSide.LOWER)}) {
            double[] w = optimum(solver.solve(p, guess)).weights();
            assertTrue(KktCheck.check(p, w).holds(KKT), "kkt" + problem);
            double[] r = reference.weights();
            assertEquals(r[twin] + r[base], w[twin] + w[base], SAME_WEIGHTS, "twins' total" + problem);
            for (int i = 0; i < base; i++) {
                if (i != twin) {
                    assertEquals(r[i], w[i], SAME_WEIGHTS, "weight " + i + problem);
                }
            }
            assertEquals(objective(p, r), objective(p, w), 1e-14 * Math.abs(objective(p, r)), "objective" + problem);
        }
    }

    static Stream<Arguments> duplicateCases() {
        return cases(0x9DA5_0005L, 4, 60, 30);
    }

    /**
     * Infeasible bounds stay infeasible and a warm start never hides it (caps 0.1 on 5 weights
     * cannot reach 1).
     */
    @Test
    void infeasibleCaps_areInfeasibleFromAnyStart() {
        double[] sigma = RandomProblems.covariance(new Random(7), 5, 30);
        QuadraticProblem p = capped(sigma, 5, 0.1);
        assertInstanceOf(SolveOutcome.Infeasible.class, solver.solve(p, uniform(5, BoundSide.UPPER)));
    }

    private static QuadraticProblem capped(double[] sigma, int n, double cap) {
        return QuadraticProblem.uniformBounds(n, sigma, new double[n], 0, cap);
    }

    /** Min variance or mean-variance on a random covariance, lower bound 0 or −0.2, a random cap. */
    private static QuadraticProblem randomProblem(Random random, int n, int periods) {
        double[] sigma = RandomProblems.covariance(random, n, periods);
        double lower = random.nextBoolean() ? 0 : -0.2;
        double upper = (0.8 + 4 * random.nextDouble()) / n;
        double[] c = random.nextBoolean() ? new double[n] : RandomProblems.expectedReturns(random, n);
        double lambda = 1 + 9 * random.nextDouble();
        double[] q = new double[n * n];
        for (int i = 0; i < q.length; i++) {
            q[i] = lambda * sigma[i];
        }
        return QuadraticProblem.uniformBounds(n, q, c, lower, upper);
    }

    private static BoundSide[] randomSides(Random random, int n) {
        BoundSide[] sides = new BoundSide[n];
        for (int i = 0; i < n; i++) {
            sides[i] = BoundSide.values()[random.nextInt(BoundSide.values().length)];
        }
        return sides;
    }

    private static BoundSide[] uniform(int n, BoundSide side) {
        BoundSide[] sides = new BoundSide[n];
        Arrays.fill(sides, side);
        return sides;
    }

    private static SolveOutcome.Optimal optimum(SolveOutcome outcome) {
        return assertInstanceOf(SolveOutcome.Optimal.class, outcome);
    }

    private static double objective(QuadraticProblem p, double[] w) {
        double[] g = KktCheck.gradient(p, w);
        double v = 0;
        for (int i = 0; i < w.length; i++) {
            v += 0.5 * w[i] * (g[i] + p.linear()[i]) - p.linear()[i] * w[i];
        }
        return v;
    }

    private static void assertClose(double[] expected, double[] actual, double tolerance, String message) {
        assertEquals(expected.length, actual.length, "weight count" + message);
        for (int i = 0; i < expected.length; i++) {
            assertEquals(expected[i], actual[i], tolerance, "weight " + i + message);
        }
    }

    /** count cases of n in [minN, maxN] (the first two at the ends) with a problem seed. */
    private static Stream<Arguments> cases(long caseSeed, int minN, int maxN, int count) {
        SplittableRandom rng = new SplittableRandom(caseSeed);
        return IntStream.range(0, count).mapToObj(k -> Arguments.of(
                k == 0 ? minN : k == 1 ? maxN : rng.nextInt(minN, maxN + 1), rng.nextLong()));
    }

    private static String describe(int n, long seed) {
        return " (n = " + n + ", seed " + seed + ")";
    }
}
