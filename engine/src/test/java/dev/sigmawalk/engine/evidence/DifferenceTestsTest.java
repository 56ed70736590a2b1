package dev.sigmawalk.engine.evidence;

import dev.sigmawalk.engine.study.EvidenceSpec;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class DifferenceTestsTest {
    /** Sampling noise of fourth moments at T = 20 000 (about 2-3 %) with margin. */
    private static final double NORMAL_THEORY_RELATIVE = 0.05;
    /**
     * Monte Carlo spread allowed between bootstrap p-values at 2 000 resamples: about three
     * standard errors √(p(1-p)/2000) ≈ 0.011 at p ≈ 0.4, plus the reference's own 0.0025.
     */
    private static final double BOOTSTRAP_SEED_SPREAD = 0.035;
    /** Re-computation of the same formula in the test; rounding only. */
    private static final double SAME_FORMULA = 1e-12;
    /** "Clearly different" pairs must reject at 1 %. */
    private static final double SMALL_P = 0.01;
    /** Few resamples where only the HAC part is under test. */
    private static final EvidenceSpec QUICK = new EvidenceSpec(100, 1L, 0);

    /**
     * For iid normal returns the asymptotic variance of √T(ŜR_a - ŜR_b) is
     * 2 - 2ρ + ½(SR_a² + SR_b²) - SR_a SR_b ρ²: Var(ŜR) = (1 + SR²/2)/T (Lo 2002, Financial
     * Analysts Journal 58, eq. for iid normal returns) and Cov(ŜR_a, ŜR_b) = (ρ + SR_a SR_b ρ²/2)/T
     * (delta method with Cov(σ̂_a², σ̂_b²) = 2σ_ab²/T, Isserlis' theorem), the normal special case
     * of Ledoit &amp; Wolf (2008). With SR = 0.1, 0.05 and ρ = 0.6 that is 0.80445; the HAC
     * estimate on 20 000 simulated periods must be within 5 %.
     */
    @Test
    void sharpe_iidNormal_standardErrorMatchesNormalTheory() {
        SimulatedPair p = SimulatedPair.normal(7, 20_000, 0.1, 0.05, 1, 1, 0.6, 0.0);
        DifferenceTest t = new DifferenceTests(HacKernel.BARTLETT, QUICK).sharpeRatio(p.first(), p.second());
        double expected = 2 - 2 * 0.6 + 0.5 * (0.01 + 0.0025) - 0.1 * 0.05 * 0.36;
        assertEquals(0.80445, expected, SAME_FORMULA);
        double scaled = 20_000 * t.standardError() * t.standardError();
        assertEquals(expected, scaled, expected * NORMAL_THEORY_RELATIVE);
    }

    /**
     * For iid normal returns Var(log σ̂²) = 2/T and Cov(log σ̂_a², log σ̂_b²) = 2ρ²/T (normal
     * theory: Var(σ̂²) = 2σ⁴/T, Cov(σ̂_a², σ̂_b²) = 2σ_ab²/T; common textbook result, from
     * memory), so T·Var(log σ̂_a² - log σ̂_b²) = 4(1 - ρ²) = 2.56 at ρ = 0.6.
     */
    @Test
    void variance_iidNormal_standardErrorMatchesNormalTheory() {
        SimulatedPair p = SimulatedPair.normal(7, 20_000, 0.1, 0.05, 1, 1, 0.6, 0.0);
        DifferenceTest t = new DifferenceTests(HacKernel.PARZEN, QUICK).variance(p.first(), p.second());
        double scaled = 20_000 * t.standardError() * t.standardError();
        assertEquals(2.56, scaled, 2.56 * NORMAL_THEORY_RELATIVE);
    }

    /**
     * The standard error is √(∇f'Ψ∇f · T/(T-4) / T) with ∇f written out here from Ledoit &amp;
     * Wolf (2008, §2) for the Sharpe ratio: (γ_a/σ_a³, -γ_b/σ_b³, -μ_a/(2σ_a³), μ_b/(2σ_b³)),
     * and ∇f'Ψ∇f the Bartlett long-run variance of the influence series u_t = ∇f'(y_t - ȳ) with
     * Andrews' (1991, §6) AR(1) bandwidth of u itself, all written out loop by loop here.
     */
    @Test
    void sharpe_standardError_isDeltaMethodOnLongRunCovariance() {
        SimulatedPair p = SimulatedPair.normal(3, 200, 0.08, 0.02, 1.0, 0.7, 0.4, 0.2);
        double[] a = p.first();
        double[] b = p.second();
        int n = a.length;
        double ma = 0;
        double mb = 0;
        double ga = 0;
        double gb = 0;
        for (int t = 0; t < n; t++) {
            ma += a[t] / n;
            mb += b[t] / n;
            ga += a[t] * a[t] / n;
            gb += b[t] * b[t] / n;
        }
        double sa3 = Math.pow(ga - ma * ma, 1.5);
        double sb3 = Math.pow(gb - mb * mb, 1.5);
        double[] gradient = {ga / sa3, -gb / sb3, -ma / (2 * sa3), mb / (2 * sb3)};
        double[][] y = new double[4][n];
        for (int t = 0; t < n; t++) {
            y[0][t] = a[t];
            y[1][t] = b[t];
            y[2][t] = a[t] * a[t];
            y[3][t] = b[t] * b[t];
        }
        // The influence series u_t = ∇f'(y_t - ȳ) and Andrews' (1991) univariate AR(1) Bartlett
        // bandwidth S = 1.1447 (α(1) T)^(1/3), α(1) = 4ρ² / ((1 - ρ)²(1 + ρ)²), written out here.
        double[] u = new double[n];
        double[] centre = {ma, mb, ga, gb};
        for (int t = 0; t < n; t++) {
            for (int c = 0; c < 4; c++) {
                u[t] += gradient[c] * (y[c][t] - centre[c]);
            }
        }
        double lagged = 0;
        double cross = 0;
        for (int t = 1; t < n; t++) {
            lagged += u[t - 1] * u[t - 1];
            cross += u[t] * u[t - 1];
        }
        double rho = cross / lagged;
        double alpha = 4 * rho * rho / Math.pow((1 - rho) * (1 + rho), 2);
        double bandwidth = 1.1447 * Math.cbrt(alpha * n);
        // Bartlett long-run variance of u with that bandwidth, divisor T.
        double lrv = 0;
        for (int lag = 0; lag < n && lag < bandwidth; lag++) {
            double g = 0;
            for (int t = lag; t < n; t++) {
                g += u[t] * u[t - lag];
            }
            lrv += (lag == 0 ? 1 : 2 * (1 - lag / bandwidth)) * g / n;
        }
        double expected = Math.sqrt(lrv * n / (n - 4.0) / n);
        DifferenceTest t = new DifferenceTests(HacKernel.BARTLETT, QUICK).sharpeRatio(a, b);
        assertEquals(expected, t.standardError(), expected * 1e-10);
        assertEquals(bandwidth, t.bandwidth(), bandwidth * 1e-10);
        assertEquals(ma / Math.sqrt(ga - ma * ma) - mb / Math.sqrt(gb - mb * mb), t.difference(), SAME_FORMULA);
        assertEquals(t.difference() / t.standardError(), t.statistic(), SAME_FORMULA);
    }

    /**
     * Units never move a p-value (Method §9): the same returns in percent (times 100) give the same
     * bandwidth, block length and p-values, for both measures and both kernels, on autocorrelated
     * pairs (so the data-driven block exceeds 1). Bootstrap p-values are counts over the same
     * resamples, so they must agree exactly; the others to rounding.
     */
    @Test
    void returnsInPercent_leaveEveryBandwidthBlockAndPValueUnchanged() {
        for (long seed = 31; seed <= 34; seed++) {
            SimulatedPair p = SimulatedPair.normal(seed, 180, 0.01, 0.004, 0.04, 0.05, 0.7, 0.35);
            double[] a100 = times(p.first(), 100);
            double[] b100 = times(p.second(), 100);
            for (HacKernel kernel : HacKernel.values()) {
                DifferenceTests tests = new DifferenceTests(kernel, QUICK);
                for (DifferenceMeasure m : DifferenceMeasure.values()) {
                    DifferenceTest decimal = tests.compare(m, p.first(), p.second());
                    DifferenceTest percent = tests.compare(m, a100, b100);
                    String what = m.label() + " " + kernel.label() + " seed " + seed;
                    assertEquals(decimal.bandwidth(), percent.bandwidth(), 1e-9 * decimal.bandwidth(), what);
                    assertEquals(decimal.blockLength(), percent.blockLength(), what);
                    assertEquals(decimal.hacPValue(), percent.hacPValue(), 1e-10, what);
                    assertEquals(decimal.bootstrapPValue(), percent.bootstrapPValue(), 0.0, what);
                    assertEquals(decimal.statistic(), percent.statistic(), 1e-9 * Math.abs(decimal.statistic()), what);
                }
            }
        }
    }

    private static double[] times(double[] x, double c) {
        double[] out = new double[x.length];
        for (int t = 0; t < x.length; t++) {
            out[t] = c * x[t];
        }
        return out;
    }

    /** Identical series: Δ = 0 exactly, documented as statistic 0 and both p-values 1. */
    @Test
    void identicalSeries_differenceZero_pValuesOne() {
        SimulatedPair p = SimulatedPair.normal(5, 120, 0.05, 0.0, 1, 1, 0.5, 0.0);
        DifferenceTests tests = new DifferenceTests(HacKernel.BARTLETT, EvidenceSpec.defaults());
        for (DifferenceMeasure m : DifferenceMeasure.values()) {
            DifferenceTest t = tests.compare(m, p.first(), p.first().clone());
            assertEquals(0.0, t.difference(), 0.0, m.label());
            assertEquals(0.0, t.statistic(), 0.0, m.label());
            assertEquals(1.0, t.hacPValue(), 0.0, m.label());
            assertEquals(1.0, t.bootstrapPValue(), 0.0, m.label());
        }
    }

    /** Per-period Sharpe 0.5 against 0 (ρ = 0.3, 240 periods), and a variance ratio of 2.25. */
    @Test
    void clearlyDifferentPairs_haveSmallPValues() {
        DifferenceTests tests = new DifferenceTests(HacKernel.BARTLETT, EvidenceSpec.defaults());
        SimulatedPair sharpe = SimulatedPair.normal(21, 240, 0.5, 0.0, 1, 1, 0.3, 0.0);
        DifferenceTest s = tests.sharpeRatio(sharpe.first(), sharpe.second());
        assertTrue(s.hacPValue() < SMALL_P, "HAC p " + s.hacPValue());
        assertTrue(s.bootstrapPValue() < SMALL_P, "bootstrap p " + s.bootstrapPValue());
        SimulatedPair variance = SimulatedPair.normal(22, 240, 0.0, 0.0, 1, 1.5, 0.5, 0.0);
        DifferenceTest v = tests.variance(variance.first(), variance.second());
        assertTrue(v.difference() < 0, "first has the smaller variance");
        assertTrue(v.hacPValue() < SMALL_P, "HAC p " + v.hacPValue());
        assertTrue(v.bootstrapPValue() < SMALL_P, "bootstrap p " + v.bootstrapPValue());
    }

    /**
     * Bootstrap p-values at 2 000 resamples from three seeds stay within ±0.035 (three Monte Carlo standard errors) of the value from
     * 40 000 resamples (Monte Carlo standard error √(p(1-p)/2000) ≈ 0.011 at p ≈ 0.4), on
     * autocorrelated data so the block length chosen from the data exceeds 1.
     */
    @Test
    void bootstrapPValue_isStableAcrossSeeds() {
        SimulatedPair p = SimulatedPair.normal(11, 150, 0.12, 0.02, 1, 1, 0.6, 0.3);
        double reference = new DifferenceTests(HacKernel.BARTLETT, new EvidenceSpec(40_000, 99L, 0))
                .sharpeRatio(p.first(), p.second()).bootstrapPValue();
        for (long seed = 1; seed <= 3; seed++) {
            DifferenceTest t = new DifferenceTests(HacKernel.BARTLETT, new EvidenceSpec(2_000, seed, 0))
                    .sharpeRatio(p.first(), p.second());
            assertTrue(t.blockLength() > 1, "block length " + t.blockLength());
            assertEquals(reference, t.bootstrapPValue(), BOOTSTRAP_SEED_SPREAD, "seed " + seed);
        }
    }

    /** The same seed reproduces the result exactly (record equality compares doubles bit-wise). */
    @Test
    void sameSeed_reproducesResultExactly() {
        SimulatedPair p = SimulatedPair.normal(13, 100, 0.1, 0.0, 1, 2, 0.2, 0.1);
        DifferenceTests tests = new DifferenceTests(HacKernel.PARZEN, new EvidenceSpec(500, 42L, 0));
        assertEquals(tests.variance(p.first(), p.second()), tests.variance(p.first(), p.second()));
        assertEquals(tests.sharpeRatio(p.first(), p.second()), tests.sharpeRatio(p.first(), p.second()));
    }

    @Test
    void givenBlockLength_isUsed_andMustLeaveTwoBlocks() {
        SimulatedPair p = SimulatedPair.normal(13, 100, 0.1, 0.0, 1, 2, 0.2, 0.1);
        DifferenceTest t = new DifferenceTests(HacKernel.BARTLETT, new EvidenceSpec(200, 1L, 7))
                .sharpeRatio(p.first(), p.second());
        assertEquals(7, t.blockLength());
        assertTrue(t.method().contains("block 7"), t.method());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new DifferenceTests(HacKernel.BARTLETT, new EvidenceSpec(200, 1L, 51))
                        .sharpeRatio(p.first(), p.second()));
        assertTrue(e.getMessage().contains("51"), e.getMessage());
    }

    @Test
    void badInput_isRejectedWithTheCause() {
        DifferenceTests tests = new DifferenceTests(HacKernel.BARTLETT, QUICK);
        double[] ten = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10};
        IllegalArgumentException shortSeries = assertThrows(IllegalArgumentException.class,
                () -> tests.sharpeRatio(new double[] {1, 2, 3}, new double[] {1, 2, 3}));
        assertTrue(shortSeries.getMessage().contains("10"), shortSeries.getMessage());
        assertThrows(IllegalArgumentException.class, () -> tests.sharpeRatio(ten, new double[11]));
        IllegalArgumentException flat = assertThrows(IllegalArgumentException.class,
                () -> tests.variance(ten, new double[10]));
        assertTrue(flat.getMessage().contains("vary"), flat.getMessage());
        double[] withNaN = ten.clone();
        withNaN[4] = Double.NaN;
        assertThrows(IllegalArgumentException.class, () -> tests.variance(ten, withNaN));
    }
}
