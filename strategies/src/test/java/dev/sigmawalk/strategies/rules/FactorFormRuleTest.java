package dev.sigmawalk.strategies.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.study.Bounds;
import dev.sigmawalk.strategies.optimize.FactorMinVariance;
import dev.sigmawalk.strategies.optimize.SolverSettings;
import dev.sigmawalk.strategies.risk.FactorCovariance;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The min-variance rule on a factor-form covariance ({@link FactorCovariance}, solved through its
 * factors) against the same rule on the same matrix handed over densely (solved by the dense
 * active-set solver), over a run of warm-started rebalances whose loadings drift, as a path's
 * would. Seeded; the dense path is the reference.
 */
class FactorFormRuleTest {
    private static final double SAME_WEIGHTS = 1e-12;

    /**
     * 120 assets, 4 factors, bounds [0, 0.03], ten rebalances: the weights, w'Σw and the warm
     * starts' effect agree with the dense solver's at every one.
     */
    @Test
    void factorForm_matchesDenseSolve_acrossWarmStartedRebalances() {
        int n = 120;
        int k = 4;
        Random random = new Random(20260212L);
        List<String> assets = TestCovariances.names(n);
        double[] loadings = new double[n * k];
        for (int e = 0; e < loadings.length; e++) {
            loadings[e] = e % k == 0 ? 0.3 + 1.2 * random.nextDouble() : 0.4 * random.nextGaussian();
        }
        double[] factor = {4e-4, 5e-5, 0, 0, 5e-5, 1e-4, 0, 0, 0, 0, 8e-5, -1e-5, 0, 0, -1e-5, 6e-5};
        double[] specific = new double[n];
        for (int i = 0; i < n; i++) {
            specific[i] = 1e-4 + 4e-4 * random.nextDouble();
        }
        MinVariance rule = new MinVariance(SolverSettings.standard());
        WarmStart viaFactors = new WarmStart();
        WarmStart viaDense = new WarmStart();
        Optional<Bounds> bounds = Optional.of(new Bounds(0, 0.03));
        for (int rebalance = 0; rebalance < 10; rebalance++) {
            for (int e = 0; e < loadings.length; e++) {
                loadings[e] += 0.02 * random.nextGaussian();
            }
            FactorCovariance form = FactorCovariance.of(loadings.clone(), factor.clone(), specific.clone());
            double[] lo = new double[n];
            double[] hi = new double[n];
            Arrays.fill(hi, 0.03);
            assertTrue(new FactorMinVariance(SolverSettings.standard()).solve(form, lo, hi, null).isPresent(),
                    "the factor path certifies its own answer at rebalance " + rebalance);
            RuleOutcome.Chosen fast = assertInstanceOf(RuleOutcome.Chosen.class,
                    rule.apply(new RuleInput(assets, form, null, bounds), viaFactors));
            RuleOutcome.Chosen dense = assertInstanceOf(RuleOutcome.Chosen.class,
                    rule.apply(new RuleInput(assets, TestCovariances.dense(form.dense()), null, bounds), viaDense));
            for (int i = 0; i < n; i++) {
                assertEquals(dense.weights()[i], fast.weights()[i], SAME_WEIGHTS,
                        "weight " + i + " at rebalance " + rebalance);
            }
            assertEquals(dense.forecastVariance(), fast.forecastVariance(), 1e-12 * dense.forecastVariance(),
                    "w'Σw at rebalance " + rebalance);
        }
    }
}
