package dev.sigmawalk.reports.cli;

import java.nio.file.Path;
import java.util.Optional;
import picocli.CommandLine.Option;

/** The options of a command that runs one study ({@code run}, {@code watch}), shared as a picocli mixin. */
final class StudyOptions {
    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (overrides the study's output:).")
    Path out;

    @Option(names = "--force", description = "Write into a non-empty folder sigmawalk did not write"
            + ", beside its files (a file sigmawalk did not write is never replaced: a clash of names is refused).")
    boolean force;

    @Option(names = "--quiet", description = "No progress line and no warnings on standard error (warnings stay in manifest.json and the report).")
    boolean quiet;

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads (default: all cores).")
    Integer threads;

    /** The choices as a run takes them; the thread count defaults to every core. */
    StudyRun.Options toRun() {
        return new StudyRun.Options(Optional.ofNullable(out), force, quiet,
                threads == null ? Runtime.getRuntime().availableProcessors() : threads);
    }
}
