package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.compare.Comparison;
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
            double meanAbs = w.points().stream().mapToDouble(p -> p.diagnostics().meanAbsCorrelation()).average().orElseThrow();
            rows.add(new ReportView.TextRow(List.of(Words.periods(w.window()), Integer.toString(n), Formats.ratio(meanAbs),
                    Formats.ratio(w.latest().diagnostics().meanAbsCorrelation()), share(lmRejections(w), n),
                    share(cdRejections(w), n), Formats.pValue(w.latest().diagnostics().lmPValue()),
                    Formats.pValue(w.latest().diagnostics().cdPValue()))));
        }
        WindowDiagnostics longest = windows.stream().max((a, b) -> Integer.compare(a.window(), b.window())).orElseThrow();
        int n = longest.points().size();
        String answer = "With the " + longest.window() + "-period window, the test of uncorrelated residuals "
                + "(Breusch-Pagan) rejected at the 5 % level at " + share(lmRejections(longest), n)
                + " of rebalances and the Pesaran test at " + share(cdRejections(longest), n)
                + "; the mean absolute residual correlation at the latest rebalance was "
                + Formats.ratio(longest.latest().diagnostics().meanAbsCorrelation()) + ".";
        List<String> notes = new ArrayList<>();
        notes.add("The single-index model assumes that, once the market is taken out, assets move independently. "
                + "Breusch-Pagan (1980) tests the sum of squared residual correlations; Pesaran (2004) tests their sum "
                + "and stays reliable when there are many assets for the window length. Frequent rejections mean "
                + "assets share influences beyond the market, such as an industry.");
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
                        "Mean |residual correlation| (latest)", "Breusch-Pagan rejections (% of rebalances)",
                        "Pesaran rejections (% of rebalances)", "Breusch-Pagan p (latest)", "Pesaran p (latest)"),
                rows, notes, List.of(residualChart(windows))));
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
        String method = "";
        for (Comparison c : comparisons) {
            String sharpe = c.sharpe().map(t -> Formats.ratio(rootP * t.first()) + " vs " + Formats.ratio(rootP * t.second()))
                    .orElse(Formats.NOT_APPLICABLE);
            String vol = c.variance().map(t -> Formats.ratio(Math.sqrt(t.first() / t.second()))).orElse(Formats.NOT_APPLICABLE);
            rows.add(new ReportView.TextRow(List.of(c.strategy(), c.baseline(), Words.periods(c.window()), sharpe,
                    pValues(c.sharpe(), c.holmSharpe()), vol, pValues(c.variance(), c.holmVariance()),
                    c.jobsonKorkie().map(t -> Formats.pValue(t.pValue())).orElse(Formats.NOT_APPLICABLE),
                    c.skipped().orElse(""))));
            sharpeRejected += c.holmSharpe() <= LEVEL ? 1 : 0;
            varianceRejected += c.holmVariance() <= LEVEL ? 1 : 0;
            if (method.isEmpty()) {
                method = c.sharpe().or(c::variance).map(DifferenceTest::method).orElse("");
            }
        }
        String answer = "Of " + comparisons.size() + " comparisons with a baseline, " + Words.howMany(varianceRejected)
                + " showed a difference in volatility and " + Words.howMany(sharpeRejected) + " a difference in Sharpe ratio that is "
                + "unlikely to be chance (Holm-adjusted bootstrap p-value at or below 5 %).";
        answer += windowChoice(comparisons);
        List<String> notes = new ArrayList<>();
        notes.add("Each p-value is the chance of a difference at least this large if the two strategies were in truth "
                + "equally good. p-values are given as HAC / bootstrap / Holm-adjusted bootstrap; the Holm adjustment "
                + "allows for testing the same pair once per window. Sharpe ratios are annualised; the volatility ratio "
                + "is the strategy's volatility divided by the baseline's.");
        if (!method.isEmpty()) {
            notes.add("Method: " + method + ".");
        }
        return Optional.of(new ReportView.EvidenceBlock("differences", "Is a difference real, or could it be chance?",
                answer, List.of("Strategy", "Baseline", "Window", "Sharpe ratio (strategy vs baseline)",
                        "Sharpe p-values", "Volatility ratio", "Variance p-values", "Jobson-Korkie p", "Note"),
                rows, notes, List.of()));
    }

    /**
     * Choosing the window is a test too: the comparison with the strongest volatility edge (the
     * smallest bootstrap p-value among strategies less volatile than their baseline), and whether
     * that edge survives Holm's correction for the number of windows tried.
     */
    static String windowChoice(List<Comparison> comparisons) {
        Comparison best = null;
        for (Comparison c : comparisons) {
            if (c.variance().isPresent() && c.variance().get().difference() < 0 && !Double.isNaN(c.holmVariance())
                    && (best == null || c.variance().get().bootstrapPValue() < best.variance().get().bootstrapPValue())) {
                best = c;
            }
        }
        if (best == null) {
            return " No strategy was less volatile than its baseline at any window.";
        }
        DifferenceTest t = best.variance().get();
        final String strategy = best.strategy();
        final String baseline = best.baseline();
        long tried = comparisons.stream().filter(c -> c.strategy().equals(strategy) && c.baseline().equals(baseline)
                && c.variance().isPresent()).count();
        double lower = 1 - Math.sqrt(t.first() / t.second());
        boolean survives = best.holmVariance() <= LEVEL;
        return " The strongest edge in volatility was " + strategy + " over " + baseline + " with the "
                + best.window() + "-period window (" + Formats.percent(lower) + " lower; bootstrap p-value "
                + Formats.pValue(t.bootstrapPValue()) + ")." + (tried > 1
                ? " Because " + tried + " windows were tried and the best one is reported, its p-value after Holm's "
                        + "correction is " + Formats.pValue(best.holmVariance()) + ": the edge "
                        + (survives ? "survives" : "does not survive") + " that correction at the 5 % level."
                : "");
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
            LocalDate[] dates = w.points().stream().map(DiagnosticsPoint::date).toArray(LocalDate[]::new);
            double[] y = w.points().stream().mapToDouble(p -> p.diagnostics().meanAbsCorrelation()).toArray();
            lines.add(new ChartLine(Words.periods(w.window()), book.variant(RESIDUAL_LINE, k), TimeAxisValues.of(dates), y));
        }
        JFreeChart c = LineCharts.overTime("Mean absolute residual correlation at each rebalance",
                "Mean |residual correlation| (0 to 1)", LineCharts.plainAxis(), lines, new LineOptions(false, true));
        return maker.make("residual-correlation", c, "0 would mean the market explains all co-movement; one line per "
                + "window length, told apart by dash pattern.", FigureMaker.WIDE);
    }

    private static String pValues(Optional<DifferenceTest> test, double holm) {
        return test.map(t -> Formats.pValue(t.hacPValue()) + " / " + Formats.pValue(t.bootstrapPValue()) + " / "
                + Formats.pValue(holm)).orElse(Formats.NOT_APPLICABLE);
    }

    private static long lmRejections(WindowDiagnostics w) {
        return w.points().stream().filter(p -> p.diagnostics().lmPValue() <= LEVEL).count();
    }

    private static long cdRejections(WindowDiagnostics w) {
        return w.points().stream().filter(p -> p.diagnostics().cdPValue() <= LEVEL).count();
    }

    private static String share(long count, int total) {
        return Formats.percent((double) count / total);
    }
}
