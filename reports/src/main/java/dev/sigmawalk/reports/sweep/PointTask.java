package dev.sigmawalk.reports.sweep;

import java.io.Serializable;
import java.util.Objects;

/**
 * What an engine ships to a worker for one grid point: a few kilobytes of text, never the data.
 * The worker reads the point's input files itself from the path the study names (a folder every
 * worker sees), exactly as {@code sigmawalk run} would.
 *
 * @param number the point's 1-based grid position
 * @param folder the point's output folder, absolute
 * @param yaml the point's study text
 */
public record PointTask(int number, String folder, String yaml) implements Serializable {
    private static final long serialVersionUID = 1L;

    public PointTask {
        Objects.requireNonNull(folder, "folder");
        Objects.requireNonNull(yaml, "yaml");
    }
}
