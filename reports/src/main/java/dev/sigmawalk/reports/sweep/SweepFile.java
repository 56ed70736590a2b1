package dev.sigmawalk.reports.sweep;

import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * A sweep file as read: a base study and the study keys to vary. The grid is the cartesian
 * product of the axes' values in file order, the first axis varying slowest.
 *
 * @param file the sweep file itself (absolute)
 * @param title free text shown on the sweep page
 * @param study the base study file, resolved against the sweep file's folder
 * @param axes at least one, keys distinct
 * @param output the sweep's output folder, resolved against the sweep file's folder
 */
public record SweepFile(Path file, String title, Path study, List<Axis> axes, Path output) {
    public SweepFile {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(study, "study");
        axes = List.copyOf(axes);
        Objects.requireNonNull(output, "output");
        if (axes.isEmpty()) {
            throw new IllegalArgumentException("a sweep needs at least one varied key");
        }
        Set<String> keys = new HashSet<>();
        for (Axis a : axes) {
            if (!keys.add(a.key())) {
                throw new IllegalArgumentException("varied key '" + a.key() + "' is given twice");
            }
        }
    }

    /** Number of grid points: the product of the axes' value counts. */
    public int size() {
        long n = 1;
        for (Axis a : axes) {
            n *= a.values().size();
        }
        return Math.toIntExact(n);
    }

    /** The value index of each axis at grid point {@code p} (0-based), the last axis varying fastest. */
    public int[] coordinates(int p) {
        int[] at = new int[axes.size()];
        int rest = p;
        for (int a = axes.size() - 1; a >= 0; a--) {
            int n = axes.get(a).values().size();
            at[a] = rest % n;
            rest /= n;
        }
        return at;
    }
}
