package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.study.ShrinkageTarget;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;

import java.util.List;
import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Invariants of the risk models on seeded simulated windows (see {@link Windows#simulated}). */
class RiskModelProperties {
    /** Two computations of the same quantity in different summation orders. */
    private static final double ROUNDING_TOL = 1e-11;
    /** Backward error of an O(n) solve relative to the magnitudes involved. */
    private static final double SOLVE_TOL = 1e-12;

    private static List<RiskModel> allModels() {
        return List.of(new SampleRiskModel(), new SingleIndexRiskModel(),
                new ShrinkageRiskModel(ShrinkageTarget.SINGLE_INDEX),
                new ShrinkageRiskModel(ShrinkageTarget.CONSTANT_CORRELATION),
                new ShrinkageRiskModel(ShrinkageTarget.IDENTITY));
    }

    /** Every estimate is symmetric, bit for bit, in dense and element form. */
    @Property(tries = 60)
    void everyModel_isSymmetric(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                @ForAll @IntRange(min = 3, max = 60) int length,
                                @ForAll @IntRange(min = 1, max = 9) int assets) {
        EstimationWindow w = Windows.simulated(seed, length, assets);
        for (RiskModel model : allModels()) {
            CovarianceEstimate est = model.estimate(w);
            for (int i = 0; i < assets; i++) {
                for (int j = 0; j < assets; j++) {
                    assertEquals(est.get(i, j), est.get(j, i), 0.0, model.label() + " (" + i + "," + j + ")");
                    assertEquals(est.dense()[i * assets + j], est.get(i, j), 0.0, model.label() + " dense");
                }
            }
        }
    }

    /**
     * METHODS §3: Σ_SI keeps S's diagonal; shrinkage toward the single-index and
     * constant-correlation targets keeps it too, as both targets carry S_ii on their diagonal.
     */
    @Property(tries = 60)
    void structuredModels_keepSampleVariances(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                              @ForAll @IntRange(min = 3, max = 60) int length,
                                              @ForAll @IntRange(min = 1, max = 9) int assets) {
        EstimationWindow w = Windows.simulated(seed, length, assets);
        List<RiskModel> models = List.of(new SingleIndexRiskModel(),
                new ShrinkageRiskModel(ShrinkageTarget.SINGLE_INDEX),
                new ShrinkageRiskModel(ShrinkageTarget.CONSTANT_CORRELATION));
        for (RiskModel model : models) {
            CovarianceEstimate est = model.estimate(w);
            for (int i = 0; i < assets; i++) {
                Close.relative(w.moments().covariance(i, i), est.get(i, i), ROUNDING_TOL, model.label() + " " + i);
            }
        }
    }

    /** δ ∈ [0, 1] for every target, including short windows where the raw κ̂/L exceeds 1. */
    @Property(tries = 60)
    void intensity_liesInUnitInterval(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                      @ForAll @IntRange(min = 3, max = 60) int length,
                                      @ForAll @IntRange(min = 1, max = 9) int assets) {
        EstimationWindow w = Windows.simulated(seed, length, assets);
        for (ShrinkageTarget target : ShrinkageTarget.values()) {
            double delta = new ShrinkageRiskModel(target).estimate(w).shrinkage().orElseThrow();
            assertTrue(delta >= 0 && delta <= 1, target + " delta " + delta);
        }
    }

    /**
     * The O(L n) sums of the production estimators equal the papers' pair-by-pair sums
     * ({@link PaperFormulas}, Ledoit &amp; Wolf 2003 appendix; 2004 JPM appendix; 2004 JMVA
     * section 3). From three assets on, so that the constant-correlation target differs from S
     * (with two it equals S, see {@code ShrinkageRiskModelTest}).
     */
    @Property(tries = 60)
    void rearrangedSums_matchPairByPairFormulas(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                                @ForAll @IntRange(min = 10, max = 80) int length,
                                                @ForAll @IntRange(min = 3, max = 8) int assets) {
        EstimationWindow w = Windows.simulated(seed, length, assets);
        PaperFormulas paper = new PaperFormulas(w);
        ProductVariances pi = ProductVariances.of(new CentredWindow(w));

        Close.relative(paper.piTotal(), pi.total(), ROUNDING_TOL, "pi");
        Close.relative(paper.piDiagonal(), pi.diagonal(), ROUNDING_TOL, "pi diagonal");
        assertEquals(paper.singleIndexDelta(), delta(w, ShrinkageTarget.SINGLE_INDEX), ROUNDING_TOL, "single-index");
        assertEquals(paper.constantCorrelationDelta(), delta(w, ShrinkageTarget.CONSTANT_CORRELATION), ROUNDING_TOL,
                "constant-correlation");
        assertEquals(paper.identityDelta(), delta(w, ShrinkageTarget.IDENTITY), ROUNDING_TOL, "identity");
    }

    /** The factor form's O(n) w'Σw equals the quadratic form of its dense matrix. */
    @Property(tries = 60)
    void factorPortfolioVariance_equalsDenseQuadraticForm(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                                          @ForAll @IntRange(min = 3, max = 60) int length,
                                                          @ForAll @IntRange(min = 1, max = 9) int assets) {
        SingleIndexCovariance si = new SingleIndexRiskModel().estimate(Windows.simulated(seed, length, assets));
        double[] w = randomVector(new SplittableRandom(seed + 1), assets);
        double[] s = si.dense();
        double dense = 0;
        for (int i = 0; i < assets; i++) {
            for (int j = 0; j < assets; j++) {
                dense += w[i] * s[i * assets + j] * w[j];
            }
        }

        Close.relative(dense, si.portfolioVariance(w), ROUNDING_TOL, "w'Sigma w");
    }

    /** The Woodbury solve x = Σ⁻¹b satisfies Σx = b up to rounding (checked by multiplying back). */
    @Property(tries = 60)
    void woodburySolve_satisfiesDenseSystem(@ForAll @LongRange(min = 1, max = 1_000_000) long seed,
                                            @ForAll @IntRange(min = 3, max = 60) int length,
                                            @ForAll @IntRange(min = 1, max = 9) int assets) {
        SingleIndexCovariance si = new SingleIndexRiskModel().estimate(Windows.simulated(seed, length, assets));
        double[] b = randomVector(new SplittableRandom(seed + 2), assets);
        double[] x = si.solve(b);
        double[] s = si.dense();
        for (int i = 0; i < assets; i++) {
            double row = 0;
            double scale = Math.abs(b[i]);
            for (int j = 0; j < assets; j++) {
                row += s[i * assets + j] * x[j];
                scale += Math.abs(s[i * assets + j] * x[j]);
            }
            assertEquals(b[i], row, SOLVE_TOL * scale, "row " + i);
        }
    }

    private static double delta(EstimationWindow w, ShrinkageTarget target) {
        return new ShrinkageRiskModel(target).estimate(w).shrinkage().orElseThrow();
    }

    private static double[] randomVector(SplittableRandom rng, int n) {
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = rng.nextDouble() * 2 - 1;
        }
        return v;
    }
}
