package dev.sigmawalk.reports.sweep;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;

/**
 * One point of a sweep's grid, derived and validated.
 *
 * @param number 1-based position in grid order
 * @param label the point's folder name, {@code 001}, {@code 002}, ...
 * @param values the varied keys' values at this point, shown as in the sweep file, in axis order
 * @param folder the point's output folder {@code points/NNN} (absolute)
 * @param yaml the text of the point's {@code point.yaml}, relative paths written from {@code folder}
 */
public record GridPoint(int number, String label, List<String> values, Path folder, String yaml) {
    public GridPoint {
        if (!(number >= 1)) {
            throw new IllegalArgumentException("number (" + number + ") must be >= 1");
        }
        Objects.requireNonNull(label, "label");
        values = List.copyOf(values);
        Objects.requireNonNull(folder, "folder");
        Objects.requireNonNull(yaml, "yaml");
    }

    /** The study file of this point: {@code points/NNN/point.yaml}. */
    public Path studyFile() {
        return folder.resolve(PointRunner.STUDY_FILE);
    }

    /** The work one engine task does for this point. */
    PointTask task() {
        return new PointTask(number, folder.toString(), yaml);
    }
}
