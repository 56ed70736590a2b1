package dev.sigmawalk.reports.sweep;

import dev.sigmawalk.engine.data.InputException;
import dev.sigmawalk.engine.study.YamlNode;
import dev.sigmawalk.engine.study.YamlTree;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * Reads a sweep file (YAML: {@code title}, {@code study}, {@code vary}, {@code output}). Checks
 * its own shape only; whether every grid point is a valid study is {@link SweepPlanner}'s job.
 * Every message names the sweep file, line and column.
 */
public final class SweepReader {
    /** Grids larger than this are almost certainly a typing slip, and would fill a disk. */
    static final int MAX_POINTS = 100_000;
    private static final Set<String> ROOT = Set.of("title", "study", "vary", "output");
    /** Keys only a study file has at its top level: a file with them and no vary: is a study. */
    private static final Set<String> STUDY_KEYS = Set.of("data", "walkforward", "strategies");
    /** Keys the sweep itself sets in every point. */
    private static final Set<String> RESERVED = Set.of("title", "output");
    private static final Pattern KEY = Pattern.compile("[A-Za-z0-9_-]+(\\.[A-Za-z0-9_-]+)*");
    private static final String DEFAULT_OUTPUT = "sweep-out";

    private SweepReader() {
    }

    /** Whether {@code file} is a sweep file rather than a study: its top level has {@code vary}. */
    public static boolean isSweep(Path file) {
        YamlNode root = YamlTree.parse(file.toAbsolutePath().normalize());
        return root instanceof YamlNode.Mapping m && m.entries().containsKey("vary");
    }

    /**
     * Refuses a sweep file where a study file is expected, saying which command runs it.
     *
     * @param taker what expected a study file, such as {@code `sigmawalk run`}
     * @throws InputException when {@code file} is a sweep file
     */
    public static void requireStudy(Path file, String taker) {
        if (Files.isRegularFile(file) && isSweep(file)) {
            throw new InputException(file.getFileName() + " is a sweep file (it has vary:); " + taker + " takes a study"
                    + " file, and `sigmawalk sweep " + file.getFileName() + "` runs a sweep");
        }
    }

    /**
     * @throws InputException naming the sweep file, line and column of the first problem
     */
    public static SweepFile read(Path sweepFile) {
        Path file = sweepFile.toAbsolutePath().normalize();
        YamlNode root = YamlTree.parse(file);
        if (!(root instanceof YamlNode.Mapping m)) {
            throw InputException.at(file, root.line(), root.column(), "the sweep file is " + root.describe()
                    + "; expected keys title, study, vary, output");
        }
        if (!m.entries().containsKey("vary") && STUDY_KEYS.stream().anyMatch(m.entries()::containsKey)) {
            throw InputException.at(file, m.line(), m.column(), "this is a study file, not a sweep (it has no vary:);"
                    + " `sigmawalk run " + file.getFileName() + "` runs it, or a sweep file names it as its study: "
                    + file.getFileName());
        }
        for (YamlNode.Entry e : m.entries().values()) {
            if (!ROOT.contains(e.key())) {
                throw InputException.at(file, e.line(), e.column(), "unknown key '" + e.key()
                        + "' in the sweep file; valid keys: output, study, title, vary");
            }
        }
        String title = m.entries().containsKey("title") ? text(file, m.entries().get("title")) : "Sweep";
        YamlNode.Entry study = required(file, m, "study");
        Path base = file.getParent().resolve(text(file, study)).normalize();
        if (Files.isRegularFile(base) && isSweep(base)) {
            throw InputException.at(file, study.value().line(), study.value().column(), "study: " + text(file, study)
                    + " is itself a sweep file (it has vary:); expected a study file, the one study a sweep varies");
        }
        List<Axis> axes = axes(file, required(file, m, "vary"));
        String output = m.entries().containsKey("output") ? text(file, m.entries().get("output")) : DEFAULT_OUTPUT;
        requireSize(file, m.entries().get("vary").value(), axes);
        return new SweepFile(file, title, base, axes, file.getParent().resolve(output).normalize());
    }

    private static YamlNode.Entry required(Path file, YamlNode.Mapping m, String key) {
        YamlNode.Entry e = m.entries().get(key);
        if (e == null) {
            throw InputException.at(file, m.line(), m.column(), "missing key '" + key + "'; a sweep file needs "
                    + ("study".equals(key) ? "the base study file, such as study: base.yaml"
                            : "the keys to vary, such as vary: {walkforward.cost_bps: [5, 20]}"));
        }
        return e;
    }

    private static String text(Path file, YamlNode.Entry e) {
        if (e.value() instanceof YamlNode.Scalar s && s.text() != null && !s.text().isBlank()
                && s.kind() != YamlNode.Scalar.Kind.NULL) {
            return s.text().strip();
        }
        throw InputException.at(file, e.value().line(), e.value().column(), e.key() + ": " + e.value().describe()
                + " is not usable here; expected a text value");
    }

    private static List<Axis> axes(Path file, YamlNode.Entry vary) {
        if (!(vary.value() instanceof YamlNode.Mapping m) || m.entries().isEmpty()) {
            throw InputException.at(file, vary.value().line(), vary.value().column(), "vary: " + vary.value().describe()
                    + " is not usable; expected a mapping of dotted study keys to lists of values,"
                    + " such as walkforward.cost_bps: [5, 20]");
        }
        List<Axis> axes = new ArrayList<>();
        for (YamlNode.Entry e : m.entries().values()) {
            axes.add(axis(file, e));
        }
        return axes;
    }

    private static Axis axis(Path file, YamlNode.Entry e) {
        if (!KEY.matcher(e.key()).matches()) {
            throw InputException.at(file, e.line(), e.column(), "vary key '" + e.key() + "' is not a dotted study key;"
                    + " expected names joined by '.', such as walkforward.windows or strategies.shrunk.bounds");
        }
        String head = e.key().split("\\.", -1)[0];
        if (RESERVED.contains(head)) {
            throw InputException.at(file, e.line(), e.column(), "vary key '" + e.key() + "' cannot be varied: the sweep"
                    + " sets the " + head + " of every point itself");
        }
        if (!(e.value() instanceof YamlNode.Sequence s) || s.items().isEmpty()) {
            throw InputException.at(file, e.value().line(), e.value().column(), "vary." + e.key() + ": "
                    + e.value().describe() + " is not usable; expected a non-empty list of values to try, such as [5, 20]"
                    + " (a list value such as windows is written inside the list: [[36], [60, 120]])");
        }
        List<String> seen = new ArrayList<>();
        for (YamlNode v : s.items()) {
            String shown = YamlText.flow(v);
            if (seen.contains(shown)) {
                throw InputException.at(file, v.line(), v.column(), "vary." + e.key() + ": " + shown
                        + " is listed twice; expected distinct values");
            }
            seen.add(shown);
        }
        return new Axis(e.key(), e.line(), e.column(), s.items());
    }

    private static void requireSize(Path file, YamlNode vary, List<Axis> axes) {
        long n = 1;
        for (Axis a : axes) {
            n *= a.values().size();
            if (n > MAX_POINTS) {
                throw InputException.at(file, vary.line(), vary.column(), "vary: the grid has more than " + MAX_POINTS
                        + " points; expected a smaller grid (split it into several sweeps)");
            }
        }
    }
}
