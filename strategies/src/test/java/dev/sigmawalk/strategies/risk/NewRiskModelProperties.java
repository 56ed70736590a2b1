package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.EstimationWindow;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.ojalgo.matrix.decomposition.Eigenvalue;
import org.ojalgo.matrix.store.R064Store;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Invariants of the Method §11 models on seeded simulated windows ({@link Windows#simulated}),
 * including windows with more assets than rows.
 */
class NewRiskModelProperties {
    /** Two computations of the same quantity in different summation orders. */
    private static final double ROUNDING_TOL = 1e-10;
    /** Smallest eigenvalue allowed, relative to the trace: PSD up to rounding. */
    private static final double PSD_TOL = 1e-12;

    /** Z01.. in three sectors by index mod 3, except every seventh asset, which has none. */
    private static Map<String, String> sectors(int n) {
        Map<String, String> out = new HashMap<>();
        for (int i = 0; i < n; i++) {
            if (i % 7 != 6) {
                out.put(String.format("Z%02d", i + 1), "s" + i % 3);
            }
        }
        return out;
    }

    private static List<RiskModel> models(int n, int length) {
        int k = Math.max(1, Math.min(3, Math.min(n, length - 1)));
        return List.of(new MultiIndexRiskModel(new FactorColumns.Sectors(sectors(n))),
                new PrincipalComponentsRiskModel(k), new EwmaRiskModel(1 + length / 4.0),
                new NonlinearShrinkageRiskModel());
    }

    /**
     * Symmetric bit for bit, dense equal to element access, positive semi-definite up to
     * rounding (smallest eigenvalue by ojAlgo), w'Σw equal to the dense quadratic form, and the
     * sample diagonal for the multi-index and principal-components models (Method §11). The 40
     * windows are drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("windows")
    void everyNewModel_keepsItsInvariants(long seed, int length, int assets) {
        String label = " (seed " + seed + ", " + length + " periods, " + assets + " assets)";
        EstimationWindow w = Windows.simulated(seed, length, assets);
        double[] weights = new double[assets];
        SplittableRandom rng = new SplittableRandom(seed + 3);
        for (int i = 0; i < assets; i++) {
            weights[i] = rng.nextDouble() * 2 - 1;
        }
        for (RiskModel model : models(assets, length)) {
            CovarianceEstimate est = model.estimate(w);
            double[] s = est.dense();
            double trace = 0;
            double quad = 0;
            for (int i = 0; i < assets; i++) {
                trace += s[i * assets + i];
                for (int j = 0; j < assets; j++) {
                    assertEquals(s[j * assets + i], s[i * assets + j], 0.0, model.label() + " symmetric" + label);
                    assertEquals(s[i * assets + j], est.get(i, j), 0.0, model.label() + " get" + label);
                    quad += weights[i] * s[i * assets + j] * weights[j];
                }
            }
            Close.relative(quad, est.portfolioVariance(weights), ROUNDING_TOL, model.label() + " w'Sigma w" + label);
            double smallest = smallestEigenvalue(s, assets);
            assertTrue(smallest >= -PSD_TOL * trace, model.label() + " smallest eigenvalue " + smallest + label);
            if (model instanceof MultiIndexRiskModel || model instanceof PrincipalComponentsRiskModel) {
                for (int i = 0; i < assets; i++) {
                    Close.relative(w.moments().covariance(i, i), est.get(i, i), ROUNDING_TOL,
                            model.label() + " diagonal " + i + label);
                }
            }
        }
    }

    /**
     * With n > L the principal components come from the L×L dual; V_k Λ_k V_k' must equal the
     * same product from ojAlgo's decomposition of the n×n matrix S itself. The 40 windows are
     * drawn from a fixed seed.
     */
    @ParameterizedTest
    @MethodSource("wideWindows")
    void principalComponentsThroughDual_matchDirectDecomposition(long seed, int length, int assets) {
        String label = " (seed " + seed + ", " + length + " periods, " + assets + " assets)";
        EstimationWindow w = Windows.simulated(seed, length, assets);
        int k = 2;
        FactorCovariance pc = new PrincipalComponentsRiskModel(k).estimate(w);
        double[] s = w.moments().covariance();
        R064Store m = R064Store.FACTORY.make(assets, assets);
        for (int i = 0; i < assets; i++) {
            for (int j = 0; j < assets; j++) {
                m.set(i, j, s[i * assets + j]);
            }
        }
        Eigenvalue<Double> e = Eigenvalue.R064.make(m, true);
        e.decompose(m);
        double scale = 0;
        for (int i = 0; i < assets; i++) {
            scale = Math.max(scale, s[i * assets + i]);
        }
        for (int i = 0; i < assets; i++) {
            for (int j = 0; j < assets; j++) {
                double direct = 0;
                for (int a = 0; a < k; a++) {
                    direct += e.getV().doubleValue(i, a) * e.getD().doubleValue(a, a) * e.getV().doubleValue(j, a);
                }
                double dual = pc.get(i, j) - (i == j ? pc.specificVariances()[i] : 0);
                assertEquals(direct, dual, ROUNDING_TOL * scale, "V Lambda V' (" + i + "," + j + ")" + label);
            }
        }
    }

    /** Seed in [1, 1 000 000], 14 to 70 periods, 2 to 30 assets (some above L - 1). */
    static Stream<Arguments> windows() {
        SplittableRandom rng = new SplittableRandom(0x5EED_0011L);
        return Stream.generate(() -> Arguments.of(rng.nextLong(1, 1_000_001), rng.nextInt(14, 71), rng.nextInt(2, 31)))
                .limit(40);
    }

    /** Seed in [1, 1 000 000], 5 to 15 periods, 16 to 30 assets: always n > L. */
    static Stream<Arguments> wideWindows() {
        SplittableRandom rng = new SplittableRandom(0x5EED_0012L);
        return Stream.generate(() -> Arguments.of(rng.nextLong(1, 1_000_001), rng.nextInt(5, 16), rng.nextInt(16, 31)))
                .limit(40);
    }

    private static double smallestEigenvalue(double[] s, int n) {
        R064Store m = R064Store.FACTORY.make(n, n);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                m.set(i, j, s[i * n + j]);
            }
        }
        Eigenvalue<Double> e = Eigenvalue.R064.make(m, true);
        e.decompose(m);
        double min = Double.POSITIVE_INFINITY;
        for (int a = 0; a < n; a++) {
            min = Math.min(min, e.getD().doubleValue(a, a));
        }
        return min;
    }
}
