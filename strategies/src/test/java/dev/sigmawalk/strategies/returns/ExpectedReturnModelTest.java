package dev.sigmawalk.strategies.returns;

import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.study.ExpectedReturnKind;
import dev.sigmawalk.strategies.risk.ReferenceData;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Expected returns on a three-row window computed by hand (Method §4):
 * <pre>
 *   t   m      x_Z01  x_Z02
 *   0   0.01   0.00   0.03
 *   1   0.03   0.05   0.01
 *   2   0.02   0.01   0.02
 * </pre>
 * m̄ = 0.02, x̄ = (0.02, 0.02); centred m = (-0.01, 0.01, 0), centred x_Z01 = (-0.02, 0.03, -0.01),
 * centred x_Z02 = (0.01, -0.01, 0). With divisor L-1 = 2: s_mm = (1e-4 + 1e-4)/2 = 1e-4,
 * s_Z01,m = (2e-4 + 3e-4)/2 = 2.5e-4, s_Z02,m = (-1e-4 - 1e-4)/2 = -1e-4, so β = (2.5, -1).
 */
class ExpectedReturnModelTest {
    /** Double rounding in a handful of operations on two-digit inputs. */
    private static final double HAND_TOL = 1e-15;
    /** Per-period returns near 1e-2; numpy's intercepts agree to about 1e-16 in absolute terms. */
    private static final double REFERENCE_TOL = 1e-13;
    private static final LocalDate REBALANCE = LocalDate.of(2032, 3, 31);

    private static EstimationWindow window() {
        double[] excess = {0.00, 0.03, 0.05, 0.01, 0.01, 0.02};
        double[] market = {0.01, 0.03, 0.02};
        List<String> assets = new ArrayList<>(List.of("Z01", "Z02"));
        return new EstimationWindow(REBALANCE, 40, assets, new int[] {0, 1}, excess, market, 12, null);
    }

    @Test
    void historical_isWindowMeanOfEachAsset() {
        EstimationWindow w = window();
        double[] mu = new HistoricalReturns().expected(w);

        assertArrayEquals(new double[] {0.02, 0.02}, mu, HAND_TOL);
        assertNotSame(w.moments().mean(), mu, "caller owns the result");
    }

    /** No alphas, no premium: μ_i = β_i m̄ = (2.5 · 0.02, -1 · 0.02) = (0.05, -0.02). */
    @Test
    void singleIndex_withoutAlphasOrPremium_isBetaTimesWindowMarketMean() {
        double[] mu = new SingleIndexReturns(AlphaLookup.none(), OptionalDouble.empty()).expected(window());

        assertArrayEquals(new double[] {0.05, -0.02}, mu, HAND_TOL);
    }

    /** Annual premium 6 % with p = 12: μ_m = 0.005, μ = (2.5 · 0.005, -1 · 0.005). */
    @Test
    void singleIndex_withAnnualPremium_usesPremiumPerPeriod() {
        double[] mu = new SingleIndexReturns(AlphaLookup.none(), OptionalDouble.of(0.06)).expected(window());

        assertArrayEquals(new double[] {0.0125, -0.005}, mu, HAND_TOL);
    }

    /**
     * The lookup is asked for each asset as known on the rebalance date; Z01 has α = 0.001, Z02
     * none (0): μ = (0.001 + 0.0125, -0.005).
     */
    @Test
    void singleIndex_withUserAlpha_addsAlphaAsOfRebalanceDate() {
        List<String> asked = new ArrayList<>();
        AlphaLookup alphas = (asset, onOrBefore) -> {
            asked.add(asset + "@" + onOrBefore);
            return asset.equals("Z01") ? 0.001 : 0.0;
        };

        double[] mu = new SingleIndexReturns(alphas, OptionalDouble.of(0.06)).expected(window());

        assertArrayEquals(new double[] {0.0135, -0.005}, mu, HAND_TOL);
        assertEquals(List.of("Z01@2032-03-31", "Z02@2032-03-31"), asked);
    }

    /**
     * On the reference window, without user alphas or premium, μ_i = β_i m̄ = x̄_i - α_i where α_i
     * is the regression intercept from single_index.csv (numpy 1.24.2, cross-checked there with
     * {@code numpy.linalg.lstsq}); x̄_i is the plain column mean of window.csv.
     */
    @Test
    void singleIndex_onReferenceWindow_equalsMeanMinusRegressionIntercept() {
        EstimationWindow w = ReferenceData.window();
        double[] intercept = ReferenceData.singleIndexColumn("alpha");
        int n = w.assetCount();
        double[] expected = new double[n];
        for (int i = 0; i < n; i++) {
            double sum = 0;
            for (int t = 0; t < w.length(); t++) {
                sum += w.excessReturns()[t * n + i];
            }
            expected[i] = sum / w.length() - intercept[i];
        }

        double[] mu = new SingleIndexReturns(AlphaLookup.none(), OptionalDouble.empty()).expected(w);

        assertArrayEquals(expected, mu, REFERENCE_TOL);
    }

    @Test
    void singleIndex_nonFiniteAlpha_isRejectedWithAssetAndDate() {
        AlphaLookup broken = (asset, onOrBefore) -> asset.equals("Z02") ? Double.NaN : 0.0;
        SingleIndexReturns model = new SingleIndexReturns(broken, OptionalDouble.empty());

        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> model.expected(window()));
        assertTrue(e.getMessage().contains("alpha of Z02 on 2032-03-31 (NaN)"), e.getMessage());
    }

    @Test
    void singleIndex_nonFinitePremium_isRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new SingleIndexReturns(AlphaLookup.none(), OptionalDouble.of(Double.POSITIVE_INFINITY)));
        assertTrue(e.getMessage().contains("market premium (Infinity) must be finite"), e.getMessage());
    }

    @Test
    void none_givesZeroForAnyAssetAndDate() {
        assertEquals(0.0, AlphaLookup.none().alpha("Z99", LocalDate.of(2040, 1, 1)), 0.0);
    }

    @Test
    void factory_mapsStudyKinds() {
        assertInstanceOf(HistoricalReturns.class,
                ExpectedReturnModel.of(ExpectedReturnKind.HISTORICAL, AlphaLookup.none(), OptionalDouble.empty()));
        ExpectedReturnModel si = ExpectedReturnModel.of(ExpectedReturnKind.SINGLE_INDEX, AlphaLookup.none(),
                OptionalDouble.of(0.06));
        assertArrayEquals(new double[] {0.0125, -0.005}, si.expected(window()), HAND_TOL);
    }
}
