package dev.sigmawalk.reports.cli;

import dev.sigmawalk.engine.data.InputException;
import dev.sigmawalk.engine.study.StudyFiles;
import dev.sigmawalk.engine.study.StudyReader;
import dev.sigmawalk.reports.sweep.SweepReader;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code sigmawalk watch STUDY.yaml [--out DIR] [--force] [--quiet] [--threads N] [--stop-after N]}:
 * runs the study as {@code run} does, then again each time the study file or one of its data
 * files is saved, until stopped. A run that fails (a bad edit) prints its one-line message, as
 * {@code run} would, and the command waits for the next save; the output folder keeps the last
 * run that succeeded, since a run publishes its outputs only when all of them are written.
 */
@Command(name = "watch", description = {"Run a study, then run it again each time its study file or a data file is saved.",
        "With --quiet, no notes about watching either."})
public final class WatchCommand implements Callable<Integer> {
    /** Time between two looks at the files. */
    static final long POLL_MILLIS = 300;

    @Parameters(index = "0", paramLabel = "STUDY.yaml", description = "The study file.")
    Path studyFile;

    @Mixin
    StudyOptions choices;

    @Option(names = "--stop-after", paramLabel = "N", description = "Stop after N runs, failed or not, with the"
            + " last run's exit code (default: run until stopped with Ctrl-C).")
    int stopAfter;

    @Spec
    CommandSpec spec;

    /** The files of the last study that could be read: still watched while an edit breaks the study. */
    private List<Path> lastNamed = List.of();

    @Override
    public Integer call() throws InterruptedException {
        if (stopAfter < 0) {
            throw new CommandLine.ParameterException(spec.commandLine(),
                    "--stop-after must be >= 0 (0: until stopped), not " + stopAfter);
        }
        Path study = studyFile.toAbsolutePath().normalize();
        if (!Files.isRegularFile(study)) {
            throw new InputException("study file " + study + (Files.exists(study) ? " is not a file" : " does not exist"));
        }
        if (isSweep(study)) {
            // SweepReader.requireStudy's words; its YAML errors are left to the first run, whose
            // message the watch reports before waiting for a fix.
            throw new InputException(study.getFileName() + " is a sweep file (it has vary:); `sigmawalk watch` takes a"
                    + " study file, and `sigmawalk sweep " + study.getFileName() + "` runs a sweep");
        }
        StudyRun.Options options = choices.toRun();
        boolean quiet = choices.quiet;
        PrintWriter err = spec.commandLine().getErr();
        StudyWatch watch = new StudyWatch(POLL_MILLIS, Thread::sleep, line -> {
            if (!quiet) {
                err.println("sigmawalk: " + line);
                err.flush();
            }
        });
        // The files are known before the first run, so a data file saved during it counts too.
        return watch.watch(named(study, List.of()), () -> runOnce(study, options), stopAfter);
    }

    /** One run, reported as {@code run} reports it; a failure is reported and does not end the watch. */
    private StudyWatch.Result runOnce(Path study, StudyRun.Options options) {
        List<Path> files = named(study, lastNamed);
        lastNamed = files;
        CommandLine cl = spec.commandLine();
        long begin = System.nanoTime();
        try {
            StudyRun.Outcome outcome = StudyRun.execute(study, options, System.err,
                    WarningLines.to(cl.getErr(), options.quiet()));
            cl.getOut().println("sigmawalk: wrote " + outcome.folder().resolve("report.html")
                    + String.format(Locale.ROOT, " in %.1f s", (System.nanoTime() - begin) / 1e9));
            cl.getOut().flush();
            return new StudyWatch.Result(0, files);
        } catch (RuntimeException e) {
            try {
                return new StudyWatch.Result(cl.getExecutionExceptionHandler()
                        .handleExecutionException(e, cl, cl.getParseResult()), files);
            } catch (Exception unreported) {
                throw e;
            }
        }
    }

    /**
     * The files the study names; while the study cannot be read, the study file and the files of
     * the last study that could be (a data file saved meanwhile still starts a run).
     */
    private static List<Path> named(Path study, List<Path> before) {
        try {
            return StudyFiles.of(StudyReader.read(study));
        } catch (InputException e) {
            return before.isEmpty() ? List.of(study) : before;
        }
    }

    private static boolean isSweep(Path study) {
        try {
            return SweepReader.isSweep(study);
        } catch (InputException e) {
            // Not readable as YAML yet: the first run reports where, and the watch waits for a fix.
            return false;
        }
    }
}
