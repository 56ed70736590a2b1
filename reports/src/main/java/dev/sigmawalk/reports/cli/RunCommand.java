package dev.sigmawalk.reports.cli;

import dev.sigmawalk.reports.sweep.SweepReader;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code sigmawalk run STUDY.yaml [--out DIR] [--force] [--quiet]}. */
@Command(name = "run", description = "Run a study: walk forward, write CSV files, charts and report.html.")
public final class RunCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "STUDY.yaml", description = "The study file.")
    Path studyFile;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (overrides the study's output:).")
    Path out;

    @Option(names = "--force", description = "Write into a non-empty folder sigmawalk did not write"
            + ", beside its files (a file sigmawalk did not write is never replaced: a clash of names is refused).")
    boolean force;

    @Option(names = "--quiet", description = "No progress line and no warnings on standard error (warnings stay in manifest.json and the report).")
    boolean quiet;

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads (default: all cores).")
    Integer threads;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        SweepReader.requireStudy(studyFile, "`sigmawalk run`");
        StudyRun.Options options = new StudyRun.Options(Optional.ofNullable(out), force, quiet,
                threads == null ? Runtime.getRuntime().availableProcessors() : threads);
        StudyRun.Outcome outcome = StudyRun.execute(studyFile, options, System.err,
                WarningLines.to(spec.commandLine().getErr(), quiet));
        spec.commandLine().getOut().println("sigmawalk: wrote " + outcome.folder().resolve("report.html"));
        spec.commandLine().getOut().flush();
        return 0;
    }
}
