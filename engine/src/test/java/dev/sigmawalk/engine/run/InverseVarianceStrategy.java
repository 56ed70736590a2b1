package dev.sigmawalk.engine.run;

import dev.sigmawalk.engine.model.Allocator;
import dev.sigmawalk.engine.model.Decision;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.StrategyDefinition;
import dev.sigmawalk.engine.model.WindowMoments;
import java.util.List;
import java.util.OptionalDouble;

/**
 * A test strategy that uses every number of its window: weights ∝ 1/S_ii, forecast variance
 * Σ w_i² S_ii. Fails when told to at a given row, to exercise the failure path.
 */
final class InverseVarianceStrategy implements StrategyDefinition {
    private final String name;
    private final int failAtRow;

    InverseVarianceStrategy(String name, int failAtRow) {
        this.name = name;
        this.failAtRow = failAtRow;
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public String riskLabel() {
        return "diagonal";
    }

    @Override
    public Allocator newAllocator(int window) {
        return this::decide;
    }

    private Decision decide(EstimationWindow w) {
        if (w.endRow() == failAtRow) {
            return new Decision.Failed("told to fail", OptionalDouble.empty());
        }
        WindowMoments m = w.moments();
        int n = w.assetCount();
        double[] weights = new double[n];
        double total = 0;
        for (int i = 0; i < n; i++) {
            weights[i] = 1 / m.covariance(i, i);
            total += weights[i];
        }
        double variance = 0;
        for (int i = 0; i < n; i++) {
            weights[i] /= total;
            variance += weights[i] * weights[i] * m.covariance(i, i);
        }
        return new Decision.Chosen(weights, variance, OptionalDouble.empty(), List.of());
    }
}
