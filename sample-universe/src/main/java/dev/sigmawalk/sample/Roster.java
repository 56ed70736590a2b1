package dev.sigmawalk.sample;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Draws the invented companies: ids, sectors, true alphas, betas, residual volatilities and
 * listing spans. Companies are dealt to the sectors in turn and listed sector by sector.
 */
final class Roster {
    /** Late listings start between these fractions of the span (years 3 to 10 of the demo). */
    private static final double LISTING_FROM = 0.12;
    private static final double LISTING_TO = 0.45;
    /** Delisted companies trade last between these fractions of the span. */
    private static final double DELISTING_FROM = 0.55;
    private static final double DELISTING_TO = 0.92;
    private static final double MIN_BETA = 0.3;
    private static final double MAX_BETA = 2.0;

    private Roster() {
    }

    static List<Company> draw(int companies, int rows, List<Sector> sectors, MarketParameters market,
                              SplitMix64 random) {
        int[] perSector = dealt(companies, sectors.size());
        int width = Math.max(2, Integer.toString(perSector[0]).length());
        List<Company> roster = new ArrayList<>(companies);
        for (int s = 0; s < sectors.size(); s++) {
            Sector sector = sectors.get(s);
            for (int k = 1; k <= perSector[s]; k++) {
                String id = sector.code() + String.format(Locale.ROOT, "%0" + width + "d", k);
                roster.add(drawCompany(id, sector, rows, market, random));
            }
        }
        return withListingEvents(roster, rows, market, random);
    }

    /** Companies per sector when dealt in turn: the first n mod S sectors get one more. */
    private static int[] dealt(int companies, int sectors) {
        int[] counts = new int[sectors];
        for (int s = 0; s < sectors; s++) {
            counts[s] = companies / sectors + (s < companies % sectors ? 1 : 0);
        }
        return counts;
    }

    private static Company drawCompany(String id, Sector sector, int rows, MarketParameters market,
                                       SplitMix64 random) {
        double beta = sector.betaCentre() + market.betaSpread() * (2 * random.nextDouble() - 1);
        beta = Math.max(MIN_BETA, Math.min(MAX_BETA, beta));
        double residual = market.minResidualVolatility()
                + (market.maxResidualVolatility() - market.minResidualVolatility()) * random.nextDouble();
        double alpha = market.alphaSpread() * random.nextGaussian();
        return new Company(id, sector, alpha, beta, residual, 0, rows - 1);
    }

    /**
     * Picks disjoint sets of late listings and delistings by a partial Fisher-Yates shuffle; at
     * least one of each, whatever the size.
     */
    private static List<Company> withListingEvents(List<Company> roster, int rows, MarketParameters market,
                                                   SplitMix64 random) {
        int n = roster.size();
        int late = Math.max(1, (int) Math.round(n * market.lateListingShare()));
        int gone = Math.max(1, (int) Math.round(n * market.delistingShare()));
        int[] order = new int[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        for (int i = 0; i < late + gone; i++) {
            int j = random.nextInt(i, n - 1);
            int swap = order[i];
            order[i] = order[j];
            order[j] = swap;
        }
        List<Company> result = new ArrayList<>(roster);
        for (int i = 0; i < late + gone; i++) {
            Company c = result.get(order[i]);
            Company changed = i < late
                    ? withRows(c, random.nextInt(row(LISTING_FROM, rows), row(LISTING_TO, rows)), c.lastRow())
                    : withRows(c, c.firstRow(), random.nextInt(row(DELISTING_FROM, rows), row(DELISTING_TO, rows)));
            result.set(order[i], changed);
        }
        return List.copyOf(result);
    }

    private static int row(double fraction, int rows) {
        return (int) Math.floor(fraction * rows);
    }

    private static Company withRows(Company c, int firstRow, int lastRow) {
        return new Company(c.id(), c.sector(), c.alpha(), c.beta(), c.residualVolatility(), firstRow, lastRow);
    }
}
