package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.compare.Comparison;
import dev.sigmawalk.engine.compare.Comparisons;
import dev.sigmawalk.engine.compare.ScannedPair;
import dev.sigmawalk.engine.evidence.DifferenceTests;
import dev.sigmawalk.engine.evidence.HacKernel;
import dev.sigmawalk.engine.evidence.InputListSize;
import dev.sigmawalk.engine.evidence.ResidualCorrelations;
import dev.sigmawalk.engine.run.ProgressListener;
import dev.sigmawalk.engine.run.RunResult;
import dev.sigmawalk.engine.run.WalkForward;
import dev.sigmawalk.engine.study.EvidenceSpec;
import dev.sigmawalk.engine.study.RebalanceRule;
import dev.sigmawalk.engine.study.WalkForwardSpec;
import dev.sigmawalk.engine.timeline.Timeline;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Evidence for the fixture run, computed with the engine's own evidence classes: residual
 * diagnostics of every window at every rebalance, and the Sharpe and variance tests of the
 * "pulled" strategy against "diag" per window and of the ranked pairs, with family p-values.
 */
final class EvidenceFixture {
    /** Assets of the input-list example (README of the check values: 1 325 and 152 for n = 50). */
    static final int INPUT_LIST_ASSETS = 50;

    private EvidenceFixture() {
    }

    static ReportData data() {
        ReportData base = ReportFixture.data();
        return new ReportData(base.study(), base.run(), base.summaries(), base.record(), evidence(base.run()));
    }

    static ReportEvidence evidence(RunResult<?> run) {
        var panel = ReportFixture.panel();
        var spec = new WalkForwardSpec(ReportFixture.WINDOWS, new RebalanceRule.EveryRows(1), Optional.empty(),
                Optional.empty(), ReportFixture.COST_BPS);
        RunResult<DiagnosticsPoint> probed = new WalkForward<DiagnosticsPoint>(panel, Timeline.plan(panel, spec),
                List.of(), ReportFixture.WINDOWS, ReportFixture.COST_BPS,
                w -> { 
                    ResidualCorrelations rho = ResidualCorrelations.of(w);
                    return new DiagnosticsPoint(w.date(), rho.diagnostics(), rho.largestPairs(3));
                }).run(1, ProgressListener.NONE);
        List<WindowDiagnostics> diagnostics = new ArrayList<>();
        for (Map.Entry<Integer, List<DiagnosticsPoint>> e : probed.probes().entrySet()) {
            diagnostics.add(new WindowDiagnostics(e.getKey(), e.getValue()));
        }
        diagnostics.sort((a, b) -> Integer.compare(a.window(), b.window()));
        return new ReportEvidence(diagnostics, comparisons(run), Optional.of(new InputListSize(INPUT_LIST_ASSETS)));
    }

    /**
     * "pulled" against "diag" at every window plus the lowest-volatility pairs the report ranks,
     * through the engine's own comparison step (Holm across windows, Romano-Wolf over the family).
     */
    private static List<Comparison> comparisons(RunResult<?> run) {
        DifferenceTests tests = new DifferenceTests(HacKernel.PARZEN, new EvidenceSpec(200, 7L, 0));
        return Comparisons.of(run, Map.of("pulled", "diag"), ReportFixture.WINDOWS, tests,
                ScannedPair.lowestVolatility(run));
    }
}
