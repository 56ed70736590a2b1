package dev.sigmawalk.engine.data;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * Where one asset has returns in the loaded panel, for {@code sigmawalk check}.
 *
 * @param asset the asset id
 * @param first the first date with a return
 * @param last the last date with a return
 * @param present rows with a return
 * @param missing rows of the panel without a return (before, inside and after its span)
 * @param gaps rows without a return strictly between {@code first} and {@code last}
 */
public record AssetCoverage(String asset, LocalDate first, LocalDate last, int present, int missing, int gaps) {
    public AssetCoverage {
        Objects.requireNonNull(asset, "asset");
        Objects.requireNonNull(first, "first");
        Objects.requireNonNull(last, "last");
        if (last.isBefore(first)) {
            throw new IllegalArgumentException("coverage of '" + asset + "': last (" + last + ") before first (" + first + ")");
        }
        if (!(present >= 1 && missing >= 0 && gaps >= 0 && gaps <= missing)) {
            throw new IllegalArgumentException("coverage of '" + asset + "': present (" + present + ") must be >= 1 and 0 <= gaps ("
                    + gaps + ") <= missing (" + missing + ")");
        }
    }

    /** Whether any panel row lacks a return for this asset. */
    public boolean hasMissingRows() {
        return missing > 0;
    }

    /** Coverage of every asset column of {@code panel}; assets with no return at all are skipped. */
    public static List<AssetCoverage> of(ReturnPanel panel) {
        return of(panel, PanelStats.of(panel, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY));
    }

    /** Coverage from counts already gathered over {@code panel}. */
    static List<AssetCoverage> of(ReturnPanel panel, PanelStats stats) {
        int n = panel.assetCount();
        List<AssetCoverage> out = new ArrayList<>(n);
        for (int j = 0; j < n; j++) {
            int present = stats.present[j];
            if (present > 0) {
                int gaps = (stats.last[j] - stats.first[j] + 1) - present;
                out.add(new AssetCoverage(panel.assets().get(j), panel.date(stats.first[j]), panel.date(stats.last[j]),
                        present, panel.rows() - present, gaps));
            }
        }
        return List.copyOf(out);
    }
}
