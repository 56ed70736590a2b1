package dev.sigmawalk.engine.run;

import java.util.List;
import java.util.Objects;

/**
 * One strategy run with one window length over the shared out-of-sample rows. Row k of the
 * arrays is out-of-sample row k (panel row τ_0 + 1 + k).
 *
 * @param strategy strategy name
 * @param riskLabel its risk model, for reports
 * @param window L
 * @param gross gross returns R_t
 * @param net returns after costs
 * @param forecastVolatility per row, √(w'Σw) per period of the portfolio formed at the last
 *                           rebalance; NaN where that rebalance failed (no forecast)
 * @param rebalances one record per rebalance, in date order
 */
public record PathResult(String strategy, String riskLabel, int window, double[] gross, double[] net,
                         double[] forecastVolatility, List<RebalanceRecord> rebalances) {
    public PathResult {
        Objects.requireNonNull(strategy, "strategy");
        Objects.requireNonNull(riskLabel, "riskLabel");
        if (gross.length != net.length || gross.length != forecastVolatility.length) {
            throw new IllegalArgumentException("gross, net and forecast arrays differ in length");
        }
        rebalances = List.copyOf(rebalances);
    }

    /** Number of rebalances whose allocation failed. */
    public long failures() {
        return rebalances.stream().filter(r -> r.failure().isPresent()).count();
    }
}
