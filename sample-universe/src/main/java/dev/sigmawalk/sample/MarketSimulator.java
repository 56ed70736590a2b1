package dev.sigmawalk.sample;

import java.time.LocalDate;
import java.util.List;

/**
 * Simulates one day of the invented market: a single-index model with sector shocks.
 *
 * <p>With daily figures (annual means divided by D = days per year, volatilities by √D), stress
 * multipliers k_m and k_e of the day, and standardised shocks z (see {@link ShockDraws}):
 * <pre>
 *   market factor   F   = μ_m + k_m σ_m z_m                   (excess return)
 *   published index r_m = rf + F + σ_η z_η                    (z_η standard normal)
 *   company i       r_i = rf + α_i + β_i F + k_e σ_i (√ρ_s z_s + √(1 - ρ_s) z_i)
 * </pre>
 * where s is the company's sector and ρ_s its shared residual share, so two residuals in one
 * sector have correlation ρ_s and residuals across sectors are independent. The index is a
 * series of its own (factor plus noise), not a mean of these companies. Every company's shock is
 * drawn every day, listed or not, so listing spans never shift other numbers.
 */
final class MarketSimulator {
    private final List<Company> companies;
    private final MarketParameters market;
    private final VolatilityRegimes regimes;
    private final RatePath rate;
    private final SplitMix64 marketRandom;
    private final SplitMix64 sectorRandom;
    private final SplitMix64 residualRandom;
    private final double[] sectorShocks;
    private final int[] sectorOf;

    MarketSimulator(List<Company> companies, List<Sector> sectors, MarketParameters market,
                    VolatilityRegimes regimes, long seed) {
        this.companies = List.copyOf(companies);
        this.market = market;
        this.regimes = regimes;
        this.rate = new RatePath(market.rates(), market.daysPerYear(), SplitMix64.stream(seed, Streams.RATE));
        this.marketRandom = SplitMix64.stream(seed, Streams.MARKET);
        this.sectorRandom = SplitMix64.stream(seed, Streams.SECTORS);
        this.residualRandom = SplitMix64.stream(seed, Streams.RESIDUALS);
        this.sectorShocks = new double[sectors.size()];
        this.sectorOf = new int[companies.size()];
        for (int i = 0; i < sectorOf.length; i++) {
            sectorOf[i] = sectors.indexOf(companies.get(i).sector());
        }
    }

    /**
     * Fills {@code out} with row {@code row}, dated {@code date}.
     *
     * @throws IllegalStateException if a return came out at or below -100 % (the clipping of the
     *     shocks rules this out for the built-in parameters; the check keeps it a guarantee)
     */
    void step(int row, LocalDate date, DayValues out) {
        double days = market.daysPerYear();
        double rootDays = StrictMath.sqrt(days);
        double rf = rate.nextDailyRate();
        double factor = market.marketPremium() / days
                + regimes.marketMultiplier(date) * market.marketVolatility() / rootDays
                * market.shocks().next(marketRandom);
        double index = rf + factor + market.indexNoiseVolatility() / rootDays * marketRandom.nextGaussian();
        out.set(date, rf, requireAboveMinusOne(index, "index", date));
        for (int s = 0; s < sectorShocks.length; s++) {
            sectorShocks[s] = market.shocks().next(sectorRandom);
        }
        double residualScale = regimes.residualMultiplier(date) / rootDays;
        for (int i = 0; i < companies.size(); i++) {
            Company c = companies.get(i);
            double rho = c.sector().sharedResidualShare();
            double shock = StrictMath.sqrt(rho) * sectorShocks[sectorOf[i]]
                    + StrictMath.sqrt(1 - rho) * market.shocks().next(residualRandom);
            double r = rf + c.alpha() / days + c.beta() * factor + residualScale * c.residualVolatility() * shock;
            out.setAsset(i, c.tradesOn(row) ? requireAboveMinusOne(r, c.id(), date) : Double.NaN);
        }
    }

    private static double requireAboveMinusOne(double r, String who, LocalDate date) {
        if (!(r > -1)) {
            throw new IllegalStateException(who + " on " + date + ": simulated return " + r + " is not > -1");
        }
        return r;
    }

    /** Stream numbers: one independent random stream per purpose. */
    static final class Streams {
        static final int ROSTER = 0;
        static final int RATE = 1;
        static final int MARKET = 2;
        static final int SECTORS = 3;
        static final int RESIDUALS = 4;

        private Streams() {
        }
    }
}
