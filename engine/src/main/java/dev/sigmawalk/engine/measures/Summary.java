package dev.sigmawalk.engine.measures;

import java.util.Objects;
import java.util.OptionalDouble;
import java.util.OptionalInt;

/**
 * The annualised performance of one path over the out-of-sample rows (Method §7), one row of
 * {@code summary.csv}. Measures that do not apply (for the {@code market} benchmark: window,
 * turnover, tracking error, information ratio, forecast, bias) are empty.
 *
 * @param strategy strategy name, or {@code market}
 * @param window L; empty for the benchmark
 * @param periods out-of-sample rows N
 * @param meanReturn p · mean(R)
 * @param volatility √p · sd(R), divisor N−1
 * @param sharpe √p · mean(R − rf) / sd(R − rf)
 * @param cagr (Π(1 + R_t))^(p/N) − 1
 * @param maxDrawdown max_t (1 − W_t / max_{s≤t} W_s), a positive fraction
 * @param meanTurnover mean turnover over rebalances after the first
 * @param trackingError √p · sd(R − R_m)
 * @param informationRatio p · mean(R − R_m) / tracking error
 * @param forecastVolatility mean over rebalances of √(p · w'Σw)
 * @param bias sd of (R_t − rf_t)/σ̂_τ over held rows (gross returns)
 */
public record Summary(String strategy, OptionalInt window, int periods, double meanReturn, double volatility,
                      double sharpe, double cagr, double maxDrawdown, OptionalDouble meanTurnover,
                      OptionalDouble trackingError, OptionalDouble informationRatio,
                      OptionalDouble forecastVolatility, OptionalDouble bias) {
    public Summary {
        Objects.requireNonNull(strategy, "strategy");
        Objects.requireNonNull(window, "window");
        Objects.requireNonNull(meanTurnover, "meanTurnover");
        Objects.requireNonNull(trackingError, "trackingError");
        Objects.requireNonNull(informationRatio, "informationRatio");
        Objects.requireNonNull(forecastVolatility, "forecastVolatility");
        Objects.requireNonNull(bias, "bias");
        if (!(periods >= 1)) {
            throw new IllegalArgumentException("periods (" + periods + ") must be >= 1");
        }
    }
}
