package dev.sigmawalk.sample;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ShockDrawsTest {
    private static final int DRAWS = 400_000;
    /** Variance of the mixture is 1 by construction; five standard errors at kurtosis ≈ 7.65. */
    private static final double VARIANCE_TOLERANCE = 5 * Math.sqrt((7.65 - 1) / DRAWS);
    /** The fourth moment's estimate is noisy (its variance needs the 8th moment); a wide band. */
    private static final double KURTOSIS_TOLERANCE = 1.0;

    /**
     * Hand computation: for a normal mixture with P(wide) = p and scales 1 and w, divided by
     * √(1 - p + p w²), the variance is 1 and the kurtosis 3 (1 - p + p w⁴) / (1 - p + p w²)²;
     * p = 0.05, w = 3 gives 3 · 5 / 1.4² = 7.653. Clipping at 8 lowers it by about 2 % (the
     * normal's fourth moment beyond 3.16 standard deviations, hand-integrated), inside the band.
     */
    @Test
    void mixture_hasUnitVarianceAndTheKurtosisOfItsFormula() {
        ShockDraws shocks = new ShockDraws(0.05, 3, 8);
        SplitMix64 random = new SplitMix64(29);
        double m2 = 0;
        double m4 = 0;
        double max = 0;
        for (int i = 0; i < DRAWS; i++) {
            double z = shocks.next(random);
            m2 += z * z;
            m4 += z * z * z * z;
            max = Math.max(max, Math.abs(z));
        }
        m2 /= DRAWS;
        m4 /= DRAWS;
        assertEquals(1, m2, VARIANCE_TOLERANCE, "variance");
        assertEquals(3 * 5 / (1.4 * 1.4), m4 / (m2 * m2), KURTOSIS_TOLERANCE, "kurtosis");
        assertTrue(max <= 8, "largest |draw| " + max + " is within the cap 8");
    }

    @Test
    void cap_clipsEveryDraw() {
        // Half the draws are N(0, 2) after scaling (10 / √50.5 ≈ 1.41): about 23 of 10,000 pass 4.
        ShockDraws tight = new ShockDraws(0.5, 10, 4);
        SplitMix64 random = new SplitMix64(2);
        boolean clipped = false;
        for (int i = 0; i < 10_000; i++) {
            double z = tight.next(random);
            assertTrue(Math.abs(z) <= 4, "draw " + z + " beyond the cap 4");
            clipped |= Math.abs(z) == 4;
        }
        assertTrue(clipped, "some of 10,000 draws hit the cap");
    }

    @Test
    void constructor_refusesNaNProbability() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new ShockDraws(Double.NaN, 3, 8));
        assertTrue(e.getMessage().contains("wide probability (NaN)"), e.getMessage());
    }
}
