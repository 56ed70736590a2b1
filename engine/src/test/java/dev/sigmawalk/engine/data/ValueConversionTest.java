package dev.sigmawalk.engine.data;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sigmawalk.engine.study.ValueKind;
import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Size;

/** Prices to returns (METHODS §1): r_t = P_t / P_{t−1} − 1, the first row giving none. */
class ValueConversionTest {
    /**
     * Relative error allowed after compounding up to 60 rounded returns. Forming 1 + r from
     * r = P_t/P_{t−1} − 1 loses bits by cancellation when the price falls: the rounding of r
     * (about 1.1e-16) is magnified by P_{t−1}/P_t ≤ 100 for prices in [1, 100], so at most about
     * 60 · 100 · 2.2e-16 ≈ 1.3e-12 in all.
     */
    private static final double COMPOUNDING_TOLERANCE = 1e-11;

    /** Compounding the returns gives back the price ratio: Π(1 + r_t) = P_last / P_first. */
    @Property(tries = 300)
    void compoundedReturns_equalThePriceRatio(
            @ForAll @Size(min = 2, max = 60) List<@DoubleRange(min = 1, max = 100) Double> prices) {
        double[] p = prices.stream().mapToDouble(Double::doubleValue).toArray();
        double[] r = ValueConversion.convert(ValueKind.PRICES, p);
        assertEquals(p.length - 1, r.length, "one return fewer than prices");
        double growth = 1.0;
        for (double x : r) {
            growth *= 1.0 + x;
        }
        double ratio = p[p.length - 1] / p[0];
        assertEquals(ratio, growth, COMPOUNDING_TOLERANCE * ratio);
    }

    /** A missing price removes its own row's return and the next one, nothing else. */
    @Property(tries = 100)
    void missingPrice_removesTwoReturns(@ForAll @Size(min = 4, max = 30) List<@DoubleRange(min = 1, max = 100) Double> prices,
                                        @ForAll @DoubleRange(min = 0, max = 1) double where) {
        double[] p = prices.stream().mapToDouble(Double::doubleValue).toArray();
        int gap = 1 + (int) (where * (p.length - 2));
        p[gap] = Double.NaN;
        double[] r = ValueConversion.convert(ValueKind.PRICES, p);
        for (int t = 0; t < r.length; t++) {
            boolean expectMissing = t + 1 == gap || t == gap;
            assertEquals(expectMissing, Double.isNaN(r[t]), "return row " + t + " with the price gap at " + gap);
        }
        assertEquals(p.length - 1, r.length, "one return fewer than prices");
    }
}
