package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.compare.BaselineChoice;
import dev.sigmawalk.engine.compare.Baselines;
import dev.sigmawalk.engine.compare.Comparison;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * What could not be tested, said in words: the report never drops a significance result without
 * saying so. Each strategy without a baseline is named with the reason.
 */
final class Untested {
    static final String NOTHING_TESTED = "No difference could be tested: no strategy has a baseline to be compared with.";
    static final String NOT_RUN = "The significance tests were not run for this report.";

    private Untested() {
    }

    /** A strategy that was not tested, and why. */
    record Missing(String strategy, String reason) {
    }

    /** Lines shown under the heat maps: empty when every strategy was tested against its baseline. */
    static List<String> of(ReportData data) {
        List<String> out = new ArrayList<>();
        List<Missing> without = withoutBaseline(data);
        headline(data, without).ifPresent(out::add);
        for (Missing m : without) {
            out.add(m.strategy() + ": " + m.reason());
        }
        return out;
    }

    private static java.util.Optional<String> headline(ReportData data, List<Missing> without) {
        if (!data.evidence().comparisons().isEmpty()) {
            return java.util.Optional.empty();
        }
        return java.util.Optional.of(without.size() == data.study().strategies().size() ? NOTHING_TESTED : NOT_RUN);
    }

    /** Every strategy of the study that was compared with nothing, with the reason, in study order. */
    static List<Missing> withoutBaseline(ReportData data) {
        Map<String, String> baselines = Baselines.of(data.study().strategies());
        List<Missing> out = new ArrayList<>();
        for (BaselineChoice c : Baselines.choices(data.study().strategies())) {
            if (!c.compared() && !isTested(data.evidence().comparisons(), c.strategy())) {
                out.add(new Missing(c.strategy(), "not tested: " + c.reason() + (isBaseline(baselines, c.strategy())
                        ? " (baseline of " + Words.list(baselineOf(baselines, c.strategy())) + ")" : "") + "."));
            }
        }
        return out;
    }

    /** The significance section when nothing was compared: it stays in the report and says why. */
    static ReportView.EvidenceBlock block(ReportData data) {
        List<Missing> without = withoutBaseline(data);
        List<ReportView.TextRow> rows = new ArrayList<>();
        for (Missing m : without) {
            rows.add(new ReportView.TextRow(List.of(m.strategy(), m.reason())));
        }
        return new ReportView.EvidenceBlock("differences", "Is a difference real, or could it be chance?",
                headline(data, without).orElse(NOT_RUN), List.of("Strategy", "Why it was not tested"), rows,
                List.of("A strategy is compared with a baseline: the one named by baseline: in the study, or else the "
                        + "first sample-covariance strategy with the same rule and bounds."), List.of());
    }

    private static boolean isTested(List<Comparison> comparisons, String strategy) {
        return comparisons.stream().anyMatch(c -> c.strategy().equals(strategy));
    }

    private static boolean isBaseline(Map<String, String> baselines, String name) {
        return baselines.containsValue(name);
    }

    private static List<String> baselineOf(Map<String, String> baselines, String name) {
        return baselines.entrySet().stream().filter(e -> e.getValue().equals(name)).map(Map.Entry::getKey).toList();
    }
}
