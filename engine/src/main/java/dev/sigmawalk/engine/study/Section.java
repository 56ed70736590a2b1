package dev.sigmawalk.engine.study;

import dev.sigmawalk.engine.data.InputException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.Set;

/**
 * Typed access to one mapping of the study file. Every error names the study file, the line and
 * column of the offending text, the key path ({@code strategies[2].bounds}) and what was expected.
 */
final class Section {
    private final Path file;
    private final String path;
    private final YamlNode.Mapping mapping;

    private Section(Path file, String path, YamlNode.Mapping mapping) {
        this.file = file;
        this.path = path;
        this.mapping = mapping;
    }

    /**
     * Wraps {@code node} as the section at {@code path}, rejecting keys outside {@code allowed}
     * with a suggestion of the nearest allowed key.
     */
    static Section of(Path file, String path, YamlNode node, Set<String> allowed) {
        if (!(node instanceof YamlNode.Mapping m)) {
            throw InputException.at(file, node.line(), node.column(),
                    (path.isEmpty() ? "the study" : path) + " is " + node.describe() + "; expected a mapping of keys");
        }
        for (YamlNode.Entry e : m.entries().values()) {
            if (!allowed.contains(e.key())) {
                String near = NearestKey.suggest(e.key(), allowed);
                throw InputException.at(file, e.line(), e.column(), "unknown key '" + e.key() + "'"
                        + (path.isEmpty() ? "" : " in " + path)
                        + (near != null ? "; did you mean '" + near + "'?" : "; valid keys: " + String.join(", ", sorted(allowed))));
            }
        }
        return new Section(file, path, m);
    }

    private static List<String> sorted(Set<String> keys) {
        return keys.stream().sorted().toList();
    }

    Path file() {
        return file;
    }

    /** The key path of {@code key} in this section. */
    String pathOf(String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    boolean has(String key) {
        YamlNode.Entry e = mapping.entries().get(key);
        return e != null && !(e.value() instanceof YamlNode.Scalar s && s.kind() == YamlNode.Scalar.Kind.NULL);
    }

    YamlNode node(String key) {
        if (!has(key)) {
            throw InputException.at(file, mapping.line(), mapping.column(),
                    (path.isEmpty() ? "" : path + ": ") + "missing key '" + key + "'; it is required");
        }
        return mapping.entries().get(key).value();
    }

    Optional<YamlNode> optional(String key) {
        return has(key) ? Optional.of(mapping.entries().get(key).value()) : Optional.empty();
    }

    /** An error about the value under {@code key}. */
    InputException bad(String key, String problem) {
        YamlNode n = mapping.entries().get(key).value();
        return badAt(n, pathOf(key), problem);
    }

    InputException badAt(YamlNode n, String keyPath, String problem) {
        return InputException.at(file, n.line(), n.column(), keyPath + ": " + n.describe() + " " + problem);
    }

    String text(String key) {
        return text(node(key), pathOf(key));
    }

    String text(YamlNode n, String keyPath) {
        if (n instanceof YamlNode.Scalar s && s.kind() != YamlNode.Scalar.Kind.NULL && !s.text().isBlank()) {
            return s.text().strip();
        }
        throw badAt(n, keyPath, "is not usable here; expected a text value");
    }

    double number(String key) {
        return number(node(key), pathOf(key));
    }

    double number(YamlNode n, String keyPath) {
        if (n instanceof YamlNode.Scalar s && isNumeric(s)) {
            requirePlain(s, keyPath);
            return Double.parseDouble(s.text());
        }
        throw badAt(n, keyPath, "is not a number; expected a finite decimal number");
    }

    private static boolean isNumeric(YamlNode.Scalar s) {
        return s.kind() == YamlNode.Scalar.Kind.INTEGER || s.kind() == YamlNode.Scalar.Kind.DECIMAL;
    }

    /** Refuses numeric forms other than a plain finite decimal ({@link YamlNumber}). */
    private void requirePlain(YamlNode.Scalar s, String keyPath) {
        String problem = YamlNumber.problem(s.text());
        if (problem != null) {
            throw badAt(s, keyPath, problem);
        }
    }

    int integer(String key, int min) {
        return integer(node(key), pathOf(key), min);
    }

    int integer(YamlNode n, String keyPath, int min) {
        if (n instanceof YamlNode.Scalar s && s.kind() == YamlNode.Scalar.Kind.INTEGER) {
            requirePlain(s, keyPath);
            try {
                int v = Integer.parseInt(s.text());
                if (v >= min) {
                    return v;
                }
            } catch (NumberFormatException e) {
                throw badAt(n, keyPath, "is out of range; expected a whole number >= " + min);
            }
        }
        throw badAt(n, keyPath, "is not allowed; expected a whole number >= " + min);
    }

    long wholeNumber(String key) {
        YamlNode n = node(key);
        if (n instanceof YamlNode.Scalar s && s.kind() == YamlNode.Scalar.Kind.INTEGER) {
            requirePlain(s, pathOf(key));
            try {
                return Long.parseLong(s.text());
            } catch (NumberFormatException e) {
                throw badAt(n, pathOf(key), "is out of range; expected a whole number that fits in 64 bits");
            }
        }
        throw badAt(n, pathOf(key), "is not a whole number");
    }

    OptionalInt optionalInteger(String key, int min) {
        return has(key) ? OptionalInt.of(integer(key, min)) : OptionalInt.empty();
    }

    OptionalDouble optionalNumber(String key) {
        return has(key) ? OptionalDouble.of(number(key)) : OptionalDouble.empty();
    }

    Optional<LocalDate> optionalDate(String key) {
        if (!has(key)) {
            return Optional.empty();
        }
        String t = text(key);
        try {
            if (t.length() == 10) {
                return Optional.of(LocalDate.parse(t));
            }
        } catch (DateTimeParseException e) {
            throw bad(key, "is not a calendar date; expected YYYY-MM-DD");
        }
        throw bad(key, "is not an ISO-8601 date; expected YYYY-MM-DD");
    }

    /** A path resolved against the study file's folder. */
    Path path(String key) {
        return resolve(text(key));
    }

    Path resolve(String text) {
        Path base = file.toAbsolutePath().getParent();
        return base.resolve(text).normalize();
    }

    /** The enum constant spelled as the value under {@code key}. */
    <E extends Enum<E> & Spelled> E choice(String key, Class<E> type) {
        E e = Spelled.parse(type, text(key));
        if (e == null) {
            throw bad(key, "is not one of the choices; expected " + Spelled.choices(type));
        }
        return e;
    }

    /** A list under {@code key}. */
    List<YamlNode> list(String key) {
        YamlNode n = node(key);
        if (n instanceof YamlNode.Sequence s) {
            return s.items();
        }
        throw badAt(n, pathOf(key), "is not a list; expected [a, b, ...] or one '- ' item per line");
    }
}
