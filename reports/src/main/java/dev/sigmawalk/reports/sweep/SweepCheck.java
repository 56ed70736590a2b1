package dev.sigmawalk.reports.sweep;

import dev.sigmawalk.engine.data.InputException;
import dev.sigmawalk.engine.data.StudyData;
import dev.sigmawalk.engine.study.Study;
import dev.sigmawalk.engine.study.StudyReader;
import dev.sigmawalk.reports.files.OutputFolder;
import dev.sigmawalk.strategies.StrategyCatalog;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * {@code sigmawalk check SWEEP.yaml}: validates the sweep file and every grid point's study and
 * data, as {@code check} does for one study, prints one line per point, and runs nothing.
 */
public final class SweepCheck {
    private SweepCheck() {
    }

    /**
     * @throws InputException for a bad sweep file or base study, or naming every point whose data
     *                        cannot be used
     */
    public static void print(Path sweepFile, PrintWriter out) {
        SweepFile sweep = SweepReader.read(sweepFile);
        SweepPlan plan = SweepPlanner.plan(sweep, sweep.output());
        out.println("Sweep: " + sweep.title());
        out.println("Base study: " + sweep.study());
        for (Axis a : sweep.axes()) {
            List<String> shown = new ArrayList<>();
            for (int i = 0; i < a.values().size(); i++) {
                shown.add(a.label(i));
            }
            out.println("  vary " + a.key() + ": " + String.join("; ", shown));
        }
        out.println("Grid: " + SweepPage.count(plan.points().size(), "point") + ", output " + plan.out());
        OutputFolder.problem(plan.out(), List.of(sweep.file(), plan.base().file()))
                .ifPresent(p -> out.println("  warning: a sweep without --out would stop here: " + p));
        List<String> problems = new ArrayList<>();
        for (GridPoint p : plan.points()) {
            out.println("  point " + p.label() + " " + String.join(", ", p.values()) + ": " + describe(p, problems));
        }
        out.flush();
        if (!problems.isEmpty()) {
            throw new InputException(sweep.file().getFileName() + ": " + SweepPage.count(problems.size(), "point")
                    + " of " + plan.points().size() + " cannot run; first: " + problems.get(0));
        }
        out.println("Sweep is valid: " + sweep.file().getFileName());
        out.flush();
    }

    private static String describe(GridPoint p, List<String> problems) {
        try {
            Study study = StudyReader.read(p.studyFile(), p.yaml());
            StudyData data = StudyData.load(study);
            StrategyCatalog.build(study, data);
            return data.panel().assetCount() + " assets, " + data.panel().rows() + " rows, "
                    + SweepPage.count(data.schedule().count(), "rebalance")
                    + (data.warnings().isEmpty() ? "" : ", " + SweepPage.count(data.warnings().size(), "warning"));
        } catch (InputException e) {
            problems.add("point " + p.label() + ": " + e.getMessage());
            return "cannot run: " + e.getMessage();
        }
    }
}
