package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.study.ShrinkageTarget;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.Stream;

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

    /**
     * Every estimate is symmetric, bit for bit, in dense and element form. The 60 windows are
     * drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("windows")
    void everyModel_isSymmetric(long seed, int length, int assets) {
        String window = describe(seed, length, assets);
        EstimationWindow w = Windows.simulated(seed, length, assets);
        for (RiskModel model : allModels()) {
            CovarianceEstimate est = model.estimate(w);
            for (int i = 0; i < assets; i++) {
                for (int j = 0; j < assets; j++) {
                    assertEquals(est.get(i, j), est.get(j, i), 0.0, model.label() + " (" + i + "," + j + ")" + window);
                    assertEquals(est.dense()[i * assets + j], est.get(i, j), 0.0, model.label() + " dense" + window);
                }
            }
        }
    }

    /**
     * Method §3: Σ_SI keeps S's diagonal; shrinkage toward the single-index and
     * constant-correlation targets keeps it too, as both targets carry S_ii on their diagonal.
     * The 60 windows are drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("windows")
    void structuredModels_keepSampleVariances(long seed, int length, int assets) {
        String window = describe(seed, length, assets);
        EstimationWindow w = Windows.simulated(seed, length, assets);
        List<RiskModel> models = List.of(new SingleIndexRiskModel(),
                new ShrinkageRiskModel(ShrinkageTarget.SINGLE_INDEX),
                new ShrinkageRiskModel(ShrinkageTarget.CONSTANT_CORRELATION));
        for (RiskModel model : models) {
            CovarianceEstimate est = model.estimate(w);
            for (int i = 0; i < assets; i++) {
                Close.relative(w.moments().covariance(i, i), est.get(i, i), ROUNDING_TOL,
                        model.label() + " " + i + window);
            }
        }
    }

    /**
     * δ ∈ [0, 1] for every target, including short windows where the raw κ̂/L exceeds 1. The 60
     * windows are drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("windows")
    void intensity_liesInUnitInterval(long seed, int length, int assets) {
        String window = describe(seed, length, assets);
        EstimationWindow w = Windows.simulated(seed, length, assets);
        for (ShrinkageTarget target : ShrinkageTarget.values()) {
            double delta = new ShrinkageRiskModel(target).estimate(w).shrinkage().orElseThrow();
            assertTrue(delta >= 0 && delta <= 1, target + " delta " + delta + window);
        }
    }

    /**
     * The O(L n) sums of the production estimators equal the papers' pair-by-pair sums
     * ({@link PaperFormulas}, Ledoit &amp; Wolf 2003 appendix; 2004 JPM appendix; 2004 JMVA
     * section 3). From three assets on, so that the constant-correlation target differs from S
     * (with two it equals S, see {@code ShrinkageRiskModelTest}). The 60 windows are drawn from a
     * fixed seed.
     */
    @ParameterizedTest
    @MethodSource("largerWindows")
    void rearrangedSums_matchPairByPairFormulas(long seed, int length, int assets) {
        String window = describe(seed, length, assets);
        EstimationWindow w = Windows.simulated(seed, length, assets);
        PaperFormulas paper = new PaperFormulas(w);
        ProductVariances pi = ProductVariances.of(new CentredWindow(w));

        Close.relative(paper.piTotal(), pi.total(), ROUNDING_TOL, "pi" + window);
        Close.relative(paper.piDiagonal(), pi.diagonal(), ROUNDING_TOL, "pi diagonal" + window);
        assertEquals(paper.singleIndexDelta(), delta(w, ShrinkageTarget.SINGLE_INDEX), ROUNDING_TOL,
                "single-index" + window);
        assertEquals(paper.constantCorrelationDelta(), delta(w, ShrinkageTarget.CONSTANT_CORRELATION), ROUNDING_TOL,
                "constant-correlation" + window);
        assertEquals(paper.identityDelta(), delta(w, ShrinkageTarget.IDENTITY), ROUNDING_TOL, "identity" + window);
    }

    /**
     * The factor form's O(n) w'Σw equals the quadratic form of its dense matrix. The 60 windows
     * are drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("windows")
    void factorPortfolioVariance_equalsDenseQuadraticForm(long seed, int length, int assets) {
        String window = describe(seed, length, assets);
        SingleIndexCovariance si = new SingleIndexRiskModel().estimate(Windows.simulated(seed, length, assets));
        double[] w = randomVector(new SplittableRandom(seed + 1), assets);
        double[] s = si.dense();
        double dense = 0;
        for (int i = 0; i < assets; i++) {
            for (int j = 0; j < assets; j++) {
                dense += w[i] * s[i * assets + j] * w[j];
            }
        }

        Close.relative(dense, si.portfolioVariance(w), ROUNDING_TOL, "w'Sigma w" + window);
    }

    /**
     * The Woodbury solve x = Σ⁻¹b satisfies Σx = b up to rounding (checked by multiplying back).
     * The 60 windows are drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("windows")
    void woodburySolve_satisfiesDenseSystem(long seed, int length, int assets) {
        String window = describe(seed, length, assets);
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
            assertEquals(b[i], row, SOLVE_TOL * scale, "row " + i + window);
        }
    }

    /** Simulation seed in [1, 1 000 000], 3 to 60 periods, 1 to 9 assets. */
    static Stream<Arguments> windows() {
        return windowCases(0x5EED_0007L, 3, 60, 1, 9);
    }

    /** Simulation seed in [1, 1 000 000], 10 to 80 periods, 3 to 8 assets. */
    static Stream<Arguments> largerWindows() {
        return windowCases(0x5EED_0008L, 10, 80, 3, 8);
    }

    private static Stream<Arguments> windowCases(long caseSeed, int minLength, int maxLength, int minAssets,
                                                 int maxAssets) {
        SplittableRandom rng = new SplittableRandom(caseSeed);
        return Stream.generate(() -> Arguments.of(rng.nextLong(1, 1_000_001), rng.nextInt(minLength, maxLength + 1),
                rng.nextInt(minAssets, maxAssets + 1))).limit(60);
    }

    /** The case's parameters, appended to every failure message so that a failure can be rerun. */
    private static String describe(long seed, int length, int assets) {
        return " (seed " + seed + ", " + length + " periods, " + assets + " assets)";
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
