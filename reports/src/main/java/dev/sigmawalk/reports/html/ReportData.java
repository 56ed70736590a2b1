package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.measures.Summary;
import dev.sigmawalk.engine.run.PathResult;
import dev.sigmawalk.engine.run.RunResult;
import dev.sigmawalk.engine.study.Study;
import java.util.List;
import java.util.Objects;

/**
 * Everything the report shows.
 *
 * @param study the study as read
 * @param run the walk-forward result
 * @param summaries one row per path plus the {@code market} row, as in {@code summary.csv}
 * @param record facts about the run the results do not carry
 * @param evidence optional statistical evidence; {@link ReportEvidence#none()} for none
 */
public record ReportData(Study study, RunResult<?> run, List<Summary> summaries, RunRecord record,
                         ReportEvidence evidence) {
    public ReportData {
        Objects.requireNonNull(evidence, "evidence");
        Objects.requireNonNull(study, "study");
        Objects.requireNonNull(run, "run");
        summaries = List.copyOf(summaries);
        Objects.requireNonNull(record, "record");
        if (run.paths().isEmpty()) {
            throw new IllegalArgumentException("the run has no paths to report");
        }
        if (summaries.stream().noneMatch(s -> s.window().isEmpty() && Families.MARKET.equals(s.strategy()))) {
            throw new IllegalArgumentException("summaries must include the 'market' benchmark row");
        }
        for (PathResult p : run.paths()) {
            find(summaries, p.strategy(), p.window());
        }
    }

    /** A report without statistical evidence. */
    public ReportData(Study study, RunResult<?> run, List<Summary> summaries, RunRecord record) {
        this(study, run, summaries, record, ReportEvidence.none());
    }

    /** The summary row of a path. */
    public Summary summary(PathResult path) {
        return find(summaries, path.strategy(), path.window());
    }

    /** The benchmark's summary row. */
    public Summary market() {
        return summaries.stream().filter(s -> s.window().isEmpty() && Families.MARKET.equals(s.strategy()))
                .findFirst().orElseThrow();
    }

    /** The windows in study order that have at least one path. */
    public List<Integer> windows() {
        return run.paths().stream().map(PathResult::window).distinct().toList();
    }

    /**
     * The paths that compete in rankings ("lowest realised risk", best values): those that formed a
     * portfolio at every rebalance. A path that held cash or a stale portfolio because an
     * allocation failed would otherwise win on low risk for the wrong reason. When every path
     * failed somewhere, those that formed a portfolio at least once are ranked; a path that never
     * formed one held cash throughout, and its "lowest volatility" is the risk-free rate's, so it
     * is never ranked: when no path formed any portfolio the list is empty.
     */
    public List<PathResult> rankedPaths() {
        List<PathResult> clean = run.paths().stream().filter(p -> p.failures() == 0).toList();
        return clean.isEmpty() ? run.paths().stream().filter(ReportData::investedOnce).toList() : clean;
    }

    /** Whether the path formed a portfolio at one rebalance at least. */
    static boolean investedOnce(PathResult p) {
        return p.failures() < p.rebalances().size();
    }

    /** The ranked paths of one window, in run order. */
    public List<PathResult> rankedPaths(int window) {
        List<PathResult> ranked = rankedPaths();
        return paths(window).stream().filter(ranked::contains).toList();
    }

    /** The paths of one window, in run order. */
    public List<PathResult> paths(int window) {
        return run.paths().stream().filter(p -> p.window() == window).toList();
    }

    private static Summary find(List<Summary> summaries, String strategy, int window) {
        for (Summary s : summaries) {
            if (s.strategy().equals(strategy) && s.window().isPresent() && s.window().getAsInt() == window) {
                return s;
            }
        }
        throw new IllegalArgumentException("no summary row for strategy '" + strategy + "' and window " + window);
    }
}
