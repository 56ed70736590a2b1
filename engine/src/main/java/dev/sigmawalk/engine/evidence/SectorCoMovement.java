package dev.sigmawalk.engine.evidence;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.OptionalDouble;
import java.util.TreeMap;

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
     * Groups a window's residual correlations.
     *
     * @param sectorOf sector of every asset of the window; an asset without one is an error
     */
    static SectorCoMovement of(ResidualCorrelations rho, Map<String, String> sectorOf) {
        List<String> assets = rho.assets();
        int n = assets.size();
        String[] sector = new String[n];
        Map<String, Integer> members = new TreeMap<>();
        for (int i = 0; i < n; i++) {
            String s = sectorOf.get(assets.get(i));
            if (s == null) {
                throw new IllegalArgumentException("asset '" + assets.get(i) + "' has no sector in the sector map");
            }
            sector[i] = s;
            members.merge(s, 1, Integer::sum);
        }
        List<String> names = new ArrayList<>(members.keySet());
        int k = names.size();
        int[] index = new int[n];
        for (int i = 0; i < n; i++) {
            index[i] = java.util.Collections.binarySearch(names, sector[i]);
        }
        Map<String, Double> withinSum = new TreeMap<>();
        double[] betweenSum = new double[k * k];
        int[] betweenCount = new int[k * k];
        double acrossSum = 0;
        int across = 0;
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                double r = rho.correlation(i, j);
                if (sector[i].equals(sector[j])) {
                    withinSum.merge(sector[i], r, Double::sum);
                } else {
                    acrossSum += r;
                    across++;
                    int cell = Math.min(index[i], index[j]) * k + Math.max(index[i], index[j]);
                    betweenSum[cell] += r;
                    betweenCount[cell]++;
                }
            }
        }
        List<SectorPairMean> between = new ArrayList<>();
        for (int a = 0; a < k; a++) {
            for (int b = a + 1; b < k; b++) {
                int cell = a * k + b;
                if (betweenCount[cell] > 0) {
                    between.add(new SectorPairMean(names.get(a), names.get(b), betweenCount[cell],
                            clamp(betweenSum[cell] / betweenCount[cell])));
                }
            }
        }
        List<SectorCorrelation> within = new ArrayList<>();
        for (Map.Entry<String, Double> e : withinSum.entrySet()) {
            int m = members.get(e.getKey());
            int pairs = m * (m - 1) / 2;
            within.add(new SectorCorrelation(e.getKey(), m, pairs, clamp(e.getValue() / pairs)));
        }
        OptionalDouble acrossMean = across == 0 ? OptionalDouble.empty() : OptionalDouble.of(clamp(acrossSum / across));
        return new SectorCoMovement(within, across, acrossMean, between);
    }

    /** A mean of values in [-1, 1] can leave it by one rounding step. */
    private static double clamp(double r) {
        return Math.max(-1.0, Math.min(1.0, r));
    }
}
