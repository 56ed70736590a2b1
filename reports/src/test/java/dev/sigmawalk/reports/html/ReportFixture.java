package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.measures.PerformanceMeasures;
import dev.sigmawalk.engine.measures.Summary;
import dev.sigmawalk.engine.model.Allocator;
import dev.sigmawalk.engine.model.Decision;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.StrategyDefinition;
import dev.sigmawalk.engine.model.WindowMoments;
import dev.sigmawalk.engine.run.PathResult;
import dev.sigmawalk.engine.run.ProgressListener;
import dev.sigmawalk.engine.run.RunResult;
import dev.sigmawalk.engine.run.WalkForward;
import dev.sigmawalk.engine.study.DataSpec;
import dev.sigmawalk.engine.study.EvidenceSpec;
import dev.sigmawalk.engine.study.ExpectedReturnKind;
import dev.sigmawalk.engine.study.Objective;
import dev.sigmawalk.engine.study.Paper;
import dev.sigmawalk.engine.study.RebalanceRule;
import dev.sigmawalk.engine.study.ReportSpec;
import dev.sigmawalk.engine.study.RiskKind;
import dev.sigmawalk.engine.study.SeriesSource;
import dev.sigmawalk.engine.study.ShrinkageTarget;
import dev.sigmawalk.engine.study.StrategySpec;
import dev.sigmawalk.engine.study.Study;
import dev.sigmawalk.engine.study.ValueKind;
import dev.sigmawalk.engine.study.WalkForwardSpec;
import dev.sigmawalk.engine.timeline.Schedule;
import dev.sigmawalk.engine.timeline.Timeline;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.SplittableRandom;

/**
 * A small invented walk-forward run for report tests: 84 monthly rows of 6 fictional assets
 * driven by one factor, windows of 24 and 36 periods, three simple strategies whose weights use
 * the window's variances (so every chart and table has something to show).
 */
final class ReportFixture {
    static final int ROWS = 84;
    static final int ASSETS = 6;
    static final List<Integer> WINDOWS = List.of(24, 36);
    static final double COST_BPS = 10;

    private ReportFixture() {
    }

    /** A run with strategies named {@code names[0]} (sample), {@code names[1]} (shrinkage), {@code names[2]} (equal). */
    static ReportData data(String title, String diagonal, String pulled, String equal) {
        return data(title, List.of(
                new TestStrategy(diagonal, "sample", Kind.DIAGONAL, RiskKind.SAMPLE, Objective.MIN_VARIANCE),
                new TestStrategy(pulled, "shrinkage", Kind.PULLED, RiskKind.SHRINKAGE, Objective.MIN_VARIANCE),
                new TestStrategy(equal, "sample", Kind.EQUAL, RiskKind.SAMPLE, Objective.EQUAL_WEIGHT)));
    }

    /** The default run: strategies "diag", "pulled" and "equal". */
    static ReportData data() {
        return data("Invented universe, monthly", "diag", "pulled", "equal");
    }

    /** The default run, its report laid out for {@code paper}. */
    static ReportData data(Paper paper) {
        ReportData d = data();
        Study s = d.study();
        Study onPaper = new Study(s.file(), s.title(), s.data(), s.walkForward(), s.strategies(), s.evidence(), s.output(),
                new ReportSpec(paper));
        return new ReportData(onPaper, d.run(), d.summaries(), d.record(), d.evidence());
    }

    /** A run without any shrinkage strategy. */
    static ReportData withoutShrinkage() {
        return data("No shrinkage here", List.of(
                new TestStrategy("diag", "sample", Kind.DIAGONAL, RiskKind.SAMPLE, Objective.MIN_VARIANCE),
                new TestStrategy("equal", "sample", Kind.EQUAL, RiskKind.SAMPLE, Objective.EQUAL_WEIGHT)));
    }

    private static ReportData data(String title, List<TestStrategy> strategies) {
        ReturnPanel panel = panel();
        WalkForwardSpec spec = new WalkForwardSpec(WINDOWS, new RebalanceRule.EveryRows(1), Optional.empty(),
                Optional.empty(), COST_BPS);
        Schedule schedule = Timeline.plan(panel, spec);
        RunResult<Void> run = new WalkForward<Void>(panel, schedule, List.copyOf(strategies), WINDOWS, COST_BPS, null)
                .run(1, ProgressListener.NONE);
        PerformanceMeasures measures = new PerformanceMeasures(run.riskFree(), run.market(), run.periodsPerYear());
        List<Summary> summaries = new ArrayList<>();
        for (PathResult p : run.paths()) {
            summaries.add(measures.of(p));
        }
        summaries.add(measures.market());
        List<StrategySpec> specs = strategies.stream().map(TestStrategy::spec).toList();
        Study study = new Study(Path.of("/study/study.yaml").toAbsolutePath(), title,
                new DataSpec(Path.of("/study/assets.csv").toAbsolutePath(), ValueKind.RETURNS,
                        new SeriesSource.Column("index"), new SeriesSource.AnnualRate(0.02), OptionalInt.of(12)),
                spec, specs, EvidenceSpec.defaults(), Path.of("/study/out").toAbsolutePath());
        RunRecord record = new RunRecord("0.1.0-test",
                List.of(new InputFile("assets.csv", "0".repeat(63) + "1")),
                panel.date(0), panel.date(ROWS - 1), ASSETS,
                Instant.parse("2026-01-02T10:00:00Z"), Instant.parse("2026-01-02T10:00:03.5Z"),
                List.of("an invented warning"));
        return new ReportData(study, run, summaries, record);
    }

    /** Month-end dates from January 2001; r = rf + β(m − rf) + noise, seeded. */
    static ReturnPanel panel() {
        SplittableRandom rng = new SplittableRandom(20260102L);
        LocalDate[] dates = new LocalDate[ROWS];
        double[] m = new double[ROWS];
        double[] rf = new double[ROWS];
        double[] r = new double[ROWS * ASSETS];
        for (int t = 0; t < ROWS; t++) {
            LocalDate month = LocalDate.of(2001, 1, 1).plusMonths(t);
            dates[t] = month.withDayOfMonth(month.lengthOfMonth());
            rf[t] = 0.0015;
            m[t] = 0.006 + 0.045 * gaussian(rng);
            for (int i = 0; i < ASSETS; i++) {
                double beta = 0.5 + 0.2 * i;
                double noise = (0.02 + 0.01 * i) * gaussian(rng);
                r[t * ASSETS + i] = rf[t] + beta * (m[t] - rf[t]) + noise;
            }
        }
        List<String> ids = new ArrayList<>();
        for (int i = 0; i < ASSETS; i++) {
            ids.add(String.format("F%02d", i + 1));
        }
        return new ReturnPanel(dates, ids, r, m, rf, "index", 12);
    }

    private static double gaussian(SplittableRandom rng) {
        // Box-Muller; adequate for invented test data.
        return Math.sqrt(-2 * Math.log(1 - rng.nextDouble())) * Math.cos(2 * Math.PI * rng.nextDouble());
    }

    enum Kind { DIAGONAL, PULLED, EQUAL }

    /**
     * Weights ∝ 1/v_i with v_i the window variance (DIAGONAL), the variance pulled toward the
     * mean variance with δ = 12/(12 + L) (PULLED, reporting δ), or 1/n (EQUAL). Forecast variance
     * Σ w_i² v_i (diagonal risk).
     */
    record TestStrategy(String name, String riskLabel, Kind kind, RiskKind risk, Objective objective)
            implements StrategyDefinition {
        StrategySpec spec() {
            return new StrategySpec(name, risk, ShrinkageTarget.SINGLE_INDEX, objective, Optional.empty(), 1.0,
                    ExpectedReturnKind.SINGLE_INDEX, Optional.empty(), OptionalDouble.empty(), Optional.empty());
        }

        @Override
        public Allocator newAllocator(int window) {
            return w -> decide(w, window);
        }

        private Decision decide(EstimationWindow w, int window) {
            WindowMoments mo = w.moments();
            int n = w.assetCount();
            double[] v = new double[n];
            double meanVar = 0;
            for (int i = 0; i < n; i++) {
                v[i] = mo.covariance(i, i);
                meanVar += v[i] / n;
            }
            double delta = 12.0 / (12 + window);
            double[] weights = new double[n];
            double total = 0;
            for (int i = 0; i < n; i++) {
                double vi = kind == Kind.PULLED ? (1 - delta) * v[i] + delta * meanVar : v[i];
                weights[i] = kind == Kind.EQUAL ? 1 : 1 / vi;
                total += weights[i];
            }
            double forecast = 0;
            for (int i = 0; i < n; i++) {
                weights[i] /= total;
                forecast += weights[i] * weights[i] * v[i];
            }
            return new Decision.Chosen(weights, forecast,
                    kind == Kind.PULLED ? OptionalDouble.of(delta) : OptionalDouble.empty(), List.of());
        }
    }
}
