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

    /**
     * @param failed points that failed: their comparisons are missing from the search, so the
     *               sentence says the best is the best of the points that ran
     */
    static String answer(SweepPlan plan, GridEvidence e, long failed) {
        if (e.best().isEmpty()) {
            if (failed == plan.points().size()) {
                return "Every point failed (the reasons are listed below), so the grid names no best point.";
            }
            if (e.comparisonCount() > 0) {
                return "No strategy tested against a baseline formed a portfolio at any rebalance"
                        + (failed == 0 ? "" : " of the points that ran (" + failed + " of " + plan.points().size()
                                + " failed)")
                        + ": each such path held cash throughout, so its volatility is the risk-free rate's and the"
                        + " grid names no best point.";
            }
            return "No point " + (failed == 0 ? "" : "that ran ") + "has a strategy tested against a baseline"
                    + (failed == 0 ? "" : " (" + failed + " of " + plan.points().size() + " failed)")
                    + ", so the grid names no best point.";
        }
        PointRow best = e.best().get();
        StringBuilder s = new StringBuilder(failed == 0 ? "Lowest realised volatility in the grid: "
                : "Lowest realised volatility among the points that ran (" + failed + " of " + plan.points().size()
                        + " failed, and their comparisons are in neither the search nor its corrections): ")
                .append(best.strategy())
                .append(", window ").append(best.window()).append(", at point ").append(best.point().label())
                .append(" (").append(values(plan, best.point())).append("): ").append(percent(best.volatility()))
                .append(" a year");
        e.baseline().ifPresent(b -> s.append(" against ").append(percent(b.volatility())).append(" for its baseline ")
                .append(b.strategy()));
        s.append(". Its own p-value is ").append(p(e.rawPValue())).append(". ");
        GridFamily f = e.family();
        if (f.notFormed().isPresent()) {
            s.append("No grid family could be formed (").append(f.notFormed().get()).append("); Holm's correction over all ")
                    .append(e.comparisonCount()).append(" comparisons gives ").append(p(e.holmPValue()))
                    .append(verdict(e.holmPValue()));
            return s.toString();
        }
        s.append("Corrected for the search over ").append(SweepPage.count(f.members().size(), "comparison"))
                .append(" of the grid on their ").append(f.periods()).append(" common dates (")
                .append(f.first().get()).append(" to ").append(f.last().get()).append(") it is ")
                .append(p(e.familyPValue())).append(verdict(e.familyPValue()));
        if (!f.leftOut().isEmpty()) {
            s.append(" ").append(SweepPage.count(f.leftOut().size(), "comparison"))
                    .append(f.leftOut().size() == 1 ? " was" : " were").append(" left out of that family (listed below);"
                    + " Holm's correction over all ").append(e.comparisonCount()).append(", which leaves none out, gives ")
                    .append(p(e.holmPValue())).append(".");
        }
        return s.toString();
    }

    private static String verdict(double p) {
        return p <= LEVEL
                ? ", so the difference is larger than the search alone would explain at the 5 % level."
                : ", so once the search is accounted for the difference is not distinguishable from chance at the 5 % level.";
    }

    static String method(GridEvidence e) {
        GridFamily f = e.family();
        String resampling = f.members().isEmpty() ? "" : " (block length " + f.blockLength() + ", the largest of the"
                + " members' own, and the base study's resamples and seed)";
        return "Each comparison is a point's strategy against the strategy its tests.csv compares it with, in the same"
                + " window: the difference in variance of net returns (Ledoit-Wolf 2011). The grid's family is every"
                + " such comparison of every point, on the dates they all share: the others join the best comparison"
                + " in order of how many of its dates they share, each only while at least half of the best"
                + " comparison's dates stay common. On those dates each member's test is run again, and the"
                + " Romano-Wolf studentised stepdown draws one set of circular block starts for all members"
                + resampling + ", so the dependence between the points' studies is kept (Method \u00a79). Holm's"
                + " (1979) step-down over the points' own p-values, each on its own period, is in sweep.csv as"
                + " holm_pvalue: it leaves no comparison out and holds under any dependence, but is more conservative.";
    }

    /** One line per comparison left out of the grid family: where it is and why. */
    static List<String> leftOut(GridEvidence e) {
        List<String> out = new ArrayList<>();
        for (GridFamily.LeftOut l : e.family().leftOut()) {
            PointComparison c = l.comparison();
            out.add("Point " + c.point().label() + ", " + c.strategy() + " against " + c.baseline() + ", window "
                    + c.window() + ": " + l.reason() + ".");
        }
        return out;
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
