package dev.sigmawalk.sample;

import java.util.List;
import java.util.Objects;

/**
 * The invented economics of the Brennmark market, all annual figures in decimal. A day's value
 * is the annual figure divided by {@link #daysPerYear} (means) or by its square root
 * (volatilities).
 *
 * @param daysPerYear rows per year; 261 because the exchange trades every weekday
 * @param marketPremium mean of the market factor's excess return
 * @param marketVolatility volatility of the market factor in calm times
 * @param indexNoiseVolatility volatility of the gap between the published index and the factor
 * @param betaSpread half-width of the uniform range of betas around a sector's centre
 * @param minResidualVolatility lower end of the uniform range of residual volatilities (calm)
 * @param maxResidualVolatility upper end of that range
 * @param alphaSpread standard deviation of the companies' true alphas
 * @param lateListingShare share of companies that list after the first day
 * @param delistingShare share of companies that stop trading before the last day
 * @param shocks how standardised shocks are drawn
 * @param rates the short-rate path
 * @param stresses the high-volatility stretches
 */
record MarketParameters(double daysPerYear, double marketPremium, double marketVolatility,
                        double indexNoiseVolatility, double betaSpread, double minResidualVolatility,
                        double maxResidualVolatility, double alphaSpread, double lateListingShare,
                        double delistingShare, ShockDraws shocks, RateParameters rates,
                        List<StressShape> stresses) {

    static MarketParameters brennmark() {
        return new MarketParameters(261, 0.05, 0.15, 0.01, 0.25, 0.15, 0.40, 0.01, 0.08, 0.06,
                new ShockDraws(0.05, 3.0, 8.0),
                new RateParameters(0.030, 0.030, 750, 0.0003),
                List.of(new StressShape(0.40, 0.47, 2.6, 1.8), new StressShape(0.70, 0.72, 1.8, 1.4)));
    }

    MarketParameters {
        Objects.requireNonNull(shocks, "shocks");
        Objects.requireNonNull(rates, "rates");
        stresses = List.copyOf(stresses);
        requireIn("days per year", daysPerYear, 1, 400);
        requireIn("market premium", marketPremium, -0.5, 0.5);
        requireIn("market volatility", marketVolatility, 0.01, 1);
        requireIn("index noise volatility", indexNoiseVolatility, 0, 0.2);
        requireIn("beta spread", betaSpread, 0, 1);
        requireIn("min residual volatility", minResidualVolatility, 0.01, 1);
        requireIn("max residual volatility", maxResidualVolatility, minResidualVolatility, 1);
        requireIn("alpha spread", alphaSpread, 0, 0.1);
        requireIn("late listing share", lateListingShare, 0, 0.4);
        requireIn("delisting share", delistingShare, 0, 0.4);
    }

    private static void requireIn(String role, double value, double lo, double hi) {
        if (!(value >= lo && value <= hi)) {
            throw new IllegalArgumentException(role + " (" + value + ") must be in [" + lo + ", " + hi + "]");
        }
    }

    /**
     * The annual short rate follows a discretised Ornstein-Uhlenbeck process, one step a day:
     * R ← max(0, R + (θ - R)/τ + s·z) with z standard normal; its long-run standard deviation is
     * about s·√(τ/2) (0.58 % for the values used). A day's simple rate is (1 + R)^(1/days) - 1.
     *
     * @param initial R on the first day
     * @param longRun θ
     * @param reversionDays τ, the mean-reversion time in days
     * @param dailyStep s, the standard deviation of a day's change in R
     */
    record RateParameters(double initial, double longRun, double reversionDays, double dailyStep) {
        RateParameters {
            requireIn("initial rate", initial, 0, 0.2);
            requireIn("long-run rate", longRun, 0, 0.2);
            requireIn("rate reversion days", reversionDays, 1, 100_000);
            requireIn("rate daily step", dailyStep, 0, 0.01);
        }
    }

    /**
     * A high-volatility stretch placed by its position in the span: from the month holding row
     * ⌊startFraction·N⌋ to the month holding row ⌊endFraction·N⌋ (whole calendar months).
     *
     * @param startFraction in [0, 1)
     * @param endFraction in (startFraction, 1]
     * @param marketMultiplier factor on the market volatility inside the stretch, ≥ 1
     * @param residualMultiplier factor on every residual volatility inside the stretch, ≥ 1
     */
    record StressShape(double startFraction, double endFraction, double marketMultiplier,
                       double residualMultiplier) {
        StressShape {
            requireIn("stress start fraction", startFraction, 0, 0.999);
            requireIn("stress end fraction", endFraction, startFraction, 1);
            requireIn("stress market multiplier", marketMultiplier, 1, 5);
            requireIn("stress residual multiplier", residualMultiplier, 1, 5);
        }
    }
}
