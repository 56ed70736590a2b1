package dev.sigmawalk.engine.evidence;

import java.util.Objects;

/**
 * Mean residual correlation over the pairs of assets inside one sector.
 *
 * @param sector sector name
 * @param assets assets of the window in this sector, >= 2
 * @param pairs assets(assets-1)/2
 * @param meanCorrelation mean signed ρ over those pairs, in [-1, 1]
 */
public record SectorCorrelation(String sector, int assets, int pairs, double meanCorrelation) {
    public SectorCorrelation {
        Objects.requireNonNull(sector, "sector");
        if (!(assets >= 2) || pairs != assets * (assets - 1) / 2) {
            throw new IllegalArgumentException("sector '" + sector + "': assets (" + assets + ") must be >= 2 and pairs ("
                    + pairs + ") = assets(assets-1)/2");
        }
        if (!(meanCorrelation >= -1 && meanCorrelation <= 1)) {
            throw new IllegalArgumentException("sector '" + sector + "': mean correlation (" + meanCorrelation
                    + ") must be in [-1, 1]");
        }
    }
}
