package dev.sigmawalk.engine.evidence;

import dev.sigmawalk.engine.study.EvidenceSpec;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
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

    private static double[] scaled(double[] x) {
        double[] out = new double[x.length];
        for (int t = 0; t < x.length; t++) {
            out[t] = 100 * x[t];
        }
        return out;
    }
}
