package dev.sigmawalk.reports.cli;

import dev.sigmawalk.reports.files.ScratchFolder;
import dev.sigmawalk.sample.SampleUniverse;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code sigmawalk demo [--out DIR]}: runs the built-in monthly study on the fictional sample
 * universe shipped inside the jar. The data are unpacked to a temporary folder first, so the
 * demo runs from any working directory.
 */
@Command(name = "demo", description = "Run the built-in study on the fictional sample universe.")
public final class DemoCommand implements Callable<Integer> {
    /** The demo unpacks the sample data into a folder of the system's temporary folder named so. */
    static final String SAMPLE_PREFIX = "sigmawalk-sample-";

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: sigmawalk-demo).")
    Path out;

    @Option(names = "--force", description = "Write into a non-empty folder sigmawalk did not write.")
    boolean force;

    @Option(names = "--quiet", description = "No progress line and no warnings on standard error (warnings stay in manifest.json and the report).")
    boolean quiet;

    @Option(names = "--daily", description = "Run the daily study instead of the monthly one.")
    boolean daily;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        Path unpacked;
        try {
            unpacked = ScratchFolder.create(Path.of(System.getProperty("java.io.tmpdir")), SAMPLE_PREFIX);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot create a temporary folder for the sample data", e);
        }
        // A stopped demo (SIGTERM, Ctrl-C) skips the finally below; the hook removes the sample data then.
        Thread cleanup = new Thread(() -> TempFiles.deleteQuietly(unpacked), "sigmawalk-sample-cleanup");
        Runtime.getRuntime().addShutdownHook(cleanup);
        try {
            Path study = daily ? SampleUniverse.extractTo(unpacked, "demo-daily.yaml") : SampleUniverse.extractTo(unpacked);
            Path target = out != null ? out : Paths.get("sigmawalk-demo");
            StudyRun.Options options = new StudyRun.Options(Optional.of(target), force, quiet,
                    Runtime.getRuntime().availableProcessors());
            StudyRun.Outcome outcome = StudyRun.execute(study, options, System.err,
                    WarningLines.to(spec.commandLine().getErr(), quiet));
            spec.commandLine().getOut().println("sigmawalk: wrote " + outcome.folder().resolve("report.html"));
            spec.commandLine().getOut().flush();
            return 0;
        } finally {
            TempFiles.deleteQuietly(unpacked);
            try {
                Runtime.getRuntime().removeShutdownHook(cleanup);
            } catch (IllegalStateException e) {
                // Shutting down already: the hook removes the folder.
            }
        }
    }
}
