package dev.sigmawalk.reports.cli;

import dev.sigmawalk.reports.sweep.SweepEngine;
import dev.sigmawalk.reports.sweep.SweepRun;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code sigmawalk sweep SWEEP.yaml [--out DIR] [--force] [--engine in-process|spark]}. Exit 0
 * when every point ran or was reused, 1 when some point failed (the others finished and every
 * output was written), 2 for a bad sweep file, base study or grid point (before any work).
 */
@Command(name = "sweep", description = "Run a grid of studies: a base study with varied keys; one folder per point,"
        + " plus sweep.csv, sweep.html and manifest.json.")
public final class SweepCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "SWEEP.yaml", description = "The sweep file.")
    Path sweepFile;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (overrides the sweep's output:).")
    Path out;

    @Option(names = "--force", description = "Write into a non-empty folder sigmawalk did not write"
            + ", beside its files (a file sigmawalk did not write is never replaced: a clash of names is refused).")
    boolean force;

    @Option(names = "--quiet", description = "No progress lines on standard error.")
    boolean quiet;

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads of the in-process engine (default: all cores).")
    Integer threads;

    @Option(names = "--engine", paramLabel = "NAME", description = "in-process (default) or spark (default when"
            + " launched through spark-submit).")
    String engine;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        int n = ThreadCount.require(threads == null ? Runtime.getRuntime().availableProcessors() : threads);
        SweepEngine chosen = SweepEngine.choose(Optional.ofNullable(engine), n);
        SweepRun.Outcome outcome = SweepRun.execute(sweepFile, new SweepRun.Options(Optional.ofNullable(out), force, quiet),
                chosen, System.err);
        spec.commandLine().getOut().println("sigmawalk: wrote " + outcome.folder().resolve("sweep.html")
                + (outcome.failed() > 0 ? " (" + outcome.failed() + " of " + outcome.points().size()
                        + " points failed; see sweep.csv)" : ""));
        spec.commandLine().getOut().flush();
        return outcome.failed() > 0 ? SigmawalkCommand.EXIT_FAILURE : 0;
    }
}
