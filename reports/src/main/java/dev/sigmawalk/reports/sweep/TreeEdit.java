package dev.sigmawalk.reports.sweep;

import dev.sigmawalk.engine.study.YamlNode;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.UnaryOperator;

/**
 * Copies of a study's YAML tree with one value replaced. A dotted key walks mappings by key and
 * lists by position (0-based) or, for a list of named mappings such as {@code strategies}, by
 * {@code name}. The last key of the path may be new (a key the base study leaves to its default);
 * every step before it must exist.
 */
final class TreeEdit {
    private TreeEdit() {
    }

    /**
     * @throws IllegalArgumentException naming the step of {@code segments} that does not exist
     */
    static YamlNode.Mapping set(YamlNode.Mapping root, List<String> segments, YamlNode value) {
        return (YamlNode.Mapping) at(root, positions(root, segments), 0, old -> value);
    }

    /**
     * The path of {@code segments} in {@code root} with every list step written as a position:
     * {@code strategies.plain.bounds} becomes {@code strategies.1.bounds}. Two keys that spell the
     * same place differently then compare equal, and a point that renames a strategy still finds
     * the strategy another key names, since every key is resolved against the base study.
     *
     * @throws IllegalArgumentException naming the step of {@code segments} that does not exist
     */
    static List<String> positions(YamlNode.Mapping root, List<String> segments) {
        List<String> path = new ArrayList<>(segments);
        YamlNode node = root;
        for (int depth = 0; depth < segments.size() && node != null; depth++) {
            String step = segments.get(depth);
            if (node instanceof YamlNode.Mapping m) {
                YamlNode.Entry e = m.entries().get(step);
                if (e == null && depth < segments.size() - 1) {
                    throw new IllegalArgumentException("the base study has no '"
                            + String.join(".", segments.subList(0, depth + 1)) + "' to look into");
                }
                node = e == null ? null : e.value();
            } else if (node instanceof YamlNode.Sequence q) {
                int i = itemIndex(q, step, segments, depth);
                path.set(depth, String.valueOf(i));
                node = q.items().get(i);
            } else {
                throw new IllegalArgumentException("'" + String.join(".", segments.subList(0, depth)) + "' is a single"
                        + " value in the base study; it has no '" + step + "' inside");
            }
        }
        return List.copyOf(path);
    }

    /** {@code root} with {@code key} (a top-level key) removed, when present. */
    static YamlNode.Mapping without(YamlNode.Mapping root, String key) {
        Map<String, YamlNode.Entry> entries = new LinkedHashMap<>(root.entries());
        entries.remove(key);
        return new YamlNode.Mapping(entries, root.line(), root.column());
    }

    /**
     * Applies {@code change} to the node at {@code path} (from {@code depth} on) and rebuilds the
     * parents. {@code path} gives list steps as positions (see {@link #positions}); every step
     * before the last exists.
     */
    static YamlNode at(YamlNode node, List<String> path, int depth, UnaryOperator<YamlNode> change) {
        if (depth == path.size()) {
            return change.apply(node);
        }
        String step = path.get(depth);
        if (node instanceof YamlNode.Mapping m) {
            YamlNode.Entry e = m.entries().get(step);
            YamlNode changed = e == null ? change.apply(null) : at(e.value(), path, depth + 1, change);
            Map<String, YamlNode.Entry> entries = new LinkedHashMap<>(m.entries());
            entries.put(step, e == null ? new YamlNode.Entry(step, m.line(), m.column(), changed)
                    : new YamlNode.Entry(step, e.line(), e.column(), changed));
            return new YamlNode.Mapping(entries, m.line(), m.column());
        }
        if (node instanceof YamlNode.Sequence q) {
            int i = Integer.parseInt(step);
            List<YamlNode> items = new ArrayList<>(q.items());
            items.set(i, at(items.get(i), path, depth + 1, change));
            return new YamlNode.Sequence(items, q.line(), q.column());
        }
        throw new IllegalStateException("'" + String.join(".", path.subList(0, depth)) + "' holds no '" + step + "'");
    }

    private static int itemIndex(YamlNode.Sequence q, String step, List<String> segments, int depth) {
        String where = String.join(".", segments.subList(0, depth));
        if (step.chars().allMatch(Character::isDigit)) {
            // More digits than any list's size has cannot name an item (and would overflow an int).
            int i = step.length() > 9 ? Integer.MAX_VALUE : Integer.parseInt(step);
            if (i >= q.items().size()) {
                throw new IllegalArgumentException("'" + where + "' has " + q.items().size() + " items in the base study;"
                        + " position " + step + " does not exist (positions count from 0)");
            }
            return i;
        }
        List<String> names = new ArrayList<>();
        for (int i = 0; i < q.items().size(); i++) {
            if (q.items().get(i) instanceof YamlNode.Mapping m && m.entries().get("name") != null
                    && m.entries().get("name").value() instanceof YamlNode.Scalar s && s.text() != null) {
                if (s.text().strip().equals(step)) {
                    return i;
                }
                names.add(s.text().strip());
            }
        }
        throw new IllegalArgumentException("'" + where + "' has no item named '" + step + "' in the base study"
                + (names.isEmpty() ? "" : "; its names are " + String.join(", ", names)));
    }
}
