package dev.sigmawalk.reports.cli;

import dev.sigmawalk.engine.compare.WindowEvidence;
import dev.sigmawalk.engine.compare.WindowEvidenceProbe;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.run.RunResult;
import dev.sigmawalk.engine.run.WindowProbe;
import dev.sigmawalk.strategies.FactorDiagnosticsProbe;
import dev.sigmawalk.strategies.risk.FactorDiagnostics;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * What the run learns from each window besides the portfolios: the single-index evidence
 * (Method §8) and the residual diagnostics of the study's factor models (Method §11), from the
 * same window and moments.
 *
 * @param evidence the single-index adequacy of the window
 * @param factors one entry per factor model the window supports
 */
record WindowFindings(WindowEvidence evidence, List<FactorDiagnostics> factors) {
    WindowFindings {
        Objects.requireNonNull(evidence, "evidence");
        factors = List.copyOf(factors);
    }

    /** Both probes on each window; the dense moments are needed when either needs them. */
    static WindowProbe<WindowFindings> probe(WindowEvidenceProbe evidence, FactorDiagnosticsProbe factors) {
        return new WindowProbe<>() {
            @Override
            public WindowFindings probe(EstimationWindow w) {
                return new WindowFindings(evidence.probe(w), factors.probe(w));
            }

            @Override
            public boolean needsDenseMoments(int window, int assets) {
                return evidence.needsDenseMoments(window, assets) || factors.needsDenseMoments(window, assets);
            }
        };
    }

    /** The run with only the single-index evidence, as the rest of the outputs read it. */
    static RunResult<WindowEvidence> evidenceOnly(RunResult<WindowFindings> run) {
        Map<Integer, List<WindowEvidence>> probes = new LinkedHashMap<>();
        run.probes().forEach((w, list) -> probes.put(w, list.stream().map(WindowFindings::evidence).toList()));
        return new RunResult<>(run.dates(), run.market(), run.riskFree(), run.periodsPerYear(), run.schedule(),
                run.paths(), probes);
    }

    /** Per window length, per rebalance, the factor models' diagnostics. */
    static Map<Integer, List<List<FactorDiagnostics>>> factorsOnly(RunResult<WindowFindings> run) {
        Map<Integer, List<List<FactorDiagnostics>>> out = new LinkedHashMap<>();
        run.probes().forEach((w, list) -> {
            List<List<FactorDiagnostics>> perRebalance = new ArrayList<>();
            for (WindowFindings f : list) {
                perRebalance.add(f.factors());
            }
            out.put(w, perRebalance);
        });
        return out;
    }
}
