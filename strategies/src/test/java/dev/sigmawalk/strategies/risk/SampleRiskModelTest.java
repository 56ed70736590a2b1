package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

class SampleRiskModelTest {
    /** Agreement with numpy on the same 60 rows: only summation order differs. */
    private static final double REFERENCE_TOL = 1e-10;

    /**
     * S of window.csv against {@code numpy.cov(X, rowvar=False, ddof=1)} (numpy 1.24.2),
     * sample_cov.csv.
     */
    @Test
    void referenceWindow_matchesNumpyCovWithDivisorLMinusOne() {
        CovarianceEstimate est = new SampleRiskModel().estimate(ReferenceData.window());

        assertEquals(ReferenceData.ASSETS, est.size());
        Close.relative(ReferenceData.matrix("sample_cov.csv"), est.dense(), REFERENCE_TOL, "S");
        assertTrue(est.shrinkage().isEmpty(), "sample model reports no shrinkage");
    }

    /** The model hands out the window's shared moments instead of recomputing them. */
    @Test
    void estimate_reusesWindowMoments() {
        var window = ReferenceData.window();
        CovarianceEstimate est = new SampleRiskModel().estimate(window);

        assertSame(window.moments().covariance(), est.dense());
        assertEquals(window.moments().covariance(3, 7), est.get(3, 7));
    }

    /**
     * Two assets, three rows, by hand: x₁ = (1, 2, 3), x₂ = (2, 2, 5); means 2 and 3;
     * S₁₁ = (1+0+1)/2 = 1, S₂₂ = (1+1+4)/2 = 3, S₁₂ = ((-1)(-1) + 0·(-1) + 1·2)/2 = 1.5.
     */
    @Test
    void threeRows_matchHandComputation() {
        var window = Windows.of(new double[] {1, 2, 2, 2, 3, 5}, new double[] {0.1, 0.2, 0.4});
        CovarianceEstimate est = new SampleRiskModel().estimate(window);

        Close.relative(new double[] {1, 1.5, 1.5, 3}, est.dense(), 1e-15, "S");
        assertEquals(1.0 * 0.25 + 2 * 1.5 * 0.25 + 3 * 0.25, est.portfolioVariance(new double[] {0.5, 0.5}), 1e-15);
    }

    @Test
    void label_isSample() {
        assertEquals("sample", new SampleRiskModel().label());
    }
}
