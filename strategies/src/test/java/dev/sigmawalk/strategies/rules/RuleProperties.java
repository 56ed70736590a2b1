package dev.sigmawalk.strategies.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.study.Bounds;
import dev.sigmawalk.strategies.optimize.RandomProblems;
import dev.sigmawalk.strategies.optimize.SolverSettings;
import java.util.Arrays;
import java.util.Optional;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

/** Invariants every rule keeps on seeded random inputs. */
class RuleProperties {
    private static final double BUDGET = 1e-10;
    private static final double BOUND_SLACK = 1e-12;

    @Property(tries = 40)
    void everyRule_sumsToOne_respectsBounds_reportsQuadraticForm(@ForAll @IntRange(min = 2, max = 25) int n,
                                                                 @ForAll long seed) {
        Random random = new Random(seed);
        double[] sigma = RandomProblems.covariance(random, n, n + 30);
        double[] mu = RandomProblems.expectedReturns(random, n);
        Bounds bounds = new Bounds(random.nextBoolean() ? 0 : -0.1, (1.5 + 3 * random.nextDouble()) / n);
        SolverSettings settings = SolverSettings.standard();
        PortfolioRule[] rules = {new MinVariance(settings), new MeanVariance(3, settings), new MaxSharpe(settings),
            new EqualWeight()};
        for (PortfolioRule rule : rules) {
            RuleOutcome out = rule.apply(new RuleInput(TestCovariances.names(n), TestCovariances.dense(sigma), mu,
                    Optional.of(bounds)), new WarmStart());
            assertTrue(out instanceof RuleOutcome.Chosen, () -> rule + " gave " + out);
            RuleOutcome.Chosen chosen = (RuleOutcome.Chosen) out;
            assertEquals(1, Arrays.stream(chosen.weights()).sum(), BUDGET, rule + " budget");
            for (double w : chosen.weights()) {
                assertTrue(w >= bounds.lower() - BOUND_SLACK && w <= bounds.upper() + BOUND_SLACK, rule + " weight " + w);
            }
            assertEquals(MinVarianceRuleTest.quadraticForm(sigma, chosen.weights()), chosen.forecastVariance(), 1e-15,
                    rule + " forecast variance");
        }
    }
}
