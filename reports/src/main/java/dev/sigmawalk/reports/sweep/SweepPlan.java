package dev.sigmawalk.reports.sweep;

import dev.sigmawalk.engine.study.Study;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;

/**
 * A sweep ready to run: the sweep file, its base study and every grid point, all validated.
 *
 * @param sweep the sweep file as read
 * @param base the base study as read
 * @param out the sweep's output folder (absolute)
 * @param points every grid point in grid order
 */
public record SweepPlan(SweepFile sweep, Study base, Path out, List<GridPoint> points) {
    /** Subfolder of the output folder holding one folder per point. */
    public static final String POINTS = "points";

    public SweepPlan {
        Objects.requireNonNull(sweep, "sweep");
        Objects.requireNonNull(base, "base");
        Objects.requireNonNull(out, "out");
        points = List.copyOf(points);
        if (points.size() != sweep.size()) {
            throw new IllegalArgumentException("a plan of " + sweep.size() + " points holds " + points.size());
        }
    }

    /** The varied keys, in axis order. */
    public List<String> keys() {
        return sweep.axes().stream().map(Axis::key).toList();
    }
}
