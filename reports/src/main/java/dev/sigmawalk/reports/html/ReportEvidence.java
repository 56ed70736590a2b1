package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.compare.Comparison;
import dev.sigmawalk.engine.evidence.InputListSize;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The optional statistical evidence of a report. Each part that is empty leaves its section out
 * of the report entirely.
 *
 * @param diagnostics single-index checks per window, in study order of windows
 * @param comparisons strategy-against-baseline tests
 * @param inputList estimates needed per rebalance by the full and the single-index model
 */
public record ReportEvidence(List<WindowDiagnostics> diagnostics, List<Comparison> comparisons,
                             Optional<InputListSize> inputList) {
    public ReportEvidence {
        diagnostics = List.copyOf(diagnostics);
        comparisons = List.copyOf(comparisons);
        Objects.requireNonNull(inputList, "inputList");
    }

    /** No evidence: the report shows only what the run itself gives. */
    public static ReportEvidence none() {
        return new ReportEvidence(List.of(), List.of(), Optional.empty());
    }
}
