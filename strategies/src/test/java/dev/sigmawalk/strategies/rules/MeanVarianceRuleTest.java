package dev.sigmawalk.strategies.rules;

import static dev.sigmawalk.strategies.rules.MinVarianceRuleTest.assertChosen;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.study.Bounds;
import dev.sigmawalk.strategies.optimize.SolverSettings;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * Mean-variance on two assets, solved by hand. With w1 = x, w2 = 1 − x, Σ = [[a, r], [r, b]]:
 * d/dx [xμ1 + (1−x)μ2 − (λ/2)(a x² + b (1−x)² + 2 r x(1−x))] = 0 gives
 * x = (μ1 − μ2 + λ(b − r)) / (λ(a + b − 2r)).
 */
class MeanVarianceRuleTest {
    private static final double EXACT = 1e-12;
    private static final List<String> TWO = List.of("P", "Q");
    private static final double[] MU = {0.08, 0.02};

    private final SolverSettings settings = SolverSettings.standard();

    /** a = 0.04, b = 0.01, r = 0, λ = 2: x = (0.06 + 0.02)/(2·0.05) = 0.8. */
    @Test
    void uncorrelatedPair_givesHandSolution() {
        RuleOutcome out = new MeanVariance(2, settings).apply(input(new double[] {0.04, 0, 0, 0.01},
                Optional.empty()), new WarmStart());
        RuleOutcome.Chosen chosen = assertChosen(new double[] {0.8, 0.2}, out, EXACT);
        assertEquals(0.8 * 0.8 * 0.04 + 0.2 * 0.2 * 0.01, chosen.forecastVariance(), EXACT, "w'Σw = 0.0260");
    }

    /** a = 0.04, b = 0.01, r = 0.006, λ = 2: x = (0.06 + 2·0.004)/(2·0.038) = 17/19. */
    @Test
    void correlatedPair_givesHandSolution() {
        double x = 17.0 / 19;
        RuleOutcome out = new MeanVariance(2, settings).apply(input(new double[] {0.04, 0.006, 0.006, 0.01},
                Optional.empty()), new WarmStart());
        assertChosen(new double[] {x, 1 - x}, out, EXACT);
    }

    /** The same pair with bounds [0, 1]: 17/19 is inside, so the bounded solver returns it too. */
    @Test
    void correlatedPair_nonBindingBounds_sameAnswer() {
        double x = 17.0 / 19;
        RuleOutcome out = new MeanVariance(2, settings).apply(input(new double[] {0.04, 0.006, 0.006, 0.01},
                Optional.of(new Bounds(0, 1))), new WarmStart());
        assertChosen(new double[] {x, 1 - x}, out, EXACT);
    }

    /** Bounds [0, 0.7]: the objective is concave in x with its peak at 0.8, so x = 0.7 (hand reasoning). */
    @Test
    void uncorrelatedPair_capBinds_givesCap() {
        RuleOutcome out = new MeanVariance(2, settings).apply(input(new double[] {0.04, 0, 0, 0.01},
                Optional.of(new Bounds(0, 0.7))), new WarmStart());
        assertChosen(new double[] {0.7, 0.3}, out, EXACT);
    }

    /** Larger λ moves toward min variance: λ → ∞ gives x = (b − r)/(a + b − 2r) = 0.2 at r = 0; λ = 1e6 is within 1e-6 of it. */
    @Test
    void veryHighRiskAversion_approachesMinVariance() {
        RuleOutcome out = new MeanVariance(1e6, settings).apply(input(new double[] {0.04, 0, 0, 0.01},
                Optional.empty()), new WarmStart());
        double x = (0.06 + 1e6 * 0.01) / (1e6 * 0.05);
        assertChosen(new double[] {x, 1 - x}, out, EXACT);
        assertEquals(0.2, x, 2e-6, "limit");
    }

    /**
     * λ = 1e-12 without bounds: x = (0.06 + 1e-14)/(5e-14) = 1.2e12 (the formula above), a
     * position no double can hold to a budget of 1, so nothing is formed; the reason names the
     * size and the cause instead of a singular matrix, which Σ is not.
     */
    @Test
    void tinyRiskAversionWithoutBounds_isNotFormed_namingThePositionSize() {
        RuleOutcome out = new MeanVariance(1e-12, settings).apply(input(new double[] {0.04, 0, 0, 0.01},
                Optional.empty()), new WarmStart());
        RuleOutcome.NotFormed none = assertInstanceOf(RuleOutcome.NotFormed.class, out);
        assertTrue(none.reason().contains("the optimum holds positions as large as 1.20e+12 times the capital"),
                none.reason());
        assertTrue(!none.reason().contains("singular"), none.reason());
    }

    /** λ = 1e-12 with bounds [0, 0.7]: the peak at x = 1.2e12 is far beyond the cap, so x = 0.7 (hand reasoning). */
    @Test
    void tinyRiskAversionWithBounds_givesTheCap() {
        RuleOutcome out = new MeanVariance(1e-12, settings).apply(input(new double[] {0.04, 0, 0, 0.01},
                Optional.of(new Bounds(0, 0.7))), new WarmStart());
        assertChosen(new double[] {0.7, 0.3}, out, EXACT);
    }

    @Test
    void missingExpectedReturns_isNotFormed() {
        RuleInput input = new RuleInput(TWO, TestCovariances.dense(new double[] {0.04, 0, 0, 0.01}), null,
                Optional.empty());
        RuleOutcome.NotFormed out = assertInstanceOf(RuleOutcome.NotFormed.class,
                new MeanVariance(2, settings).apply(input, new WarmStart()));
        assertTrue(out.reason().contains("expected returns are required"), out.reason());
    }

    @Test
    void nonPositiveRiskAversion_isRejectedWithItsValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new MeanVariance(0, settings));
        assertTrue(e.getMessage().contains("risk aversion (0.0)"), e.getMessage());
    }

    private static RuleInput input(double[] sigma, Optional<Bounds> bounds) {
        return new RuleInput(TWO, TestCovariances.dense(sigma), MU, bounds);
    }
}
