package dev.sigmawalk.reports.api;

import dev.sigmawalk.engine.compare.Baselines;
import dev.sigmawalk.engine.compare.Comparison;
import dev.sigmawalk.engine.compare.Comparisons;
import dev.sigmawalk.engine.compare.EvidenceNotes;
import dev.sigmawalk.engine.compare.PairScanPlan;
import dev.sigmawalk.engine.compare.ScannedPair;
import dev.sigmawalk.engine.compare.WindowEvidence;
import dev.sigmawalk.engine.compare.WindowEvidenceProbe;
import dev.sigmawalk.engine.data.StudyData;
import dev.sigmawalk.engine.evidence.DifferenceTests;
import dev.sigmawalk.engine.evidence.HacKernel;
import dev.sigmawalk.engine.measures.PerformanceMeasures;
import dev.sigmawalk.engine.measures.SeriesStats;
import dev.sigmawalk.engine.measures.Summary;
import dev.sigmawalk.engine.model.StrategyDefinition;
import dev.sigmawalk.engine.run.PathResult;
import dev.sigmawalk.engine.run.ProgressListener;
import dev.sigmawalk.engine.run.RebalanceRecord;
import dev.sigmawalk.engine.run.RunResult;
import dev.sigmawalk.engine.run.WalkForward;
import dev.sigmawalk.strategies.StrategyCatalog;
import java.util.ArrayList;
import java.util.List;

/**
 * The steps of one run that produce results, shared by the command line (which then writes the
 * files) and the library API (which hands the results to the caller): walk forward, measure,
 * compare every strategy with its baseline.
 */
public final class Runs {
    /** Residual pairs kept per window for the report. */
    public static final int LARGEST_PAIRS = 10;

    private Runs() {
    }

    /** Walks forward every strategy of the study with every window (Method §2). */
    public static RunResult<WindowEvidence> walk(dev.sigmawalk.engine.study.Study study, StudyData data, int threads,
                                                 ProgressListener progress) {
        Given.study(study);
        Given.data(data);
        return walk(study, data, StrategyCatalog.build(study, data), threads, progress);
    }

    /** The same, with the study's strategies already built (the command line builds them first to fail early). */
    public static RunResult<WindowEvidence> walk(dev.sigmawalk.engine.study.Study study, StudyData data,
                                                 List<StrategyDefinition> strategies, int threads,
                                                 ProgressListener progress) {
        Given.study(study);
        Given.data(data);
        Given.required(strategies, "the list of strategies", "StrategyCatalog.build(study, data)");
        Given.required(progress, "the progress listener", "ProgressListener.NONE for none");
        return new WalkForward<>(data.panel(), data.schedule(), strategies, study.walkForward().windows(),
                study.walkForward().costBps(), new WindowEvidenceProbe(data.sectors(), LARGEST_PAIRS,
                        PairScanPlan.of(data.schedule())))
                .run(threads, progress);
    }

    /** One summary per path in run order, then the market's (Method §7). */
    public static List<Summary> summaries(RunResult<?> run) {
        Given.run(run);
        PerformanceMeasures measures = new PerformanceMeasures(run.riskFree(), run.market(), run.periodsPerYear());
        List<Summary> out = new ArrayList<>();
        for (PathResult p : run.paths()) {
            out.add(measures.of(p));
        }
        out.add(measures.market());
        return out;
    }

    /**
     * Every strategy against its baseline, for every window (Method §9), the bootstrap tests on
     * {@code threads} threads (the values do not depend on it).
     */
    public static List<Comparison> comparisons(dev.sigmawalk.engine.study.Study study, RunResult<?> run, int threads) {
        Given.study(study);
        Given.run(run);
        return Comparisons.of(run, Baselines.of(study.strategies()), study.walkForward().windows(),
                new DifferenceTests(HacKernel.PARZEN, study.evidence()), ScannedPair.lowestVolatility(run), threads);
    }

    /**
     * The warnings known before the walk, the lines {@code check} prints too: those of the data
     * (in the order found), then those of the preview (constant series, rebalances with no
     * eligible asset, bounds that cannot be met).
     */
    public static List<String> warningsBeforeWalk(dev.sigmawalk.engine.study.Study study, StudyData data) {
        Given.data(data);
        List<String> out = new ArrayList<>(data.warnings());
        out.addAll(RunPreview.of(study, data).warnings());
        return out;
    }

    /**
     * The warning that variance tests may reject too often: those whose influence series keeps
     * more autocorrelation than the bandwidth rule covers (Method §9), as volatility clustering
     * does when the compared strategies' volatilities move apart. One line naming each such
     * comparison, or none.
     */
    public static List<String> warningsOfTests(List<Comparison> comparisons) {
        List<String> flagged = new ArrayList<>();
        for (Comparison c : comparisons) {
            if (c.variance().isPresent() && c.variance().get().dependenceExceedsBandwidth()) {
                flagged.add("'" + c.strategy() + "' against '" + c.baseline() + "' (window " + c.window() + ")");
            }
        }
        if (flagged.isEmpty()) {
            return List.of();
        }
        boolean one = flagged.size() == 1;
        return List.of((one ? "the variance test of " : "the variance tests of ") + String.join(", ", flagged)
                + (one ? " finds" : " find") + " more autocorrelation in the two strategies' squared returns than"
                + (one ? " its" : " their") + " bandwidth covers, as when their volatilities move apart (Method §9): "
                + (one ? "its p-values" : "their p-values") + " may be too small; treat " + (one ? "it" : "them")
                + " as borderline, or check with a longer evidence.block_length");
    }

    /**
     * The warnings of the results: what the residual diagnostics left out, then one line per path
     * whose allocation failed at some rebalance, one per path whose wealth was lost (a period
     * return of −100 % or worse, Method §7) and one per path with rebalance notes.
     */
    public static List<String> warningsOfResults(RunResult<WindowEvidence> run) {
        Given.run(run);
        List<String> out = new ArrayList<>(EvidenceNotes.warnings(run.probes()));
        for (PathResult p : run.paths()) {
            List<RebalanceRecord> failed = p.rebalances().stream().filter(r -> r.failure().isPresent()).toList();
            if (!failed.isEmpty()) {
                RebalanceRecord first = failed.get(0);
                out.add("strategy '" + p.strategy() + "', window " + p.window() + ": no portfolio formed at "
                        + failed.size() + " of " + p.rebalances().size() + " rebalances (first " + first.date() + ": "
                        + first.failure().get() + "); at those rebalances the path kept its previous portfolio, or cash"
                        + " before its first one");
            }
            int ruin = SeriesStats.firstRuin(p.net());
            if (ruin >= 0) {
                double lost = p.net()[ruin];
                out.add("strategy '" + p.strategy() + "', window " + p.window() + ": its net return of " + lost
                        + " on " + run.dates()[ruin] + (lost < -1 ? " loses more than the whole portfolio (short and"
                        + " leveraged positions can lose more than the capital)" : " loses the whole portfolio")
                        + "; its wealth is taken as gone from that date, so"
                        + " its max drawdown is 100 % and its CAGR -100 %, while its mean return, volatility and Sharpe"
                        + " ratio still average the period returns as they are");
            }
            long notes = p.rebalances().stream().filter(r -> !r.notes().isEmpty()).count();
            if (notes > 0) {
                RebalanceRecord first = p.rebalances().stream().filter(r -> !r.notes().isEmpty()).findFirst().get();
                out.add("strategy '" + p.strategy() + "', window " + p.window() + ": " + notes + " rebalances with notes"
                        + " (first " + first.date() + ": " + String.join("; ", first.notes()) + ")");
            }
        }
        return out;
    }
}
