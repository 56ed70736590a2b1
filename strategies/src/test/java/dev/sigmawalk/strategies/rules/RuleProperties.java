package dev.sigmawalk.strategies.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.study.Bounds;
import dev.sigmawalk.strategies.optimize.RandomProblems;
import dev.sigmawalk.strategies.optimize.SolverSettings;
import java.util.Arrays;
import java.util.Optional;
import java.util.Random;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Invariants every rule keeps on seeded random inputs. The cases (number of assets and input
 * seed) are drawn from a fixed seed.
 */
class RuleProperties {
    private static final double BUDGET = 1e-10;
    private static final double BOUND_SLACK = 1e-12;

    /**
     * Every rule chooses weights that sum to 1, respect the bounds and report w'Σw as their
     * forecast variance. The 40 inputs (2 to 25 assets, any input seed) are drawn from a fixed
     * seed.
     */
    @ParameterizedTest
    @MethodSource("assetCountsAndSeeds")
    void everyRule_sumsToOne_respectsBounds_reportsQuadraticForm(int n, long seed) {
        String input = " (n = " + n + ", seed " + seed + ")";
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
            assertTrue(out instanceof RuleOutcome.Chosen, () -> rule + " gave " + out + input);
            RuleOutcome.Chosen chosen = (RuleOutcome.Chosen) out;
            assertEquals(1, Arrays.stream(chosen.weights()).sum(), BUDGET, rule + " budget" + input);
            for (double w : chosen.weights()) {
                assertTrue(w >= bounds.lower() - BOUND_SLACK && w <= bounds.upper() + BOUND_SLACK,
                        rule + " weight " + w + input);
            }
            assertEquals(MinVarianceRuleTest.quadraticForm(sigma, chosen.weights()), chosen.forecastVariance(), 1e-15,
                    rule + " forecast variance" + input);
        }
    }

    /**
     * n in [2, 25] (the first two cases at the ends) and an input seed over all longs, a small
     * one (|seed| &le; 1000) a quarter of the time.
     */
    static Stream<Arguments> assetCountsAndSeeds() {
        SplittableRandom rng = new SplittableRandom(0x5EED_0011L);
        return IntStream.range(0, 40).mapToObj(k -> Arguments.of(k == 0 ? 2 : k == 1 ? 25 : rng.nextInt(2, 26),
                rng.nextInt(4) == 0 ? rng.nextLong(-1000, 1001) : rng.nextLong()));
    }
}
