package dev.sigmawalk.strategies.optimize;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Optional;
import java.util.Random;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The bounded max-Sharpe solver's two routes (its own start, and the start from ojAlgo 57.1.0's
 * {@code ConvexSolver} on the transformed program, an independent solver) must land on the same
 * verified portfolio.
 */
class MaxSharpeSolverTest {
    private static final double SAME_PORTFOLIO = 1e-9;

    private final MaxSharpeSolver solver = new MaxSharpeSolver(SolverSettings.standard());

    @ParameterizedTest(name = "n = {0}, seed = {1}, bounds [{2}, {3}]")
    @CsvSource({"4, 1, 0, 0.5", "12, 2, 0, 0.2", "30, 3, 0, 0.1", "30, 4, -0.05, 0.15", "60, 5, 0, 1"})
    void ownRoute_matchesConvexSolverRoute(int n, long seed, double lower, double upper) {
        Random random = new Random(seed);
        double[] sigma = RandomProblems.covariance(random, n, n + 40);
        double[] mu = RandomProblems.expectedReturns(random, n);
        double[] lo = new double[n];
        double[] hi = new double[n];
        Arrays.fill(lo, lower);
        Arrays.fill(hi, upper);
        assertTrue(MaxSharpeSolver.highestExpectedReturn(mu, lo, hi) > 0, "a positive-return portfolio exists");
        Optional<SolveOutcome.Optimal> ownRoute = solver.solveFromOwnStart(sigma, mu, lo, hi);
        assertTrue(ownRoute.isPresent(), "the route without ojAlgo verifies");
        SolveOutcome.Optimal own = ownRoute.get();
        SolveOutcome.Optimal viaOjAlgo = assertInstanceOf(SolveOutcome.Optimal.class,
                solver.solveFromConvexSolver(sigma, mu, lo, hi));
        for (int i = 0; i < n; i++) {
            assertEquals(viaOjAlgo.weights()[i], own.weights()[i], SAME_PORTFOLIO, "weight " + i);
        }
    }

    /**
     * Random problems: the answer is verified whichever route produced it, and where the route
     * without ojAlgo verifies it agrees with ojAlgo's route. The 25 problems (n from 2 to 15, any
     * problem seed, only problems where a positive-return portfolio exists) are drawn from a fixed
     * seed.
     */
    @ParameterizedTest
    @MethodSource("randomProblems")
    void randomProblems_routesAgreeWhereBothVerify(int n, long seed) {
        String problem = " (n = " + n + ", seed " + seed + ")";
        BoundedProblem p = BoundedProblem.random(n, seed);
        assertTrue(p.hasPositiveReturn(), "a positive-return portfolio exists" + problem);
        SolveOutcome.Optimal chosen = assertInstanceOf(SolveOutcome.Optimal.class, solver.solve(p.sigma, p.mu, p.lo, p.hi),
                "optimal" + problem);
        assertTrue(chosen.kktResidual() <= 1e-9, "verified" + problem);
        Optional<SolveOutcome.Optimal> own = solver.solveFromOwnStart(p.sigma, p.mu, p.lo, p.hi);
        SolveOutcome viaOjAlgo = solver.solveFromConvexSolver(p.sigma, p.mu, p.lo, p.hi);
        if (own.isPresent() && viaOjAlgo instanceof SolveOutcome.Optimal) {
            for (int i = 0; i < n; i++) {
                assertEquals(((SolveOutcome.Optimal) viaOjAlgo).weights()[i], own.get().weights()[i], SAME_PORTFOLIO,
                        "weight " + i + problem);
            }
        }
    }

    /**
     * n in [2, 15] (the first two candidates at the ends) and a problem seed over all longs, a
     * small one (|seed| &le; 1000) a quarter of the time; candidates without a positive-return
     * portfolio are passed over until 25 remain.
     */
    static Stream<Arguments> randomProblems() {
        SplittableRandom rng = new SplittableRandom(0x5EED_000CL);
        return IntStream.iterate(0, k -> k + 1)
                .mapToObj(k -> Arguments.of(k == 0 ? 2 : k == 1 ? 15 : rng.nextInt(2, 16),
                        rng.nextInt(4) == 0 ? rng.nextLong(-1000, 1001) : rng.nextLong()))
                .filter(a -> BoundedProblem.random((int) a.get()[0], (long) a.get()[1]).hasPositiveReturn())
                .limit(25);
    }

    /** A random covariance of n assets, expected returns and uniform bounds, all from one seed. */
    private static final class BoundedProblem {
        final double[] sigma;
        final double[] mu;
        final double[] lo;
        final double[] hi;

        private BoundedProblem(int n, Random random) {
            sigma = RandomProblems.covariance(random, n, n + 20);
            mu = RandomProblems.expectedReturns(random, n);
            lo = new double[n];
            hi = new double[n];
            Arrays.fill(lo, random.nextBoolean() ? 0 : -0.1);
            Arrays.fill(hi, (1.2 + 3 * random.nextDouble()) / n);
        }

        static BoundedProblem random(int n, long seed) {
            return new BoundedProblem(n, new Random(seed));
        }

        boolean hasPositiveReturn() {
            return MaxSharpeSolver.highestExpectedReturn(mu, lo, hi) > 0;
        }
    }

    /**
     * Greedy linear program by hand: μ = (0.03, −0.01, 0.02), bounds [0.1, 0.6]. Start at 0.1 each,
     * leaving 0.7 to place; the highest μ takes its room 0.5, the next highest the last 0.2:
     * w = (0.6, 0.1, 0.3), μ'w = 0.018 − 0.001 + 0.006 = 0.023.
     */
    @Test
    void highestExpectedReturn_isGreedyByHand() {
        double value = MaxSharpeSolver.highestExpectedReturn(new double[] {0.03, -0.01, 0.02},
                new double[] {0.1, 0.1, 0.1}, new double[] {0.6, 0.6, 0.6});
        assertEquals(0.023, value, 1e-15, "max μ'w");
    }

    /** Bounds that cannot sum to 1 report −∞ (no portfolio at all), which the rule treats as infeasible. */
    @Test
    void highestExpectedReturn_infeasibleBounds_isMinusInfinity() {
        double value = MaxSharpeSolver.highestExpectedReturn(new double[] {0.03, 0.02}, new double[2],
                new double[] {0.3, 0.3});
        assertEquals(Double.NEGATIVE_INFINITY, value, "no feasible portfolio");
    }

    /**
     * Two copies of one asset (Σ = v·11', singular) with μ = (0.02, 0.01) and bounds [−1, 2]: on
     * the budget every portfolio has variance v, so the Sharpe ratio (0.01 + 0.01 w1)/√v grows
     * with w1 up to its bound: w = (2, −1) (hand computation).
     */
    @Test
    void duplicateAssetPair_singularCovariance_takesTheBound() {
        double v = 0.04;
        double[] sigma = {v, v, v, v};
        SolveOutcome out = solver.solve(sigma, new double[] {0.02, 0.01}, new double[] {-1, -1}, new double[] {2, 2});
        SolveOutcome.Optimal optimal = assertInstanceOf(SolveOutcome.Optimal.class, out, out::toString);
        assertEquals(2, optimal.weights()[0], 1e-12, "w1");
        assertEquals(-1, optimal.weights()[1], 1e-12, "w2");
    }

    /** Without bounds the tangency Σ⁻¹μ / 1'Σ⁻¹μ is found in closed form; a singular Σ is named. */
    @Test
    void unbounded_singularCovariance_isFailedNamingSingular() {
        double[] sigma = RandomProblems.covariance(new Random(8), 6, 4);
        Optional<SolveOutcome> out = solver.unbounded(sigma, new double[] {0.01, 0.02, 0.01, 0, 0.03, 0.01});
        assertTrue(out.isPresent(), "an outcome");
        SolveOutcome.Failed failed = assertInstanceOf(SolveOutcome.Failed.class, out.get());
        assertTrue(failed.reason().contains("singular"), failed.reason());
    }
}
