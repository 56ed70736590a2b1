package dev.sigmawalk.reports.sweep;

import dev.sigmawalk.engine.study.YamlNode;
import java.util.List;
import java.util.Objects;

/**
 * One varied study key of a sweep file and the values to try, in the file's order.
 *
 * @param key the dotted study key as written ({@code walkforward.cost_bps}, {@code strategies.shrunk.bounds})
 * @param line 1-based line of the key in the sweep file
 * @param column 1-based column of the key in the sweep file
 * @param values at least one value, each remembering its position in the sweep file
 */
public record Axis(String key, int line, int column, List<YamlNode> values) {
    public Axis {
        Objects.requireNonNull(key, "key");
        values = List.copyOf(values);
        if (values.isEmpty()) {
            throw new IllegalArgumentException("axis '" + key + "' must list at least one value");
        }
    }

    /** The key's parts: {@code walkforward.cost_bps} gives {@code [walkforward, cost_bps]}. */
    public List<String> segments() {
        return List.of(key.split("\\.", -1));
    }

    /**
     * How value {@code i} is shown in {@code sweep.csv} and on the sweep page: a text as it reads
     * ({@code 2012-01-01}, not the quoted form the derived study needs), anything else in YAML's
     * flow form ({@code [60, 120]}).
     */
    public String label(int i) {
        YamlNode v = values.get(i);
        if (v instanceof YamlNode.Scalar s && s.kind() == YamlNode.Scalar.Kind.STRING) {
            return s.text();
        }
        return YamlText.flow(v);
    }
}
