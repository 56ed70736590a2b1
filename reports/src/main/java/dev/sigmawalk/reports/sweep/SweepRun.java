package dev.sigmawalk.reports.sweep;

import dev.sigmawalk.engine.data.InputException;
import dev.sigmawalk.engine.evidence.DifferenceTests;
import dev.sigmawalk.engine.evidence.HacKernel;
import dev.sigmawalk.reports.cli.VersionProvider;
import dev.sigmawalk.reports.files.OutputFolder;
import dev.sigmawalk.reports.files.SweepFiles;
import java.io.IOException;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;

/**
 * Wires one sweep: read the sweep file and validate every point's study (before any work),
 * claim the output folder, keep the points whose outputs are complete and current, run the rest
 * on the chosen engine (each point published whole), then read every finished point back and
 * write {@code sweep.csv}, {@code sweep.html} and {@code manifest.json}, published together.
 */
public final class SweepRun {
    private SweepRun() {
    }

    /** Command-line choices of a sweep. */
    public record Options(Optional<Path> out, boolean force, boolean quiet) {
    }

    /** Where the outputs went and how each point ended. */
    public record Outcome(Path folder, List<PointOutcome> points, GridEvidence evidence) {
        /** Number of points that failed. */
        public long failed() {
            return points.stream().filter(p -> p.status() == PointOutcome.Status.FAILED).count();
        }
    }

    /**
     * @throws InputException for a bad sweep file, base study or grid point, or a foreign output
     *                        folder, before any point runs
     */
    public static Outcome execute(Path sweepFile, Options options, SweepEngine engine, PrintStream err) {
        Instant started = Instant.now();
        SweepFile sweep = SweepReader.read(sweepFile);
        SweepPlan plan = SweepPlanner.plan(sweep, options.out().orElse(sweep.output()));
        List<Path> inputs = List.of(sweep.file(), plan.base().file());
        claim(plan.out(), options.force(), inputs);
        PointReuse reuse = new PointReuse(VersionProvider.version());
        List<PointOutcome> outcomes = new ArrayList<>();
        List<PointTask> tasks = new ArrayList<>();
        for (GridPoint p : plan.points()) {
            if (reuse.reusable(p)) {
                outcomes.add(new PointOutcome(p.number(), PointOutcome.Status.REUSED, "", 0));
            } else {
                tasks.add(p.task());
            }
        }
        Consumer<PointOutcome> progress = options.quiet() ? o -> { } : progress(err, plan, tasks.size());
        outcomes.addAll(engine.run(tasks, options.force(), progress));
        outcomes.sort(Comparator.comparingInt(PointOutcome::number));
        return publish(plan, outcomes, engine, started, options.force(), inputs);
    }

    /** One line per summary row of every finished point, one per failed point, in grid order. */
    private static List<SweepFiles.Line> lines(SweepPlan plan, List<PointOutcome> outcomes, List<PointRow> rows,
                                               GridEvidence evidence) {
        List<SweepFiles.Line> lines = new ArrayList<>();
        int next = 0;
        for (PointOutcome o : outcomes) {
            GridPoint p = plan.points().get(o.number() - 1);
            if (!o.hasOutputs()) {
                lines.add(new SweepFiles.Line(p.label(), p.values(), "", "", Double.NaN, Double.NaN, Double.NaN,
                        Double.NaN, o.status().spelling(), o.reason(), SweepFiles.Comparison.NONE));
                continue;
            }
            while (next < rows.size() && rows.get(next).point().equals(p)) {
                PointRow r = rows.get(next++);
                lines.add(new SweepFiles.Line(p.label(), p.values(), r.strategy(), r.window(), r.volatility(), r.sharpe(),
                        r.meanTurnover(), r.bias(), o.status().spelling(), "", comparison(evidence, r)));
            }
        }
        return lines;
    }

    /** The row's comparison columns: its baseline, grid family and Holm p-values, or why it has none. */
    private static SweepFiles.Comparison comparison(GridEvidence e, PointRow r) {
        int t = GridEvidence.indexOf(e.comparisons(), r);
        if (t < 0) {
            return SweepFiles.Comparison.NONE;
        }
        PointComparison c = e.comparisons().get(t);
        double family = e.family().member(c).map(GridFamily.Member::adjusted).orElse(Double.NaN);
        return new SweepFiles.Comparison(c.baseline(), family, e.holm()[t], e.family().note(c));
    }

    /** Publishes the (possibly empty) folder at once, so that an interrupted sweep's folder is still sigmawalk's. */
    private static void claim(Path out, boolean force, List<Path> inputs) {
        try (OutputFolder folder = OutputFolder.prepare(out, force, inputs)) {
            folder.commit();
        }
    }

    private static void retractStale(SweepPlan plan, List<PointOutcome> outcomes, List<Path> inputs) {
        try {
            StalePoints.retract(plan, outcomes, inputs);
        } catch (IOException | UncheckedIOException e) {
            // The grid is published and its files name only its own points; a folder of an earlier
            // grid that cannot be removed stays as it was, and the next sweep here tries again.
        }
    }

    private static Consumer<PointOutcome> progress(PrintStream err, SweepPlan plan, int total) {
        int[] done = {0};
        return o -> {
            done[0]++;
            err.println("sigmawalk: sweep point " + plan.points().get(o.number() - 1).label() + " " + o.status().spelling()
                    + " (" + done[0] + " of " + total + ")" + (o.reason().isEmpty() ? "" : ": " + o.reason()));
            err.flush();
        };
    }

    private static Outcome publish(SweepPlan plan, List<PointOutcome> outcomes, SweepEngine engine, Instant started,
                                   boolean force, List<Path> inputs) {
        List<PointRow> rows = new ArrayList<>();
        List<ContrastReturns> candidates = new ArrayList<>();
        for (PointOutcome o : outcomes) {
            if (o.hasOutputs()) {
                GridPoint p = plan.points().get(o.number() - 1);
                rows.addAll(PointFiles.summary(p));
                candidates.addAll(PointFiles.contrasts(p, PointFiles.varianceTests(p)));
            }
        }
        // The grid's evidence is computed here, on the driver, from the published files alone,
        // so it is the same whichever engine ran the points and in whatever order they finished.
        GridEvidence evidence = GridEvidence.of(rows, candidates,
                new DifferenceTests(HacKernel.PARZEN, plan.base().evidence()), engine.driverThreads());
        List<SweepFiles.Line> lines = lines(plan, outcomes, rows, evidence);
        List<HeatMap> maps = HeatMap.of(plan.sweep(), rows);
        try (OutputFolder folder = OutputFolder.prepare(plan.out(), force, inputs)) {
            Path dir = folder.staging();
            SweepFiles.writeSweep(dir.resolve("sweep.csv"), plan.keys(), lines);
            Instant finished = Instant.now();
            new SweepPage().write(dir.resolve("sweep.html"),
                    new SweepPage.Content(plan, outcomes, maps, evidence, engine.describe(), started, finished));
            SweepManifest.write(dir.resolve("manifest.json"), new SweepManifest.Content(VersionProvider.version(), plan,
                    outcomes, evidence, engine.describe(), started, finished));
            folder.commit();
            retractStale(plan, outcomes, inputs);
            return new Outcome(folder.target(), outcomes, evidence);
        }
    }
}
