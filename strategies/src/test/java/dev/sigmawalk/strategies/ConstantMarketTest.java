package dev.sigmawalk.strategies;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.data.AlphaTable;
import dev.sigmawalk.engine.model.Decision;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.StrategyDefinition;
import dev.sigmawalk.engine.study.Bounds;
import dev.sigmawalk.engine.study.ExpectedReturnKind;
import dev.sigmawalk.engine.study.Objective;
import dev.sigmawalk.engine.study.RiskKind;
import dev.sigmawalk.engine.study.ShrinkageTarget;
import dev.sigmawalk.engine.study.StrategySpec;
import java.time.LocalDate;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * A window whose market excess return never changes has s_mm = 0 exactly: every strategy that
 * needs a beta records a failed rebalance with the reason, and none throws; the others decide.
 */
class ConstantMarketTest {
    private static final int L = 30;
    private static final int N = 6;

    private static EstimationWindow flatMarketWindow() {
        SplittableRandom rng = new SplittableRandom(17);
        double[] m = new double[L];
        double[] x = new double[L * N];
        for (int t = 0; t < L; t++) {
            m[t] = -0.0016;
            for (int i = 0; i < N; i++) {
                x[t * N + i] = 0.004 + 0.05 * (rng.nextDouble() - 0.5);
            }
        }
        List<String> ids = List.of("A", "B", "C", "D", "E", "F");
        return new EstimationWindow(LocalDate.of(2016, 5, 31), L - 1, ids, new int[] {0, 1, 2, 3, 4, 5}, x, m, 12, null);
    }

    private static Decision decide(RiskKind risk, Objective objective) {
        StrategySpec spec = new StrategySpec("s", risk, ShrinkageTarget.SINGLE_INDEX, objective,
                Optional.of(new Bounds(0, 0.5)), 4, ExpectedReturnKind.SINGLE_INDEX, Optional.empty(),
                OptionalDouble.empty(), Optional.empty());
        StrategyDefinition def = StrategyCatalog.build(List.of(spec), s -> AlphaTable.empty()).get(0);
        return def.newAllocator(L).decide(flatMarketWindow());
    }

    @Test
    void singleIndexRisk_failsTheRebalance_withTheReason() {
        Decision.Failed f = assertInstanceOf(Decision.Failed.class, decide(RiskKind.SINGLE_INDEX, Objective.MIN_VARIANCE));
        assertEquals("single-index model could not be estimated: market variance in the window (0.0) must be finite"
                + " and > 0 for the single-index model", f.reason());
    }

    @Test
    void singleIndexExpectedReturns_onSampleRisk_failTheRebalance_insteadOfStoppingTheRun() {
        Decision.Failed f = assertInstanceOf(Decision.Failed.class, decide(RiskKind.SAMPLE, Objective.MEAN_VARIANCE));
        assertTrue(f.reason().startsWith("expected returns could not be estimated: market variance in the window (0.0)"),
                f.reason());
    }

    @Test
    void sampleMinVariance_stillDecides() {
        assertInstanceOf(Decision.Chosen.class, decide(RiskKind.SAMPLE, Objective.MIN_VARIANCE));
    }
}
