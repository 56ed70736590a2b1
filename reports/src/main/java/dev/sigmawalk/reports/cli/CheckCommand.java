package dev.sigmawalk.reports.cli;

import dev.sigmawalk.engine.compare.BaselineChoice;
import dev.sigmawalk.engine.compare.Baselines;
import dev.sigmawalk.engine.data.AssetCoverage;
import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.data.StudyData;
import dev.sigmawalk.engine.study.AppliedDefaults;
import dev.sigmawalk.engine.study.Bounds;
import dev.sigmawalk.engine.study.DataSpec;
import dev.sigmawalk.engine.study.Objective;
import dev.sigmawalk.engine.study.RebalanceRule;
import dev.sigmawalk.engine.study.RiskKind;
import dev.sigmawalk.engine.study.SeriesSource;
import dev.sigmawalk.engine.study.StrategySpec;
import dev.sigmawalk.engine.study.Study;
import dev.sigmawalk.engine.study.StudyReader;
import dev.sigmawalk.engine.timeline.Schedule;
import dev.sigmawalk.reports.api.RunPreview;
import dev.sigmawalk.reports.files.OutputFolder;
import dev.sigmawalk.strategies.StrategyCatalog;
import dev.sigmawalk.reports.sweep.SweepCheck;
import dev.sigmawalk.reports.sweep.SweepReader;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code sigmawalk check STUDY.yaml}: reads and validates the study file and its data, prints
 * what it found, writes nothing and runs nothing. Exit 0 when everything is usable; an input
 * problem surfaces as an {@code InputException}, which the top command maps to exit code 2.
 */
@Command(name = "check", description = "Validate a study file and its data, print what was found; run nothing.")
public final class CheckCommand implements Callable<Integer> {
    /** Assets with missing rows listed by name before the rest are only counted. */
    static final int LISTED_ASSETS = 20;

    @Parameters(index = "0", paramLabel = "STUDY.yaml", description = "The study file (or a sweep file).")
    Path studyFile;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        if (SweepReader.isSweep(studyFile)) {
            SweepCheck.print(studyFile, spec.commandLine().getOut());
            return 0;
        }
        Study study = StudyReader.read(studyFile);
        StudyData data = StudyData.load(study);
        // Building the strategies applies the checks that need the data and the models (a window
        // too short for a model), exactly as a run does before it starts.
        StrategyCatalog.build(study, data);
        PrintWriter out = spec.commandLine().getOut();
        printData(out, study, data);
        printTimeline(out, study, data);
        printStrategies(out, study);
        RunPreview preview = RunPreview.of(study, data);
        if (!preview.feasibility().isEmpty()) {
            printList(out, "Bounds on the eligible assets at every rebalance", preview.feasibility());
        }
        List<String> applied = AppliedDefaults.of(study);
        printList(out, "Defaults applied (keys this study leaves out)", applied.isEmpty() ? List.of("none") : applied);
        List<String> warnings = new ArrayList<>(data.warnings());
        warnings.addAll(preview.warnings());
        outputProblem(study, data).ifPresent(warnings::add);
        printList(out, "Warnings", warnings.isEmpty() ? List.of("none") : warnings);
        out.println("Study is valid: " + study.file().getFileName());
        out.flush();
        return 0;
    }

    /**
     * Whether {@code sigmawalk run} without {@code --out} or {@code --force} could write the
     * study's output folder: a warning, not an error, since a run may name another folder.
     */
    private static Optional<String> outputProblem(Study study, StudyData data) {
        List<Path> inputs = new ArrayList<>();
        inputs.add(study.file());
        data.fingerprints().forEach(f -> inputs.add(f.path()));
        return OutputFolder.problem(study.output(), inputs)
                .map(p -> "output: a run without --out would stop here: " + p);
    }

    private static void printData(PrintWriter out, Study study, StudyData data) {
        ReturnPanel panel = data.panel();
        DataSpec spec = study.data();
        out.println("Study: " + study.title());
        out.println("Data: " + spec.assets().getFileName() + " (" + spec.values().spelling() + ")");
        out.println("  dates " + panel.date(0) + " to " + panel.date(panel.rows() - 1) + ", " + panel.rows()
                + " rows of returns, " + panel.assetCount() + " assets");
        out.println("  periods per year: " + panel.periodsPerYear()
                + (data.periodsPerYearInferred() ? " (inferred from the dates)" : " (given)"));
        out.println("  market: " + describe(spec.market()) + ", series '" + panel.marketName() + "'");
        out.println("  risk-free: " + describe(spec.riskFree()));
        spec.sectors().ifPresent(p -> out.println("  sectors: " + p.getFileName() + " (" + data.sectors().size()
                + " assets with a sector)"));
        printGaps(out, data.coverage());
    }

    private static void printGaps(PrintWriter out, List<AssetCoverage> coverage) {
        List<AssetCoverage> gappy = coverage.stream().filter(AssetCoverage::hasMissingRows).toList();
        out.println("  assets with missing rows: " + (gappy.isEmpty() ? "none" : gappy.size()));
        for (int i = 0; i < Math.min(LISTED_ASSETS, gappy.size()); i++) {
            AssetCoverage c = gappy.get(i);
            out.println("    " + c.asset() + ": " + c.first() + " to " + c.last() + ", " + count(c.missing(), "row")
                    + " missing (" + c.gaps() + " inside its span)");
        }
        if (gappy.size() > LISTED_ASSETS) {
            out.println("    and " + (gappy.size() - LISTED_ASSETS) + " more");
        }
    }

    private static String describe(SeriesSource source) {
        if (source instanceof SeriesSource.File f) {
            return "file " + f.path().getFileName();
        }
        if (source instanceof SeriesSource.Column c) {
            return "column '" + c.name() + "' of the assets file";
        }
        return "annual rate " + ((SeriesSource.AnnualRate) source).rate() + ", compounded to a per-period rate";
    }

    private static void printTimeline(PrintWriter out, Study study, StudyData data) {
        ReturnPanel panel = data.panel();
        Schedule schedule = data.schedule();
        RebalanceRule rule = study.walkForward().rebalance();
        out.println("Walk-forward: windows " + study.walkForward().windows() + ", rebalance "
                + (rule instanceof RebalanceRule.CalendarEnd c ? "at each " + c.calendar().spelling()
                        : "every " + count(((RebalanceRule.EveryRows) rule).rows(), "row"))
                + ", cost " + study.walkForward().costBps() + " bps");
        out.println("  first rebalance " + panel.date(schedule.firstRebalance()) + ", "
                + count(schedule.count(), "rebalance") + "; out-of-sample " + panel.date(schedule.firstRebalance() + 1) + " to "
                + panel.date(schedule.lastRow()) + " (" + count(schedule.outOfSampleRows(), "row") + ")");
        for (int window : study.walkForward().windows()) {
            out.println("  window " + window + ": first estimation date "
                    + panel.date(schedule.firstRebalance() - window + 1));
        }
    }

    private static void printStrategies(PrintWriter out, Study study) {
        out.println("Strategies: " + study.strategies().size());
        Map<String, BaselineChoice> baselines = new HashMap<>();
        Baselines.choices(study.strategies()).forEach(c -> baselines.put(c.strategy(), c));
        for (StrategySpec s : study.strategies()) {
            StringBuilder line = new StringBuilder("  " + s.name() + ": " + s.objective().spelling()
                    + ", risk " + s.risk().spelling());
            if (s.risk() == RiskKind.SHRINKAGE) {
                line.append(" toward ").append(s.shrinkageTarget().spelling());
            }
            line.append(s.bounds().map(CheckCommand::bounds).orElse(", no bounds (short sales allowed)"));
            if (s.objective() == Objective.MEAN_VARIANCE) {
                line.append(", risk aversion ").append(s.riskAversion());
            }
            if (s.objective().needsExpectedReturns()) {
                line.append(", expected returns ").append(s.expectedReturns().spelling());
                s.alphas().ifPresent(a -> line.append(", alphas ").append(a.getFileName()));
                s.marketPremium().ifPresent(m -> line.append(", market premium ").append(m).append(" a year"));
            }
            line.append("; ").append(baselines.get(s.name()).describe());
            out.println(line);
        }
    }

    private static void printList(PrintWriter out, String heading, List<String> lines) {
        out.println(heading + ":");
        for (String l : lines) {
            out.println("  " + l);
        }
    }

    /** "1 row", "2 rows". */
    private static String count(int n, String noun) {
        return n + " " + noun + (n == 1 ? "" : "s");
    }

    private static String bounds(Bounds b) {
        return ", bounds [" + b.lower() + ", " + b.upper() + "]";
    }
}
