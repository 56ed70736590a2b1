package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.compare.Comparison;
import dev.sigmawalk.engine.evidence.DifferenceTest;
import dev.sigmawalk.engine.measures.Summary;
import dev.sigmawalk.engine.study.Objective;
import dev.sigmawalk.engine.study.RiskKind;
import dev.sigmawalk.engine.study.StrategySpec;
import dev.sigmawalk.reports.charts.StyleBook;
import dev.sigmawalk.strategies.risk.FactorDiagnostics;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

/**
 * Builds the {@link FactorLoopSection} (Method §11) for the longest window that has both the
 * single-index diagnostics and factor-model diagnostics: which sectors the single index left
 * co-moving ({@link SectorReading}), how much of that each factor model left, and what the
 * strategies built on the single index and on each factor model did out of sample.
 */
final class FactorLoop {
    /** A test at this level is read as a rejection (common practice). */
    private static final double LEVEL = 0.05;
    private static final String SINGLE_INDEX = RiskKind.SINGLE_INDEX.spelling();
    /** The sector model the answer reads, when the study has one. */
    private static final String FIRST_SECTOR_MODEL = "multi-index:sectors";

    private final ReportData data;
    private final StyleBook styles;

    FactorLoop(ReportData data, StyleBook styles) {
        this.data = data;
        this.styles = styles;
    }

    /** The section, or empty when the study has no factor model or no single-index diagnostics. */
    Optional<FactorLoopSection> section() {
        Map<Integer, List<FactorDiagnostics>> factors = data.evidence().factorDiagnostics();
        Optional<WindowDiagnostics> single = data.evidence().diagnostics().stream()
                .filter(w -> !factors.getOrDefault(w.window(), List.of()).isEmpty())
                .max((a, b) -> Integer.compare(a.window(), b.window()));
        if (single.isEmpty()) {
            return Optional.empty();
        }
        int window = single.get().window();
        List<FactorDiagnostics> points = factors.get(window);
        Set<String> models = new LinkedHashSet<>();
        points.forEach(p -> models.add(p.model()));
        List<SectorReading.Sector> flagged = SectorReading.of(single.get()).coMoving();

        List<String> sectorHeaders = new ArrayList<>(List.of("Sector", "Assets", "Single index"));
        sectorHeaders.addAll(models);
        List<ReportView.TextRow> sectorRows = new ArrayList<>();
        List<String> verdicts = new ArrayList<>();
        for (SectorReading.Sector s : flagged) {
            List<String> cells = new ArrayList<>(List.of(s.name(), Integer.toString(s.assets()),
                    Formats.ratio(s.meanCorrelation())));
            for (String m : models) {
                OptionalDouble left = meanWithin(points, m, s.name());
                cells.add(Formats.ratio(left));
                if (m.equals(FIRST_SECTOR_MODEL) && left.isPresent()) {
                    verdicts.add(s.name() + " " + Formats.ratio(s.meanCorrelation()) + " \u2192 "
                            + Formats.ratio(left.getAsDouble()) + " (" + verdict(s.meanCorrelation(), left.getAsDouble()) + ")");
                }
            }
            sectorRows.add(new ReportView.TextRow(cells));
        }
        List<FactorLoopSection.ModelRow> modelRows = modelRows(window, single.get(), points, models);
        return Optional.of(new FactorLoopSection(answer(window, flagged, models, verdicts), sectorHeaders, sectorRows,
                List.of("Strategy", "Risk model", "Mean |residual correlation|", "Adjusted LM rejects at 5 %",
                        "Volatility (% a year)", "Turnover (per rebalance)", "Bias statistic",
                        "Variance against its baseline"),
                modelRows, notes(window, models, flagged)));
    }

    /** removed: no longer read as co-moving; reduced: lower but still co-moving; else not reduced. */
    static String verdict(double before, double after) {
        if (after < SectorReading.CO_MOVING) {
            return "removed";
        }
        return after < before ? "reduced" : "not reduced";
    }

    private static OptionalDouble meanWithin(List<FactorDiagnostics> points, String model, String sector) {
        return points.stream().filter(p -> p.model().equals(model) && p.withinSector().containsKey(sector))
                .mapToDouble(p -> p.withinSector().get(sector)).average();
    }

    private String answer(int window, List<SectorReading.Sector> flagged, Set<String> models, List<String> verdicts) {
        StringBuilder sb = new StringBuilder();
        if (flagged.isEmpty()) {
            sb.append("With the window of ").append(Words.periods(window)).append(" the single index left no sector's"
                    + " residuals co-moving (a mean within-sector residual correlation at or above ")
                    .append(Formats.ratio(SectorReading.CO_MOVING)).append("), so there was no co-movement for the"
                            + " factor models to take up; the table below shows what each did out of sample.");
            return sb.toString();
        }
        sb.append("With the window of ").append(Words.periods(window)).append(" the single index left the residuals of ")
                .append(Words.howMany(flagged.size())).append(flagged.size() == 1 ? " sector" : " sectors")
                .append(" co-moving. ");
        if (!verdicts.isEmpty()) {
            sb.append("The multi-index model with sector factors moved their mean within-sector residual correlation: ")
                    .append(String.join("; ", verdicts)).append(". ");
        }
        sb.append("Whether that built better portfolios is in the second table: the realised volatility, turnover and"
                + " bias statistic of each strategy beside those of the single-index strategies, and the variance test"
                + " against its baseline.");
        return sb.toString();
    }

    private List<FactorLoopSection.ModelRow> modelRows(int window, WindowDiagnostics single,
                                                       List<FactorDiagnostics> points, Set<String> models) {
        Map<String, String[]> residuals = new LinkedHashMap<>();
        int n = single.points().size();
        OptionalDouble siMean = EvidenceSections.scanned(single).mapToDouble(p -> p.diagnostics().meanAbsCorrelation())
                .average();
        long siLm = single.points().stream().filter(p -> p.diagnostics().hasLmAdj()
                && p.diagnostics().lmAdjPValue() < LEVEL).count();
        residuals.put(SINGLE_INDEX, new String[] {Formats.ratio(siMean), share(siLm, n)});
        // Like with like: where the single index's mean |ρ| was computed at some rebalances only
        // (Method §8), the other models' means are averaged over the same rebalances.
        Set<java.time.LocalDate> scannedDates = EvidenceSections.scanned(single).map(DiagnosticsPoint::date)
                .collect(java.util.stream.Collectors.toSet());
        boolean thinned = scannedDates.size() < n;
        for (String m : models) {
            List<FactorDiagnostics> mine = points.stream().filter(p -> p.model().equals(m)).toList();
            OptionalDouble mean = mine.stream().filter(p -> !thinned || scannedDates.contains(p.date()))
                    .mapToDouble(FactorDiagnostics::meanAbsCorrelation).average();
            long lm = mine.stream().filter(p -> p.lmAdj().isPresent() && p.lmAdj().get().pValue() < LEVEL).count();
            residuals.put(m, new String[] {Formats.ratio(mean), share(lm, mine.size())});
        }
        List<FactorLoopSection.ModelRow> rows = new ArrayList<>();
        for (StrategySpec s : data.study().strategies()) {
            String model = s.riskModelName();
            if (s.objective() == Objective.EQUAL_WEIGHT || !residuals.containsKey(model)) {
                continue;
            }
            Optional<Summary> summary = data.summaries().stream()
                    .filter(x -> x.strategy().equals(s.name()) && x.window().isPresent() && x.window().getAsInt() == window)
                    .findFirst();
            if (summary.isEmpty()) {
                continue;
            }
            Summary sum = summary.get();
            String[] r = residuals.get(model);
            rows.add(new FactorLoopSection.ModelRow(s.name(), styles.family(s.name()).cssClass(), List.of(model, r[0], r[1],
                    Formats.percent(sum.volatility()), Formats.percent(sum.meanTurnover()), Formats.ratio(sum.bias()),
                    varianceTest(s.name(), window))));
        }
        return rows;
    }

    private String varianceTest(String strategy, int window) {
        for (Comparison c : data.evidence().comparisons()) {
            if (c.strategy().equals(strategy) && c.window() == window && c.variance().isPresent()) {
                DifferenceTest t = c.variance().get();
                String direction = t.difference() < 0 ? "lower" : "higher";
                return direction + " than " + c.baseline() + ", p = " + Formats.pValue(t.bootstrapPValue());
            }
        }
        return "not compared";
    }

    private static String share(long count, int of) {
        return of == 0 ? Formats.NOT_APPLICABLE : count + " of " + of;
    }

    private static List<String> notes(int window, Set<String> models, List<SectorReading.Sector> flagged) {
        List<String> notes = new ArrayList<>();
        notes.add("Each cell of the sector table is the mean, over the rebalances of the window of "
                + Words.periods(window) + ", of the mean residual correlation over the pairs inside the sector, after each model's"
                + " factors are taken out (Method §11). A sector is read as co-moving at or above "
                + Formats.ratio(SectorReading.CO_MOVING) + "; 'removed' means the model brings it below that.");
        if (models.contains(FIRST_SECTOR_MODEL)) {
            String example = flagged.isEmpty() ? "" : " (" + Formats.ratio(-1.0 / (flagged.get(0).assets() - 1))
                    + " for the " + flagged.get(0).assets() + " assets of " + flagged.get(0).name() + ")";
            notes.add("A sector factor is the equal-weighted mean of the sector's own assets, each asset included, so"
                    + " inside a sector of k assets the residuals nearly sum to zero and their correlation is pushed"
                    + " toward -1/(k-1)" + example + ". A negative value there is that construction, not"
                    + " a new dependence; for the same reason the adjusted LM test, which counts squared correlations"
                    + " of either sign, keeps rejecting under the sector model.");
        }
        notes.add("The adjusted LM test (Pesaran, Ullah & Yamagata 2008) uses each pair's exact null moments for the"
                + " pair's own regressors. The variance test is Ledoit & Wolf (2011) on net returns with its block"
                + " bootstrap p-value; a lower realised variance than the baseline is the improvement a risk model is"
                + " for, and a p-value above 0.05 means the difference could be chance.");
        return notes;
    }
}
