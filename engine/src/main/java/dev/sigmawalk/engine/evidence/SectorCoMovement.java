package dev.sigmawalk.engine.evidence;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.OptionalDouble;

/**
 * Residual correlations grouped by sector: the mean over pairs inside each sector, and the mean
 * over pairs whose assets sit in different sectors. If the single index leaves a sector factor
 * out, that sector's within-mean stands clearly above the across-mean.
 *
 * <p>The pair-count-weighted average of all within-means and the across-mean is the mean ρ over
 * all pairs.
 *
 * @param withinSectors one entry per sector holding >= 2 of the window's assets, by sector name
 * @param acrossPairs pairs whose two assets are in different sectors
 * @param acrossMean their mean ρ; empty when every asset is in one sector
 * @param betweenSectors the across-sector pairs split by the two sectors: one entry per pair of
 *        distinct sectors that both hold assets of the window, in name order (the off-diagonal
 *        cells of a sector x sector map whose diagonal is {@code withinSectors})
 */
public record SectorCoMovement(List<SectorCorrelation> withinSectors, int acrossPairs, OptionalDouble acrossMean,
                               List<SectorPairMean> betweenSectors) {
    public SectorCoMovement {
        withinSectors = List.copyOf(withinSectors);
        betweenSectors = List.copyOf(betweenSectors);
        Objects.requireNonNull(acrossMean, "acrossMean");
        if (!(acrossPairs >= 0) || (acrossPairs == 0) != acrossMean.isEmpty()) {
            throw new IllegalArgumentException("across-sector pairs (" + acrossPairs
                    + ") must be >= 0, with a mean exactly when > 0");
        }
    }

    /**
     * Groups a window's residual correlations pair by pair.
     *
     * @param sectorOf sector of every asset of the window; an asset without one is an error
     */
    static SectorCoMovement of(ResidualCorrelations rho, Map<String, String> sectorOf) {
        SectorIndex index = SectorIndex.of(rho.assets(), sectorOf);
        int n = rho.assetCount();
        int k = index.sectors();
        double[] cells = new double[k * k];
        for (int i = 0; i < n; i++) {
            int g = index.of(i);
            for (int j = i + 1; j < n; j++) {
                int h = index.of(j);
                cells[Math.min(g, h) * k + Math.max(g, h)] += rho.correlation(i, j);
            }
        }
        return fromCells(index, cells);
    }

    /**
     * The means from the sums of ρ over each cell's pairs.
     *
     * @param cells s×s row-major, upper triangle read: cell (g, g) the sum over pairs i &lt; j inside
     *        sector g, cell (g, h), g &lt; h, the sum over pairs with one asset in each
     */
    static SectorCoMovement fromCells(SectorIndex index, double[] cells) {
        int k = index.sectors();
        List<SectorCorrelation> within = new ArrayList<>();
        List<SectorPairMean> between = new ArrayList<>();
        double acrossSum = 0;
        int across = 0;
        for (int g = 0; g < k; g++) {
            int m = index.members(g);
            if (m >= 2) {
                int pairs = m * (m - 1) / 2;
                within.add(new SectorCorrelation(index.name(g), m, pairs, clamp(cells[g * k + g] / pairs)));
            }
            for (int h = g + 1; h < k; h++) {
                int pairs = m * index.members(h);
                double sum = cells[g * k + h];
                acrossSum += sum;
                across += pairs;
                between.add(new SectorPairMean(index.name(g), index.name(h), pairs, clamp(sum / pairs)));
            }
        }
        OptionalDouble acrossMean = across == 0 ? OptionalDouble.empty() : OptionalDouble.of(clamp(acrossSum / across));
        return new SectorCoMovement(within, across, acrossMean, between);
    }

    /** A mean of values in [-1, 1] can leave it by one rounding step. */
    private static double clamp(double r) {
        return Math.max(-1.0, Math.min(1.0, r));
    }
}
