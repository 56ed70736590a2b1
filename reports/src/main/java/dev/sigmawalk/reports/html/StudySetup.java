package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.compare.BaselineChoice;
import dev.sigmawalk.engine.compare.Baselines;
import dev.sigmawalk.engine.run.RunResult;
import dev.sigmawalk.engine.study.EvidenceSpec;
import dev.sigmawalk.engine.study.RebalanceRule;
import dev.sigmawalk.engine.study.SeriesSource;
import dev.sigmawalk.engine.study.StrategySpec;
import dev.sigmawalk.engine.study.Study;
import dev.sigmawalk.engine.study.WalkForwardSpec;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

/**
 * The "What was compared" section: every strategy with every setting and its baseline (or why
 * it has none), and the walk-forward settings every strategy shared.
 */
final class StudySetup {
    private StudySetup() {
    }

    static ReportView.Setup of(ReportData data) {
        Study study = data.study();
        Map<String, BaselineChoice> baselines = new HashMap<>();
        Baselines.choices(study.strategies()).forEach(c -> baselines.put(c.strategy(), c));
        List<ReportView.TextRow> rows = new ArrayList<>();
        for (StrategySpec s : study.strategies()) {
            rows.add(new ReportView.TextRow(StrategySettings.row(s, baseline(baselines.get(s.name())))));
        }
        return new ReportView.Setup(StrategySettings.HEADERS, rows, walkForward(data));
    }

    /** "plain-sample (how it was chosen)", or "None: why". */
    static String baseline(BaselineChoice c) {
        return c.baseline().map(b -> b + " (" + c.reason() + ")").orElse("None: " + c.reason());
    }

    static List<ReportView.Fact> walkForward(ReportData data) {
        Study study = data.study();
        WalkForwardSpec wf = study.walkForward();
        RunResult<?> run = data.run();
        int p = run.periodsPerYear();
        List<ReportView.Fact> facts = new ArrayList<>();
        facts.add(new ReportView.Fact("Estimation windows", wf.windows().stream().map(w -> windowWords(w, p))
                .collect(Collectors.joining("; ")) + ". Every strategy is run once with each window, and each "
                + "estimate uses only the window's rows before the rebalance date."));
        facts.add(new ReportView.Fact("Rebalancing", rebalancing(wf.rebalance()) + ", " + run.schedule().count()
                + " rebalances in all"));
        facts.add(new ReportView.Fact("Trading cost", Formats.basisPoints(wf.costBps()) + " of wealth per unit of "
                + "weight bought or sold, charged at each rebalance"));
        facts.add(new ReportView.Fact("Dates", "data " + data.record().dataFirst() + " to " + data.record().dataLast()
                + "; out of sample " + RunFacts.period(run) + limits(wf)));
        facts.add(new ReportView.Fact("Universe", data.record().assets() + " assets from "
                + study.data().assets().getFileName() + ", " + p + " periods a year; market: "
                + source(study.data().market()) + "; risk-free rate: " + source(study.data().riskFree())));
        EvidenceSpec e = study.evidence();
        facts.add(new ReportView.Fact("Significance tests", Formats.count(e.resamples()) + " bootstrap resamples, seed "
                + e.seed() + ", block length " + (e.blockLength() == 0 ? "chosen from the data" : e.blockLength()
                + " periods") + "; 5 % level"));
        return facts;
    }

    private static String windowWords(int w, int periodsPerYear) {
        double years = (double) w / periodsPerYear;
        String y = years == Math.rint(years) ? StrategySettings.plain(years) : Formats.oneDecimal(years);
        return Words.periods(w) + " (about " + y + (years == 1 ? " year)" : " years)");
    }

    static String rebalancing(RebalanceRule rule) {
        if (rule instanceof RebalanceRule.EveryRows e) {
            return e.rows() == 1 ? "Every period" : "Every " + e.rows() + " periods";
        }
        return "At each " + ((RebalanceRule.CalendarEnd) rule).calendar().spelling() + " in the data";
    }

    private static String limits(WalkForwardSpec wf) {
        String start = wf.start().map(d -> "; no rebalance before " + d).orElse("");
        String end = wf.end().map(d -> "; no row after " + d + " used").orElse("");
        return start + end;
    }

    private static String source(SeriesSource s) {
        if (s instanceof SeriesSource.File f) {
            return "file " + f.path().getFileName();
        }
        if (s instanceof SeriesSource.Column c) {
            return "column " + c.name() + " of the assets file";
        }
        return Formats.percent(((SeriesSource.AnnualRate) s).rate()) + " a year";
    }
}
