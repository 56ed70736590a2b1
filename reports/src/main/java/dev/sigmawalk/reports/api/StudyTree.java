package dev.sigmawalk.reports.api;

import dev.sigmawalk.engine.study.Spelled;
import dev.sigmawalk.engine.study.YamlNode;
import java.io.File;
import java.lang.reflect.Array;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Turns the values a study built in code holds into the node tree the study reader reads, the
 * way a study file holding them would be parsed: text stays text (so {@code "36"} is text, as a
 * quoted {@code "36"} in YAML is), whole numbers are integers, other numbers decimals spelled as
 * Java spells them, lists and maps keep their order. Nodes carry no position (line and column
 * 0), so messages name the key path alone.
 */
final class StudyTree {
    private StudyTree() {
    }

    /**
     * @param key the key path of {@code value}, for the message when its type has no meaning in a study
     * @throws IllegalArgumentException when {@code value} is null or of a type a study file cannot hold
     */
    static YamlNode node(String key, Object value) {
        if (value == null) {
            throw new IllegalArgumentException(key + " is null; leave the key out to take its default");
        }
        if (value instanceof File file) {
            return node(key, file.toPath());
        }
        if (value instanceof Path path) {
            // A Path is also an Iterable of its names; it stands for one file.
            return new YamlNode.Scalar(path.toAbsolutePath().normalize().toString(), YamlNode.Scalar.Kind.STRING, 0, 0);
        }
        if (value instanceof Map<?, ?> map) {
            return mapping(key, map);
        }
        if (value instanceof Iterable<?> items) {
            List<Object> list = new ArrayList<>();
            items.forEach(list::add);
            return sequence(key, list);
        }
        if (value.getClass().isArray()) {
            List<Object> list = new ArrayList<>();
            for (int i = 0; i < Array.getLength(value); i++) {
                list.add(Array.get(value, i));
            }
            return sequence(key, list);
        }
        return scalar(key, value);
    }

    private static YamlNode mapping(String key, Map<?, ?> map) {
        Map<String, YamlNode.Entry> entries = new LinkedHashMap<>();
        for (Map.Entry<?, ?> e : map.entrySet()) {
            if (!(e.getKey() instanceof String name)) {
                throw new IllegalArgumentException(key + " has the key " + e.getKey() + "; keys must be text");
            }
            String path = key.isEmpty() ? name : key + "." + name;
            entries.put(name, new YamlNode.Entry(name, 0, 0, node(path, e.getValue())));
        }
        return new YamlNode.Mapping(entries, 0, 0);
    }

    private static YamlNode sequence(String key, List<Object> items) {
        List<YamlNode> nodes = new ArrayList<>();
        for (int i = 0; i < items.size(); i++) {
            nodes.add(node(key + "[" + i + "]", items.get(i)));
        }
        return new YamlNode.Sequence(nodes, 0, 0);
    }

    private static YamlNode scalar(String key, Object value) {
        if (value instanceof String text) {
            return new YamlNode.Scalar(text, YamlNode.Scalar.Kind.STRING, 0, 0);
        }
        if (value instanceof Spelled option) {
            // An option of the study's own types (RiskKind.SINGLE_INDEX) is the word a file spells it with.
            return new YamlNode.Scalar(option.spelling(), YamlNode.Scalar.Kind.STRING, 0, 0);
        }
        if (value instanceof LocalDate date) {
            return new YamlNode.Scalar(date.toString(), YamlNode.Scalar.Kind.STRING, 0, 0);
        }
        if (value instanceof Boolean b) {
            return new YamlNode.Scalar(b.toString(), YamlNode.Scalar.Kind.BOOLEAN, 0, 0);
        }
        if (value instanceof Integer || value instanceof Long || value instanceof Short || value instanceof Byte
                || value instanceof BigInteger) {
            return new YamlNode.Scalar(value.toString(), YamlNode.Scalar.Kind.INTEGER, 0, 0);
        }
        if (value instanceof Double || value instanceof Float) {
            return new YamlNode.Scalar(decimal((Number) value), YamlNode.Scalar.Kind.DECIMAL, 0, 0);
        }
        if (value instanceof BigDecimal d) {
            return new YamlNode.Scalar(d.toString(), YamlNode.Scalar.Kind.DECIMAL, 0, 0);
        }
        throw new IllegalArgumentException(key + " is a " + value.getClass().getName()
                + "; expected text, a number, a boolean, a Path or File, a LocalDate, one of the study's options"
                + " (such as RiskKind.SAMPLE), a list or a map");
    }

    /**
     * The shortest text that reads back as the same number (0.1f stays 0.1, as a YAML writer
     * spells it); NaN and the infinities take YAML's spellings, which the reader refuses with the
     * message a file holding them gets.
     */
    private static String decimal(Number value) {
        double v = value.doubleValue();
        if (Double.isNaN(v)) {
            return ".nan";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? ".inf" : "-.inf";
        }
        return value.toString();
    }
}
