package dev.sigmawalk.reports.sweep;

import dev.sigmawalk.engine.study.StudyFiles;
import dev.sigmawalk.engine.study.StudyReader;
import dev.sigmawalk.reports.files.Retraction;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;

/**
 * Point folders that an earlier, larger or different grid published into the same sweep folder
 * and that this grid has no point for, or has a point for that failed this time. Left in place
 * they would sit beside the current points as if they were this grid's results, so once the
 * sweep is published they are retracted: the files sigmawalk wrote there go, files the user
 * added stay.
 */
final class StalePoints {
    private StalePoints() {
    }

    /**
     * @param outcomes how each point of this grid ended
     * @param inputs the sweep's own inputs (sweep file, base study); every point's data files are added
     * @return the point folders taken back (some may keep files the user added)
     */
    static List<Path> retract(SweepPlan plan, List<PointOutcome> outcomes, List<Path> inputs) throws IOException {
        Path points = plan.out().resolve(SweepPlan.POINTS);
        if (!Files.isDirectory(points)) {
            return List.of();
        }
        Set<String> current = new LinkedHashSet<>();
        for (PointOutcome o : outcomes) {
            if (o.hasOutputs()) {
                current.add(plan.points().get(o.number() - 1).label());
            }
        }
        List<Path> stale = new ArrayList<>();
        try (Stream<Path> s = Files.list(points)) {
            s.filter(p -> p.getFileName().toString().matches("[0-9]+") && !current.contains(p.getFileName().toString()))
                    .filter(Files::isDirectory).sorted().forEach(stale::add);
        }
        if (stale.isEmpty()) {
            return List.of();
        }
        Set<Path> keep = new LinkedHashSet<>(inputs);
        for (GridPoint p : plan.points()) {
            // The first file is the point's own point.yaml, an output of the point, not an input.
            List<Path> files = StudyFiles.of(StudyReader.read(p.studyFile(), p.yaml()));
            keep.addAll(files.subList(1, files.size()));
        }
        List<Path> done = new ArrayList<>();
        for (Path dir : stale) {
            Retraction.retract(dir, List.copyOf(keep));
            done.add(dir);
        }
        return done;
    }
}
