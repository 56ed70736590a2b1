package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.WindowMoments;
import dev.sigmawalk.strategies.optimize.SingleFactorForm;
import org.junit.jupiter.api.Test;
import org.ojalgo.matrix.decomposition.LU;
import org.ojalgo.matrix.store.MatrixStore;
import org.ojalgo.matrix.store.R064Store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class SingleIndexCovarianceTest {
    /** Agreement with numpy on the same 60 rows: only summation order differs. */
    private static final double REFERENCE_TOL = 1e-10;
    /** Arithmetic on textbook inputs given to two or three digits. */
    private static final double TEXTBOOK_TOL = 1e-15;
    /** Double rounding in an O(n) sum. */
    private static final double ROUNDING_TOL = 1e-13;
    /** Two O(n³) and O(n) solves of a well-conditioned 12×12 system. */
    private static final double SOLVE_TOL = 1e-10;

    /**
     * α, β and residual variance of every asset in window.csv against single_index.csv (numpy
     * 1.24.2: {@code numpy.cov} moments, cross-checked there against {@code numpy.linalg.lstsq}
     * with an intercept), and s_mm against values.json {@code market_variance}.
     */
    @Test
    void referenceWindow_matchesNumpyMarketModel() {
        SingleIndexCovariance si = new SingleIndexRiskModel().estimate(ReferenceData.window());

        Close.relative(ReferenceData.value("market_variance"), si.marketVariance(), REFERENCE_TOL, "s_mm");
        Close.relative(ReferenceData.singleIndexColumn("alpha"), si.alphas(), REFERENCE_TOL, "alpha");
        Close.relative(ReferenceData.singleIndexColumn("beta"), si.betas(), REFERENCE_TOL, "beta");
        Close.relative(ReferenceData.singleIndexColumn("residual_variance"), si.residualVariances(), REFERENCE_TOL,
                "residual variance");
    }

    /** Σ_SI of window.csv against single_index_cov.csv (numpy 1.24.2, s_mm ββ' + diag(d)). */
    @Test
    void referenceWindow_denseMatchesNumpySingleIndexMatrix() {
        SingleIndexCovariance si = new SingleIndexRiskModel().estimate(ReferenceData.window());

        Close.relative(ReferenceData.matrix("single_index_cov.csv"), si.dense(), REFERENCE_TOL, "Sigma_SI");
        assertSame(si.dense(), si.dense(), "dense matrix is built once");
    }

    /** Method §3: the single-index matrix keeps the sample variances on its diagonal. */
    @Test
    void referenceWindow_diagonalEqualsSampleVariances() {
        var window = ReferenceData.window();
        SingleIndexCovariance si = new SingleIndexRiskModel().estimate(window);

        for (int i = 0; i < si.size(); i++) {
            Close.relative(window.moments().covariance(i, i), si.get(i, i), ROUNDING_TOL, "diagonal " + i);
        }
    }

    /**
     * Bodie, Kane &amp; Marcus, Investments (10th ed.), index-model chapter, concept check:
     * β_A = 1.0, β_B = 0.2, σ_M = 25 %, σ_B = 30 % give Cov(A, B) = β_A β_B σ_M² = 0.0125 and
     * split B's variance 0.09 into 0.0025 systematic and 0.0875 firm-specific. The moments below
     * are chosen to carry exactly those inputs (s_im = β_i σ_M²); A's own variance (0.1) and the
     * sample S_AB (0.02) are not part of the exercise and must not affect Cov(A, B).
     */
    @Test
    void textbookConceptCheck_covarianceAndVarianceSplit() {
        double marketVar = 0.25 * 0.25;
        var moments = new WindowMoments(2, 60, new double[] {0.01, 0.01}, 0.005, marketVar,
                new double[] {1.0 * marketVar, 0.2 * marketVar}, new double[] {0.1, 0.02, 0.02, 0.09});

        SingleIndexCovariance si = SingleIndexCovariance.fit(moments);

        assertEquals(0.0125, si.get(0, 1), TEXTBOOK_TOL, "Cov(A, B)");
        assertEquals(0.0125, si.get(1, 0), TEXTBOOK_TOL, "Cov(B, A)");
        assertEquals(0.0025, si.betas()[1] * si.betas()[1] * si.marketVariance(), TEXTBOOK_TOL, "B systematic");
        assertEquals(0.0875, si.residualVariances()[1], TEXTBOOK_TOL, "B firm-specific");
        assertEquals(0.09, si.get(1, 1), TEXTBOOK_TOL, "B total");
    }

    /** The optimizer's factor view is the same numbers: s = s_mm, loadings β, specifics d. */
    @Test
    void factorForm_exposesMarketVarianceBetasAndResiduals() {
        SingleFactorForm form = new SingleIndexRiskModel().estimate(ReferenceData.window());

        Close.relative(ReferenceData.value("market_variance"), form.factorVariance(), REFERENCE_TOL, "s");
        Close.relative(ReferenceData.singleIndexColumn("beta"), form.loadings(), REFERENCE_TOL, "loadings");
        Close.relative(ReferenceData.singleIndexColumn("residual_variance"), form.specificVariances(), REFERENCE_TOL,
                "specific variances");
    }

    /**
     * Hand computation: market m = (-1, 0, 1), asset x₁ = (-2, 0, 2) = 2m, x₂ = (1, -1, 0).
     * s_mm = 1, β₁ = 2, d₁ = S₁₁ - 4 = 0, so Σ_SI is singular: the residual variance stays at 0
     * (never negative or NaN) and the solve refuses with a message naming the asset.
     */
    @Test
    void assetMovingWithMarket_zeroResidualAndSolveRefuses() {
        var window = Windows.of(new double[] {-2, 1, 0, -1, 2, 0}, new double[] {-1, 0, 1});
        SingleIndexCovariance si = new SingleIndexRiskModel().estimate(window);

        assertEquals(2.0, si.betas()[0], 1e-15);
        assertEquals(0.0, si.residualVariances()[0], 0.0);
        ArithmeticException e = assertThrows(ArithmeticException.class, () -> si.solve(new double[] {1, 1}));
        assertTrue(e.getMessage().contains("residual variance of asset 0"), e.getMessage());
    }

    /** A market constant over the window has no variance, so β is undefined. */
    @Test
    void constantMarket_isRejectedWithMessage() {
        var window = Windows.of(new double[] {1, 2, 3, 4, 5, 7}, new double[] {0.01, 0.01, 0.01});

        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new SingleIndexRiskModel().estimate(window));
        assertTrue(e.getMessage().contains("market variance in the window (0.0)"), e.getMessage());
    }

    /**
     * Woodbury solve by hand: s = 1, β = (1, 2), d = (1, 1), so Σ = [[2, 2], [2, 5]] and
     * Σ⁻¹ = [[5, -2], [-2, 2]] / 6; Σ⁻¹ (1, 1) = (1/2, 0).
     */
    @Test
    void solve_smallCase_matchesHandInverse() {
        var moments = new WindowMoments(2, 10, new double[] {0, 0}, 0, 1.0, new double[] {1, 2},
                new double[] {2, 2, 2, 5});
        SingleIndexCovariance si = SingleIndexCovariance.fit(moments);

        Close.absolute(new double[] {0.5, 0.0}, si.solve(new double[] {1, 1}), ROUNDING_TOL, "inverse times ones");
        assertEquals(2 * 0.09 + 2 * 2 * 0.12 + 5 * 0.16, si.portfolioVariance(new double[] {0.3, 0.4}), ROUNDING_TOL);
    }

    /**
     * The O(n) Woodbury solve on the reference window against a dense LU solve of the same
     * Σ_SI (ojAlgo 57.1.0 {@code LU.R064}), for b = 1 (the minimum-variance direction) and a
     * mixed-sign b.
     */
    @Test
    void referenceWindow_solveMatchesDenseLuSolve() {
        SingleIndexCovariance si = new SingleIndexRiskModel().estimate(ReferenceData.window());
        int n = si.size();
        LU<Double> lu = LU.R064.make();
        assertTrue(lu.decompose(R064Store.wrap(si.dense().clone(), n)), "LU of Sigma_SI");
        double[][] rightHandSides = {new double[n], new double[n]};
        for (int i = 0; i < n; i++) {
            rightHandSides[0][i] = 1.0;
            rightHandSides[1][i] = (i % 3) - 1.0 + 0.1 * i;
        }
        for (double[] b : rightHandSides) {
            MatrixStore<Double> dense = lu.getSolution(R064Store.wrap(b.clone(), n));
            double[] expected = new double[n];
            for (int i = 0; i < n; i++) {
                expected[i] = dense.doubleValue(i, 0);
            }

            Close.relative(expected, si.solve(b), SOLVE_TOL, "Sigma^-1 b");
        }
    }

    @Test
    void wrongLengthWeights_areRejected() {
        SingleIndexCovariance si = new SingleIndexRiskModel().estimate(ReferenceData.window());

        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> si.portfolioVariance(new double[] {1}));
        assertTrue(e.getMessage().contains("weights (1) must have length n (12)"), e.getMessage());
    }
}
