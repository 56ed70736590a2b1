package dev.sigmawalk.strategies.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.model.Decision;
import dev.sigmawalk.engine.model.DenseProof;
import dev.sigmawalk.engine.study.Bounds;
import dev.sigmawalk.strategies.optimize.RandomProblems;
import dev.sigmawalk.strategies.optimize.ReferenceMatrices;
import dev.sigmawalk.strategies.optimize.SolverSettings;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The min-variance rule on the 12-asset reference window: weights against
 * {@code numpy.linalg.solve} (numpy 1.24.2) without bounds and against {@code cvxopt.solvers.qp}
 * (cvxopt 1.3.0) polished by an exact active-set KKT solve with bounds [0, 0.25].
 */
class MinVarianceRuleTest {
    private static final double CLOSED_FORM_TOLERANCE = 1e-10;
    private static final double BOUNDED_TOLERANCE = 1e-8;
    private static final Optional<Bounds> LONG_ONLY_CAPPED = Optional.of(new Bounds(0, 0.25));

    private final MinVariance rule = new MinVariance(SolverSettings.standard());
    private final List<String> assets = TestCovariances.names(ReferenceMatrices.ASSETS);

    /** Sample matrix, no bounds: numpy.linalg.solve; w'Σw = 1/(1'Σ⁻¹1) = ν (textbook identity). */
    @Test
    void sampleUnbounded_matchesNumpy_andVarianceIsQuadraticForm() {
        double[] sigma = ReferenceMatrices.sampleCovariance();
        RuleOutcome out = rule.apply(new RuleInput(assets, TestCovariances.dense(sigma), null, Optional.empty()),
                new WarmStart());
        double[] expected = ReferenceMatrices.minVarianceWeights(0);
        RuleOutcome.Chosen chosen = assertChosen(expected, out, CLOSED_FORM_TOLERANCE);
        assertEquals(quadraticForm(sigma, expected), chosen.forecastVariance(), 1e-15, "w'Σw");
    }

    /** Sample matrix, bounds [0, 0.25]: cvxopt.solvers.qp polished by an exact active-set KKT solve. */
    @Test
    void sampleBounded_matchesPolishedCvxopt() {
        RuleOutcome out = rule.apply(new RuleInput(assets, TestCovariances.dense(ReferenceMatrices.sampleCovariance()),
                null, LONG_ONLY_CAPPED), new WarmStart());
        assertChosen(ReferenceMatrices.minVarianceWeights(1), out, BOUNDED_TOLERANCE);
    }

    /** Single-index form (Woodbury path), no bounds: numpy.linalg.solve on s_mm ββ' + diag(d). */
    @Test
    void singleIndexUnbounded_factorPath_matchesNumpy() {
        RuleInput input = new RuleInput(assets,
                new TestCovariances.FactorCovariance(ReferenceMatrices.singleIndexForm()), null, Optional.empty());
        assertChosen(ReferenceMatrices.minVarianceWeights(2), rule.apply(input, new WarmStart()),
                CLOSED_FORM_TOLERANCE);
    }

    /** Single-index form (threshold path), bounds [0, 0.25]: polished cvxopt.solvers.qp. */
    @Test
    void singleIndexBounded_factorPath_matchesPolishedCvxopt() {
        RuleInput input = new RuleInput(assets,
                new TestCovariances.FactorCovariance(ReferenceMatrices.singleIndexForm()), null, LONG_ONLY_CAPPED);
        assertChosen(ReferenceMatrices.minVarianceWeights(3), rule.apply(input, new WarmStart()), BOUNDED_TOLERANCE);
    }

    /** 8 assets, 5 periods: rank ≤ 4 (common practice), so no closed form; the engine's Decision is Failed. */
    @Test
    void singularSample_unbounded_isNotFormedNamingSingular() {
        double[] sigma = RandomProblems.covariance(new Random(2), 8, 5);
        RuleOutcome out = rule.apply(new RuleInput(TestCovariances.names(8), TestCovariances.dense(sigma), null,
                Optional.empty()), new WarmStart());
        RuleOutcome.NotFormed failed = assertInstanceOf(RuleOutcome.NotFormed.class, out);
        assertTrue(failed.reason().startsWith("min-variance: ") && failed.reason().contains("singular"),
                failed.reason());
        Decision decision = out.toDecision(OptionalDouble.empty());
        assertInstanceOf(Decision.Failed.class, decision);
    }

    /** 12 assets capped at 0.05 hold at most 0.6 (hand computation): NotFormed naming the sum. */
    @Test
    void boundsThatCannotSumToOne_areNotFormed() {
        RuleOutcome out = rule.apply(new RuleInput(assets, TestCovariances.dense(ReferenceMatrices.sampleCovariance()),
                null, Optional.of(new Bounds(0, 0.05))), new WarmStart());
        RuleOutcome.NotFormed failed = assertInstanceOf(RuleOutcome.NotFormed.class, out);
        assertTrue(failed.reason().contains("upper bounds sum to"), failed.reason());
    }

    /**
     * Two rebalances on one path whose asset sets differ (one asset leaves, one joins): the warm
     * start must give the same weights as a fresh path.
     */
    @Test
    void warmStartAcrossChangingAssetSets_equalsFreshPath() {
        Random random = new Random(9);
        List<String> first = TestCovariances.names(25);
        List<String> second = new java.util.ArrayList<>(first.subList(1, 25));
        second.add("X99");
        Optional<Bounds> bounds = Optional.of(new Bounds(0, 0.12));
        WarmStart path = new WarmStart();
        rule.apply(new RuleInput(first, TestCovariances.dense(RandomProblems.covariance(random, 25, 60)), null,
                bounds), path);
        RuleInput next = new RuleInput(second, TestCovariances.dense(RandomProblems.covariance(random, 25, 60)), null,
                bounds);
        RuleOutcome.Chosen warm = assertInstanceOf(RuleOutcome.Chosen.class, rule.apply(next, path));
        RuleOutcome.Chosen cold = assertInstanceOf(RuleOutcome.Chosen.class, rule.apply(next, new WarmStart()));
        for (int i = 0; i < 25; i++) {
            assertEquals(cold.weights()[i], warm.weights()[i], 1e-10, "weight " + i);
        }
    }

    @Test
    void nonFiniteCovariance_isNotFormedNamingTheEntry() {
        double[] sigma = {0.04, Double.NaN, Double.NaN, 0.01};
        RuleOutcome out = rule.apply(new RuleInput(List.of("P", "Q"), TestCovariances.dense(sigma), null,
                Optional.empty()), new WarmStart());
        RuleOutcome.NotFormed failed = assertInstanceOf(RuleOutcome.NotFormed.class, out);
        assertTrue(failed.reason().contains("(P, Q) is NaN"), failed.reason());
    }

    /**
     * An infinite or NaN entry anywhere in a 3×3 Σ is named by its position, with and without
     * bounds (with bounds the entries are checked by the problem's own validation), and whether
     * or not the estimate promises symmetry (that promise skips only the symmetry proof): the
     * solvers take finite matrices only.
     */
    @Test
    void nonFiniteEntryAtAnyPosition_isNotFormedNamingIt() {
        List<String> names = List.of("P", "Q", "R");
        double[] bad = {Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NaN};
        for (DenseProof proof : List.of(DenseProof.UNPROVEN, DenseProof.MIRRORED)) {
            for (Optional<Bounds> bounds : List.of(Optional.<Bounds>empty(), Optional.of(new Bounds(0, 1)))) {
                for (int k = 0; k < 9; k++) {
                    double[] sigma = {0.04, 0.01, 0.0, 0.01, 0.05, 0.01, 0.0, 0.01, 0.06};
                    sigma[k] = bad[k % 3];
                    RuleOutcome out = rule.apply(new RuleInput(names, TestCovariances.dense(sigma, proof), null,
                            bounds), new WarmStart());
                    RuleOutcome.NotFormed failed = assertInstanceOf(RuleOutcome.NotFormed.class, out, "entry " + k);
                    String entry = "(" + names.get(k / 3) + ", " + names.get(k % 3) + ") is " + bad[k % 3];
                    assertTrue(failed.reason().contains(entry), failed.reason());
                }
            }
        }
    }

    /** A covariance whose (0, 1) and (1, 0) entries differ is refused by the solver: NotFormed, not an exception. */
    @Test
    void asymmetricCovariance_isNotFormedNamingSymmetry() {
        double[] sigma = {0.04, 0.01, 0.02, 0.01};
        RuleOutcome out = rule.apply(new RuleInput(List.of("P", "Q"), TestCovariances.dense(sigma), null,
                Optional.of(new Bounds(0, 1))), new WarmStart());
        RuleOutcome.NotFormed failed = assertInstanceOf(RuleOutcome.NotFormed.class, out);
        assertTrue(failed.reason().contains("not symmetric"), failed.reason());
    }

    static RuleOutcome.Chosen assertChosen(double[] expected, RuleOutcome out, double tolerance) {
        RuleOutcome.Chosen chosen = assertInstanceOf(RuleOutcome.Chosen.class, out, () -> out.toString());
        for (int i = 0; i < expected.length; i++) {
            assertEquals(expected[i], chosen.weights()[i], tolerance, "weight " + i);
        }
        return chosen;
    }

    static double quadraticForm(double[] sigma, double[] w) {
        int n = w.length;
        double v = 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                v += w[i] * sigma[i * n + j] * w[j];
            }
        }
        return v;
    }
}
