package dev.sigmawalk.engine.run;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.model.Allocator;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.StrategyDefinition;
import dev.sigmawalk.engine.model.WindowMoments;
import dev.sigmawalk.engine.study.RebalanceRule;
import dev.sigmawalk.engine.study.WalkForwardSpec;
import dev.sigmawalk.engine.timeline.Schedule;
import dev.sigmawalk.engine.timeline.Timeline;
import java.util.List;
import java.util.Optional;
import java.util.function.BiPredicate;
import org.junit.jupiter.api.Test;

/**
 * The dense n×n moments are computed only for windows whose consumers declare that they need
 * them; the cheap moments are the window's own either way.
 */
class DenseMomentPlanTest {
    /** Agreement of the cheap path's moments with the two-pass computation, relative to √(S_ii S_jj). */
    private static final double RELATIVE = 1e-13;
    private static final List<Integer> WINDOWS = List.of(12, 30);

    /** The inverse-variance test strategy, declaring that it needs S only when n ≤ L. */
    private static StrategyDefinition declaring(String name) {
        return declaring(name, (window, assets) -> assets <= window);
    }

    /** The inverse-variance test strategy with the given declaration. */
    private static StrategyDefinition declaring(String name, BiPredicate<Integer, Integer> needs) {
        InverseVarianceStrategy inner = new InverseVarianceStrategy(name, -1);
        return new StrategyDefinition() {
            @Override
            public String name() {
                return name;
            }

            @Override
            public String riskLabel() {
                return inner.riskLabel();
            }

            @Override
            public Allocator newAllocator(int window) {
                return inner.newAllocator(window);
            }

            @Override
            public boolean needsDenseMoments(int window, int assets) {
                return needs.test(window, assets);
            }
        };
    }

    /**
     * With 20 assets, windows of 12 rows (n > L) get only the cheap moments and windows of 30
     * rows (n ≤ L) the dense S from the running sums, as the strategy declares; a probe saying
     * no does not change that.
     */
    @Test
    void denseMoments_onlyWhereDeclared() {
        ReturnPanel panel = TestPanels.random(90, 20, 5);
        WalkForwardSpec spec = new WalkForwardSpec(WINDOWS, new RebalanceRule.EveryRows(3), Optional.empty(),
                Optional.empty(), 0);
        Schedule schedule = Timeline.plan(panel, spec);
        WindowProbe<Boolean> probe = new WindowProbe<>() {
            @Override
            public Boolean probe(EstimationWindow window) {
                return window.moments().hasCovariance();
            }

            @Override
            public boolean needsDenseMoments(int window, int assets) {
                return false;
            }
        };
        RunResult<Boolean> run = new WalkForward<>(panel, schedule, List.of(declaring("iv")), WINDOWS, 0, probe)
                .run(1, ProgressListener.NONE);
        assertTrue(run.probes().get(12).stream().noneMatch(b -> b), "L = 12 windows built S");
        assertTrue(run.probes().get(30).stream().allMatch(b -> b), "L = 30 windows lacked S");
    }

    /**
     * A window length keeps running sums when any of its rebalances needs S, even if a window
     * with every column eligible would not: here five of 20 assets list only at row 50, so the
     * early windows of 12 rows have 15 assets and need S (n ≤ 15), the later ones do not.
     */
    @Test
    void runningSums_keptWhenSomeRebalanceNeedsS() {
        ReturnPanel base = TestPanels.random(90, 20, 13);
        double[] r = base.rawReturns().clone();
        for (int t = 0; t < 50; t++) {
            for (int i = 15; i < 20; i++) {
                r[t * 20 + i] = Double.NaN;
            }
        }
        double[] m = new double[base.rows()];
        double[] rf = new double[base.rows()];
        for (int t = 0; t < base.rows(); t++) {
            m[t] = base.market(t);
            rf[t] = base.riskFree(t);
        }
        ReturnPanel panel = new ReturnPanel(base.dates(), base.assets(), r, m, rf, "index", base.periodsPerYear());
        Schedule schedule = Timeline.plan(panel, new WalkForwardSpec(List.of(12), new RebalanceRule.EveryRows(3),
                Optional.empty(), Optional.empty(), 0));
        StrategyDefinition fewAssets = declaring("iv", (window, assets) -> assets <= 15);
        DenseMomentPlan plan = new DenseMomentPlan(List.of(fewAssets), null);
        WindowBuilder builder = new WindowBuilder(panel);
        assertFalse(plan.needs(12, panel.assetCount()), "with every column eligible");
        assertTrue(plan.anyWindowNeeds(builder, schedule, 12), "some early window needs S");
        Schedule late = Timeline.plan(panel, new WalkForwardSpec(List.of(12), new RebalanceRule.EveryRows(3),
                Optional.of(panel.date(70)), Optional.empty(), 0));
        assertFalse(plan.anyWindowNeeds(builder, late, 12), "no late window needs S");
    }

    /**
     * The cheap path's means, variances and market moments match the two-pass
     * {@link WindowMoments#of} to rounding, and the dense S built on request afterwards matches
     * it too, with its diagonal the variances already published (bit for bit).
     */
    @Test
    void cheapMoments_matchTwoPass_andLazySKeepsTheVariances() {
        ReturnPanel panel = TestPanels.random(60, 15, 9);
        WindowBuilder builder = new WindowBuilder(panel);
        for (int tau = 11; tau < panel.rows(); tau += 7) {
            EstimationWindow cheap = builder.build(tau, 12, null, n -> false);
            EstimationWindow full = builder.build(tau, 12);
            WindowMoments got = cheap.moments();
            WindowMoments want = full.moments();
            assertFalse(got.hasCovariance(), "S built before it was asked for at " + tau);
            double[] variances = got.variances().clone();
            int n = want.assets();
            for (int i = 0; i < n; i++) {
                double scale = Math.sqrt(want.variance(i));
                assertEquals(want.mean()[i], got.mean()[i], RELATIVE * scale, "mean " + i + " at " + tau);
                assertEquals(want.variance(i), got.variance(i), RELATIVE * want.variance(i), "S_ii " + i + " at " + tau);
                assertEquals(want.marketCovariance()[i], got.marketCovariance()[i],
                        RELATIVE * scale * Math.sqrt(want.marketVariance()), "s_im " + i + " at " + tau);
            }
            assertEquals(want.marketVariance(), got.marketVariance(), RELATIVE * want.marketVariance(), "s_mm at " + tau);
            double[] s = got.covariance();
            for (int i = 0; i < n; i++) {
                assertEquals(variances[i], s[i * n + i], 0.0, "diagonal " + i + " at " + tau);
                for (int j = 0; j < n; j++) {
                    assertEquals(want.covariance(i, j), s[i * n + j],
                            RELATIVE * Math.sqrt(want.variance(i) * want.variance(j)), "S_" + i + j + " at " + tau);
                }
            }
            assertArrayEquals(variances, got.variances(), "variances changed at " + tau);
        }
    }

    /** The choice depends on (L, n) only: the same study gives the same weights on one and two threads. */
    @Test
    void weights_sameOnOneAndTwoThreads() {
        ReturnPanel panel = TestPanels.random(90, 20, 11);
        WalkForwardSpec spec = new WalkForwardSpec(WINDOWS, new RebalanceRule.EveryRows(2), Optional.empty(),
                Optional.empty(), 0);
        Schedule schedule = Timeline.plan(panel, spec);
        List<StrategyDefinition> strategies = List.of(declaring("a"), new InverseVarianceStrategy("b", -1));
        RunResult<Void> one = new WalkForward<Void>(panel, schedule, strategies, WINDOWS, 0, null)
                .run(1, ProgressListener.NONE);
        RunResult<Void> two = new WalkForward<Void>(panel, schedule, strategies, WINDOWS, 0, null)
                .run(2, ProgressListener.NONE);
        for (int p = 0; p < one.paths().size(); p++) {
            assertArrayEquals(one.paths().get(p).gross(), two.paths().get(p).gross(), "path " + p);
        }
    }
}
