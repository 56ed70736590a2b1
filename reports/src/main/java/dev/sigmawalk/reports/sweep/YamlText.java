package dev.sigmawalk.reports.sweep;

import dev.sigmawalk.engine.study.YamlNode;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;

/**
 * Writes {@link YamlNode}s back as YAML text that reads as the same nodes: mappings in block
 * style, lists of mappings as {@code - } items, every other list in flow style. Text scalars are
 * double-quoted (so {@code 2006-01-31} or {@code yes} stay text); numbers and booleans are written
 * exactly as they were spelled.
 */
final class YamlText {
    private static final Pattern PLAIN_KEY = Pattern.compile("[A-Za-z_][A-Za-z0-9_.-]*");
    private static final int STEP = 2;

    private YamlText() {
    }

    /** A whole document whose root is a mapping. */
    static String document(YamlNode.Mapping root) {
        StringBuilder out = new StringBuilder();
        mapping(out, root, 0, "");
        return out.toString();
    }

    /** One value on one line: {@code 5}, {@code "month-end"}, {@code [36, 60]}, {@code {a: 1}}. */
    static String flow(YamlNode node) {
        StringBuilder out = new StringBuilder();
        flow(out, node);
        return out.toString();
    }

    private static void flow(StringBuilder out, YamlNode node) {
        if (node instanceof YamlNode.Scalar s) {
            scalar(out, s);
        } else if (node instanceof YamlNode.Sequence q) {
            out.append('[');
            join(out, q.items().iterator(), (o, n) -> flow(o, n));
            out.append(']');
        } else {
            out.append('{');
            join(out, ((YamlNode.Mapping) node).entries().values().iterator(), (o, e) -> {
                key(o, e.key());
                o.append(": ");
                flow(o, e.value());
            });
            out.append('}');
        }
    }

    private interface Part<T> {
        void write(StringBuilder out, T item);
    }

    private static <T> void join(StringBuilder out, Iterator<T> items, Part<T> part) {
        while (items.hasNext()) {
            part.write(out, items.next());
            if (items.hasNext()) {
                out.append(", ");
            }
        }
    }

    /** The entries of {@code m}, the first prefixed by {@code first} (a list item's dash), the rest indented. */
    private static void mapping(StringBuilder out, YamlNode.Mapping m, int indent, String first) {
        boolean head = true;
        for (Map.Entry<String, YamlNode.Entry> e : m.entries().entrySet()) {
            out.append(head ? first : " ".repeat(indent));
            head = false;
            key(out, e.getKey());
            out.append(':');
            YamlNode v = e.getValue().value();
            if (v instanceof YamlNode.Mapping child && !child.entries().isEmpty()) {
                out.append('\n');
                mapping(out, child, indent + STEP, " ".repeat(indent + STEP));
            } else if (v instanceof YamlNode.Sequence q && blockItems(q.items())) {
                out.append('\n');
                for (YamlNode item : q.items()) {
                    mapping(out, (YamlNode.Mapping) item, indent + 2 * STEP, " ".repeat(indent + STEP) + "- ");
                }
            } else {
                out.append(' ');
                flow(out, v);
                out.append('\n');
            }
        }
    }

    /** Lists of non-empty mappings (the strategies) read best as one {@code - } item per mapping. */
    private static boolean blockItems(List<YamlNode> items) {
        return !items.isEmpty() && items.stream().allMatch(n -> n instanceof YamlNode.Mapping m && !m.entries().isEmpty());
    }

    private static void key(StringBuilder out, String key) {
        if (PLAIN_KEY.matcher(key).matches()) {
            out.append(key);
        } else {
            quoted(out, key);
        }
    }

    private static void scalar(StringBuilder out, YamlNode.Scalar s) {
        switch (s.kind()) {
            case NULL -> out.append("null");
            case STRING -> quoted(out, s.text());
            default -> out.append(s.text());
        }
    }

    /** YAML double-quoted style; its escapes are a superset of JSON's (YAML 1.2, section 5.7). */
    private static void quoted(StringBuilder out, String text) {
        out.append('"');
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '"' -> out.append("\\\"");
                case '\\' -> out.append("\\\\");
                case '\n' -> out.append("\\n");
                case '\t' -> out.append("\\t");
                case '\r' -> out.append("\\r");
                default -> {
                    if (c < 0x20 || c == 0x7f) {
                        out.append(String.format("\\u%04x", (int) c));
                    } else {
                        out.append(c);
                    }
                }
            }
        }
        out.append('"');
    }
}
