package dev.sigmawalk.strategies.optimize;

import static org.junit.jupiter.api.Assertions.assertAll;
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
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Invariants of every solve over seeded random problems. The cases (problem size and problem
 * seed) are drawn from a fixed seed.
 */
class SolverPropertiesTest {
    private static final double KKT = 1e-9;
    private static final double BUDGET = 1e-12;
    private static final double SAME_OPTIMUM = 1e-10;

    private final SolverSettings settings = SolverSettings.standard();
    private final ActiveSetSolver solver = new ActiveSetSolver(settings);

    /**
     * A bounded solve is infeasible only when the caps cannot reach 1; otherwise its weights sum
     * to 1, stay in their bounds and pass the KKT check. The 60 problems (n from 1 to 40, any
     * problem seed) are drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("boundedCases")
    void boundedSolve_sumsToOne_staysInBounds_passesKkt(int n, long seed) {
        String problem = describe(n, seed);
        QuadraticProblem p = problem(new Random(seed), n);
        SolveOutcome out = solver.solve(p);
        if (out instanceof SolveOutcome.Infeasible) {
            assertTrue(n * p.upper()[0] < 1, "infeasible only when the caps cannot reach 1" + problem);
            return;
        }
        double[] w = assertInstanceOf(SolveOutcome.Optimal.class, out, "optimal" + problem).weights();
        assertEquals(1, Arrays.stream(w).sum(), BUDGET, "budget" + problem);
        for (int i = 0; i < n; i++) {
            assertTrue(w[i] >= p.lower()[i] && w[i] <= p.upper()[i], "weight " + i + " = " + w[i] + problem);
        }
        assertTrue(KktCheck.check(p, w).holds(KKT), "kkt" + problem);
    }

    static Stream<Arguments> boundedCases() {
        return sizesAndSeeds(0x5EED_000DL, 1, 40, 60);
    }

    /**
     * Warm-starting from the partition of another problem's optimum gives the cold-start optimum.
     * The 40 problem pairs (n from 2 to 40, any problem seed) are drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("warmStartCases")
    void warmStart_fromAnotherProblemsPartition_equalsColdStart(int n, long seed) {
        Random random = new Random(seed);
        QuadraticProblem previous = problem(random, n);
        QuadraticProblem current = problem(random, n);
        SolveOutcome before = solver.solve(previous);
        SolveOutcome cold = solver.solve(current);
        if (!(before instanceof SolveOutcome.Optimal) || !(cold instanceof SolveOutcome.Optimal)) {
            return;
        }
        SolveOutcome warm = solver.solve(current, ((SolveOutcome.Optimal) before).sides());
        assertAll("warm start" + describe(n, seed),
                () -> MinVarianceReferenceTest.assertWeights(((SolveOutcome.Optimal) cold).weights(), warm,
                        SAME_OPTIMUM));
    }

    static Stream<Arguments> warmStartCases() {
        return sizesAndSeeds(0x5EED_000EL, 2, 40, 40);
    }

    /**
     * Both fast single-factor searches agree with the general solver. The 60 problems (n from 1
     * to 60, any problem seed) are drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("singleFactorThresholdCases")
    void singleFactorThreshold_matchesGeneralSolver(int n, long seed) {
        checkSingleFactorPaths(n, seed);
    }

    static Stream<Arguments> singleFactorThresholdCases() {
        return sizesAndSeeds(0x5EED_000FL, 1, 60, 60);
    }

    /**
     * A sample the property once found: bisection met a flat piece of the level function that
     * rounding put a hair below the target (one weight at the cap the budget implies, all others
     * at −0.05).
     */
    @Test
    void singleFactorThreshold_flatLevelPieceSample_matchesGeneralSolver() {
        checkSingleFactorPaths(35, -55);
    }

    /** Both fast single-factor searches certify an answer equal to the general solver's. */
    private void checkSingleFactorPaths(int n, long seed) {
        String problem = describe(n, seed);
        Random random = new Random(seed);
        SingleFactorForm form = RandomProblems.singleFactor(random, n);
        double cap = random.nextBoolean() ? Double.POSITIVE_INFINITY : (1.0 + 3 * random.nextDouble()) / n;
        double[] lo = new double[n];
        double[] hi = new double[n];
        Arrays.fill(lo, random.nextBoolean() ? 0 : -0.05);
        Arrays.fill(hi, cap);
        SingleFactorMinVariance fastPaths = new SingleFactorMinVariance(settings);
        Optional<SolveOutcome.Optimal> fast = fastPaths.threshold(form, lo, hi);
        Optional<SolveOutcome.Optimal> bisection = fastPaths.thresholdByBisection(form, lo, hi);
        assertTrue(fast.isPresent(), "partition iteration certifies its answer" + problem);
        assertTrue(bisection.isPresent(), "bisection certifies its answer" + problem);
        QuadraticProblem dense = new QuadraticProblem(n, SingleFactorMinVariance.dense(form), new double[n], lo, hi);
        SolveOutcome general = solver.solve(dense);
        assertAll("partition iteration against the general solver" + problem,
                () -> MinVarianceReferenceTest.assertWeights(fast.get().weights(), general, SAME_OPTIMUM));
        assertAll("bisection against the general solver" + problem,
                () -> MinVarianceReferenceTest.assertWeights(bisection.get().weights(), general, SAME_OPTIMUM));
    }

    /**
     * The unbounded Woodbury solve agrees with the dense closed form and with the general solver
     * without bounds. The 40 problems (n from 1 to 60, any problem seed) are drawn from a fixed
     * seed.
     */
    @ParameterizedTest
    @MethodSource("woodburyCases")
    void woodbury_matchesDenseClosedFormAndGeneralSolver(int n, long seed) {
        String problem = describe(n, seed);
        SingleFactorForm form = RandomProblems.singleFactor(new Random(seed), n);
        SolveOutcome fast = new SingleFactorMinVariance(settings).unbounded(form);
        SolveOutcome dense = new UnboundedSolver(settings).minVariance(SingleFactorMinVariance.dense(form), n);
        assertAll("Woodbury against the dense closed form" + problem,
                () -> MinVarianceReferenceTest.assertWeights(((SolveOutcome.Optimal) dense).weights(), fast,
                        SAME_OPTIMUM));
        QuadraticProblem open = QuadraticProblem.uniformBounds(n, SingleFactorMinVariance.dense(form), new double[n],
                Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY);
        assertAll("general solver against Woodbury" + problem,
                () -> MinVarianceReferenceTest.assertWeights(((SolveOutcome.Optimal) fast).weights(),
                        solver.solve(open), SAME_OPTIMUM));
    }

    static Stream<Arguments> woodburyCases() {
        return sizesAndSeeds(0x5EED_0010L, 1, 60, 40);
    }

    /**
     * count cases of n in [minN, maxN] (the first two at the ends) and a problem seed over all
     * longs, a small one (|seed| &le; 1000) a quarter of the time.
     */
    private static Stream<Arguments> sizesAndSeeds(long caseSeed, int minN, int maxN, int count) {
        SplittableRandom rng = new SplittableRandom(caseSeed);
        return IntStream.range(0, count).mapToObj(k -> Arguments.of(
                k == 0 ? minN : k == 1 ? maxN : rng.nextInt(minN, maxN + 1),
                rng.nextInt(4) == 0 ? rng.nextLong(-1000, 1001) : rng.nextLong()));
    }

    /** The case's parameters, appended to every failure message so that a failure can be rerun. */
    private static String describe(int n, long seed) {
        return " (n = " + n + ", seed " + seed + ")";
    }

    /** Min variance or mean-variance on a random covariance, with random bounds (lower 0 or −0.2). */
    private static QuadraticProblem problem(Random random, int n) {
        double[] sigma = RandomProblems.covariance(random, n, n + 20);
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
}
