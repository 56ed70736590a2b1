package dev.sigmawalk.engine.evidence;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

import java.util.Arrays;
import dev.sigmawalk.engine.SeededCases;
import java.util.SplittableRandom;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Hand computations use y = (1, -1, 2, 0, -2) (mean 0, T = 5), whose autocovariances with
 * divisor T are Γ(0) = 10/5 = 2, Γ(1) = (1·(-1) + (-1)·2 + 2·0 + 0·(-2))/5 = -0.6 and
 * Γ(2) = (1·2 + (-1)·0 + 2·(-2))/5 = -0.4.
 */
class LongRunCovarianceTest {
    private static final double[] Y = {1, -1, 2, 0, -2};
    /** Hand values are short decimal expressions; rounding only. */
    private static final double HAND = 1e-12;
    /** Andrews' constants are printed to 4 decimals, so bandwidths are compared to the hand value's digits. */
    private static final double BANDWIDTH_DIGITS = 1e-9;

    /**
     * Newey-West with ℓ = 2 lags (Bartlett, S = 3): weights 1 - j/3 = 2/3, 1/3, so
     * Ψ = 2 + 2(⅔·(-0.6) + ⅓·(-0.4)) = 14/15 and Var(ȳ) = Ψ/5 = 14/75. Hand computation
     * following Newey &amp; West (1987).
     */
    @Test
    void bartlett_twoLags_matchesHandComputation() {
        LongRunCovariance psi = LongRunCovariance.fixed(new double[][] {Y}, HacKernel.BARTLETT, 3.0);
        assertEquals(14.0 / 15.0, psi.entry(0, 0), HAND);
        assertEquals(14.0 / 75.0, psi.varianceOfMean(0, 0), HAND);
    }

    /**
     * Parzen at S = 3: k(1/3) = 1 - 6/9 + 6/27 = 5/9, k(2/3) = 2(1/3)³ = 2/27, so
     * Ψ = 2 + 2(5/9·(-0.6) + 2/27·(-0.4)) = 2 - 2/3 - 8/135 = 172/135.
     */
    @Test
    void parzen_bandwidthThree_matchesHandComputation() {
        LongRunCovariance psi = LongRunCovariance.fixed(new double[][] {Y}, HacKernel.PARZEN, 3.0);
        assertEquals(172.0 / 135.0, psi.entry(0, 0), HAND);
    }

    /** Bandwidth 0 keeps Γ(0) only: the iid variance with divisor T, 2. */
    @Test
    void zeroBandwidth_isLagZeroOnly() {
        assertEquals(2.0, LongRunCovariance.fixed(new double[][] {Y}, HacKernel.BARTLETT, 0.0).entry(0, 0), HAND);
    }

    /**
     * A shifted copy of y has the same Ψ: the estimator centres at the sample mean.
     */
    @Test
    void constantShift_doesNotChangeTheEstimate() {
        double[] shifted = {11, 9, 12, 10, 8};
        LongRunCovariance psi = LongRunCovariance.fixed(new double[][] {shifted}, HacKernel.BARTLETT, 3.0);
        assertEquals(14.0 / 15.0, psi.entry(0, 0), HAND);
    }

    /**
     * Two components, y1 = y above and y2 = (0, 1, -1, 1, -1), Bartlett S = 3. By hand:
     * Γ(0)_12 = -1/5, Γ(1)_12 = Σ y1_t y2_{t-1} / 5 = 0, Γ(1)_21 = Σ y2_t y1_{t-1} / 5 = 4/5,
     * Γ(2)_12 = 2/5, Γ(2)_21 = -4/5; Γ(0)_22 = 4/5, Γ(1)_22 = -3/5, Γ(2)_22 = 2/5. Then
     * Ψ_12 = -1/5 + ⅔(0 + 4/5) + ⅓(2/5 - 4/5) = 1/5 and Ψ_22 = 4/5 + ⅔(-6/5) + ⅓(4/5) = 4/15.
     */
    @Test
    void twoComponents_crossTermsMatchHandComputation() {
        double[] y2 = {0, 1, -1, 1, -1};
        LongRunCovariance psi = LongRunCovariance.fixed(new double[][] {Y, y2}, HacKernel.BARTLETT, 3.0);
        assertEquals(14.0 / 15.0, psi.entry(0, 0), HAND, "psi11");
        assertEquals(0.2, psi.entry(0, 1), HAND, "psi12");
        assertEquals(0.2, psi.entry(1, 0), HAND, "psi21");
        assertEquals(4.0 / 15.0, psi.entry(1, 1), HAND, "psi22");
        // g = (1, 1): the long-run variance of y1 + y2 is Ψ11 + 2Ψ12 + Ψ22.
        assertEquals(14.0 / 15.0 + 0.4 + 4.0 / 15.0, psi.quadraticForm(new double[] {1, 1}), HAND);
    }

    /**
     * Andrews (1991) AR(1) plug-in on y, by hand: ρ = Σ y_t y_{t-1} / Σ y_{t-1}² = -3/6 = -0.5; for
     * one component σ⁴ cancels, α(1) = 4ρ² / ((1-ρ)²(1+ρ)²) = 1/0.5625 = 16/9 and
     * α(2) = 4ρ² / (1-ρ)⁴ = 16/81. Bartlett S = 1.1447 (16/9 · 5)^{1/3}; weights 1 - j/S at
     * j = 1, 2. Parzen S = 2.6614 (16/81 · 5)^{1/5} ≈ 2.655, so lag 1 (x ≈ 0.377) takes the inner
     * branch 1 - 6x² + 6x³ and lag 2 (x ≈ 0.753) the outer branch 2(1 - x)³. Python with numpy
     * 2.4.6 gave 1.4127639728546013 for this Ψ, agreeing with the expression below.
     */
    @Test
    void automaticBandwidth_matchesAndrewsPlugInByHand() {
        double bartlettS = 1.1447 * Math.cbrt(16.0 / 9.0 * 5.0);
        LongRunCovariance bartlett = LongRunCovariance.automatic(new double[][] {Y}, HacKernel.BARTLETT);
        assertEquals(bartlettS, bartlett.bandwidth(), BANDWIDTH_DIGITS);
        double expectedBartlett = 2 + 2 * ((1 - 1 / bartlettS) * -0.6 + (1 - 2 / bartlettS) * -0.4);
        assertEquals(expectedBartlett, bartlett.entry(0, 0), HAND);

        double parzenS = 2.6614 * Math.pow(16.0 / 81.0 * 5.0, 0.2);
        LongRunCovariance parzen = LongRunCovariance.automatic(new double[][] {Y}, HacKernel.PARZEN);
        assertEquals(parzenS, parzen.bandwidth(), BANDWIDTH_DIGITS);
        double x1 = 1 / parzenS;
        double x2 = 2 / parzenS;
        double expectedParzen = 2 + 2 * ((1 - 6 * x1 * x1 + 6 * x1 * x1 * x1) * -0.6 + 2 * Math.pow(1 - x2, 3) * -0.4);
        assertEquals(expectedParzen, parzen.entry(0, 0), HAND);
        assertEquals(expectedParzen / 5, LongRunCovariance.varianceOfMean(Y, HacKernel.PARZEN), HAND);
    }

    /** A constant series carries no autocorrelation information: bandwidth 0 and Ψ = 0. */
    @Test
    void constantSeries_givesZeroBandwidthAndZeroVariance() {
        LongRunCovariance psi = LongRunCovariance.automatic(new double[][] {{3, 3, 3, 3}}, HacKernel.BARTLETT);
        assertEquals(0.0, psi.bandwidth(), 0.0);
        assertEquals(0.0, psi.entry(0, 0), 0.0);
    }

    @Test
    void kernels_matchTheirDefinitionsAtKnots() {
        assertEquals(1.0, HacKernel.BARTLETT.weight(0.0), 0.0);
        assertEquals(0.25, HacKernel.BARTLETT.weight(-0.75), HAND);
        assertEquals(0.0, HacKernel.BARTLETT.weight(1.5), 0.0);
        // Parzen's two branches meet at ½: 1 - 6/4 + 6/8 = 2(½)³ = 0.25.
        assertEquals(0.25, HacKernel.PARZEN.weight(0.5), HAND);
        assertEquals(0.0, HacKernel.PARZEN.weight(1.0), 0.0);
    }

    @Test
    void badInput_isRejectedWithTheCause() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LongRunCovariance.fixed(new double[][] {{1, Double.NaN, 2}}, HacKernel.BARTLETT, 1));
        assertTrue(e.getMessage().contains("NaN"), e.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> LongRunCovariance.fixed(new double[][] {{1, 2, 3}, {1, 2}}, HacKernel.BARTLETT, 1));
        assertThrows(IllegalArgumentException.class,
                () -> LongRunCovariance.fixed(new double[][] {Y}, HacKernel.PARZEN, -1));
    }

    /**
     * Both kernels have non-negative spectral windows, so the long-run variance of any series is
     * non-negative at any bandwidth (Andrews 1991, class K₁ contains both); rounding allows a
     * tiny negative. The 200 cases (2 to 40 values in [-1, 1], bandwidth in [0, 50]) are drawn
     * from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("seriesAndBandwidths")
    void longRunVariance_isNeverNegative(double[] y, double bandwidth) {
        for (HacKernel k : HacKernel.values()) {
            double psi = LongRunCovariance.fixed(new double[][] {y}, k, bandwidth).entry(0, 0);
            assertTrue(psi >= -1e-12, () -> k + " gave " + psi + " at bandwidth " + bandwidth + " for y = "
                    + Arrays.toString(y));
        }
    }

    static Stream<Arguments> seriesAndBandwidths() {
        SplittableRandom rng = new SplittableRandom(0x5EED_0005L);
        return Stream.generate(() -> {
            double[] y = new double[rng.nextInt(2, 41)];
            for (int t = 0; t < y.length; t++) {
                y[t] = SeededCases.inRange(rng, -1, 1);
            }
            return Arguments.of(y, SeededCases.inRange(rng, 0, 50));
        }).limit(200);
    }
}
