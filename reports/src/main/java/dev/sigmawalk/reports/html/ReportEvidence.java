package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.compare.Comparison;
import dev.sigmawalk.engine.evidence.InputListSize;
import dev.sigmawalk.strategies.risk.FactorDiagnostics;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * The optional statistical evidence of a report. Each part that is empty leaves its section out
 * of the report entirely.
 *
 * @param diagnostics single-index checks per window, in study order of windows
 * @param comparisons strategy-against-baseline tests
 * @param inputList estimates needed per rebalance by the full and the single-index model
 * @param factorDiagnostics per window length, the residual diagnostics of every factor model at
 *        every rebalance (Method §11); empty when the study has no factor model
 */
public record ReportEvidence(List<WindowDiagnostics> diagnostics, List<Comparison> comparisons,
                             Optional<InputListSize> inputList,
                             Map<Integer, List<FactorDiagnostics>> factorDiagnostics) {
    public ReportEvidence {
        diagnostics = List.copyOf(diagnostics);
        comparisons = List.copyOf(comparisons);
        Objects.requireNonNull(inputList, "inputList");
        Map<Integer, List<FactorDiagnostics>> copy = new LinkedHashMap<>();
        factorDiagnostics.forEach((w, list) -> copy.put(w, List.copyOf(list)));
        factorDiagnostics = Collections.unmodifiableMap(copy);
    }

    /** Evidence without factor models. */
    public ReportEvidence(List<WindowDiagnostics> diagnostics, List<Comparison> comparisons,
                          Optional<InputListSize> inputList) {
        this(diagnostics, comparisons, inputList, Map.of());
    }

    /** No evidence: the report shows only what the run itself gives. */
    public static ReportEvidence none() {
        return new ReportEvidence(List.of(), List.of(), Optional.empty());
    }
}
