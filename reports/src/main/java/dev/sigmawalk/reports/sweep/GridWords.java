package dev.sigmawalk.reports.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The sweep page's sentences about the best point. They state what was measured and how sure
 * one may be after the search, never more: a small corrected p-value says the best point's
 * volatility differs from its baseline's beyond what the grid's search explains, not that it
 * will keep doing so.
 */
final class GridWords {
    /** Conventional level for "distinguishable from chance" (common practice). */
    static final double LEVEL = 0.05;

    private GridWords() {
    }

    static String answer(SweepPlan plan, GridEvidence e) {
        if (e.best().isEmpty()) {
            return "No point has a strategy tested against a baseline, so the grid names no best point.";
        }
        PointRow best = e.best().get();
        StringBuilder s = new StringBuilder("Lowest realised volatility in the grid: ").append(best.strategy())
                .append(", window ").append(best.window()).append(", at point ").append(best.point().label())
                .append(" (").append(values(plan, best.point())).append("): ").append(percent(best.volatility()))
                .append(" a year");
        e.baseline().ifPresent(b -> s.append(" against ").append(percent(b.volatility())).append(" for its baseline ")
                .append(b.strategy()));
        s.append(". Its own p-value is ").append(p(e.rawPValue())).append("; corrected for all ")
                .append(e.family()).append(" comparisons in the grid it is ").append(p(e.familyPValue()))
                .append(e.familyPValue() <= LEVEL
                        ? ", so the difference is larger than the search alone would explain at the 5 % level."
                        : ", so once the search is accounted for the difference is not distinguishable from chance"
                        + " at the 5 % level.");
        return s.toString();
    }

    static String method(GridEvidence e) {
        return "Each comparison is a point's strategy against its baseline in the same window: the studentised"
                + " circular block bootstrap p-value of the difference in variance of net returns, from that point's"
                + " tests.csv (Method \u00a79). The family-corrected value applies Holm's (1979) step-down adjustment over"
                + " every such comparison in the grid (" + e.family() + "), which holds under any dependence between"
                + " the points' studies.";
    }

    private static String values(SweepPlan plan, GridPoint p) {
        List<String> parts = new ArrayList<>();
        for (int a = 0; a < plan.keys().size(); a++) {
            parts.add(plan.keys().get(a) + " = " + p.values().get(a));
        }
        return String.join(", ", parts);
    }

    private static String percent(double v) {
        return String.format(Locale.ROOT, "%.2f %%", 100 * v);
    }

    private static String p(double v) {
        return v < 0.001 ? "below 0.001" : String.format(Locale.ROOT, "%.3f", v);
    }
}
