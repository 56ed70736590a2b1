package dev.sigmawalk.reports.cli;

import dev.sigmawalk.engine.compare.Baselines;
import dev.sigmawalk.engine.compare.Comparison;
import dev.sigmawalk.engine.compare.PairScanPlan;
import dev.sigmawalk.engine.compare.WindowEvidence;
import dev.sigmawalk.engine.compare.WindowEvidenceProbe;
import dev.sigmawalk.engine.data.StudyData;
import dev.sigmawalk.engine.measures.Summary;
import dev.sigmawalk.engine.model.StrategyDefinition;
import dev.sigmawalk.engine.run.ProgressListener;
import dev.sigmawalk.engine.run.RunResult;
import dev.sigmawalk.engine.run.WalkForward;
import dev.sigmawalk.engine.study.Study;
import dev.sigmawalk.engine.study.StudyReader;
import dev.sigmawalk.reports.api.Runs;
import dev.sigmawalk.reports.files.EvidenceFiles;
import dev.sigmawalk.reports.files.FactorDiagnosticsFile;
import dev.sigmawalk.reports.files.Manifest;
import dev.sigmawalk.reports.files.OutputFolder;
import dev.sigmawalk.reports.files.ResultFiles;
import dev.sigmawalk.reports.files.SectorCorrelationsFile;
import dev.sigmawalk.reports.html.SectorGrids;
import dev.sigmawalk.strategies.FactorDiagnosticsProbe;
import dev.sigmawalk.strategies.StrategyCatalog;
import dev.sigmawalk.strategies.risk.FactorDiagnostics;
import java.io.PrintStream;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Consumer;

/**
 * Wires one run: read and validate the study and its data, prepare the output folder (refusing
 * a foreign one before any work), walk forward, measure, test, write every output into a
 * staging folder and move it into place only when all of it succeeded.
 */
public final class StudyRun {
    private StudyRun() {
    }

    /** Command-line choices of a run. */
    record Options(Optional<Path> out, boolean force, boolean quiet, int threads) {
        Options {
            ThreadCount.require(threads);
        }
    }

    /** Where the outputs went. */
    record Outcome(Path folder, List<Summary> summaries, RunResult<WindowEvidence> run) {
    }

    /** {@link #execute(Path, Options, PrintStream, Consumer)} with the warnings kept to the outputs. */
    static Outcome execute(Path studyFile, Options options, PrintStream err) {
        return execute(studyFile, options, err, w -> { });
    }

    /**
     * @param err where the progress line goes
     * @param warn receives every warning as soon as it is known: those of the data and of the
     *             preview before the walk, those of the results after it (all also go to the
     *             manifest and the report)
     */
    static Outcome execute(Path studyFile, Options options, PrintStream err, Consumer<String> warn) {
        Instant started = Instant.now();
        long begin = System.nanoTime();
        Study study = StudyReader.read(studyFile);
        StudyData data = StudyData.load(study);
        Path target = options.out().orElse(study.output());
        try (OutputFolder folder = OutputFolder.prepare(target, options.force(), inputs(study, data))) {
            ProgressListener progress = options.quiet() ? ProgressListener.NONE : new ProgressLine(err, System::nanoTime);
            Written written = writeInto(folder.staging(), study, data, options.threads(), progress, warn, started, begin);
            folder.commit();
            return new Outcome(folder.target(), written.summaries(), written.run());
        }
    }

    /** What {@link #writeInto} computed, besides the files. */
    public record Written(List<Summary> summaries, RunResult<WindowEvidence> run) {
    }

    /**
     * Walks forward, measures, tests and writes every output of a run of {@code study} into
     * {@code dir} (a staging folder the caller publishes). The files depend only on the study and
     * its data, never on {@code threads}, except the manifest's clock readings and thread count.
     *
     * @param warn receives every warning as soon as it is known (all also go to the manifest and the report)
     * @param started when the run began (for the manifest and the report)
     * @param begin {@link System#nanoTime} when reading the study began (for the manifest's timings)
     */
    public static Written writeInto(Path dir, Study study, StudyData data, int threads, ProgressListener progress,
                                    Consumer<String> warn, Instant started, long begin) {
        List<StrategyDefinition> strategies = StrategyCatalog.build(study, data);
        List<String> warnings = new ArrayList<>(Runs.warningsBeforeWalk(study, data));
        warnings.forEach(warn);
        long loaded = System.nanoTime();
        RunResult<WindowFindings> probed = new WalkForward<>(data.panel(), data.schedule(), strategies,
                study.walkForward().windows(), study.walkForward().costBps(),
                WindowFindings.probe(new WindowEvidenceProbe(data.sectors(), Runs.LARGEST_PAIRS,
                        PairScanPlan.of(data.schedule())),
                        FactorDiagnosticsProbe.of(study, data))).run(threads, progress);
        RunResult<WindowEvidence> run = WindowFindings.evidenceOnly(probed);
        Map<Integer, List<List<FactorDiagnostics>>> factorDiagnostics = WindowFindings.factorsOnly(probed);
        long walked = System.nanoTime();
        List<Summary> summaries;
        List<Comparison> comparisons;
        long tested;
        try (Workers workers = new Workers(threads)) {
            // The files of the walk itself need neither the measures, the tests nor the report:
            // the workers write them beside the PDF, whose layout keeps only one thread busy,
            // while the tests have every thread. Each large file is a task of its own, the
            // costliest first, so that both workers write while the PDF is laid out.
            List<Integer> windows = study.walkForward().windows();
            List<Runnable> runFiles = List.of(
                    () -> EvidenceFiles.writeEstimates(dir.resolve("estimates.csv"), run.probes(), windows),
                    () -> ResultFiles.writeWeights(dir.resolve("weights.csv"), run),
                    () -> ResultFiles.writeReturns(dir.resolve("returns.csv"), run),
                    () -> {
                        ResultFiles.writeRebalances(dir.resolve("rebalances.csv"), run);
                        EvidenceFiles.writeDiagnostics(dir.resolve("diagnostics.csv"), run.probes(), windows);
                        FactorDiagnosticsFile.write(dir.resolve("factor_diagnostics.csv"), factorDiagnostics, windows);
                        SectorCorrelationsFile.write(dir.resolve("sector_correlations.csv"), SectorGrids.of(
                                ReportStep.diagnostics(run, windows), ReportStep.flatten(factorDiagnostics)));
                    });
            summaries = Runs.summaries(run);
            comparisons = Runs.comparisons(study, run, threads);
            List<String> found = new ArrayList<>(Runs.warningsOfResults(run));
            found.addAll(Runs.warningsOfTests(comparisons));
            found.forEach(warn);
            warnings.addAll(found);
            ResultFiles.writeSummary(dir.resolve("summary.csv"), summaries);
            EvidenceFiles.writeTests(dir.resolve("tests.csv"), comparisons, Baselines.choices(study.strategies()));
            tested = System.nanoTime();
            ReportStep.write(dir, study, data, run, summaries, comparisons, warnings, started, factorDiagnostics,
                    workers.executor(), runFiles);
        }
        long reported = System.nanoTime();
        Map<String, Double> seconds = new LinkedHashMap<>();
        seconds.put("read_and_check", (loaded - begin) / 1e9);
        seconds.put("walk_forward", (walked - loaded) / 1e9);
        seconds.put("measures_tests_and_csv", (tested - walked) / 1e9);
        seconds.put("report", (reported - tested) / 1e9);
        Manifest.write(dir.resolve("manifest.json"), new Manifest.Content(VersionProvider.version(), study,
                data.panel(), data.periodsPerYearInferred(), data.fingerprints(), run, warnings, started,
                Instant.now(), threads, seconds));
        return new Written(summaries, run);
    }

    /** Every file the run reads: the study file and each data file. */
    private static List<Path> inputs(Study study, StudyData data) {
        List<Path> out = new ArrayList<>();
        out.add(study.file());
        data.fingerprints().forEach(f -> out.add(f.path()));
        return out;
    }

}
