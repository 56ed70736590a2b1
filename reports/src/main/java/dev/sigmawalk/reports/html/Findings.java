package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.evidence.BiasStatistic;
import dev.sigmawalk.engine.measures.Summary;
import dev.sigmawalk.engine.run.PathResult;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The one-line answers that open each section, written from the numbers. Ties go to the path
 * that comes first in the run (study order of windows, then of strategies).
 */
final class Findings {
    private final ReportData data;
    private final Map<PathResult, PathFacts> facts;
    private final FamilyEdge edge;

    Findings(ReportData data, Map<PathResult, PathFacts> facts) {
        this.data = data;
        this.facts = facts;
        this.edge = new FamilyEdge(data.evidence().comparisons());
    }

    /** The ranked path with the lowest realised (net) volatility; empty when no path formed a portfolio. */
    Optional<PathResult> lowestVolatility() {
        return data.rankedPaths().stream().min(Comparator.comparingDouble(p -> data.summary(p).volatility()));
    }

    String headline() {
        if (lowestVolatility().isEmpty()) {
            return "No strategy formed a portfolio at any of the " + data.run().schedule().count() + " rebalances:"
                    + " every path held cash throughout, so its figures are the risk-free rate's and nothing is"
                    + " ranked; the run record says why each allocation failed.";
        }
        PathResult best = lowestVolatility().get();
        Summary b = data.summary(best);
        String lead = "With a " + best.window() + "-period window, " + best.strategy()
                + " had the lowest realised volatility: " + Formats.percent(b.volatility()) + " a year";
        Optional<PathResult> next = data.rankedPaths(best.window()).stream().filter(p -> p != best)
                .min(Comparator.comparingDouble(p -> data.summary(p).volatility()));
        // Every "lowest" says in the same sentence whether its edge survives the family correction.
        String sentence = next.isPresent()
                ? lead + ", against " + Formats.percent(data.summary(next.get()).volatility()) + " for "
                        + next.get().strategy() + " with the same window and " + Formats.percent(data.market().volatility())
                        + " for the market; " + edge.volatilityGap(best.strategy(), next.get().strategy(), best.window())
                        + "."
                : lead + ", against " + Formats.percent(data.market().volatility()) + " for the market (no other"
                        + " strategy with that window to compare it with).";
        return sentence + leftOut();
    }

    /** Names the paths kept out of the rankings because some allocation failed. */
    private String leftOut() {
        List<PathResult> ranked = data.rankedPaths();
        List<String> out = new ArrayList<>();
        for (PathResult p : data.run().paths()) {
            if (!ranked.contains(p)) {
                out.add(name(p) + " (no portfolio at " + p.failures() + " of " + p.rebalances().size() + " rebalances)");
            }
        }
        boolean noneClean = data.run().paths().stream().allMatch(p -> p.failures() > 0);
        String all = noneClean ? " Every strategy failed to form a portfolio at some rebalance, so "
                + (out.isEmpty() ? "all are ranked" : "those that formed one at least once are ranked")
                + "; see the run record." : "";
        if (out.isEmpty()) {
            return all;
        }
        return all + " Not ranked, because no portfolio could be formed at " + (noneClean ? "any rebalance" : "some"
                + " rebalances") + " and the path held cash" + (noneClean ? "" : " or an old portfolio") + " instead: "
                + Words.list(out) + ".";
    }

    String cost() {
        List<PathResult> traded = data.run().paths().stream()
                .filter(p -> data.summary(p).meanTurnover().isPresent()).toList();
        String bp = Formats.basisPoints(data.study().walkForward().costBps());
        if (traded.isEmpty()) {
            return "Each portfolio was formed only once, so the only trading was the first purchase from cash.";
        }
        Comparator<PathResult> byTurnover = Comparator.comparingDouble(p -> data.summary(p).meanTurnover().getAsDouble());
        PathResult most = traded.stream().max(byTurnover).orElseThrow();
        PathResult least = traded.stream().min(byTurnover).orElseThrow();
        String sentence = name(most) + " traded the most, " + Formats.percent(data.summary(most).meanTurnover())
                + " of the portfolio per rebalance, which cost " + Formats.percent(facts.get(most).annualCost())
                + " a year at " + bp + " per unit traded";
        if (most == least) {
            return sentence + ".";
        }
        return sentence + "; " + name(least) + " traded the least, " + Formats.percent(data.summary(least).meanTurnover())
                + " per rebalance (" + Formats.percent(facts.get(least).annualCost()) + " a year).";
    }

    String honesty() {
        List<PathResult> checked = data.run().paths().stream().filter(p -> data.summary(p).bias().isPresent()).toList();
        if (checked.isEmpty()) {
            return "No path had enough periods with a risk forecast to judge the forecasts.";
        }
        int inside = 0;
        int insideNormal = 0;
        for (PathResult p : checked) {
            Optional<BiasStatistic> b = BiasStatistic.overForecastRows(p.gross(), data.run().riskFree(),
                    p.forecastVolatility());
            inside += b.map(BiasStatistic::withinRobustBand).orElse(false) ? 1 : 0;
            insideNormal += b.map(BiasStatistic::withinBand).orElse(false) ? 1 : 0;
        }
        Comparator<PathResult> byDistance = Comparator.comparingDouble(p -> Math.abs(data.summary(p).bias().getAsDouble() - 1));
        PathResult closest = checked.stream().min(byDistance).orElseThrow();
        PathResult farthest = checked.stream().max(byDistance).orElseThrow();
        String sentence = inside + " of " + checked.size() + " strategy-window combinations had a bias statistic inside "
                + "the band expected of honest forecasts once fat tails are allowed for, 1 ± √((κ − 1)/N) with κ the "
                + "kurtosis of the standardised returns (" + insideNormal + " inside the normal-theory band 1 ± √(2/N), "
                + "which is too narrow for fat-tailed returns); the closest to 1 was " + name(closest) + " ("
                + Formats.ratio(data.summary(closest).bias()) + ")";
        if (closest == farthest) {
            return sentence + ".";
        }
        double far = data.summary(farthest).bias().getAsDouble();
        return sentence + " and the farthest " + name(farthest) + " (" + Formats.ratio(far) + ", risk "
                + (far > 1 ? "understated" : "overstated") + ").";
    }

    String concentration() {
        List<PathResult> held = data.run().paths().stream()
                .filter(p -> Double.isFinite(facts.get(p).meanEffectiveHoldings())).toList();
        if (held.isEmpty()) {
            return "No portfolio was formed, so there is no concentration to report.";
        }
        Comparator<PathResult> bySpread = Comparator.comparingDouble(p -> facts.get(p).meanEffectiveHoldings());
        PathResult tight = held.stream().min(bySpread).orElseThrow();
        PathResult wide = held.stream().max(bySpread).orElseThrow();
        PathFacts t = facts.get(tight);
        String sentence = "The most concentrated was " + name(tight) + ", with " + Formats.oneDecimal(t.meanEffectiveHoldings())
                + " effective holdings on average and a largest single weight of up to " + Formats.percent(t.maxLargestWeight());
        if (tight == wide) {
            return sentence + ".";
        }
        return sentence + "; the most spread out was " + name(wide) + ", with "
                + Formats.oneDecimal(facts.get(wide).meanEffectiveHoldings()) + " effective holdings.";
    }

    /** Empty when no path reports a shrinkage intensity. */
    Optional<String> shrinkage() {
        List<String> parts = new ArrayList<>();
        List<PathResult> shrunk = data.run().paths().stream().filter(p -> facts.get(p).shrinkage().isPresent()).toList();
        if (shrunk.isEmpty()) {
            return Optional.empty();
        }
        for (PathResult p : shrunk) {
            parts.add(Formats.ratio(facts.get(p).shrinkage().orElseThrow().mean()) + " for " + name(p));
        }
        String sentence = "On average δ was " + Words.list(parts) + " (0 = sample covariance kept, 1 = target used alone).";
        return Optional.of(sentence + trend(shrunk));
    }

    String windows() {
        List<Integer> windows = data.windows();
        if (windows.size() == 1) {
            return "This study used one window, " + Words.periods(windows.get(0))
                    + "; run several windows to see how the choice of window changes the result.";
        }
        List<String> parts = new ArrayList<>();
        for (int w : windows) {
            Optional<PathResult> ranked = data.rankedPaths(w).stream()
                    .min(Comparator.comparingDouble(p -> data.summary(p).volatility()));
            if (ranked.isEmpty()) {
                continue;
            }
            PathResult best = ranked.get();
            Optional<PathResult> next = data.rankedPaths(w).stream().filter(p -> p != best)
                    .min(Comparator.comparingDouble(p -> data.summary(p).volatility()));
            parts.add(Words.periods(w) + ", " + best.strategy() + " at " + Formats.percent(data.summary(best).volatility())
                    + next.map(n -> " (" + n.strategy() + " " + Formats.percent(data.summary(n).volatility()) + "; "
                            + edge.volatilityGap(best.strategy(), n.strategy(), w) + ")").orElse(""));
        }
        if (parts.isEmpty()) {
            return "No window has a strategy that formed a portfolio, so no window is ranked.";
        }
        return "Lowest realised volatility for each window, all a year: " + String.join("; ", parts) + ".";
    }

    /** A sentence on whether δ fell as the window grew, for every shrinkage strategy alike. */
    private String trend(List<PathResult> shrunk) {
        List<String> names = shrunk.stream().map(PathResult::strategy).distinct().toList();
        boolean falling = true;
        boolean rising = true;
        boolean compared = false;
        for (String n : names) {
            List<PathResult> own = shrunk.stream().filter(p -> p.strategy().equals(n))
                    .sorted(Comparator.comparingInt(PathResult::window)).toList();
            for (int k = 1; k < own.size(); k++) {
                double before = facts.get(own.get(k - 1)).shrinkage().orElseThrow().mean();
                double after = facts.get(own.get(k)).shrinkage().orElseThrow().mean();
                falling &= after < before;
                rising &= after > before;
                compared = true;
            }
        }
        if (!compared) {
            return "";
        }
        if (falling) {
            return " Longer windows were pulled less toward the target: more data make the sample covariance less noisy.";
        }
        if (rising) {
            return " Longer windows were pulled more toward the target in this study.";
        }
        return " The pull did not change in one direction as the window grew.";
    }

    private static String name(PathResult p) {
        return p.strategy() + " with the " + p.window() + "-period window";
    }
}
