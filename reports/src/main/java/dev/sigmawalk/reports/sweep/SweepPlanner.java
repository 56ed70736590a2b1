package dev.sigmawalk.reports.sweep;

import dev.sigmawalk.engine.data.InputException;
import dev.sigmawalk.engine.study.FactorSource;
import dev.sigmawalk.engine.study.RiskSettings;
import dev.sigmawalk.engine.study.StrategySpec;
import dev.sigmawalk.engine.study.Study;
import dev.sigmawalk.engine.study.StudyReader;
import dev.sigmawalk.engine.study.YamlNode;
import dev.sigmawalk.engine.study.YamlTree;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Derives every grid point's study from the base study and validates all of them before any
 * work, as strictly as {@code sigmawalk run} validates one study. When a point is invalid, a
 * value of it that makes the base study invalid on its own is reported at that value in the
 * sweep file; otherwise the combination (a start date after an end date) is reported at
 * {@code vary:} with the point's values. Values valid only together (a factor file and
 * {@code risk: multi-index}) are accepted.
 *
 * <p>Relative paths in the varied values resolve like the base study's own, against the base
 * study's folder: a point is the base study with its values written in.
 */
public final class SweepPlanner {
    private SweepPlanner() {
    }

    /**
     * @param out the sweep's output folder; points go to {@code out/points/NNN}
     * @throws InputException naming the sweep file (or the base study), line and column of the first problem
     */
    public static SweepPlan plan(SweepFile sweep, Path out) {
        Path outAbs = out.toAbsolutePath().normalize();
        Study base = StudyReader.read(sweep.study());
        YamlNode.Mapping tree = (YamlNode.Mapping) YamlTree.parse(base.file());
        List<List<String>> places = places(sweep, tree);
        int width = Math.max(3, String.valueOf(sweep.size()).length());
        List<GridPoint> points = new ArrayList<>();
        Map<List<Object>, Integer> studies = new HashMap<>();
        for (int p = 0; p < sweep.size(); p++) {
            Derived d = point(sweep, base, tree, places, p, width, outAbs);
            Integer same = studies.putIfAbsent(d.meaning(), p);
            if (same != null) {
                throw sameStudy(sweep, same, p);
            }
            points.add(d.point());
        }
        return new SweepPlan(sweep, base, outAbs, points);
    }

    /** A grid point and what its study means, without its title: equal meanings run the same walk. */
    private record Derived(GridPoint point, List<Object> meaning) {
    }

    /**
     * Where each axis writes in the base study, list steps as positions. Two axes writing the same
     * place, or one inside the other's value, would make the later one silently overrule the earlier
     * in every point, so the grid's labels would claim values its studies never had.
     */
    private static List<List<String>> places(SweepFile sweep, YamlNode.Mapping tree) {
        List<List<String>> places = new ArrayList<>();
        for (Axis axis : sweep.axes()) {
            List<String> place;
            try {
                place = TreeEdit.positions(tree, axis.segments());
            } catch (IllegalArgumentException e) {
                throw InputException.at(sweep.file(), axis.line(), axis.column(), "vary key '" + axis.key() + "': "
                        + e.getMessage());
            }
            for (int b = 0; b < places.size(); b++) {
                List<String> other = places.get(b);
                Axis earlier = sweep.axes().get(b);
                if (startsWith(place, other) || startsWith(other, place)) {
                    String how = place.size() == other.size() ? "names the same study value as"
                            : place.size() > other.size() ? "lies inside" : "holds";
                    throw InputException.at(sweep.file(), axis.line(), axis.column(), "vary key '" + axis.key() + "' "
                            + how + " '" + earlier.key() + "' (line " + earlier.line() + "), so one would overrule the"
                            + " other at every point; expected keys that set separate values (vary only one of them)");
                }
            }
            places.add(place);
        }
        return places;
    }

    private static boolean startsWith(List<String> path, List<String> prefix) {
        return path.size() >= prefix.size() && path.subList(0, prefix.size()).equals(prefix);
    }

    /** Points {@code first} and {@code second} (0-based) derive the same study: at the first axis they differ on. */
    private static InputException sameStudy(SweepFile sweep, int first, int second) {
        int[] a = sweep.coordinates(first);
        int[] b = sweep.coordinates(second);
        int axis = 0;
        while (a[axis] == b[axis]) {
            axis++;
        }
        Axis x = sweep.axes().get(axis);
        YamlNode value = x.values().get(b[axis]);
        return InputException.at(sweep.file(), value.line(), value.column(), "vary." + x.key() + ": "
                + x.label(b[axis]) + " gives the same study as " + x.label(a[axis])
                + " (grid points " + (first + 1) + " and " + (second + 1) + " would be one walk run twice);"
                + " expected values that differ in meaning, not only in how they are written");
    }

    private static void checkAlone(SweepFile sweep, Study base, YamlNode.Mapping tree, Axis axis, List<String> place,
                                   YamlNode value) {
        String shown = YamlText.flow(value);
        YamlNode.Mapping changed = TreeEdit.set(tree, place, value);
        try {
            StudyReader.read(base.file(), YamlText.document(changed));
        } catch (InputException e) {
            throw InputException.at(sweep.file(), value.line(), value.column(), "vary." + axis.key() + " = " + shown
                    + " makes the base study " + base.file().getFileName() + " invalid: " + problem(e, base.file()));
        }
    }

    private static Derived point(SweepFile sweep, Study base, YamlNode.Mapping tree, List<List<String>> places, int p,
                                 int width, Path out) {
        int[] at = sweep.coordinates(p);
        YamlNode.Mapping changed = tree;
        List<String> values = new ArrayList<>();
        Map<String, String> shown = new LinkedHashMap<>();
        for (int a = 0; a < at.length; a++) {
            Axis axis = sweep.axes().get(a);
            changed = TreeEdit.set(changed, places.get(a), axis.values().get(at[a]));
            values.add(axis.label(at[a]));
            shown.put(axis.key(), axis.label(at[a]));
        }
        String label = String.format("%0" + width + "d", p + 1);
        changed = TreeEdit.without(changed, "output");
        changed = TreeEdit.set(changed, List.of("title"), title(base.title() + " \u00b7 point " + label));
        Study here;
        try {
            here = StudyReader.read(base.file(), YamlText.document(changed));
        } catch (InputException e) {
            // A value that is wrong on its own is reported where it stands; only a point whose
            // values are each fine alone is a bad combination (a value may need another, as
            // factors needs risk: multi-index, so none is refused merely for failing alone).
            for (int a = 0; a < at.length; a++) {
                checkAlone(sweep, base, tree, sweep.axes().get(a), places.get(a), sweep.axes().get(a).values().get(at[a]));
            }
            Axis first = sweep.axes().get(0);
            throw InputException.at(sweep.file(), first.line(), first.column(), "vary: point " + label + " " + shown
                    + " is not a valid study: " + problem(e, base.file()));
        }
        Path folder = out.resolve(SweepPlan.POINTS).resolve(label);
        String yaml = header(sweep, label, shown) + YamlText.document(
                new PathRebase(base.file().getParent(), folder).apply(changed));
        requireSame(here, StudyReader.read(folder.resolve(PointRunner.STUDY_FILE), yaml), label);
        return new Derived(new GridPoint(p + 1, label, values, folder, yaml),
                List.of(here.data(), here.walkForward(), located(here.strategies()), here.evidence(), here.report()));
    }

    private static YamlNode title(String text) {
        return new YamlNode.Scalar(text, YamlNode.Scalar.Kind.STRING, 0, 0);
    }

    private static String header(SweepFile sweep, String label, Map<String, String> shown) {
        StringBuilder h = new StringBuilder("# Grid point ").append(label).append(" of ").append(sweep.file().getFileName())
                .append(": the base study ").append(sweep.study().getFileName()).append(" with\n");
        shown.forEach((k, v) -> h.append("#   ").append(k).append(" = ").append(v.replace('\n', ' ')).append('\n'));
        return h.toString();
    }

    /** The point read where it will stand must be the point read beside the base study. */
    private static void requireSame(Study beside, Study standing, String label) {
        if (!beside.data().equals(standing.data()) || !beside.walkForward().equals(standing.walkForward())
                || !located(beside.strategies()).equals(located(standing.strategies()))
                || !beside.evidence().equals(standing.evidence())
                || !beside.title().equals(standing.title())) {
            throw new IllegalStateException("point " + label + ": the study written to point.yaml does not read back"
                    + " as the derived study (a file path the sweep does not know how to move?)");
        }
    }

    /**
     * The strategies with each factor file known by its path alone: the text that names it
     * differs between the base study's folder and the point's ({@code f.csv}, {@code ../../f.csv})
     * while the file, and so the walk, is the same.
     */
    private static List<StrategySpec> located(List<StrategySpec> strategies) {
        List<StrategySpec> out = new ArrayList<>();
        for (StrategySpec s : strategies) {
            RiskSettings r = s.riskSettings();
            Optional<FactorSource> factors = r.factors().map(f -> f instanceof FactorSource.File file
                    ? new FactorSource.File(file.path(), file.path().toString()) : f);
            out.add(new StrategySpec(s.name(), s.risk(), s.shrinkageTarget(), s.objective(), s.bounds(),
                    s.riskAversion(), s.expectedReturns(), s.alphas(), s.marketPremium(), s.baseline(),
                    new RiskSettings(factors, r.components(), r.halfLife())));
        }
        return out;
    }

    /** The message of a problem in generated text, without the generated text's line and column. */
    private static String problem(InputException e, Path generated) {
        String m = e.getMessage();
        String name = String.valueOf(generated.getFileName());
        if (e.location() != null && e.location().file().equals(generated) && m.startsWith(name)) {
            int colon = m.indexOf(": ");
            if (colon > 0) {
                return m.substring(colon + 2);
            }
        }
        return m;
    }
}
