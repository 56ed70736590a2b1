package dev.sigmawalk.engine.study;

import java.util.List;
import java.util.Map;

/**
 * A node of a YAML document that remembers where it starts (1-based line and column), so that
 * every message about a study file can point at the text to fix.
 */
public sealed interface YamlNode permits YamlNode.Mapping, YamlNode.Sequence, YamlNode.Scalar {
    int line();

    int column();

    /** What kind of value this is, for messages ("a mapping", "a list", "the number 3"). */
    String describe();

    /** A key with its position and value; keys keep the file's order. */
    record Entry(String key, int line, int column, YamlNode value) {
    }

    record Mapping(Map<String, Entry> entries, int line, int column) implements YamlNode {
        @Override
        public String describe() {
            return "a mapping";
        }
    }

    record Sequence(List<YamlNode> items, int line, int column) implements YamlNode {
        @Override
        public String describe() {
            return "a list";
        }
    }

    /**
     * A scalar.
     *
     * @param text the scalar's text as written ({@code null} for a YAML null)
     * @param kind what the YAML parser resolved it to
     */
    record Scalar(String text, Kind kind, int line, int column) implements YamlNode {
        public enum Kind { STRING, INTEGER, DECIMAL, BOOLEAN, NULL }

        @Override
        public String describe() {
            return switch (kind) {
                case NULL -> "an empty value";
                case STRING -> "'" + text + "'";
                default -> text;
            };
        }
    }
}
