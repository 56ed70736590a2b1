package dev.sigmawalk.sample;

/**
 * The invented short rate, stepped one day at a time (see {@link MarketParameters.RateParameters}
 * for the process). Mutable: one instance belongs to one generator run.
 */
final class RatePath {
    private final MarketParameters.RateParameters rates;
    private final double daysPerYear;
    private final SplitMix64 random;
    private double annual;

    RatePath(MarketParameters.RateParameters rates, double daysPerYear, SplitMix64 random) {
        this.rates = rates;
        this.daysPerYear = daysPerYear;
        this.random = random;
        this.annual = rates.initial();
    }

    /** Today's simple rate for one day, (1 + R)^(1/days) - 1; then R moves to tomorrow's value. */
    double nextDailyRate() {
        double today = StrictMath.pow(1 + annual, 1 / daysPerYear) - 1;
        double pull = (rates.longRun() - annual) / rates.reversionDays();
        annual = Math.max(0, annual + pull + rates.dailyStep() * random.nextGaussian());
        return today;
    }
}
