package dev.sigmawalk.reports.files;

import dev.sigmawalk.reports.html.SectorGrid;
import java.nio.file.Path;
import java.util.List;

/**
 * Writes {@code sector_correlations.csv}: the cells of every sector x sector map of residual
 * correlation, the single index's and each factor model's, for every window (Method §8's sector
 * sums, averaged over the window's rebalances). The report's maps show the longest window's.
 */
public final class SectorCorrelationsFile {
    private SectorCorrelationsFile() {
    }

    /**
     * window,model,sector,other_sector,rebalances,mean_residual_corr: one row per cell, each pair
     * of sectors once ({@code sector} before or equal to {@code other_sector} in name order; equal
     * on the diagonal), grids in the order given, cells in name order. Header only when the study
     * gives no sectors.
     */
    public static void write(Path file, List<SectorGrid> grids) {
        try (CsvWriter csv = new CsvWriter(file, "window", "model", "sector", "other_sector", "rebalances",
                "mean_residual_corr")) {
            for (SectorGrid g : grids) {
                for (SectorGrid.Cell c : g.cells().values()) {
                    csv.integer(g.window()).text(g.model()).text(c.sector()).text(c.other()).integer(c.rebalances())
                            .number(c.mean()).end();
                }
            }
        }
    }
}
