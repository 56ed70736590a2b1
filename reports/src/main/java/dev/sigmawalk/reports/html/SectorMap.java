package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.evidence.SectorCoMovement;
import dev.sigmawalk.engine.evidence.SectorCorrelation;
import dev.sigmawalk.engine.evidence.SectorPairMean;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * The sector x sector map of single-index residual correlation for the longest window: each cell
 * the mean correlation of the residuals of one sector's assets with another's (the diagonal:
 * within the sector), averaged over every rebalance where both sectors had assets. A sector
 * factor the single index misses shows as a warm diagonal cell; warm cells off the diagonal show
 * sectors that move together. Cells are shaded warm for positive and cool for negative means.
 */
final class SectorMap {
    private static final int[] PAPER = {0xF7, 0xF8, 0xF9};
    /** Darkest warm and cool shades; both keep the report's ink above 4.5:1 contrast (WCAG 2.1, 1.4.3). */
    private static final int[] WARM = {0xE0, 0xA4, 0x58};
    private static final int[] COOL = {0x8F, 0xB3, 0xD9};
    /** The shade reaches its darkest at this absolute mean correlation or above. */
    private static final double FULL_SHADE = 0.3;

    private SectorMap() {
    }

    /** The map of the longest window with sector information, or empty when sectors were not given. */
    static Optional<ReportView.Matrix> of(ReportData data) {
        Optional<WindowDiagnostics> longest = data.evidence().diagnostics().stream()
                .filter(w -> w.points().stream().anyMatch(p -> p.sectors().isPresent()))
                .max((a, b) -> Integer.compare(a.window(), b.window()));
        if (longest.isEmpty()) {
            return Optional.empty();
        }
        Map<String, Mean> cells = new TreeMap<>();
        TreeSet<String> sectors = new TreeSet<>();
        for (DiagnosticsPoint p : longest.get().points()) {
            if (p.sectors().isEmpty()) {
                continue;
            }
            SectorCoMovement s = p.sectors().get();
            for (SectorCorrelation c : s.withinSectors()) {
                sectors.add(c.sector());
                add(cells, key(c.sector(), c.sector()), c.meanCorrelation());
            }
            for (SectorPairMean c : s.betweenSectors()) {
                sectors.add(c.first());
                sectors.add(c.second());
                add(cells, key(c.first(), c.second()), c.meanCorrelation());
            }
        }
        List<String> names = new ArrayList<>(sectors);
        List<ReportView.MatrixRow> rows = new ArrayList<>();
        for (String a : names) {
            List<ReportView.MatrixCell> row = new ArrayList<>();
            for (String b : names) {
                Mean sum = cells.get(a.compareTo(b) <= 0 ? key(a, b) : key(b, a));
                if (sum == null) {
                    row.add(new ReportView.MatrixCell(Formats.NOT_APPLICABLE, "", "", a.equals(b)
                            ? a + " never had two assets in one window" : a + " and " + b + " never shared a window"));
                } else {
                    double mean = sum.total / sum.count;
                    row.add(new ReportView.MatrixCell(Formats.ratio(mean), "", shade(mean), (a.equals(b) ? "within " + a
                            : a + " with " + b) + ": mean residual correlation " + Formats.ratio(mean)));
                }
            }
            rows.add(new ReportView.MatrixRow(a, "", false, row));
        }
        return Optional.of(new ReportView.Matrix("sector-map", "Mean residual correlation after the market, by sector ("
                + longest.get().window() + "-period window, averaged over its rebalances)", names, rows));
    }

    private static String key(String a, String b) {
        return a + "\u0000" + b;
    }

    /** A running mean of one cell over the rebalances. */
    private static final class Mean {
        private double total;
        private int count;
    }

    private static void add(Map<String, Mean> cells, String key, double value) {
        Mean m = cells.computeIfAbsent(key, k -> new Mean());
        m.total += value;
        m.count++;
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
