package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.run.PathResult;
import dev.sigmawalk.engine.run.RebalanceRecord;
import dev.sigmawalk.engine.run.RunResult;
import dev.sigmawalk.engine.study.RebalanceRule;
import dev.sigmawalk.engine.study.WalkForwardSpec;
import java.time.Duration;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

/** The run record section: facts, input fingerprints, warnings and failed solves. */
final class RunFacts {
    private static final DateTimeFormatter UTC = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss 'UTC'")
            .withZone(ZoneOffset.UTC);

    private RunFacts() {
    }

    static ReportView.Record of(ReportData data) {
        RunRecord r = data.record();
        RunResult<?> run = data.run();
        WalkForwardSpec wf = data.study().walkForward();
        List<ReportView.Fact> facts = new ArrayList<>();
        facts.add(new ReportView.Fact("Study", data.study().title()));
        facts.add(new ReportView.Fact("Data", r.dataFirst() + " to " + r.dataLast() + ", " + r.assets() + " assets, "
                + run.periodsPerYear() + " periods a year"));
        facts.add(new ReportView.Fact("Out-of-sample period", period(run)));
        facts.add(new ReportView.Fact("Estimation windows", data.windows().stream().map(String::valueOf)
                .collect(Collectors.joining(", ")) + " periods"));
        facts.add(new ReportView.Fact("Rebalancing", rebalancing(wf.rebalance()) + ", " + run.schedule().count()
                + " rebalances"));
        facts.add(new ReportView.Fact("Trading cost", Formats.basisPoints(wf.costBps()) + " per unit of weight traded"));
        facts.add(new ReportView.Fact("Strategies", data.study().strategies().size() + " (" + Words.list(
                data.study().strategies().stream().map(s -> s.name()).toList()) + ")"));
        facts.add(new ReportView.Fact("Tool version", r.toolVersion()));
        facts.add(new ReportView.Fact("Run started", UTC.format(r.started())));
        facts.add(new ReportView.Fact("Run took", seconds(Duration.between(r.started(), r.finished()))));
        return new ReportView.Record(facts, r.inputs(), r.warnings(), failedSolves(run));
    }

    static String period(RunResult<?> run) {
        return run.dates()[0] + " to " + run.dates()[run.dates().length - 1] + " (" + run.dates().length + " periods)";
    }

    private static String rebalancing(RebalanceRule rule) {
        if (rule instanceof RebalanceRule.EveryRows e) {
            return e.rows() == 1 ? "every period" : "every " + e.rows() + " periods";
        }
        return "at each " + ((RebalanceRule.CalendarEnd) rule).calendar().spelling();
    }

    private static String seconds(Duration d) {
        return Formats.oneDecimal(d.toMillis() / 1000.0) + " s";
    }

    private static List<String> failedSolves(RunResult<?> run) {
        List<String> out = new ArrayList<>();
        for (PathResult p : run.paths()) {
            for (RebalanceRecord r : p.rebalances()) {
                r.failure().ifPresent(reason -> out.add(r.date() + ", " + p.strategy() + ", "
                        + Words.periods(p.window()) + ": " + reason));
            }
        }
        return out;
    }
}
