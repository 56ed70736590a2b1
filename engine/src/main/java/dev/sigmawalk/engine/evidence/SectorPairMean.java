package dev.sigmawalk.engine.evidence;

import java.util.Objects;

/**
 * Mean residual correlation over the pairs of assets with one asset in each of two different
 * sectors: one off-diagonal cell of the sector x sector map.
 *
 * @param first sector name, before {@code second} in name order
 * @param second the other sector
 * @param pairs asset pairs across the two sectors, >= 1
 * @param meanCorrelation mean signed ρ over those pairs, in [-1, 1]
 */
public record SectorPairMean(String first, String second, int pairs, double meanCorrelation) {
    public SectorPairMean {
        Objects.requireNonNull(first, "first");
        Objects.requireNonNull(second, "second");
        if (!(first.compareTo(second) < 0)) {
            throw new IllegalArgumentException("sectors '" + first + "' and '" + second + "' must be distinct, in name order");
        }
        if (!(pairs >= 1)) {
            throw new IllegalArgumentException("sectors '" + first + "' and '" + second + "': pairs (" + pairs + ") must be >= 1");
        }
        if (!(meanCorrelation >= -1 && meanCorrelation <= 1)) {
            throw new IllegalArgumentException("sectors '" + first + "' and '" + second + "': mean correlation ("
                    + meanCorrelation + ") must be in [-1, 1]");
        }
    }
}
