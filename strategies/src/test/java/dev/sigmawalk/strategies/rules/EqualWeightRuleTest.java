package dev.sigmawalk.strategies.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.study.Bounds;
import dev.sigmawalk.engine.study.Objective;
import dev.sigmawalk.strategies.optimize.SolverSettings;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class EqualWeightRuleTest {
    private static final double EXACT = 1e-15;

    /**
     * Three assets: w = 1/3 each and w'Σw = (1/9) Σ_ij Σ_ij (hand computation): with
     * Σ = [[0.04, 0.01, 0], [0.01, 0.09, 0.02], [0, 0.02, 0.01]] the entries sum to 0.2, so 0.2/9.
     */
    @Test
    void threeAssets_giveThirds_andAverageCovariance() {
        double[] sigma = {0.04, 0.01, 0, 0.01, 0.09, 0.02, 0, 0.02, 0.01};
        RuleOutcome out = new EqualWeight().apply(new RuleInput(List.of("a", "b", "c"), TestCovariances.dense(sigma),
                null, Optional.empty()), new WarmStart());
        RuleOutcome.Chosen chosen = MinVarianceRuleTest.assertChosen(new double[] {1.0 / 3, 1.0 / 3, 1.0 / 3}, out,
                EXACT);
        assertEquals(0.2 / 9, chosen.forecastVariance(), EXACT, "w'Σw");
    }

    /** Four assets capped at 0.2 hold at most 0.8 (hand computation), so 1/4 breaks the cap: NotFormed. */
    @Test
    void boundsThatCannotSumToOne_areNotFormed() {
        RuleOutcome out = new EqualWeight().apply(new RuleInput(List.of("a", "b", "c", "d"),
                TestCovariances.dense(new double[16]), null, Optional.of(new Bounds(0, 0.2))), new WarmStart());
        RuleOutcome.NotFormed failed = assertInstanceOf(RuleOutcome.NotFormed.class, out);
        assertEquals("equal-weight: bounds [0.0, 0.2] cannot make 4 weights sum to 1; they need 4·lower <= 1 <= 4·upper",
                failed.reason(), "the bounds as the study writes them, not as a Java record prints");
    }

    @Test
    void noEligibleAssets_isNotFormed() {
        RuleOutcome out = new EqualWeight().apply(new RuleInput(List.of(), TestCovariances.dense(new double[0]), null,
                Optional.empty()), new WarmStart());
        assertInstanceOf(RuleOutcome.NotFormed.class, out);
    }

    @Test
    void ruleForEachObjective_matchesItsNeedForExpectedReturns() {
        SolverSettings settings = SolverSettings.standard();
        for (Objective objective : Objective.values()) {
            PortfolioRule rule = PortfolioRule.of(objective, 3, settings);
            assertEquals(objective.needsExpectedReturns(), rule.needsExpectedReturns(), objective.spelling());
        }
        assertEquals(new MeanVariance(3, settings), PortfolioRule.of(Objective.MEAN_VARIANCE, 3, settings), "λ kept");
    }
}
