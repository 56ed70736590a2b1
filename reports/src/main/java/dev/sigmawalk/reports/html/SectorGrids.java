package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.evidence.SectorCoMovement;
import dev.sigmawalk.strategies.risk.FactorDiagnostics;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Every sector x sector map a run gives: for each window length in study order, the single-index
 * residuals' map, then one per factor model (in the order the diagnostics name them) whose
 * residuals were grouped by sector.
 */
public final class SectorGrids {
    private SectorGrids() {
    }

    /**
     * @param singleIndex the single-index checks per window, in study order of windows
     * @param factors per window length, every rebalance's factor-model diagnostics
     */
    public static List<SectorGrid> of(List<WindowDiagnostics> singleIndex, Map<Integer, List<FactorDiagnostics>> factors) {
        List<SectorGrid> out = new ArrayList<>();
        for (WindowDiagnostics w : singleIndex) {
            List<SectorCoMovement> points = w.points().stream().flatMap(p -> p.sectors().stream()).toList();
            SectorGrid.of(SectorGrid.SINGLE_INDEX, w.window(), points).ifPresent(out::add);
            Map<String, List<SectorCoMovement>> byModel = new LinkedHashMap<>();
            for (FactorDiagnostics d : factors.getOrDefault(w.window(), List.of())) {
                List<SectorCoMovement> list = byModel.computeIfAbsent(d.model(), m -> new ArrayList<>());
                d.sectors().ifPresent(list::add);
            }
            byModel.forEach((model, list) -> SectorGrid.of(model, w.window(), list).ifPresent(out::add));
        }
        return out;
    }

    /** The grids the report shows: those of the longest window with a single-index map, single index first. */
    static List<SectorGrid> shown(List<SectorGrid> all) {
        Optional<Integer> longest = all.stream().filter(g -> g.model().equals(SectorGrid.SINGLE_INDEX))
                .map(SectorGrid::window).max(Integer::compare);
        return longest.map(w -> all.stream().filter(g -> g.window() == w).toList()).orElse(List.of());
    }
}
