package dev.sigmawalk.reports.cli;

import dev.sigmawalk.reports.sweep.SweepReader;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code sigmawalk run STUDY.yaml [--out DIR] [--force] [--quiet]}. */
@Command(name = "run", description = "Run a study: walk forward, write CSV files, charts and report.html.")
public final class RunCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "STUDY.yaml", description = "The study file.")
    Path studyFile;

    @Mixin
    StudyOptions options;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        SweepReader.requireStudy(studyFile, "`sigmawalk run`");
        StudyRun.Outcome outcome = StudyRun.execute(studyFile, options.toRun(), System.err,
                WarningLines.to(spec.commandLine().getErr(), options.quiet));
        spec.commandLine().getOut().println("sigmawalk: wrote " + outcome.folder().resolve("report.html"));
        spec.commandLine().getOut().flush();
        return 0;
    }
}
