package dev.sigmawalk.strategies.optimize;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Optional;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.junit.jupiter.api.Test;

/** Invariants of every solve over seeded random problems. */
class SolverPropertiesTest {
    private static final double KKT = 1e-9;
    private static final double BUDGET = 1e-12;
    private static final double SAME_OPTIMUM = 1e-10;

    private final SolverSettings settings = SolverSettings.standard();
    private final ActiveSetSolver solver = new ActiveSetSolver(settings);

    @Property(tries = 60)
    void boundedSolve_sumsToOne_staysInBounds_passesKkt(@ForAll @IntRange(min = 1, max = 40) int n,
                                                        @ForAll long seed) {
        QuadraticProblem p = problem(new Random(seed), n);
        SolveOutcome out = solver.solve(p);
        if (out instanceof SolveOutcome.Infeasible) {
            assertTrue(n * p.upper()[0] < 1, "infeasible only when the caps cannot reach 1");
            return;
        }
        double[] w = assertInstanceOf(SolveOutcome.Optimal.class, out).weights();
        assertEquals(1, Arrays.stream(w).sum(), BUDGET, "budget");
        for (int i = 0; i < n; i++) {
            assertTrue(w[i] >= p.lower()[i] && w[i] <= p.upper()[i], "weight " + i + " = " + w[i]);
        }
        assertTrue(KktCheck.check(p, w).holds(KKT), "kkt");
    }

    @Property(tries = 40)
    void warmStart_fromAnotherProblemsPartition_equalsColdStart(@ForAll @IntRange(min = 2, max = 40) int n,
                                                                @ForAll long seed) {
        Random random = new Random(seed);
        QuadraticProblem previous = problem(random, n);
        QuadraticProblem current = problem(random, n);
        SolveOutcome before = solver.solve(previous);
        SolveOutcome cold = solver.solve(current);
        if (!(before instanceof SolveOutcome.Optimal) || !(cold instanceof SolveOutcome.Optimal)) {
            return;
        }
        SolveOutcome warm = solver.solve(current, ((SolveOutcome.Optimal) before).sides());
        MinVarianceReferenceTest.assertWeights(((SolveOutcome.Optimal) cold).weights(), warm, SAME_OPTIMUM);
    }

    @Property(tries = 60)
    void singleFactorThreshold_matchesGeneralSolver(@ForAll @IntRange(min = 1, max = 60) int n,
                                                    @ForAll long seed) {
        checkSingleFactorPaths(n, seed);
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
        assertTrue(fast.isPresent(), "partition iteration certifies its answer");
        assertTrue(bisection.isPresent(), "bisection certifies its answer");
        QuadraticProblem dense = new QuadraticProblem(n, SingleFactorMinVariance.dense(form), new double[n], lo, hi);
        SolveOutcome general = solver.solve(dense);
        MinVarianceReferenceTest.assertWeights(fast.get().weights(), general, SAME_OPTIMUM);
        MinVarianceReferenceTest.assertWeights(bisection.get().weights(), general, SAME_OPTIMUM);
    }

    @Property(tries = 40)
    void woodbury_matchesDenseClosedFormAndGeneralSolver(@ForAll @IntRange(min = 1, max = 60) int n, @ForAll long seed) {
        SingleFactorForm form = RandomProblems.singleFactor(new Random(seed), n);
        SolveOutcome fast = new SingleFactorMinVariance(settings).unbounded(form);
        SolveOutcome dense = new UnboundedSolver(settings).minVariance(SingleFactorMinVariance.dense(form), n);
        MinVarianceReferenceTest.assertWeights(((SolveOutcome.Optimal) dense).weights(), fast, SAME_OPTIMUM);
        QuadraticProblem open = QuadraticProblem.uniformBounds(n, SingleFactorMinVariance.dense(form), new double[n],
                Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY);
        MinVarianceReferenceTest.assertWeights(((SolveOutcome.Optimal) fast).weights(), solver.solve(open),
                SAME_OPTIMUM);
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
