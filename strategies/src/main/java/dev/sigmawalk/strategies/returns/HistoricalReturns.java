package dev.sigmawalk.strategies.returns;

import dev.sigmawalk.engine.model.EstimationWindow;

/** μ_i = x̄_i, the window mean of each asset's excess return (Method §4). */
public record HistoricalReturns() implements ExpectedReturnModel {

    @Override
    public double[] expected(EstimationWindow window) {
        return window.moments().mean().clone();
    }
}
