package dev.sigmawalk.engine.evidence;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

class JobsonKorkieMemmelTest {
    /** Hand values: exact decimals up to rounding. */
    private static final double HAND = 1e-12;
    /** p-values against scipy. */
    private static final double P_VALUE = 1e-9;
    /** z of the iid Ledoit-Wolf test and of this test agree to sampling noise of the fourth moments. */
    private static final double LARGE_SAMPLE_AGREEMENT = 0.05;

    /**
     * Hand computation with Memmel's (2003) corrected θ: μ_a = 0.15, μ_b = 0.05, σ_a² = 0.04,
     * σ_b² = 0.01, σ_ab = 0.01 (ρ = 0.5), T = 100. Numerator 0.1·0.15 - 0.2·0.05 = 0.005;
     * Tθ = 0.0008 - 0.0004 + 0.0001125 + 0.00005 - (0.0075/0.02)·0.0001 = 0.000525, so
     * z = 0.005/√(5.25e-6) = 2.1821789023599236 and p = 0.029096331741252188
     * (2·scipy.stats.norm.sf, scipy 1.17.1). Outside check of θ: a numpy 2.4.6 simulation of
     * 100 000 bivariate normal samples of T = 400 with these moments gave T·Var(numerator) =
     * 0.0005248, against 0.000525 here and 0.00046875 for the variant with last term
     * (μ_aμ_b/(2σ_aσ_b))(σ_ab² + σ_a²σ_b²), which would give z = 2.309401.
     */
    @Test
    void handCase_matchesCorrectedVarianceFormula() {
        JobsonKorkieTest jk = JobsonKorkieMemmel.test(0.15, 0.05, 0.04, 0.01, 0.01, 100);
        assertEquals(0.75, jk.sharpeA(), HAND);
        assertEquals(0.5, jk.sharpeB(), HAND);
        assertEquals(2.1821789023599236, jk.statistic(), HAND);
        assertEquals(0.029096331741252188, jk.pValue(), P_VALUE);
    }

    /**
     * Under iid normal returns the Ledoit-Wolf delta-method test and this test estimate the same
     * asymptotic variance (Ledoit &amp; Wolf 2008, §2: JK-Memmel is the normal iid special case),
     * so on 20 000 periods their statistics agree to a few per cent.
     */
    @Test
    void largeNormalSample_agreesWithLedoitWolfStatistic() {
        SimulatedPair p = SimulatedPair.normal(7, 20_000, 0.1, 0.05, 1, 1, 0.6, 0.0);
        JobsonKorkieTest jk = JobsonKorkieMemmel.test(p.first(), p.second());
        DifferenceTest lw = new DifferenceTests(HacKernel.BARTLETT,
                new dev.sigmawalk.engine.study.EvidenceSpec(100, 1, 0)).sharpeRatio(p.first(), p.second());
        assertEquals(lw.first(), jk.sharpeA(), HAND, "same Sharpe estimate, divisor T");
        assertEquals(lw.statistic(), jk.statistic(), Math.abs(lw.statistic()) * LARGE_SAMPLE_AGREEMENT);
    }

    /** Identical series: equal Sharpe ratios, θ = 0; documented as z = 0, p = 1. */
    @Test
    void identicalSeries_giveZeroAndPOne() {
        double[] a = {0.01, -0.02, 0.03, 0.015, -0.005, 0.02};
        JobsonKorkieTest jk = JobsonKorkieMemmel.test(a, a.clone());
        assertEquals(0.0, jk.statistic(), 0.0);
        assertEquals(1.0, jk.pValue(), 0.0);
    }

    /**
     * Series entry uses divisor-T moments (a constant b = (2, 2) is rejected);
     * a = (0, 2, 1, 3), b = (1, 0, 2, 1) gives μ_a = 1.5, μ_b = 1, σ_a² = 1.25, σ_b² = 0.5,
     * σ_ab = (−1.5·0 + 0.5·(−1) + (−0.5)·1 + 1.5·0)/4 = −0.25, by hand.
     */
    @Test
    void seriesEntry_usesDivisorTMoments() {
        JobsonKorkieTest fromSeries = JobsonKorkieMemmel.test(new double[] {0, 2, 1, 3}, new double[] {1, 0, 2, 1});
        JobsonKorkieTest fromMoments = JobsonKorkieMemmel.test(1.5, 1.0, 1.25, 0.5, -0.25, 4);
        assertEquals(fromMoments.statistic(), fromSeries.statistic(), HAND);
        assertThrows(IllegalArgumentException.class,
                () -> JobsonKorkieMemmel.test(new double[] {1, 3}, new double[] {2, 2}));
    }
}
