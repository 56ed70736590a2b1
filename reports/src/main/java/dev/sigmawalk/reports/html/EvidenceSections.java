package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.compare.Comparison;
import dev.sigmawalk.engine.compare.PairScanPlan;
import dev.sigmawalk.engine.evidence.DifferenceTest;
import dev.sigmawalk.engine.evidence.InputListSize;
import dev.sigmawalk.engine.evidence.ResidualPair;
import dev.sigmawalk.reports.charts.ChartLine;
import dev.sigmawalk.reports.charts.LineCharts;
import dev.sigmawalk.reports.charts.LineOptions;
import dev.sigmawalk.reports.charts.ModelFamily;
import dev.sigmawalk.reports.charts.StyleBook;
import dev.sigmawalk.reports.charts.TimeAxisValues;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import org.jfree.chart.JFreeChart;

/**
 * The evidence sections, each present only when its data were given: is the single-index
 * assumption holding, is a difference real, and how many estimates each model needs.
 */
final class EvidenceSections {
    /** Significance level of the rejection counts, 5 % (common practice). */
    static final double LEVEL = 0.05;
    private static final String RESIDUAL_LINE = "residual correlation";

    private final ReportData data;
    private final FigureMaker maker;

    EvidenceSections(ReportData data, FigureMaker maker) {
        this.data = data;
        this.maker = maker;
    }

    List<ReportView.EvidenceBlock> all() {
        List<ReportView.EvidenceBlock> out = new ArrayList<>();
        diagnostics().ifPresent(out::add);
        differences().ifPresent(out::add);
        inputList().ifPresent(out::add);
        return out;
    }

    Optional<ReportView.EvidenceBlock> diagnostics() {
        List<WindowDiagnostics> windows = data.evidence().diagnostics();
        if (windows.isEmpty()) {
            return Optional.empty();
        }
        List<ReportView.TextRow> rows = new ArrayList<>();
        for (WindowDiagnostics w : windows) {
            int n = w.points().size();
            OptionalDouble meanAbs = scanned(w).mapToDouble(p -> p.diagnostics().meanAbsCorrelation()).average();
            rows.add(new ReportView.TextRow(List.of(Words.periods(w.window()), Integer.toString(n), Formats.ratio(meanAbs),
                    Formats.ratio(w.latest().diagnostics().meanAbsCorrelation()), share(cdRejections(w), n),
                    lmAdjShare(w), Formats.pValue(w.latest().diagnostics().cdPValue()),
                    Formats.pValue(w.latest().diagnostics().lmAdjPValue()), share(lmRejections(w), n))));
        }
        WindowDiagnostics longest = windows.stream().max((a, b) -> Integer.compare(a.window(), b.window())).orElseThrow();
        String answer = verdict(longest);
        List<String> notes = new ArrayList<>();
        notes.add("The single-index model assumes that, once the market is taken out, assets move independently. "
                + "Pesaran's CD test (2004) tests the sum of the residual correlations; the bias-adjusted LM test of "
                + "Pesaran, Ullah & Yamagata (2008) tests the sum of their squares with its exact small-sample mean "
                + "and variance, so correlations of either sign count. Both keep their 5 % size with many assets "
                + "for the window length (CD also under fat tails; the adjusted LM assumes normal residuals and "
                + "rejects somewhat too often with fat tails), and the verdict rests on them. Frequent rejections "
                + "mean assets share influences beyond the market, such as an industry.");
        notes.add("Breusch-Pagan (1980), the last column, is shown only for continuity: its chi-squared reference "
                + "is badly over-sized when the number of assets is not small against the window (with 70 assets "
                + "and 36 periods it rejects about 64 % of the time even when residuals are independent), so its "
                + "rejections are not evidence here.");
        thinningNote(windows).ifPresent(notes::add);
        SectorReading reading = SectorReading.of(longest);
        if (!reading.isEmpty()) {
            answer += " " + sectorAnswer(reading, longest.window());
            notes.add(sectorNote(reading, longest.window()));
        }
        List<ResidualPair> pairs = longest.latest().largestPairs();
        if (!pairs.isEmpty()) {
            List<String> items = new ArrayList<>();
            for (ResidualPair p : pairs) {
                items.add(p.first() + " and " + p.second() + " (" + Formats.ratio(p.correlation()) + ")");
            }
            notes.add("Most correlated residual pairs at the latest rebalance, " + longest.window() + "-period window: "
                    + String.join("; ", items) + ".");
        }
        return Optional.of(new ReportView.EvidenceBlock("single-index-check",
                "Does the single-index assumption hold?", answer,
                List.of("Window", "Rebalances (count)", "Mean |residual correlation| (average)",
                        "Mean |residual correlation| (latest)", "Pesaran CD rejections (% of rebalances)",
                        "Adjusted LM rejections (% of rebalances)", "Pesaran CD p (latest)", "Adjusted LM p (latest)",
                        "Breusch-Pagan rejections, over-sized (% of rebalances)"),
                rows, notes, List.of(residualChart(windows))));
    }

    /**
     * The answer for the longest window, from the two tests whose size holds at these dimensions:
     * the assumption fails when both CD and the adjusted LM reject at most rebalances, holds when
     * both reject about as often as chance would (at most twice the 5 % level), and is in doubt
     * otherwise (reading rule of thumb).
     */
    private static String verdict(WindowDiagnostics w) {
        int n = w.points().size();
        double cd = (double) cdRejections(w) / n;
        long withAdj = w.points().stream().filter(p -> p.diagnostics().hasLmAdj()).count();
        String lead = "With the " + w.window() + "-period window, Pesaran's CD test rejected uncorrelated residuals at "
                + "the 5 % level at " + share(cdRejections(w), n) + " of rebalances";
        String mean = "; the mean absolute residual correlation at the latest rebalance was "
                + Formats.ratio(w.latest().diagnostics().meanAbsCorrelation());
        if (withAdj == 0) {
            return lead + " (the window is too short for the adjusted LM test)" + mean + ".";
        }
        double adj = (double) lmAdjRejections(w) / withAdj;
        String reading = cd > 0.5 && adj > 0.5 ? "the single-index assumption does not hold here"
                : cd <= 2 * LEVEL && adj <= 2 * LEVEL ? "no more rejections than chance would give, so the data do not "
                        + "contradict the single-index assumption"
                : "the evidence against the single-index assumption is mixed";
        return lead + " and the bias-adjusted LM test at " + Formats.percent(adj) + ": " + reading + mean + ".";
    }

    private static String sectorAnswer(SectorReading reading, int window) {
        List<SectorReading.Sector> moving = reading.coMoving();
        String across = reading.across().isPresent()
                ? "; between sectors it averaged " + Formats.ratio(reading.across().getAsDouble()) : "";
        if (moving.isEmpty()) {
            return "No sector's residuals moved together on average (every within-sector mean stayed below "
                    + Formats.ratio(SectorReading.CO_MOVING) + across + ").";
        }
        List<String> names = new ArrayList<>();
        for (SectorReading.Sector s : moving) {
            names.add(s.name() + " (" + Formats.ratio(s.meanCorrelation()) + ")");
        }
        return "Residuals moved together within " + Words.list(names) + ", averaged over every rebalance of the "
                + window + "-period window" + across + ": the market alone does not explain "
                + (moving.size() == 1 ? "that sector" : "those sectors") + ".";
    }

    private static String sectorNote(SectorReading reading, int window) {
        List<String> items = new ArrayList<>();
        for (SectorReading.Sector s : reading.sectors()) {
            items.add(s.name() + " " + Formats.ratio(s.meanCorrelation()) + " (" + s.assets() + " assets)");
        }
        return "Mean residual correlation within each sector, averaged over the rebalances of the " + window
                + "-period window (a sector at or above " + Formats.ratio(SectorReading.CO_MOVING)
                + " is read as co-moving, a rule of thumb): " + String.join("; ", items) + ".";
    }

    Optional<ReportView.EvidenceBlock> differences() {
        List<Comparison> comparisons = data.evidence().comparisons();
        if (comparisons.isEmpty()) {
            return Optional.of(Untested.block(data));
        }
        double rootP = Math.sqrt(data.run().periodsPerYear());
        List<ReportView.TextRow> rows = new ArrayList<>();
        int sharpeRejected = 0;
        int varianceRejected = 0;
        int lingering = 0;
        String method = "";
        for (Comparison c : comparisons) {
            String sharpe = c.sharpe().map(t -> Formats.ratio(rootP * t.first()) + " vs " + Formats.ratio(rootP * t.second()))
                    .orElse(Formats.NOT_APPLICABLE);
            String vol = c.variance().map(t -> Formats.ratio(Math.sqrt(t.first() / t.second()))).orElse(Formats.NOT_APPLICABLE);
            rows.add(new ReportView.TextRow(List.of(c.strategy(), c.baseline(), Words.periods(c.window()), sharpe,
                    pValues(c.sharpe(), c.familySharpe()), vol, pValues(c.variance(), c.familyVariance()),
                    c.jobsonKorkie().map(t -> Formats.pValue(t.pValue())).orElse(Formats.NOT_APPLICABLE),
                    c.skipped().orElse(lingers(c) ? LINGERING_NOTE : ""))));
            lingering += lingers(c) ? 1 : 0;
            sharpeRejected += c.familySharpe() <= LEVEL ? 1 : 0;
            varianceRejected += c.familyVariance() <= LEVEL ? 1 : 0;
            if (method.isEmpty()) {
                method = c.sharpe().or(c::variance).map(DifferenceTest::method).orElse("");
            }
        }
        int family = new FamilyEdge(comparisons).familySize();
        String answer = "Of " + comparisons.size() + " strategy pairs and windows compared, " + Words.howMany(varianceRejected)
                + " showed a difference in volatility and " + Words.howMany(sharpeRejected) + " a difference in Sharpe ratio that is "
                + "unlikely to be chance once all " + family + " tests scanned are allowed for (family p-value at or "
                + "below 5 %).";
        answer += windowChoice(comparisons);
        List<String> notes = new ArrayList<>();
        notes.add("Each p-value is the chance of a difference at least this large if the two strategies were in truth "
                + "equally good. p-values are given as HAC / bootstrap / family: the family p-value (Romano & Wolf "
                + "2005 stepdown, with one block bootstrap shared by all comparisons so their dependence is kept) "
                + "allows for every strategy, window and measure the report chose among, the pairs the rankings "
                + "above picked included. Sharpe ratios are annualised; the volatility ratio is the strategy's "
                + "volatility divided by the baseline's (or the runner-up's, for the ranking pairs).");
        if (!method.isEmpty()) {
            notes.add("Method: " + method + ".");
        }
        if (lingering > 0) {
            notes.add("Marked \"" + LINGERING_NOTE + "\": in " + Words.howMany(lingering) + " of these comparisons the"
                    + " squared returns keep more autocorrelation than the variance test's bandwidth covers, as when the"
                    + " two strategies' volatilities move apart. In simulations of that case the variance tests rejected"
                    + " a true null in 15 to 23 % of histories at the 5 % level, so read those variance p-values as"
                    + " borderline (Method §9).");
        }
        return Optional.of(new ReportView.EvidenceBlock("differences", "Is a difference real, or could it be chance?",
                answer, List.of("Strategy", "Baseline or runner-up", "Window", "Sharpe ratio (strategy vs baseline)",
                        "Sharpe p-values (HAC / bootstrap / family)", "Volatility ratio",
                        "Variance p-values (HAC / bootstrap / family)", "Jobson-Korkie p", "Note"),
                rows, notes, List.of()));
    }

    /** What the Note column says of a variance test whose dependence outlasts its bandwidth. */
    static final String LINGERING_NOTE = "variance p-values may be too small";

    private static boolean lingers(Comparison c) {
        return c.variance().map(DifferenceTest::dependenceExceedsBandwidth).orElse(false);
    }

    /**
     * Choosing the strongest edge is a test too: the comparison with the strongest volatility edge
     * (the smallest bootstrap p-value among strategies less volatile than their partner), and, in
     * the same sentence, whether that edge survives the family correction over every comparison
     * scanned.
     */
    static String windowChoice(List<Comparison> comparisons) {
        Comparison best = null;
        for (Comparison c : comparisons) {
            if (c.variance().isPresent() && c.variance().get().difference() < 0
                    && (best == null || c.variance().get().bootstrapPValue() < best.variance().get().bootstrapPValue())) {
                best = c;
            }
        }
        if (best == null) {
            return " No strategy was less volatile than the strategy it was compared with at any window.";
        }
        DifferenceTest t = best.variance().get();
        double lower = 1 - Math.sqrt(t.first() / t.second());
        FamilyEdge edge = new FamilyEdge(comparisons);
        String survival = Double.isFinite(best.familyVariance())
                ? edge.verdict("the edge", best.familyVariance())
                : "the edge was not corrected for the other comparisons scanned";
        return " The strongest edge in volatility was " + best.strategy() + " over " + best.baseline() + " with the "
                + best.window() + "-period window (" + Formats.percent(lower) + " lower, bootstrap p-value "
                + Formats.pValue(t.bootstrapPValue()) + " on its own); " + survival + ".";
    }

    Optional<ReportView.EvidenceBlock> inputList() {
        Optional<InputListSize> size = data.evidence().inputList();
        if (size.isEmpty()) {
            return Optional.empty();
        }
        InputListSize s = size.get();
        String answer = "With " + s.assets() + " assets, a mean-variance rebalance needs " + Formats.count(s.fullModel())
                + " estimates under the full sample model and " + Formats.count(s.singleIndex())
                + " under the single-index model, " + Formats.percent(s.reduction()) + " fewer.";
        return Optional.of(new ReportView.EvidenceBlock("input-list", "How many numbers must each model estimate?",
                answer, List.of("Model", "Estimates per rebalance (count)", "What they are"),
                List.of(new ReportView.TextRow(List.of("Full sample model", Formats.count(s.fullModel()),
                                "n expected returns and n(n+1)/2 variances and covariances")),
                        new ReportView.TextRow(List.of("Single-index model", Formats.count(s.singleIndex()),
                                "per asset α, β and residual variance, plus the market premium and market variance"))),
                List.of("Fewer estimates mean less room for estimation error, at the price of the model's assumption."),
                List.of()));
    }

    private Figure residualChart(List<WindowDiagnostics> windows) {
        StyleBook book = StyleBook.of(Map.of(RESIDUAL_LINE, ModelFamily.SINGLE_INDEX));
        List<ChartLine> lines = new ArrayList<>();
        for (int k = 0; k < windows.size(); k++) {
            WindowDiagnostics w = windows.get(k);
            LocalDate[] dates = scanned(w).map(DiagnosticsPoint::date).toArray(LocalDate[]::new);
            double[] y = scanned(w).mapToDouble(p -> p.diagnostics().meanAbsCorrelation()).toArray();
            lines.add(new ChartLine(Words.periods(w.window()), book.variant(RESIDUAL_LINE, k), TimeAxisValues.of(dates), y));
        }
        JFreeChart c = LineCharts.overTime("Mean absolute residual correlation at each rebalance",
                "Mean |residual correlation| (0 to 1)", LineCharts.plainAxis(), lines, new LineOptions(false, true));
        return maker.make("residual-correlation", c, "0 would mean the market explains all co-movement; one line per "
                + "window length, told apart by dash pattern.", FigureMaker.WIDE);
    }

    /** The rebalances at which the mean |ρ| was computed (all of them unless the window was large, Method §8). */
    static java.util.stream.Stream<DiagnosticsPoint> scanned(WindowDiagnostics w) {
        return w.points().stream().filter(p -> p.diagnostics().hasMeanAbsCorrelation());
    }

    /** Says where the all-pairs statistics were computed at some rebalances only; empty when everywhere. */
    private static Optional<String> thinningNote(List<WindowDiagnostics> windows) {
        List<String> parts = new ArrayList<>();
        for (WindowDiagnostics w : windows) {
            long with = scanned(w).count();
            if (with < w.points().size()) {
                parts.add(with + " of " + w.points().size() + " rebalances with the " + w.window() + "-period window");
            }
        }
        if (parts.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of("The mean absolute residual correlation and the most correlated pairs need every one of the "
                + "n(n-1)/2 pairs of assets, so with more than " + Formats.count(PairScanPlan.LARGE_FROM - 1)
                + " assets they were "
                + "computed only at the first rebalance, every " + PairScanPlan.EVERY + "th after it and the last ("
                + String.join("; ", parts) + "). Their average and chart use those rebalances only; the tests (and "
                + "the sector means, where sectors are given) use every rebalance.");
    }

    private static String pValues(Optional<DifferenceTest> test, double family) {
        return test.map(t -> Formats.pValue(t.hacPValue()) + " / " + Formats.pValue(t.bootstrapPValue()) + " / "
                + Formats.pValue(family)).orElse(Formats.NOT_APPLICABLE);
    }

    private static long lmRejections(WindowDiagnostics w) {
        return w.points().stream().filter(p -> p.diagnostics().lmPValue() <= LEVEL).count();
    }

    private static long lmAdjRejections(WindowDiagnostics w) {
        return w.points().stream().filter(p -> p.diagnostics().hasLmAdj() && p.diagnostics().lmAdjPValue() <= LEVEL)
                .count();
    }

    /** Share of the rebalances with LM_adj that rejected; "n/a" when the window is too short for it. */
    private static String lmAdjShare(WindowDiagnostics w) {
        long with = w.points().stream().filter(p -> p.diagnostics().hasLmAdj()).count();
        return with == 0 ? Formats.NOT_APPLICABLE : share(lmAdjRejections(w), (int) with);
    }

    private static long cdRejections(WindowDiagnostics w) {
        return w.points().stream().filter(p -> p.diagnostics().cdPValue() <= LEVEL).count();
    }

    private static String share(long count, int total) {
        return Formats.percent((double) count / total);
    }
}
