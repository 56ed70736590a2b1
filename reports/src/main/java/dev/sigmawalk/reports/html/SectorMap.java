package dev.sigmawalk.reports.html;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * The sector x sector maps of residual correlation for the longest window: the single index's
 * first, then one per factor model whose residuals were grouped by sector, all of the same
 * sectors and on one colour scale, so that a sector factor the single index misses shows as a
 * warm diagonal cell that fades on the map of a model that takes it up. Warm cells off the
 * diagonal show sectors that move together; cells are shaded warm for positive and cool for
 * negative means.
 */
final class SectorMap {
    private static final int[] PAPER = {0xF7, 0xF8, 0xF9};
    /** Darkest warm and cool shades; both keep the report's ink above 4.5:1 contrast (WCAG 2.1, 1.4.3). */
    private static final int[] WARM = {0xE0, 0xA4, 0x58};
    private static final int[] COOL = {0x8F, 0xB3, 0xD9};
    /** The shade reaches its darkest at this absolute mean correlation or above. */
    static final double FULL_SHADE = 0.3;
    /** The values the colour key shows. */
    private static final double[] KEY = {-FULL_SHADE, -FULL_SHADE / 2, 0, FULL_SHADE / 2, FULL_SHADE};

    private SectorMap() {
    }

    /** The maps of the longest window with a single-index map, or empty when sectors were not given. */
    static Optional<ReportView.SectorMaps> of(ReportData data) {
        List<SectorGrid> shown = SectorGrids.shown(SectorGrids.of(data.evidence().diagnostics(),
                data.evidence().factorDiagnostics()));
        if (shown.isEmpty()) {
            return Optional.empty();
        }
        List<String> names = shown.get(0).sectors();
        List<ReportView.Matrix> maps = new ArrayList<>();
        for (SectorGrid g : shown) {
            maps.add(matrix(g, names));
        }
        List<ReportView.ScaleStep> key = new ArrayList<>();
        for (double v : KEY) {
            key.add(new ReportView.ScaleStep((v > 0 ? "+" : "") + Formats.ratio(v) + (Math.abs(v) == FULL_SHADE
                    ? (v > 0 ? " or more" : " or less") : ""), shade(v)));
        }
        return Optional.of(new ReportView.SectorMaps(maps.size() > 1, maps, key));
    }

    /** One map on the sectors of the single index's map (a factor model sees the same assets' sectors). */
    private static ReportView.Matrix matrix(SectorGrid g, List<String> names) {
        List<ReportView.MatrixRow> rows = new ArrayList<>();
        for (String a : names) {
            List<ReportView.MatrixCell> row = new ArrayList<>();
            for (String b : names) {
                Optional<SectorGrid.Cell> cell = g.cell(a, b);
                if (cell.isEmpty()) {
                    row.add(new ReportView.MatrixCell(Formats.NOT_APPLICABLE, "", "", a.equals(b)
                            ? a + " never had two assets in one window" : a + " and " + b + " never shared a window"));
                } else {
                    double mean = cell.get().mean();
                    row.add(new ReportView.MatrixCell(Formats.ratio(mean), "", shade(mean), (a.equals(b) ? "within " + a
                            : a + " with " + b) + ": mean residual correlation " + Formats.ratio(mean) + " ("
                            + residualsOf(g.model()) + ")"));
                }
            }
            rows.add(new ReportView.MatrixRow(a, "", false, row));
        }
        return new ReportView.Matrix(id(g.model()), "Mean residual correlation " + after(g.model()) + ", by sector ("
                + g.window() + "-period window, averaged over its rebalances)", names, rows);
    }

    private static String id(String model) {
        return model.equals(SectorGrid.SINGLE_INDEX) ? "sector-map"
                : "sector-map-" + model.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-");
    }

    private static String after(String model) {
        if (model.equals(SectorGrid.SINGLE_INDEX)) {
            return "after the market (single index)";
        }
        if (model.equals("multi-index:sectors")) {
            return "after the market and the sector indices (" + model + ")";
        }
        return "after the factors of " + model;
    }

    private static String residualsOf(String model) {
        return model.equals(SectorGrid.SINGLE_INDEX) ? "single-index residuals" : model + " residuals";
    }

    /** Warm for positive, cool for negative, paper at 0; as CSS hex. */
    static String shade(double mean) {
        double t = Math.min(1, Math.abs(mean) / FULL_SHADE);
        int[] end = mean >= 0 ? WARM : COOL;
        int[] rgb = new int[3];
        for (int k = 0; k < 3; k++) {
            rgb[k] = (int) Math.round(PAPER[k] + t * (end[k] - PAPER[k]));
        }
        return String.format(Locale.ROOT, "#%02x%02x%02x", rgb[0], rgb[1], rgb[2]);
    }
}
