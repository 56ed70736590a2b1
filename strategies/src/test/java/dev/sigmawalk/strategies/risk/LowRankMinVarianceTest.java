package dev.sigmawalk.strategies.risk;

import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.study.Bounds;
import dev.sigmawalk.engine.study.ShrinkageTarget;
import dev.sigmawalk.strategies.optimize.FactorMinVariance;
import dev.sigmawalk.strategies.optimize.SolverSettings;
import dev.sigmawalk.strategies.rules.MinVariance;
import dev.sigmawalk.strategies.rules.RuleInput;
import dev.sigmawalk.strategies.rules.RuleOutcome;
import dev.sigmawalk.strategies.rules.WarmStart;
import java.util.Arrays;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * Long-only minimum variance on shrinkage handed on as diagonal plus low rank (solved on the
 * factor side) against the same problem on the dense matrix (the exact dense active-set
 * solver). Shrinkage toward a target with a positive diagonal part is positive definite, so the
 * optimum is unique and both must find it.
 */
class LowRankMinVarianceTest {
    /** Objective values: both solvers certify KKT to 1e-9 of the gradient's scale. */
    private static final double OBJECTIVE_TOL = 1e-9;
    /** Weights of a unique optimum, absolute. */
    private static final double WEIGHT_TOL = 1e-7;

    @Test
    void boundedMinVariance_sameOptimumAsDense_onSeededWideWindows() {
        long seed = 100;
        for (ShrinkageTarget target : new ShrinkageTarget[] {ShrinkageTarget.SINGLE_INDEX, ShrinkageTarget.IDENTITY}) {
            for (int[] shape : new int[][] {{16, 150}, {36, 300}, {18, 150}}) {
                EstimationWindow w = Windows.simulated(seed++, shape[0], shape[1]);
                ShrinkageRiskModel model = new ShrinkageRiskModel(target);
                CovarianceEstimate low = model.estimate(w);
                assertInstanceOf(FactorCovariance.class, low);
                CovarianceEstimate dense = model.dense(Windows.simulated(seed - 1, shape[0], shape[1]));
                Optional<Bounds> bounds = Optional.of(new Bounds(0, 3.0 / shape[1]));
                double[] a = solve(w, low, bounds);
                double[] b = solve(w, dense, bounds);
                String label = target + " L = " + shape[0] + ", n = " + shape[1];
                double[] lo = new double[shape[1]];
                double[] hi = new double[shape[1]];
                Arrays.fill(hi, 3.0 / shape[1]);
                assertTrue(new FactorMinVariance(SolverSettings.standard()).solve((FactorCovariance) low, lo, hi, null)
                        .isPresent(), label + ": the factor-side solver did not certify its answer");
                double va = dense.portfolioVariance(a);
                double vb = dense.portfolioVariance(b);
                assertTrue(Math.abs(va - vb) <= OBJECTIVE_TOL * vb, label + ": objective " + va + " vs " + vb);
                for (int i = 0; i < a.length; i++) {
                    assertTrue(Math.abs(a[i] - b[i]) <= WEIGHT_TOL, label + ": w_" + i + " " + a[i] + " vs " + b[i]);
                }
            }
        }
    }

    private static double[] solve(EstimationWindow w, CovarianceEstimate sigma, Optional<Bounds> bounds) {
        RuleOutcome out = new MinVariance(SolverSettings.standard())
                .apply(new RuleInput(w.assets(), sigma, null, bounds), new WarmStart());
        return assertInstanceOf(RuleOutcome.Chosen.class, out, String.valueOf(out)).weights();
    }
}
