package dev.sigmawalk.strategies.rules;

import static dev.sigmawalk.strategies.rules.MinVarianceRuleTest.assertChosen;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.model.Decision;
import dev.sigmawalk.engine.study.Bounds;
import dev.sigmawalk.strategies.optimize.RandomProblems;
import dev.sigmawalk.strategies.optimize.ReferenceMatrices;
import dev.sigmawalk.strategies.optimize.SolverSettings;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** Max-Sharpe: hand-solved pairs, the fallback, and consistency of the bounded and closed forms. */
class MaxSharpeRuleTest {
    private static final double EXACT = 1e-12;
    private static final double SOLVED = 1e-9;
    private static final List<String> TWO = List.of("P", "Q");
    private static final double[] PAIR = {0.04, 0.006, 0.006, 0.01};
    private static final double[] MU = {0.08, 0.02};

    private final MaxSharpe rule = new MaxSharpe(SolverSettings.standard());

    /**
     * Tangency w ∝ Σ⁻¹μ (textbook): det = 0.04·0.01 − 0.006² = 0.000364, Σ⁻¹μ ∝
     * (0.01·0.08 − 0.006·0.02, −0.006·0.08 + 0.04·0.02) = (0.00068, 0.00032), so w = (0.68, 0.32)
     * (hand computation).
     */
    @Test
    void correlatedPair_unbounded_isTangencyByHand() {
        RuleOutcome out = rule.apply(new RuleInput(TWO, TestCovariances.dense(PAIR), MU, Optional.empty()),
                new WarmStart());
        assertChosen(new double[] {0.68, 0.32}, out, EXACT);
    }

    /**
     * Bounds [0, 0.6]: on the budget line the Sharpe ratio rises up to x = 0.68 and the cap stops
     * x at 0.6, leaving 0.4 (hand reasoning: one peak on the line).
     */
    @Test
    void correlatedPair_capBinds_givesCap() {
        RuleOutcome out = rule.apply(new RuleInput(TWO, TestCovariances.dense(PAIR), MU,
                Optional.of(new Bounds(0, 0.6))), new WarmStart());
        assertChosen(new double[] {0.6, 0.4}, out, SOLVED);
    }

    /** Loose bounds [−10, 10] do not bind, so the bounded program must reproduce the closed form. */
    @Test
    void referenceWindow_looseBounds_matchTangency() {
        double[] sigma = ReferenceMatrices.sampleCovariance();
        double[] mu = RandomProblems.expectedReturns(new Random(4), ReferenceMatrices.ASSETS);
        List<String> assets = TestCovariances.names(ReferenceMatrices.ASSETS);
        RuleOutcome.Chosen closed = assertInstanceOf(RuleOutcome.Chosen.class,
                rule.apply(new RuleInput(assets, TestCovariances.dense(sigma), mu, Optional.empty()), new WarmStart()));
        assertTrue(Arrays.stream(closed.weights()).allMatch(w -> Math.abs(w) < 10), "tangency inside the loose box");
        RuleOutcome bounded = rule.apply(new RuleInput(assets, TestCovariances.dense(sigma), mu,
                Optional.of(new Bounds(-10, 10))), new WarmStart());
        assertChosen(closed.weights(), bounded, SOLVED);
    }

    /** Long-only on the reference window: no random feasible portfolio beats the solver's Sharpe ratio. */
    @Test
    void referenceWindow_longOnly_beatsRandomFeasiblePortfolios() {
        double[] sigma = ReferenceMatrices.sampleCovariance();
        int n = ReferenceMatrices.ASSETS;
        double[] mu = RandomProblems.expectedReturns(new Random(6), n);
        RuleOutcome.Chosen chosen = assertInstanceOf(RuleOutcome.Chosen.class, rule.apply(
                new RuleInput(TestCovariances.names(n), TestCovariances.dense(sigma), mu, Optional.of(new Bounds(0, 0.3))),
                new WarmStart()));
        double best = sharpe(sigma, mu, chosen.weights());
        Random random = new Random(7);
        for (int trial = 0; trial < 2000; trial++) {
            double[] w = randomCappedPortfolio(random, n, 0.3);
            assertTrue(sharpe(sigma, mu, w) <= best + 1e-12, "trial " + trial);
        }
    }

    /**
     * Every μ &lt; 0 with long-only bounds: every allowed w'μ is negative, so the rule must fall
     * back to min-variance and record the note; the weights then equal the min-variance rule's.
     */
    @Test
    void allNegativeExpectedReturns_longOnly_fallsBackWithNote() {
        double[] sigma = ReferenceMatrices.sampleCovariance();
        int n = ReferenceMatrices.ASSETS;
        double[] mu = new double[n];
        Arrays.fill(mu, -0.01);
        Optional<Bounds> bounds = Optional.of(new Bounds(0, 0.25));
        RuleInput input = new RuleInput(TestCovariances.names(n), TestCovariances.dense(sigma), mu, bounds);
        RuleOutcome.Chosen chosen = assertInstanceOf(RuleOutcome.Chosen.class, rule.apply(input, new WarmStart()));
        assertEquals(List.of(MaxSharpe.FALLBACK_NOTE), chosen.notes(), "notes");
        assertChosen(ReferenceMatrices.minVarianceWeights(1), chosen, 1e-8);
        Decision.Chosen decision = (Decision.Chosen) chosen.toDecision(OptionalDouble.empty());
        assertEquals(MaxSharpe.FALLBACK_NOTE, decision.notes().get(0), "note reaches the engine");
    }

    /**
     * Without bounds and μ = −(1, 1): Σ⁻¹μ = −Σ⁻¹1 and 1'Σ⁻¹1 &gt; 0, so 1'Σ⁻¹μ &lt; 0 and no
     * maximum is attained: fall back to min-variance with the no-tangency note.
     */
    @Test
    void negativeTangencyBudget_unbounded_fallsBackWithNote() {
        RuleOutcome out = rule.apply(new RuleInput(TWO, TestCovariances.dense(PAIR), new double[] {-0.01, -0.01},
                Optional.empty()), new WarmStart());
        RuleOutcome.Chosen chosen = assertInstanceOf(RuleOutcome.Chosen.class, out);
        assertEquals(List.of(MaxSharpe.NO_TANGENCY_NOTE), chosen.notes(), "notes");
        // two-asset minimum variance: x = (b − r)/(a + b − 2r) = 0.004/0.038 = 2/19
        assertChosen(new double[] {2.0 / 19, 17.0 / 19}, chosen, EXACT);
    }

    /**
     * μ = (0.034, −0.00399) on the same pair: 1'Σ⁻¹μ ∝ 0.004·0.034 + 0.034·(−0.00399) = 3.4e-7,
     * barely positive, and Σ⁻¹μ ∝ (0.00036394, −0.0003636), so the tangency portfolio is
     * (0.00036394, −0.0003636) / 3.4e-7 ≈ (1070.4, −1069.4) (hand computation, the formula of
     * the first test): still chosen, as Method §5 asks, with a note of its size; the ordinary
     * tangency (0.68, 0.32) gets none.
     */
    @Test
    void tangencyNearAZeroBudget_isChosen_withANoteOfItsSize() {
        double[] mu = {0.034, -0.00399};
        RuleOutcome.Chosen chosen = assertInstanceOf(RuleOutcome.Chosen.class,
                rule.apply(new RuleInput(TWO, TestCovariances.dense(PAIR), mu, Optional.empty()), new WarmStart()));
        double scale = 0.004 * 0.034 + 0.034 * -0.00399;
        double w1 = (0.01 * 0.034 - 0.006 * -0.00399) / scale;
        assertChosen(new double[] {w1, 1 - w1}, chosen, 1e-9);
        assertEquals(List.of("max-sharpe: 1'inv(S)mu is close to 0, so the tangency portfolio holds positions as large"
                + " as 1.07e+03 times the capital (gross exposure 2.14e+03): the highest Sharpe ratio, but not a usable"
                + " portfolio; bounds keep its positions in range"), chosen.notes());
        RuleOutcome.Chosen ordinary = assertInstanceOf(RuleOutcome.Chosen.class,
                rule.apply(new RuleInput(TWO, TestCovariances.dense(PAIR), MU, Optional.empty()), new WarmStart()));
        assertEquals(List.of(), ordinary.notes());
    }

    private static double sharpe(double[] sigma, double[] mu, double[] w) {
        double mean = 0;
        for (int i = 0; i < w.length; i++) {
            mean += mu[i] * w[i];
        }
        return mean / Math.sqrt(MinVarianceRuleTest.quadraticForm(sigma, w));
    }

    /** Uniform random weights clipped to [0, cap] and rescaled until they sum to 1 within the cap. */
    private static double[] randomCappedPortfolio(Random random, int n, double cap) {
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            w[i] = random.nextDouble() * (random.nextBoolean() ? 1 : 0.05);
        }
        for (int round = 0; round < 50; round++) {
            double sum = Arrays.stream(w).sum();
            for (int i = 0; i < n; i++) {
                w[i] = Math.min(cap, w[i] / sum);
            }
        }
        double sum = Arrays.stream(w).sum();
        for (int i = 0; i < n; i++) {
            w[i] /= sum;
        }
        return w;
    }
}
