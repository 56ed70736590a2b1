package dev.sigmawalk.engine.evidence;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.study.EvidenceSpec;
import java.util.Arrays;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The check that a variance test's influence series keeps more autocorrelation than its
 * bandwidth rule assumes: its value against numpy, and what it flags in the size study's designs.
 */
class LingeringDependenceTest {
    /** The series of {@code lingering_reference.py} (an MA(1) with θ = 0.6, 40 values, rounded). */
    private static final double[] SERIES = {0.352041, 1.882178, -0.748639, 0.431354, 1.526469, 0.314058, -1.283403,
        -1.270218, -1.29897, -1.612217, -0.788961, 0.665237, -0.982047, -2.776354, -2.10451, -1.462708, -1.133926,
        -0.532563, 1.152024, 0.756591, 0.050819, 0.000248, 0.516922, 1.461555, 1.780093, 1.30756, -0.790287,
        -0.069647, 0.248146, 0.258879, 1.839192, -1.659714, -2.4021, 0.061303, -0.092021, -0.285539, -0.35698,
        1.726747, 1.38285, -0.102235};

    /** numpy 2.4 (src/test/resources/.../lingering_reference.py): z = -0.574436471453801 for K = 3. */
    @Test
    void value_matchesNumpy() {
        assertEquals(-0.574436471453801, LingeringDependence.of(SERIES, 3), 1e-12);
    }

    @Test
    void shortOrConstantSeries_giveNoVerdict() {
        assertTrue(Double.isNaN(LingeringDependence.of(SERIES)), "40 periods are too few for 20 lags");
        double[] flat = new double[200];
        Arrays.fill(flat, 0.5);
        assertTrue(Double.isNaN(LingeringDependence.of(flat)));
        assertThrows(IllegalArgumentException.class, () -> LingeringDependence.of(SERIES, 40));
    }

    /**
     * The size study's designs at T = 5,500 (daily): independent pairs are almost never flagged;
     * GARCH(1,1) pairs on separate volatility paths, whose variance test rejects a true null in
     * about 19 % of draws (the developer guide's size tables), almost always are.
     */
    @Test
    void flagsSeparateVolatilityPaths_notIndependentPairs() {
        DifferenceTests tests = new DifferenceTests(HacKernel.PARZEN, new EvidenceSpec(100, 1, 0));
        assertTrue(flagged(NullModel.NORMAL, tests, 60, 31L) <= 2, "independent pairs flagged");
        assertTrue(flagged(NullModel.GARCH, tests, 30, 37L) >= 24, "separate GARCH paths flagged");
    }

    @Test
    void theTestCarriesTheCheck_andOnlyAboveTheThresholdIsItFlagged() {
        double[] a = new double[120];
        double[] b = new double[120];
        SplittableRandom r = new SplittableRandom(3);
        for (int t = 0; t < a.length; t++) {
            a[t] = 0.01 + 0.05 * NullModel.normal(r);
            b[t] = 0.01 + 0.04 * NullModel.normal(r);
        }
        DifferenceTest v = new DifferenceTests(HacKernel.PARZEN, new EvidenceSpec(100, 1, 0)).variance(a, b);
        assertEquals(LingeringDependence.of(DifferenceTests.influence(PairMoments.of(a, b, a.length).centred(a, b),
                DifferenceMeasure.VARIANCE.gradient(PairMoments.of(a, b, a.length)))), v.lingering(), 1e-12);
        assertFalse(v.dependenceExceedsBandwidth());
        DifferenceTest high = new DifferenceTest(v.measure(), v.kernel(), v.periods(), v.first(), v.second(),
                v.difference(), v.standardError(), v.statistic(), v.hacPValue(), v.bootstrapPValue(), v.bandwidth(),
                v.blockLength(), v.resamples(), LingeringDependence.THRESHOLD + 0.01);
        assertTrue(high.dependenceExceedsBandwidth());
        assertFalse(new DifferenceTest(v.measure(), v.kernel(), v.periods(), v.first(), v.second(), v.difference(),
                v.standardError(), v.statistic(), v.hacPValue(), v.bootstrapPValue(), v.bandwidth(), v.blockLength(),
                v.resamples()).dependenceExceedsBandwidth(), "no verdict is no flag");
    }

    /** How many of {@code draws} variance tests at T = 5,500 are flagged, in the separate-path design. */
    private static int flagged(NullModel model, DifferenceTests tests, int draws, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        int periods = 5500;
        double rest = Math.sqrt(1 - 0.49);
        int count = 0;
        for (int k = 0; k < draws; k++) {
            double[][] p = model.pair(random, periods, 0.7);
            double[][] q = model.pair(random, periods, 0.7);
            double[] a = new double[periods];
            for (int t = 0; t < periods; t++) {
                a[t] = 0.7 * p[0][t] + rest * q[1][t];
            }
            double[] u = DifferenceTests.influence(PairMoments.of(a, p[1], periods).centred(a, p[1]),
                    DifferenceMeasure.VARIANCE.gradient(PairMoments.of(a, p[1], periods)));
            count += LingeringDependence.of(u) > LingeringDependence.THRESHOLD ? 1 : 0;
        }
        return count;
    }
}
