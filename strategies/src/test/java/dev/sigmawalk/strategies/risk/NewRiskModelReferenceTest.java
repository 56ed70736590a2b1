package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.data.FactorTable;
import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.EstimationWindow;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The Method §11 models on the invented reference window (window.csv: 60 rows, 12 assets, a
 * market column) against matrices computed outside the project by numpy 1.24.2 (with pandas and
 * statsmodels cross-checks, as each test says).
 */
class NewRiskModelReferenceTest {
    /** Agreement with numpy on the same rows: only summation order differs. */
    private static final double REFERENCE_TOL = 1e-10;
    /** Two computations of one quantity in different orders. */
    private static final double ROUNDING_TOL = 1e-12;

    /** A01-A04, A05-A08 and A09-A12, the three invented sectors of the reference window. */
    static Map<String, String> referenceSectors() {
        Map<String, String> sectors = new HashMap<>();
        for (int i = 1; i <= 12; i++) {
            sectors.put(String.format("A%02d", i), i <= 4 ? "first" : i <= 8 ? "second" : "third");
        }
        return sectors;
    }

    /**
     * Market plus sector means (sectors A01-A04, A05-A08, A09-A12) against
     * multi_index_sectors_cov.csv: {@code numpy.linalg.pinv} least squares, cross-checked against
     * statsmodels OLS (3e-15).
     */
    @Test
    void multiIndexSectors_matchesNumpyLeastSquares() {
        EstimationWindow w = ReferenceData.window();
        FactorCovariance sigma = new MultiIndexRiskModel(new FactorColumns.Sectors(referenceSectors())).estimate(w);

        Close.relative(LabelledMatrix.read("multi_index_sectors_cov.csv"), sigma.dense(), REFERENCE_TOL, "Sigma_MI");
        assertEquals(4, sigma.factorCount(), "market and three sectors");
        for (int i = 0; i < 12; i++) {
            Close.relative(w.moments().covariance(i, i), sigma.get(i, i), ROUNDING_TOL, "diagonal " + i);
        }
    }

    /**
     * A factor file holding only the market column gives the market model: against
     * single_index_cov.csv ({@code numpy.cov} moments, s_mm ββ' + diag(d)).
     */
    @Test
    void multiIndexFileWithMarketOnly_matchesNumpySingleIndex() {
        EstimationWindow w = ReferenceData.window();
        double[] m = w.marketExcess();
        FactorTable table = new FactorTable(Path.of("market-factor.csv"), List.of("market"), m.clone());
        FactorCovariance sigma = new MultiIndexRiskModel(new FactorColumns.File(table, "market-factor.csv")).estimate(w);

        Close.relative(ReferenceData.matrix("single_index_cov.csv"), sigma.dense(), REFERENCE_TOL, "Sigma");
    }

    /** Two principal components plus a diagonal against principal_components_2_cov.csv ({@code numpy.linalg.eigh}). */
    @Test
    void principalComponents_matchesNumpyEigh() {
        EstimationWindow w = ReferenceData.window();
        FactorCovariance sigma = new PrincipalComponentsRiskModel(2).estimate(w);

        Close.relative(LabelledMatrix.read("principal_components_2_cov.csv"), sigma.dense(), REFERENCE_TOL, "Sigma_PC");
        for (int i = 0; i < 12; i++) {
            Close.relative(w.moments().covariance(i, i), sigma.get(i, i), ROUNDING_TOL, "diagonal " + i);
        }
    }

    /**
     * Zero-mean EWMA with a half-life of 12 periods over the 60 rows against
     * ewma_half_life_12_cov.csv (numpy; cross-checked there against pandas {@code ewm} and a hand
     * loop).
     */
    @Test
    void ewma_matchesNumpyAndPandas() {
        CovarianceEstimate sigma = new EwmaRiskModel(12).estimate(ReferenceData.window());

        Close.relative(LabelledMatrix.read("ewma_half_life_12_cov.csv"), sigma.dense(), REFERENCE_TOL, "Sigma_EWMA");
    }

    /**
     * Hand computation: two rows, half-life 1, so λ = 1/2, ω = (1/3, 2/3) oldest first and
     * Σ = x_0x_0'/3 + 2 x_1x_1'/3 with x_0 = (0.03, -0.03), x_1 = (0.06, 0.03):
     * Σ_00 = 0.0003 + 0.0024 = 0.0027, Σ_01 = -0.0003 + 0.0012 = 0.0009, Σ_11 = 0.0003 + 0.0006 = 0.0009.
     */
    @Test
    void ewma_twoRows_matchesHandComputation() {
        EstimationWindow w = Windows.of(new double[] {0.03, -0.03, 0.06, 0.03}, new double[] {0.01, 0.02});
        CovarianceEstimate sigma = new EwmaRiskModel(1).estimate(w);

        Close.absolute(new double[] {0.0027, 0.0009, 0.0009, 0.0009}, sigma.dense(), 1e-17, "Sigma");
        double[] weights = new EwmaRiskModel(1).weights(2);
        assertEquals(1.0 / 3, weights[0], 1e-16, "oldest weight");
        assertEquals(2.0 / 3, weights[1], 1e-16, "newest weight");
    }

    /**
     * Nonlinear shrinkage with n = 12 < N = 59 against nonlinear_shrinkage_cov.csv (numpy from the
     * paper's equations; agrees with a port of the code listing published with the paper to 4e-12) and against
     * nonlinear_shrinkage_numpy_cov.csv, written by this folder's independent script
     * nonlinear_shrinkage_check.py ({@code numpy.linalg.eigh}, numpy 2.4).
     */
    @Test
    void nonlinearShrinkage_narrow_matchesNumpy() {
        CovarianceEstimate sigma = new NonlinearShrinkageRiskModel().estimate(ReferenceData.window());

        Close.relative(LabelledMatrix.read("nonlinear_shrinkage_cov.csv"), sigma.dense(), REFERENCE_TOL, "reference");
        Close.relative(LabelledMatrix.read("nonlinear_shrinkage_numpy_cov.csv"), sigma.dense(), REFERENCE_TOL, "script");
        assertInstanceOf(DenseCovariance.class, sigma);
    }

    /**
     * n = 40 > N = 20 (wide_window.csv, 21 rows) against nonlinear_shrinkage_wide_cov.csv (as
     * above; 6.6e-14 against the paper's listing) and nonlinear_shrinkage_wide_numpy_cov.csv from
     * nonlinear_shrinkage_check.py. This path takes the eigenvectors through the 21×21 dual.
     */
    @Test
    void nonlinearShrinkage_wide_matchesNumpy() {
        CovarianceEstimate sigma = new NonlinearShrinkageRiskModel().estimate(LabelledMatrix.wideWindow());

        Close.relative(LabelledMatrix.read("nonlinear_shrinkage_wide_cov.csv"), sigma.dense(), REFERENCE_TOL, "reference");
        Close.relative(LabelledMatrix.read("nonlinear_shrinkage_wide_numpy_cov.csv"), sigma.dense(), REFERENCE_TOL,
                "script");
    }

    /** Method §11: with n > N the formula needs L ≥ 13; a 12-row window of 40 assets is refused. */
    @Test
    void nonlinearShrinkage_wideAndShort_isRefused() {
        EstimationWindow wide = LabelledMatrix.wideWindow();
        int n = wide.assetCount();
        double[] rows = java.util.Arrays.copyOfRange(wide.excessReturns(), 9 * n, 21 * n);
        EstimationWindow shortWindow = Windows.of(rows, java.util.Arrays.copyOfRange(wide.marketExcess(), 9, 21));

        var e = assertThrows(IllegalArgumentException.class, () -> new NonlinearShrinkageRiskModel().estimate(shortWindow));
        assertTrue(e.getMessage().contains("at least 13 rows, not 12"), e.getMessage());
    }

    /**
     * The closed form and the series of H_K agree where both are accurate (|x| a little above
     * 4√5, both sides of the switch), and the series matches the leading term -1/(π x) of the
     * expansion for large x (Ledoit &amp; Wolf 2020: H_K(x) ~ 1/(π x) · (-1) as |x| grows, since
     * the Hilbert transform of a unit-mass density decays like 1/(π x)).
     */
    @Test
    void hilbertTransform_seriesAgreesWithClosedForm() {
        double edge = 4 * Math.sqrt(5);
        double below = AnalyticalShrinkage.hilbertOfKernel(edge * (1 - 1e-9));
        double above = AnalyticalShrinkage.hilbertOfKernel(edge * (1 + 1e-9));
        Close.relative(below, above, 1e-8, "continuity at 4 sqrt 5");
        double far = 1e6;
        Close.relative(-1.0 / (Math.PI * far), AnalyticalShrinkage.hilbertOfKernel(far), 1e-9, "1/(pi x) tail");
        assertEquals(-AnalyticalShrinkage.hilbertOfKernel(3.0), AnalyticalShrinkage.hilbertOfKernel(-3.0), 0.0, "odd");
        assertEquals(-3 * Math.sqrt(5) / (10 * Math.PI), AnalyticalShrinkage.hilbertOfKernel(Math.sqrt(5)), 0.0,
                "value at sqrt 5");
    }
}
