package dev.sigmawalk.strategies.optimize;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * Minimum-variance weights on the 12-asset reference window against values computed outside the
 * project (see {@link ReferenceMatrices}): the closed form against {@code numpy.linalg.solve}
 * (numpy 1.24.2), bounds [0, 0.25] against {@code cvxopt.solvers.qp} (cvxopt 1.3.0) polished by
 * an exact active-set KKT solve.
 */
class MinVarianceReferenceTest {
    private static final double CLOSED_FORM_TOLERANCE = 1e-10;
    private static final double BOUNDED_TOLERANCE = 1e-8;
    private static final int SAMPLE_UNBOUNDED = 0;
    private static final int SAMPLE_BOUNDED = 1;
    private static final int SINGLE_INDEX_UNBOUNDED = 2;
    private static final int SINGLE_INDEX_BOUNDED = 3;

    private final SolverSettings settings = SolverSettings.standard();
    private final int n = ReferenceMatrices.ASSETS;

    /** Σ⁻¹1/(1'Σ⁻¹1) for the sample matrix, reference: numpy.linalg.solve (numpy 1.24.2). */
    @Test
    void sampleUnbounded_closedForm_matchesNumpySolve() {
        SolveOutcome out = new UnboundedSolver(settings).minVariance(ReferenceMatrices.sampleCovariance(), n);
        assertWeights(ReferenceMatrices.minVarianceWeights(SAMPLE_UNBOUNDED), out, CLOSED_FORM_TOLERANCE);
    }

    /** Dense closed form for the single-index matrix, reference: numpy.linalg.solve (numpy 1.24.2). */
    @Test
    void singleIndexUnbounded_denseClosedForm_matchesNumpySolve() {
        SolveOutcome out = new UnboundedSolver(settings).minVariance(ReferenceMatrices.singleIndexCovariance(), n);
        assertWeights(ReferenceMatrices.minVarianceWeights(SINGLE_INDEX_UNBOUNDED), out, CLOSED_FORM_TOLERANCE);
    }

    /**
     * The O(n) Woodbury form from α, β, residual variance and s_mm ("market_variance"), reference:
     * numpy.linalg.solve on s_mm ββ' + diag(d) (numpy 1.24.2).
     */
    @Test
    void singleIndexUnbounded_woodbury_matchesNumpySolve() {
        SolveOutcome out = new SingleFactorMinVariance(settings).unbounded(ReferenceMatrices.singleIndexForm());
        assertWeights(ReferenceMatrices.minVarianceWeights(SINGLE_INDEX_UNBOUNDED), out, CLOSED_FORM_TOLERANCE);
    }

    /** Bounds [0, 0.25] on the sample matrix, reference: cvxopt.solvers.qp polished by an exact KKT solve. */
    @Test
    void sampleBounded_activeSet_matchesPolishedCvxopt() {
        QuadraticProblem p = QuadraticProblem.uniformBounds(n, ReferenceMatrices.sampleCovariance(), new double[n],
                0, 0.25);
        SolveOutcome out = new ActiveSetSolver(settings).solve(p);
        assertWeights(ReferenceMatrices.minVarianceWeights(SAMPLE_BOUNDED), out, BOUNDED_TOLERANCE);
    }

    /** Bounds [0, 0.25] on the single-index matrix, reference: cvxopt.solvers.qp polished by an exact KKT solve. */
    @Test
    void singleIndexBounded_activeSet_matchesPolishedCvxopt() {
        QuadraticProblem p = QuadraticProblem.uniformBounds(n, ReferenceMatrices.singleIndexCovariance(),
                new double[n], 0, 0.25);
        SolveOutcome out = new ActiveSetSolver(settings).solve(p);
        assertWeights(ReferenceMatrices.minVarianceWeights(SINGLE_INDEX_BOUNDED), out, BOUNDED_TOLERANCE);
    }

    /** The O(n log n) threshold rule, reference: cvxopt.solvers.qp polished by an exact KKT solve. */
    @Test
    void singleIndexBounded_threshold_matchesPolishedCvxopt() {
        double[] lo = new double[n];
        double[] hi = new double[n];
        Arrays.fill(hi, 0.25);
        Optional<SolveOutcome.Optimal> out = new SingleFactorMinVariance(settings)
                .threshold(ReferenceMatrices.singleIndexForm(), lo, hi);
        assertTrue(out.isPresent(), "the threshold rule certifies its answer");
        assertWeights(ReferenceMatrices.minVarianceWeights(SINGLE_INDEX_BOUNDED), out.get(), BOUNDED_TOLERANCE);
    }

    /** The bisection search of the single-factor path, same reference: polished cvxopt.solvers.qp. */
    @Test
    void singleIndexBounded_bisection_matchesPolishedCvxopt() {
        double[] lo = new double[n];
        double[] hi = new double[n];
        Arrays.fill(hi, 0.25);
        Optional<SolveOutcome.Optimal> out = new SingleFactorMinVariance(settings)
                .thresholdByBisection(ReferenceMatrices.singleIndexForm(), lo, hi);
        assertTrue(out.isPresent(), "bisection certifies its answer");
        assertWeights(ReferenceMatrices.minVarianceWeights(SINGLE_INDEX_BOUNDED), out.get(), BOUNDED_TOLERANCE);
    }

    /** The sample optimum under [0, 0.25] holds A01 at the cap and A07..A12 at zero (same reference). */
    @Test
    void sampleBounded_activeSet_reportsCappedAndZeroSides() {
        QuadraticProblem p = QuadraticProblem.uniformBounds(n, ReferenceMatrices.sampleCovariance(), new double[n],
                0, 0.25);
        SolveOutcome.Optimal out = (SolveOutcome.Optimal) new ActiveSetSolver(settings).solve(p);
        assertEquals(BoundSide.UPPER, out.sides()[0], "A01");
        for (int i = 6; i < n; i++) {
            assertEquals(BoundSide.LOWER, out.sides()[i], "asset " + i);
        }
    }

    static void assertWeights(double[] expected, SolveOutcome outcome, double tolerance) {
        assertTrue(outcome instanceof SolveOutcome.Optimal, () -> "expected an optimum, got " + outcome);
        double[] w = ((SolveOutcome.Optimal) outcome).weights();
        assertEquals(expected.length, w.length, "weight count");
        for (int i = 0; i < w.length; i++) {
            assertEquals(expected[i], w[i], tolerance, "weight " + i);
        }
    }
}
