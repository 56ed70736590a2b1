package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.evidence.SectorCoMovement;
import dev.sigmawalk.engine.evidence.SectorCorrelation;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.TreeMap;

/**
 * Which sectors' residuals move together, averaged over every rebalance of one window: for each
 * sector the mean (over rebalances) of its mean within-sector residual correlation, and the same
 * for pairs across sectors. A sector whose average reaches {@value #CO_MOVING} is read as
 * co-moving: a rule of thumb of ours (common practice has no fixed cut-off), well above the
 * sampling noise of an average over many pairs and dates.
 */
final class SectorReading {
    /** Average within-sector residual correlation read as co-movement. */
    static final double CO_MOVING = 0.10;

    /** One sector's average. */
    record Sector(String name, int assets, double meanCorrelation) {
    }

    private final List<Sector> sectors;
    private final OptionalDouble across;

    private SectorReading(List<Sector> sectors, OptionalDouble across) {
        this.sectors = sectors;
        this.across = across;
    }

    /** The reading of a window's rebalances that carry sector information. */
    static SectorReading of(WindowDiagnostics window) {
        Map<String, double[]> sums = new TreeMap<>();
        double acrossSum = 0;
        int acrossCount = 0;
        for (DiagnosticsPoint p : window.points()) {
            if (p.sectors().isEmpty()) {
                continue;
            }
            SectorCoMovement s = p.sectors().get();
            for (SectorCorrelation c : s.withinSectors()) {
                double[] acc = sums.computeIfAbsent(c.sector(), k -> new double[3]);
                acc[0] += c.meanCorrelation();
                acc[1] += 1;
                acc[2] = Math.max(acc[2], c.assets());
            }
            if (s.acrossMean().isPresent()) {
                acrossSum += s.acrossMean().getAsDouble();
                acrossCount++;
            }
        }
        List<Sector> out = new ArrayList<>();
        sums.forEach((name, acc) -> out.add(new Sector(name, (int) acc[2], acc[0] / acc[1])));
        out.sort(Comparator.comparingDouble(Sector::meanCorrelation).reversed().thenComparing(Sector::name));
        return new SectorReading(out, acrossCount == 0 ? OptionalDouble.empty() : OptionalDouble.of(acrossSum / acrossCount));
    }

    boolean isEmpty() {
        return sectors.isEmpty();
    }

    /** Sectors from most to least co-moving. */
    List<Sector> sectors() {
        return sectors;
    }

    List<Sector> coMoving() {
        return sectors.stream().filter(s -> s.meanCorrelation() >= CO_MOVING).toList();
    }

    OptionalDouble across() {
        return across;
    }
}
