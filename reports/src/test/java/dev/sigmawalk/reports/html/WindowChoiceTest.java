package dev.sigmawalk.reports.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.compare.Comparison;
import dev.sigmawalk.engine.evidence.DifferenceMeasure;
import dev.sigmawalk.engine.evidence.DifferenceTest;
import dev.sigmawalk.engine.evidence.HacKernel;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/** The plain-words reading of "the strongest edge survives the correction for everything scanned". */
class WindowChoiceTest {

    private static Comparison variance(int window, double first, double second, double bootstrapP, double family) {
        double diff = Math.log(first / second);
        DifferenceTest t = new DifferenceTest(DifferenceMeasure.VARIANCE, HacKernel.PARZEN, 120, first, second, diff,
                0.05, diff / 0.05, bootstrapP, bootstrapP, 2.0, 1, 2000);
        return new Comparison("shrunk", "plain", window, Optional.empty(), Optional.of(t), Optional.empty(),
                Double.NaN, Double.NaN, Optional.empty(), Double.NaN, family);
    }

    /**
     * Variances 0.81 against 1.00 give a volatility 10 % lower (√0.81 = 0.9); the raw p 0.02 at
     * the best of three windows has family p-value 0.06, so the edge does not survive, and the
     * sentence that names it says so with the family's size.
     */
    @Test
    void strongestEdge_isNamed_withItsFamilyVerdict() {
        String text = EvidenceSections.windowChoice(List.of(variance(36, 0.81, 1.0, 0.02, 0.06),
                variance(60, 0.9, 1.0, 0.30, 0.60), variance(120, 1.1, 1.0, 0.50, 0.60)));
        assertTrue(text.contains("shrunk over plain with the 36-period window"), text);
        assertTrue(text.contains("10.00 % lower"), text);
        assertTrue(text.contains("the edge is not significant at 5 % after correcting for the 3 comparisons scanned,"
                + " p = 0.060."), text);
    }

    @Test
    void edgeThatSurvivesTheFamilyCorrection_isSaidToBeSignificant() {
        String text = EvidenceSections.windowChoice(List.of(variance(36, 0.81, 1.0, 0.001, 0.003),
                variance(60, 0.9, 1.0, 0.30, 0.60)));
        assertTrue(text.contains("the edge is significant at 5 % after correcting for the 2 comparisons scanned,"
                + " p = 0.003."), text);
    }

    @Test
    void noStrategyLessVolatile_saysSo() {
        assertEquals(" No strategy was less volatile than the strategy it was compared with at any window.",
                EvidenceSections.windowChoice(List.of(variance(36, 1.2, 1.0, 0.2, 0.4))));
    }
}
