package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.evidence.SectorCoMovement;
import dev.sigmawalk.engine.evidence.SectorCorrelation;
import dev.sigmawalk.engine.evidence.SectorPairMean;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * The sector x sector map of one residual model's correlations for one window length: each cell
 * the mean, over the rebalances where the cell exists, of the mean correlation of the residuals
 * of one sector's assets with another's (the diagonal: within one sector). The cells are those of
 * {@code sector_correlations.csv} and of the report's heat maps.
 *
 * @param model {@code single-index}, or a factor model's name as {@code factor_diagnostics.csv} spells it
 * @param window the window length
 * @param sectors every sector that appears in a cell, in name order
 * @param cells by the two sectors in name order
 */
public record SectorGrid(String model, int window, List<String> sectors, Map<List<String>, Cell> cells) {
    /** The model name of the single-index residuals. */
    public static final String SINGLE_INDEX = "single-index";

    /**
     * One cell.
     *
     * @param sector the first sector in name order
     * @param other the second (the same as {@code sector} on the diagonal)
     * @param rebalances the rebalances the mean is taken over, >= 1
     * @param mean the mean over them of the cell's mean residual correlation, in [-1, 1]
     */
    public record Cell(String sector, String other, int rebalances, double mean) {
        public Cell {
            Objects.requireNonNull(sector, "sector");
            Objects.requireNonNull(other, "other");
            if (!(sector.compareTo(other) <= 0)) {
                throw new IllegalArgumentException("sectors '" + sector + "' and '" + other + "' must be in name order");
            }
            if (!(rebalances >= 1) || !(mean >= -1 && mean <= 1)) {
                throw new IllegalArgumentException("cell " + sector + " x " + other + ": rebalances (" + rebalances
                        + ") must be >= 1 and the mean (" + mean + ") in [-1, 1]");
            }
        }
    }

    public SectorGrid {
        Objects.requireNonNull(model, "model");
        sectors = List.copyOf(sectors);
        Map<List<String>, Cell> sorted = new TreeMap<>(SectorGrid::byNames);
        sorted.putAll(cells);
        cells = Collections.unmodifiableMap(sorted);
    }

    /** The grid of the rebalances {@code points} of one window; empty when none carries a cell. */
    static Optional<SectorGrid> of(String model, int window, List<SectorCoMovement> points) {
        Map<List<String>, double[]> sums = new TreeMap<>(SectorGrid::byNames);
        TreeSet<String> names = new TreeSet<>();
        for (SectorCoMovement p : points) {
            for (SectorCorrelation c : p.withinSectors()) {
                add(sums, names, c.sector(), c.sector(), c.meanCorrelation());
            }
            for (SectorPairMean c : p.betweenSectors()) {
                add(sums, names, c.first(), c.second(), c.meanCorrelation());
            }
        }
        if (sums.isEmpty()) {
            return Optional.empty();
        }
        Map<List<String>, Cell> cells = new TreeMap<>(SectorGrid::byNames);
        // A mean of values in [-1, 1] can leave it by one rounding step.
        sums.forEach((k, s) -> cells.put(k, new Cell(k.get(0), k.get(1), (int) s[1],
                Math.max(-1.0, Math.min(1.0, s[0] / s[1])))));
        return Optional.of(new SectorGrid(model, window, new ArrayList<>(names), cells));
    }

    /** The cell of two sectors in either order. */
    public Optional<Cell> cell(String a, String b) {
        return Optional.ofNullable(a.compareTo(b) <= 0 ? cells.get(List.of(a, b)) : cells.get(List.of(b, a)));
    }

    private static void add(Map<List<String>, double[]> sums, TreeSet<String> names, String a, String b, double value) {
        names.add(a);
        names.add(b);
        double[] s = sums.computeIfAbsent(List.of(a, b), k -> new double[2]);
        s[0] += value;
        s[1]++;
    }

    private static int byNames(List<String> x, List<String> y) {
        int c = x.get(0).compareTo(y.get(0));
        return c != 0 ? c : x.get(1).compareTo(y.get(1));
    }
}
