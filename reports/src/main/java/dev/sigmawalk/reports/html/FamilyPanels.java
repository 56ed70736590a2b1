package dev.sigmawalk.reports.html;

import dev.sigmawalk.reports.charts.ChartLine;
import dev.sigmawalk.reports.charts.ModelFamily;
import dev.sigmawalk.reports.charts.StyleBook;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Splits the lines of one chart into small multiples, one panel per model family, when more
 * than {@value #MOST_LINES} lines would otherwise overlap. Every panel repeats the reference
 * line (the market) so each family is read against the same yardstick.
 */
final class FamilyPanels {
    /** More lines than this on one chart tangle; four is where the report splits them. */
    static final int MOST_LINES = 4;

    /** One panel: its family (empty for a chart that was not split) and its lines. */
    record Panel(Optional<ModelFamily> family, List<ChartLine> lines) {
        Panel {
            lines = List.copyOf(lines);
        }

        /** The id suffix of this panel's figure: "" or "-" plus the family's name. */
        String idSuffix() {
            return family.map(f -> "-" + f.cssClass().substring("fam-".length())).orElse("");
        }

        /** The title suffix: "" or ": " plus the family's label. */
        String titleSuffix() {
            return family.map(f -> ": " + f.label()).orElse("");
        }
    }

    private FamilyPanels() {
    }

    /**
     * @param lines one line per strategy, labelled with the strategy's name as registered in {@code styles}
     * @param reference drawn in every panel (the market), or empty
     */
    static List<Panel> of(List<ChartLine> lines, Optional<ChartLine> reference, StyleBook styles) {
        int total = lines.size() + (reference.isPresent() ? 1 : 0);
        if (total <= MOST_LINES) {
            List<ChartLine> all = new ArrayList<>(lines);
            reference.ifPresent(all::add);
            return List.of(new Panel(Optional.empty(), all));
        }
        Map<ModelFamily, List<ChartLine>> byFamily = new EnumMap<>(ModelFamily.class);
        for (ChartLine l : lines) {
            byFamily.computeIfAbsent(styles.family(l.label()), f -> new ArrayList<>()).add(l);
        }
        List<Panel> out = new ArrayList<>();
        for (Map.Entry<ModelFamily, List<ChartLine>> e : byFamily.entrySet()) {
            List<ChartLine> panel = new ArrayList<>(e.getValue());
            reference.ifPresent(panel::add);
            out.add(new Panel(Optional.of(e.getKey()), panel));
        }
        return out;
    }

    /** A y-axis range shared by the panels of one set. */
    record Range(double low, double high) {
        Range {
            if (!(low < high)) {
                throw new IllegalArgumentException("axis range [" + low + ", " + high + "] needs low < high");
            }
        }
    }

    /**
     * The smallest and largest finite y over every panel, widened by 4 % of the span on each side
     * (on a log axis, by the factor 1.04), and reaching 0 when asked; empty when the panels have no
     * finite value or the values do not spread (the chart then fits its own axis).
     */
    static Optional<Range> range(List<Panel> panels, boolean includeZero, boolean log) {
        double low = includeZero ? 0 : Double.POSITIVE_INFINITY;
        double high = includeZero ? 0 : Double.NEGATIVE_INFINITY;
        for (Panel p : panels) {
            for (ChartLine l : p.lines()) {
                for (double y : l.y()) {
                    if (Double.isFinite(y) && (!log || y > 0)) {
                        low = Math.min(low, y);
                        high = Math.max(high, y);
                    }
                }
            }
        }
        if (!(low < high)) {
            return Optional.empty();
        }
        if (log) {
            return Optional.of(new Range(low / 1.04, high * 1.04));
        }
        double pad = 0.04 * (high - low);
        return Optional.of(new Range(includeZero && low == 0 ? 0 : low - pad, includeZero && high == 0 ? 0 : high + pad));
    }
}
