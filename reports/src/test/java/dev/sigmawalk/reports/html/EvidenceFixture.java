package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.compare.Comparison;
import dev.sigmawalk.engine.evidence.DifferenceTest;
import dev.sigmawalk.engine.evidence.DifferenceTests;
import dev.sigmawalk.engine.evidence.HacKernel;
import dev.sigmawalk.engine.evidence.HolmAdjustment;
import dev.sigmawalk.engine.evidence.InputListSize;
import dev.sigmawalk.engine.evidence.JobsonKorkieMemmel;
import dev.sigmawalk.engine.evidence.ResidualCorrelations;
import dev.sigmawalk.engine.measures.SeriesStats;
import dev.sigmawalk.engine.run.PathResult;
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
 * "pulled" strategy against "diag" per window, Holm-adjusted across the windows.
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

    private static List<Comparison> comparisons(RunResult<?> run) {
        DifferenceTests tests = new DifferenceTests(HacKernel.PARZEN, new EvidenceSpec(200, 7L, 0));
        List<DifferenceTest> sharpe = new ArrayList<>();
        List<DifferenceTest> variance = new ArrayList<>();
        List<PathResult[]> pairs = new ArrayList<>();
        for (int w : ReportFixture.WINDOWS) {
            PathResult a = run.path("pulled", w);
            PathResult b = run.path("diag", w);
            sharpe.add(tests.sharpeRatio(SeriesStats.minus(a.net(), run.riskFree()), SeriesStats.minus(b.net(), run.riskFree())));
            variance.add(tests.variance(a.net(), b.net()));
            pairs.add(new PathResult[] {a, b});
        }
        double[] holmSharpe = HolmAdjustment.adjust(sharpe.stream().mapToDouble(DifferenceTest::bootstrapPValue).toArray());
        double[] holmVariance = HolmAdjustment.adjust(variance.stream().mapToDouble(DifferenceTest::bootstrapPValue).toArray());
        List<Comparison> out = new ArrayList<>();
        for (int k = 0; k < pairs.size(); k++) {
            PathResult a = pairs.get(k)[0];
            PathResult b = pairs.get(k)[1];
            out.add(new Comparison("pulled", "diag", a.window(), Optional.of(sharpe.get(k)), Optional.of(variance.get(k)),
                    Optional.of(JobsonKorkieMemmel.test(SeriesStats.minus(a.net(), run.riskFree()),
                            SeriesStats.minus(b.net(), run.riskFree()))),
                    holmSharpe[k], holmVariance[k], Optional.empty()));
        }
        return out;
    }
}
