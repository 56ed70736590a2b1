package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.study.RiskKind;
import dev.sigmawalk.engine.study.ShrinkageTarget;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class ShrinkageRiskModelTest {
    /** Agreement with numpy / scikit-learn on the same 60 rows: only summation order differs. */
    private static final double REFERENCE_TOL = 1e-10;
    /** The published worked example prints six decimals. */
    private static final double SIX_DECIMALS = 5e-7;

    private static double delta(ShrinkageTarget target) {
        return new ShrinkageRiskModel(target).estimate(ReferenceData.window()).shrinkage().orElseThrow();
    }

    /**
     * δ toward the single-index target (Ledoit &amp; Wolf 2003) against values.json
     * {@code ledoit_wolf_single_index_delta_numpy_formula}: a numpy implementation of the paper's
     * estimator formulas, cross-checked there against a loop-by-loop implementation.
     */
    @Test
    void singleIndexTarget_intensityMatchesNumpyFormula() {
        Close.relative(ReferenceData.value("ledoit_wolf_single_index_delta_numpy_formula"),
                delta(ShrinkageTarget.SINGLE_INDEX), REFERENCE_TOL, "delta");
    }

    /**
     * δ toward the constant-correlation target (Ledoit &amp; Wolf 2004, JPM) against values.json
     * {@code ledoit_wolf_constant_correlation_delta_numpy_formula} (numpy implementation of the
     * paper's formulas).
     */
    @Test
    void constantCorrelationTarget_intensityMatchesNumpyFormula() {
        Close.relative(ReferenceData.value("ledoit_wolf_constant_correlation_delta_numpy_formula"),
                delta(ShrinkageTarget.CONSTANT_CORRELATION), REFERENCE_TOL, "delta");
    }

    /**
     * δ toward the scaled identity (Ledoit &amp; Wolf 2004, JMVA) against values.json
     * {@code ledoit_wolf_identity_delta_sklearn}: {@code sklearn.covariance.ledoit_wolf(X)}
     * (scikit-learn 1.2.1).
     */
    @Test
    void identityTarget_intensityMatchesScikitLearn() {
        Close.relative(ReferenceData.value("ledoit_wolf_identity_delta_sklearn"), delta(ShrinkageTarget.IDENTITY),
                REFERENCE_TOL, "delta");
    }

    /**
     * The identity-target matrix against {@code sklearn.covariance.ledoit_wolf(X)} (scikit-learn
     * 1.2.1), sklearn_ledoit_wolf_identity_cov.csv. scikit-learn shrinks the divisor-L sample
     * matrix S_L = S (L-1)/L toward (tr S_L / n) I; this model shrinks the divisor-(L-1) S with
     * the same δ. Every term scales by (L-1)/L, so the matching quantity is our Σ · (L-1)/L.
     */
    @Test
    void identityTarget_matrixMatchesScikitLearnAfterDivisorChange() {
        CovarianceEstimate est = new ShrinkageRiskModel(ShrinkageTarget.IDENTITY).estimate(ReferenceData.window());
        double toDivisorL = (ReferenceData.LENGTH - 1.0) / ReferenceData.LENGTH;
        double[] rescaled = est.dense().clone();
        for (int k = 0; k < rescaled.length; k++) {
            rescaled[k] *= toDivisorL;
        }

        Close.relative(ReferenceData.matrix("sklearn_ledoit_wolf_identity_cov.csv"), rescaled, REFERENCE_TOL,
                "sklearn matrix");
    }

    /**
     * The single-index shrinkage matrix is δ Σ_SI + (1-δ) S with Σ_SI from single_index_cov.csv,
     * S from sample_cov.csv (numpy 1.24.2) and δ from values.json (numpy formula).
     */
    @Test
    void singleIndexTarget_matrixIsConvexCombinationOfReferenceMatrices() {
        CovarianceEstimate est = new ShrinkageRiskModel(ShrinkageTarget.SINGLE_INDEX).estimate(ReferenceData.window());
        double delta = ReferenceData.value("ledoit_wolf_single_index_delta_numpy_formula");
        double[] f = ReferenceData.matrix("single_index_cov.csv");
        double[] s = ReferenceData.matrix("sample_cov.csv");
        double[] expected = new double[s.length];
        for (int k = 0; k < s.length; k++) {
            expected[k] = delta * f[k] + (1 - delta) * s[k];
        }

        Close.relative(expected, est.dense(), REFERENCE_TOL, "shrunk matrix");
    }

    /**
     * Constant-correlation worked example (public question-and-answer example, reproduced with
     * numpy as the reference README states): S = [[.0309, .0056, .0011], [.0056, .0739, .0148],
     * [.0011, .0148, .0489]] gives r̄ = 0.130562, f₁₂ = 0.006239, f₁₃ = 0.005075,
     * f₂₃ = 0.007849, with the diagonal unchanged.
     */
    @Test
    void constantCorrelationWorkedExample_matchesPublishedTarget() {
        double[] s = {0.0309, 0.0056, 0.0011, 0.0056, 0.0739, 0.0148, 0.0011, 0.0148, 0.0489};

        ConstantCorrelationTarget cc = ConstantCorrelationTarget.of(s, 3);

        assertEquals(0.130562, cc.meanCorrelation(), SIX_DECIMALS, "mean correlation");
        double[] f = cc.matrix();
        assertEquals(0.006239, f[1], SIX_DECIMALS, "f12");
        assertEquals(0.005075, f[2], SIX_DECIMALS, "f13");
        assertEquals(0.007849, f[5], SIX_DECIMALS, "f23");
        assertEquals(f[1], f[3], 0.0, "symmetric");
        assertEquals(0.0309, f[0], 0.0, "f11");
        assertEquals(0.0739, f[4], 0.0, "f22");
        assertEquals(0.0489, f[8], 0.0, "f33");
    }

    /**
     * Hand computation: x₁ = (1, -1, 1, -1), x₂ = (1, 1, -1, -1) have equal variances (4/3) and
     * zero covariance, so S is already a scaled identity with zero correlation: the identity and
     * constant-correlation targets equal S, γ̂ = 0, and δ is reported as 0 with Σ = S.
     */
    @Test
    void shrinkageIntensity_isZero_whenTargetEqualsSample() {
        var window = Windows.of(new double[] {1, 1, -1, 1, 1, -1, -1, -1}, new double[] {0.01, -0.02, 0.03, 0.0});
        for (ShrinkageTarget target : new ShrinkageTarget[] {ShrinkageTarget.IDENTITY,
                ShrinkageTarget.CONSTANT_CORRELATION}) {
            CovarianceEstimate est = new ShrinkageRiskModel(target).estimate(window);

            assertEquals(0.0, est.shrinkage().orElseThrow(), 0.0, target + " delta");
            Close.absolute(new double[] {4.0 / 3, 0, 0, 4.0 / 3}, est.dense(), 1e-15, target + " matrix");
        }
    }

    /**
     * With two assets r̄ is their one correlation, so the constant-correlation target equals S up
     * to rounding: δ is reported as 0 instead of a value decided by rounding noise, and Σ = S.
     */
    @Test
    void twoAssets_constantCorrelationTargetEqualsSample_zeroIntensity() {
        var window = Windows.simulated(7, 40, 2);
        CovarianceEstimate est = new ShrinkageRiskModel(ShrinkageTarget.CONSTANT_CORRELATION).estimate(window);

        assertEquals(0.0, est.shrinkage().orElseThrow(), 0.0, "delta");
        Close.relative(window.moments().covariance(), est.dense(), 1e-15, "matrix");
    }

    /** With one asset every target equals S (no pair to structure), so δ = 0. */
    @Test
    void singleAsset_everyTargetGivesZeroIntensity() {
        var window = Windows.simulated(11, 30, 1);
        for (ShrinkageTarget target : ShrinkageTarget.values()) {
            CovarianceEstimate est = new ShrinkageRiskModel(target).estimate(window);

            assertEquals(0.0, est.shrinkage().orElseThrow(), 0.0, target + " delta");
            assertEquals(window.moments().covariance(0, 0), est.get(0, 0), 0.0, target + " variance");
        }
    }

    /**
     * Consistency (Ledoit &amp; Wolf 2003, 2004: κ̂ converges, so δ = κ̂/L tends to 0 when the
     * true covariance differs from the target). Seeded returns with a market factor, a sector
     * factor and heavy-tailed noise fit none of the targets; δ must fall clearly as L grows
     * from 60 to 240 to 960 (for κ̂ roughly constant, by about 4 each step; asserted: by 2).
     */
    @Test
    void intensity_fallsAsWindowGrows_onDataFromAFullCovariance() {
        for (ShrinkageTarget target : ShrinkageTarget.values()) {
            double d60 = new ShrinkageRiskModel(target).estimate(Windows.simulated(2024, 60, 10)).shrinkage()
                    .orElseThrow();
            double d240 = new ShrinkageRiskModel(target).estimate(Windows.simulated(2024, 240, 10)).shrinkage()
                    .orElseThrow();
            double d960 = new ShrinkageRiskModel(target).estimate(Windows.simulated(2024, 960, 10)).shrinkage()
                    .orElseThrow();

            assertTrue(d60 > 0, target + ": delta at L = 60 (" + d60 + ") must be > 0");
            assertTrue(d240 < d60 / 2, target + ": delta at 240 (" + d240 + ") vs 60 (" + d60 + ")");
            assertTrue(d960 < d240 / 2, target + ": delta at 960 (" + d960 + ") vs 240 (" + d240 + ")");
        }
    }

    /** A constant asset has no correlation with anything. */
    @Test
    void constantAsset_constantCorrelationTargetIsRejected() {
        var window = Windows.of(new double[] {0.02, 0.01, 0.02, 0.03, 0.02, -0.01}, new double[] {0.01, 0.02, 0.0});

        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new ShrinkageRiskModel(ShrinkageTarget.CONSTANT_CORRELATION).estimate(window));
        assertTrue(e.getMessage().contains("variance of asset 0 (0.0)"), e.getMessage());
    }

    @Test
    void factory_mapsStudyKindsToModelsAndLabels() {
        assertInstanceOf(SampleRiskModel.class, RiskModel.of(RiskKind.SAMPLE, ShrinkageTarget.SINGLE_INDEX));
        assertInstanceOf(SingleIndexRiskModel.class, RiskModel.of(RiskKind.SINGLE_INDEX, ShrinkageTarget.IDENTITY));
        RiskModel shrink = RiskModel.of(RiskKind.SHRINKAGE, ShrinkageTarget.CONSTANT_CORRELATION);
        assertEquals(new ShrinkageRiskModel(ShrinkageTarget.CONSTANT_CORRELATION), shrink);
        assertEquals("shrinkage to constant-correlation", shrink.label());
        assertEquals("single-index", RiskModel.of(RiskKind.SINGLE_INDEX, ShrinkageTarget.IDENTITY).label());
    }
}
