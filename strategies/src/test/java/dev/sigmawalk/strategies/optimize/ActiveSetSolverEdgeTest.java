package dev.sigmawalk.strategies.optimize;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** Small and degenerate problems whose answers are worked out by hand in each test's Javadoc. */
class ActiveSetSolverEdgeTest {
    private static final double EXACT = 1e-12;
    private static final double KKT = 1e-9;

    private final SolverSettings settings = SolverSettings.standard();
    private final ActiveSetSolver solver = new ActiveSetSolver(settings);

    /** One asset: the budget alone fixes w = 1 (hand computation). */
    @Test
    void oneAsset_weightIsOne() {
        QuadraticProblem p = QuadraticProblem.uniformBounds(1, new double[] {0.04}, new double[1], 0, 1);
        assertWeights(new double[] {1}, solver.solve(p), EXACT);
    }

    /**
     * Two assets, Σ = [[0.04, 0.002], [0.002, 0.01]]: minimising w'Σw with w2 = 1 − w1 gives
     * w1 = (σ2² − σ12)/(σ1² + σ2² − 2σ12) = 0.008/0.046 = 4/23 (hand computation, a textbook
     * two-asset result); inside [0, 1], so bounds do not bind.
     */
    @Test
    void twoAssets_interiorOptimum_matchesHandFormula() {
        double[] sigma = {0.04, 0.002, 0.002, 0.01};
        double w1 = 4.0 / 23;
        QuadraticProblem p = QuadraticProblem.uniformBounds(2, sigma, new double[2], 0, 1);
        assertWeights(new double[] {w1, 1 - w1}, solver.solve(p), EXACT);
        assertWeights(new double[] {w1, 1 - w1}, new UnboundedSolver(settings).minVariance(sigma, 2), EXACT);
    }

    /**
     * Σ = diag(0.04, 0.01): the unbounded optimum is w ∝ (25, 100) = (0.2, 0.8); with w ≤ 0.6 the
     * second weight is capped and the budget leaves 0.4 for the first (hand computation; the
     * cap's multiplier ν − g2 = 0.016 − 0.006 = 0.01 ≥ 0 confirms it).
     */
    @Test
    void twoAssets_capBinds_givesCapAndRemainder() {
        double[] sigma = {0.04, 0, 0, 0.01};
        QuadraticProblem p = QuadraticProblem.uniformBounds(2, sigma, new double[2], 0, 0.6);
        SolveOutcome out = solver.solve(p);
        assertWeights(new double[] {0.4, 0.6}, out, EXACT);
        assertEquals(BoundSide.UPPER, ((SolveOutcome.Optimal) out).sides()[1], "capped side");
        assertEquals(0.016, ((SolveOutcome.Optimal) out).budgetMultiplier(), EXACT, "ν = g1 = 0.04 * 0.4");
    }

    /**
     * Degenerate: Q = I, c = (0.4, 0.4, −0.1). The budget-only optimum w = c + ν1 with ν = 0.1 is
     * (0.5, 0.5, 0): the third weight sits exactly on its lower bound 0 with multiplier
     * g3 − ν = 0.1 − 0.1 = 0 (hand computation).
     */
    @Test
    void weightOnBoundWithZeroMultiplier_isExact() {
        double[] q = identity(3);
        double[] c = {0.4, 0.4, -0.1};
        QuadraticProblem p = QuadraticProblem.uniformBounds(3, q, c, 0, 1);
        assertWeights(new double[] {0.5, 0.5, 0}, solver.solve(p), EXACT);
    }

    /**
     * A free weight 1e-6 above its bound: Q = I and c = w* − ν1 with w* = (0.5, 0.5 − 1e-6, 1e-6)
     * and ν = 0.1 make w* the exact optimum (stationarity Qw − c = ν1 by construction; hand
     * computation). An interior-point method typically misses such a weight by ~1e-6.
     */
    @Test
    void freeWeightNearBound_isExact() {
        double[] expected = {0.5, 0.5 - 1e-6, 1e-6};
        double[] c = {expected[0] - 0.1, expected[1] - 0.1, expected[2] - 0.1};
        QuadraticProblem p = QuadraticProblem.uniformBounds(3, identity(3), c, 0, 1);
        assertWeights(expected, solver.solve(p), EXACT);
    }

    /** Three assets with w ≤ 0.25 can hold at most 0.75 (hand computation): infeasible, the reason names the sum. */
    @Test
    void upperBoundsTooLow_isInfeasibleNamingTheSum() {
        QuadraticProblem p = QuadraticProblem.uniformBounds(3, identity(3), new double[3], 0, 0.25);
        SolveOutcome out = solver.solve(p);
        SolveOutcome.Infeasible inf = assertInstanceOf(SolveOutcome.Infeasible.class, out);
        assertTrue(inf.reason().contains("upper bounds sum to 0.75"), inf.reason());
    }

    /** Four assets with w ≥ 0.3 need at least 1.2 (hand computation): infeasible. */
    @Test
    void lowerBoundsTooHigh_isInfeasibleNamingTheSum() {
        QuadraticProblem p = QuadraticProblem.uniformBounds(4, identity(4), new double[4], 0.3, 1);
        SolveOutcome.Infeasible inf = assertInstanceOf(SolveOutcome.Infeasible.class, solver.solve(p));
        assertTrue(inf.reason().contains("lower bounds sum to 1.2"), inf.reason());
    }

    /** Four assets with w = 0.25 exactly: the feasible set is one point (hand computation). */
    @Test
    void boundsThatSumExactlyToOne_giveTheOnlyFeasiblePoint() {
        QuadraticProblem p = QuadraticProblem.uniformBounds(4, identity(4), new double[] {1, 0, 0, 0}, 0, 0.25);
        assertWeights(new double[] {0.25, 0.25, 0.25, 0.25}, solver.solve(p), EXACT);
    }

    /**
     * A sample covariance from L = 4 periods of n = 6 assets has rank at most 3 (common practice:
     * rank ≤ L − 1), so the closed form must refuse it and say the matrix is singular.
     */
    @Test
    void sampleWithMoreAssetsThanPeriods_unbounded_isFailedNamingSingular() {
        double[] sigma = RandomProblems.covariance(new Random(11), 6, 4);
        SolveOutcome out = new UnboundedSolver(settings).minVariance(sigma, 6);
        SolveOutcome.Failed failed = assertInstanceOf(SolveOutcome.Failed.class, out);
        assertTrue(failed.reason().contains("singular"), failed.reason());
    }

    /**
     * Three assets, the second a copy of the first, in a window with more periods than assets: Σ
     * is singular all the same, and the refusal names the copy (whose pivot vanishes, being
     * exactly the first asset) rather than blaming the window's length alone.
     */
    @Test
    void repeatedColumn_unbounded_isFailedNamingTheCopy() {
        double[] sigma = {
            0.04, 0.04, 0.01,
            0.04, 0.04, 0.01,
            0.01, 0.01, 0.09};
        SolveOutcome out = new UnboundedSolver(settings).minVariance(sigma, java.util.List.of("K1", "K1-copy", "K2"));
        SolveOutcome.Failed failed = assertInstanceOf(SolveOutcome.Failed.class, out);
        assertTrue(failed.reason().startsWith("the 3x3 matrix is singular or not positive definite (Cholesky pivot 1"
                + " vanishes: asset 'K1-copy' is, to rounding, a mix of the assets before it)"), failed.reason());
        assertTrue(failed.reason().contains("or when assets move together exactly"), failed.reason());
    }

    /**
     * The same rank-deficient matrix with bounds [0, 0.5]: the problem is bounded, so the
     * semi-definite treatment must find a point that passes the KKT check, with no NaN.
     */
    @Test
    void sampleWithMoreAssetsThanPeriods_bounded_isOptimalAndPassesKkt() {
        double[] sigma = RandomProblems.covariance(new Random(11), 6, 4);
        QuadraticProblem p = QuadraticProblem.uniformBounds(6, sigma, new double[6], 0, 0.5);
        SolveOutcome.Optimal out = assertInstanceOf(SolveOutcome.Optimal.class, solver.solve(p));
        assertTrue(KktCheck.check(p, out.weights()).holds(KKT), "kkt");
    }

    /**
     * Duplicate assets: assets 0 and 1 are the same asset twice. Any split of their combined
     * weight is optimal, so the combined weight must equal the optimum of the problem with the
     * duplicate merged into one asset of bounds [0, 0.8] (hand reduction), and the variance must
     * match.
     */
    @Test
    void duplicateAssets_combinedWeightMatchesMergedProblem() {
        double[] base = RandomProblems.covariance(new Random(5), 3, 40);
        double[] dup = duplicateFirst(base, 3);
        QuadraticProblem withDuplicate = QuadraticProblem.uniformBounds(4, dup, new double[4], 0, 0.4);
        QuadraticProblem merged = new QuadraticProblem(3, base, new double[3], new double[] {0, 0, 0},
                new double[] {0.8, 0.4, 0.4});
        SolveOutcome.Optimal a = assertInstanceOf(SolveOutcome.Optimal.class, solver.solve(withDuplicate));
        SolveOutcome.Optimal b = assertInstanceOf(SolveOutcome.Optimal.class, solver.solve(merged));
        assertEquals(b.weights()[0], a.weights()[0] + a.weights()[1], 1e-10, "combined weight");
        assertEquals(b.weights()[1], a.weights()[2], 1e-10, "second asset");
        assertEquals(b.weights()[2], a.weights()[3], 1e-10, "third asset");
    }

    /**
     * Q = 0 (a linear program): maximise c'w with c = (1, 2, 3), w in [0, 0.5], Σ w = 1. Greedy by
     * c gives (0, 0.5, 0.5) (hand computation); every release of a bound meets a singular block.
     */
    @Test
    void zeroQuadratic_solvesTheLinearProgram() {
        QuadraticProblem p = QuadraticProblem.uniformBounds(3, new double[9], new double[] {1, 2, 3}, 0, 0.5);
        assertWeights(new double[] {0, 0.5, 0.5}, solver.solve(p), EXACT);
    }

    /**
     * Q = 0 and no bounds: c'w grows without limit along (−1, 1); both weights are unbounded, so
     * the start already meets a singular block and the outcome is Failed, not NaN.
     */
    @Test
    void zeroQuadraticWithoutBounds_isFailedNamingSingular() {
        QuadraticProblem p = QuadraticProblem.uniformBounds(2, new double[4], new double[] {1, 2},
                Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY);
        SolveOutcome.Failed failed = assertInstanceOf(SolveOutcome.Failed.class, solver.solve(p));
        assertTrue(failed.reason().contains("singular"), failed.reason());
    }

    /**
     * Q = 0, c = (1, 2), w1 ≥ 0.2 (no cap) and w2 ≤ 3 (no floor). On the budget line w2 = 1 − w1
     * the objective −c'w = −(2 − w1) is smallest at the least w1, so w = (0.2, 0.8) (hand
     * computation); the multiplier of w1's bound is g1 − ν = −1 − (−2) = 1 ≥ 0.
     */
    @Test
    void zeroQuadraticWithOneSidedBounds_stopsAtTheLowerBound() {
        QuadraticProblem p = new QuadraticProblem(2, new double[4], new double[] {1, 2},
                new double[] {0.2, Double.NEGATIVE_INFINITY}, new double[] {Double.POSITIVE_INFINITY, 3});
        assertWeights(new double[] {0.2, 0.8}, solver.solve(p), EXACT);
    }

    /**
     * The same bounds with c = (2, 1): −c'w = −(1 + w1) falls forever as w1 grows and w2 = 1 − w1
     * has no floor (hand computation), so the solver must report an unbounded objective.
     */
    @Test
    void zeroQuadraticWithOpenDirection_isFailedUnbounded() {
        QuadraticProblem p = new QuadraticProblem(2, new double[4], new double[] {2, 1},
                new double[] {0.2, Double.NEGATIVE_INFINITY}, new double[] {Double.POSITIVE_INFINITY, 3});
        SolveOutcome.Failed failed = assertInstanceOf(SolveOutcome.Failed.class, solver.solve(p));
        assertTrue(failed.reason().contains("unbounded"), failed.reason());
    }

    /**
     * Single factor with s = 0.01, β = (2, 1, 2, 2), d = (0.01, 0.0001, 0.01, 0.01), long only:
     * w = (0, 1, 0, 0) is optimal because g2 = sβ2² + d2 = 0.0101 = ν and every other
     * g_i = s β_i β2 = 0.02 ≥ ν (hand computation). Every weight is pinned (the second by the cap
     * 1 that the budget implies), the vertex case of the fast paths.
     */
    @Test
    void singleFactorVertex_allPathsGiveTheOneHeldAsset() {
        SingleFactorForm form = RandomProblems.form(0.01, new double[] {2, 1, 2, 2},
                new double[] {0.01, 0.0001, 0.01, 0.01});
        double[] lo = new double[4];
        double[] hi = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY,
            Double.POSITIVE_INFINITY};
        double[] expected = {0, 1, 0, 0};
        SingleFactorMinVariance fast = new SingleFactorMinVariance(settings);
        assertWeights(expected, fast.threshold(form, lo, hi).orElseThrow(), EXACT);
        assertWeights(expected, fast.thresholdByBisection(form, lo, hi).orElseThrow(), EXACT);
        QuadraticProblem dense = new QuadraticProblem(4, SingleFactorMinVariance.dense(form), new double[4], lo, hi);
        assertWeights(expected, solver.solve(dense), EXACT);
    }

    /**
     * A nearly linear program: Q = 1e-12·Σ (mean-variance with a risk aversion of 1e-12) with
     * Σ = diag(0.04, 0.01, 0.0225), c = μ = (0.010, 0.008, 0.006), w in [0, 0.4]. The two best
     * expected returns take the cap and the budget leaves 0.2 for the third, which is free:
     * ν = g3 = 1e-12·0.0045 − 0.006, and the caps' multipliers ν − g1 ≈ 0.004 and ν − g2 ≈ 0.002
     * are positive (hand computation). The subproblem's solve runs through Q⁻¹ of size 1e13, so
     * the free weight must come from the budget, not from that cancellation.
     */
    @Test
    void nearlyLinearProgram_keepsTheBudgetExact() {
        double[] sigma = {0.04, 0, 0, 0, 0.01, 0, 0, 0, 0.0225};
        double[] q = new double[9];
        for (int k = 0; k < 9; k++) {
            q[k] = 1e-12 * sigma[k];
        }
        QuadraticProblem p = QuadraticProblem.uniformBounds(3, q, new double[] {0.010, 0.008, 0.006}, 0, 0.4);
        assertWeights(new double[] {0.4, 0.4, 0.2}, solver.solve(p), EXACT);
        BoundSide[] warm = {BoundSide.UPPER, BoundSide.UPPER, BoundSide.FREE};
        assertWeights(new double[] {0.4, 0.4, 0.2}, solver.solve(p, warm), EXACT);
    }

    /** Three caps of 0.3 sum to 0.8999999999999999 in floating point; the reason says 0.9 (hand computation). */
    @Test
    void infeasibleReason_showsTheSumAsWritten() {
        QuadraticProblem p = QuadraticProblem.uniformBounds(3, identity(3), new double[3], 0, 0.3);
        SolveOutcome.Infeasible inf = assertInstanceOf(SolveOutcome.Infeasible.class, solver.solve(p));
        assertEquals("upper bounds sum to 0.9 < 1 over 3 assets: no weights can sum to 1", inf.reason());
        assertEquals("1.2", ActiveSetSolver.shown(0.4 + 0.4 + 0.4));
        assertEquals("-0.75", ActiveSetSolver.shown(-0.75));
    }

    /** No bounds at all: the active-set solver must agree with the closed form (same problem, two methods). */
    @Test
    void infiniteBounds_matchClosedForm() {
        double[] sigma = RandomProblems.covariance(new Random(3), 8, 60);
        QuadraticProblem p = QuadraticProblem.uniformBounds(8, sigma, new double[8], Double.NEGATIVE_INFINITY,
                Double.POSITIVE_INFINITY);
        double[] closed = ((SolveOutcome.Optimal) new UnboundedSolver(settings).minVariance(sigma, 8)).weights();
        assertWeights(closed, solver.solve(p), 1e-10);
    }

    /** A warm start from a wrong partition lands on the same optimum as a cold start. */
    @Test
    void warmStartFromWrongGuess_equalsColdStart() {
        double[] sigma = RandomProblems.covariance(new Random(21), 30, 80);
        QuadraticProblem p = QuadraticProblem.uniformBounds(30, sigma, new double[30], 0, 0.1);
        BoundSide[] guess = new BoundSide[30];
        for (int i = 0; i < 30; i++) {
            guess[i] = i % 3 == 0 ? BoundSide.UPPER : i % 3 == 1 ? BoundSide.FREE : BoundSide.LOWER;
        }
        double[] cold = ((SolveOutcome.Optimal) solver.solve(p)).weights();
        assertWeights(cold, solver.solve(p, guess), 1e-10);
    }

    static double[] identity(int n) {
        double[] q = new double[n * n];
        for (int i = 0; i < n; i++) {
            q[i * n + i] = 1;
        }
        return q;
    }

    /** The (n+1)×(n+1) matrix with asset 0 repeated as a new asset 0. */
    private static double[] duplicateFirst(double[] s, int n) {
        int m = n + 1;
        double[] out = new double[m * m];
        for (int i = 0; i < m; i++) {
            for (int j = 0; j < m; j++) {
                int a = Math.max(0, i - 1);
                int b = Math.max(0, j - 1);
                out[i * m + j] = s[a * n + b];
            }
        }
        return out;
    }

    static void assertWeights(double[] expected, SolveOutcome outcome, double tolerance) {
        MinVarianceReferenceTest.assertWeights(expected, outcome, tolerance);
    }
}
