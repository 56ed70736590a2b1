package dev.sigmawalk.engine.evidence;

import dev.sigmawalk.engine.study.EvidenceSpec;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class RomanoWolfStepdownTest {
    /**
     * Hand computation of the stepdown (Romano &amp; Wolf 2016, Stat. Probab. Letters 113, eq. for
     * the adjusted p-values): d̂ = (3.0, 1.0, 2.0), four resamples of d*. Ordered by d̂: H1 (3.0),
     * H3 (2.0), H2 (1.0). Step 1 uses max over all three per resample: (2.5, 3.5, 1.5, 0.5) ≥ 3.0
     * once, p = 2/5. Step 2 uses max over H3, H2: (1.0, 0.4, 1.5, 0.2) ≥ 2.0 never, p = 1/5, raised
     * to 2/5 by monotonicity. Step 3 uses H2 alone: (0.1, 0.4, 1.5, 0.2) ≥ 1.0 once, p = 2/5. With
     * H2's d̂ at 0.3 instead, step 3 counts (0.1, 0.4, 1.5, 0.2) ≥ 0.3 twice: p = 3/5.
     */
    @Test
    void handExample_stepdownCountsAndMonotonicity() {
        double[][] resampled = {{2.5, 0.1, 1.0}, {3.5, 0.4, 0.2}, {1.5, 1.5, 0.0}, {0.5, 0.2, 0.1}};
        assertArrayEquals(new double[] {0.4, 0.4, 0.4},
                RomanoWolfStepdown.fromResamples(new double[] {3.0, 1.0, 2.0}, resampled), 1e-15);
        assertArrayEquals(new double[] {0.4, 0.6, 0.4},
                RomanoWolfStepdown.fromResamples(new double[] {3.0, 0.3, 2.0}, resampled), 1e-15);
    }

    /** A family of one is the individual studentised bootstrap: same block, same draws, same p. */
    @Test
    void familyOfOne_equalsTheIndividualBootstrapPValue() {
        SimulatedPair p = SimulatedPair.normal(41, 160, 0.05, 0.0, 1, 1.2, 0.5, 0.3);
        EvidenceSpec spec = new EvidenceSpec(500, 7L, 0);
        for (DifferenceMeasure m : DifferenceMeasure.values()) {
            DifferenceTest t = new DifferenceTests(HacKernel.PARZEN, spec).compare(m, p.first(), p.second());
            double[] family = RomanoWolfStepdown.adjust(List.of(new FamilyContrast(m, p.first(), p.second(), t)),
                    spec.resamples(), spec.seed());
            assertEquals(t.bootstrapPValue(), family[0], 0.0, m.label());
        }
    }

    /**
     * Every adjusted p-value is at least the member's own bootstrap p-value and at most 1, and the
     * ordering of the d̂ carries over to the adjusted values (stepdown monotonicity), on a family of
     * six correlated pairs sharing one block length (fixed at 3).
     */
    @Test
    void adjustedValues_boundedBelowByIndividualAndMonotoneInTheStatistic() {
        EvidenceSpec spec = new EvidenceSpec(400, 11L, 3);
        DifferenceTests tests = new DifferenceTests(HacKernel.BARTLETT, spec);
        List<FamilyContrast> family = new ArrayList<>();
        for (int k = 0; k < 3; k++) {
            SimulatedPair p = SimulatedPair.normal(50 + k, 150, 0.04 * k, 0.0, 1, 1 + 0.15 * k, 0.6, 0.2);
            for (DifferenceMeasure m : DifferenceMeasure.values()) {
                family.add(new FamilyContrast(m, p.first(), p.second(), tests.compare(m, p.first(), p.second())));
            }
        }
        double[] adjusted = RomanoWolfStepdown.adjust(family, spec.resamples(), spec.seed());
        for (int s = 0; s < family.size(); s++) {
            assertTrue(adjusted[s] >= family.get(s).test().bootstrapPValue() && adjusted[s] <= 1,
                    "member " + s + ": " + adjusted[s] + " against " + family.get(s).test().bootstrapPValue());
            for (int r = 0; r < family.size(); r++) {
                if (Math.abs(family.get(s).test().statistic()) > Math.abs(family.get(r).test().statistic())) {
                    assertTrue(adjusted[s] <= adjusted[r], "monotone: " + s + " against " + r);
                }
            }
        }
    }

    /**
     * Units never move a family p-value (Method §9): the same family with every return times 100
     * gives the same block lengths and exactly the same adjusted p-values (the same resamples, and
     * studentised statistics that do not depend on units).
     */
    @Test
    void returnsInPercent_leaveTheFamilyPValuesUnchanged() {
        EvidenceSpec spec = new EvidenceSpec(300, 13L, 0);
        DifferenceTests tests = new DifferenceTests(HacKernel.PARZEN, spec);
        List<FamilyContrast> decimal = new ArrayList<>();
        List<FamilyContrast> percent = new ArrayList<>();
        for (int k = 0; k < 3; k++) {
            SimulatedPair p = SimulatedPair.normal(60 + k, 140, 0.01 * k, 0.0, 0.04, 0.05, 0.6, 0.3);
            double[] a = scaled(p.first());
            double[] b = scaled(p.second());
            for (DifferenceMeasure m : DifferenceMeasure.values()) {
                DifferenceTest d = tests.compare(m, p.first(), p.second());
                DifferenceTest c = tests.compare(m, a, b);
                assertEquals(d.blockLength(), c.blockLength(), m.label() + " block");
                decimal.add(new FamilyContrast(m, p.first(), p.second(), d));
                percent.add(new FamilyContrast(m, a, b, c));
            }
        }
        assertArrayEquals(RomanoWolfStepdown.adjust(decimal, spec.resamples(), spec.seed()),
                RomanoWolfStepdown.adjust(percent, spec.resamples(), spec.seed()), 0.0);
    }

    /**
     * Resampling each distinct series once per draw, with its sums taken while it is drawn, gives
     * the very bits of the definition written out plainly: every contrast's two series resampled
     * period by period ((start + k) mod T), v* by {@link PairMoments#of}, d* by the studentised
     * statistic, then the stepdown. The family shares series the way a study's does (one path in
     * two pairs, the Sharpe and variance contrasts of a pair, equal series held in separate
     * arrays), and the block of 7 wraps past the end of the 150 periods.
     */
    @Test
    void sharedSeries_giveTheSameBitsAsThePlainDefinition() {
        EvidenceSpec spec = new EvidenceSpec(250, 17L, 7);
        DifferenceTests tests = new DifferenceTests(HacKernel.PARZEN, spec);
        SimulatedPair p = SimulatedPair.normal(71, 150, 0.03, 0.0, 1, 1.1, 0.5, 0.3);
        SimulatedPair q = SimulatedPair.normal(72, 150, 0.0, 0.02, 1.2, 1, 0.4, 0.2);
        double[] copy = p.second().clone();
        List<FamilyContrast> family = new ArrayList<>();
        for (double[][] pair : new double[][][] {{p.first(), p.second()}, {q.first(), copy}, {q.second(), p.first()}}) {
            for (DifferenceMeasure m : DifferenceMeasure.values()) {
                family.add(new FamilyContrast(m, pair[0], pair[1], tests.compare(m, pair[0], pair[1])));
            }
        }
        assertArrayEquals(plainDefinition(family, spec.resamples(), spec.seed()),
                RomanoWolfStepdown.adjust(family, spec.resamples(), spec.seed()), 0.0);
    }

    /**
     * Sharing the resamples out over threads changes no bit: the plain definition (one thread,
     * one draw after another) against 1, 2, 3 and 8 threads, with a resample count (101) that the
     * thread counts do not divide, so the ranges are uneven.
     */
    @Test
    void threads_giveTheSameBitsAsOneThread() {
        EvidenceSpec spec = new EvidenceSpec(101, 29L, 5);
        DifferenceTests tests = new DifferenceTests(HacKernel.PARZEN, spec);
        SimulatedPair p = SimulatedPair.normal(81, 120, 0.02, 0.0, 1, 1.2, 0.6, 0.3);
        SimulatedPair q = SimulatedPair.normal(82, 120, 0.0, 0.01, 1.1, 1, 0.3, 0.2);
        List<FamilyContrast> family = new ArrayList<>();
        for (double[][] pair : new double[][][] {{p.first(), p.second()}, {q.first(), q.second()}, {q.second(), p.first()}}) {
            for (DifferenceMeasure m : DifferenceMeasure.values()) {
                family.add(new FamilyContrast(m, pair[0], pair[1], tests.compare(m, pair[0], pair[1])));
            }
        }
        double[] expected = plainDefinition(family, spec.resamples(), spec.seed());
        for (int threads : new int[] {1, 2, 3, 8}) {
            assertArrayEquals(expected, RomanoWolfStepdown.adjust(family, spec.resamples(), spec.seed(), threads), 0.0,
                    threads + " threads");
        }
        assertThrows(IllegalArgumentException.class, () -> RomanoWolfStepdown.adjust(family, 10, 1L, 0));
    }

    /** The adjusted p-values computed straight from the definition (class Javadoc), one contrast at a time. */
    private static double[] plainDefinition(List<FamilyContrast> family, int resamples, long seed) {
        int length = family.get(0).first().length;
        int block = family.stream().mapToInt(c -> c.test().blockLength()).max().getAsInt();
        int blocks = length / block;
        double[] observed = new double[family.size()];
        for (int s = 0; s < observed.length; s++) {
            observed[s] = Math.abs(family.get(s).test().statistic());
        }
        double[][] resampled = new double[resamples][family.size()];
        double[] ra = new double[blocks * block];
        double[] rb = new double[blocks * block];
        int[] starts = new int[blocks];
        java.util.SplittableRandom random = new java.util.SplittableRandom(seed);
        for (int m = 0; m < resamples; m++) {
            for (int j = 0; j < blocks; j++) {
                starts[j] = random.nextInt(length);
            }
            for (int s = 0; s < family.size(); s++) {
                FamilyContrast c = family.get(s);
                for (int j = 0; j < blocks; j++) {
                    for (int k = 0; k < block; k++) {
                        ra[j * block + k] = c.first()[(starts[j] + k) % length];
                        rb[j * block + k] = c.second()[(starts[j] + k) % length];
                    }
                }
                resampled[m][s] = StudentisedBlockBootstrap.studentised(c.measure(), ra, rb, block,
                        c.test().difference());
            }
        }
        return RomanoWolfStepdown.fromResamples(observed, resampled);
    }

    private static double[] scaled(double[] x) {
        double[] out = new double[x.length];
        for (int t = 0; t < x.length; t++) {
            out[t] = 100 * x[t];
        }
        return out;
    }
}
