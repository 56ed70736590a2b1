package dev.sigmawalk.reports.sweep;

import dev.sigmawalk.engine.study.StudyDefaults;
import dev.sigmawalk.engine.study.YamlNode;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.function.Predicate;

/**
 * Rewrites the relative file paths of a study's YAML tree so that they name the same files from
 * another folder: a grid point's {@code point.yaml} lives in {@code points/NNN/}, not beside the
 * base study. The keys are those the study reader resolves as files; a value of {@code market}
 * or {@code riskfree} is a file when it ends in {@code .csv} or holds a '/', and one of
 * {@code factors} unless it is the word for the sectors model, as the reader decides.
 * {@link SweepPlanner} checks the outcome by reading both forms.
 */
final class PathRebase {
    /** Keys whose text is always a file. */
    private static final List<List<String>> FILES = List.of(List.of("data", "assets"), List.of("data", "sectors"));
    /** Keys whose text is a file only when it looks like one. */
    private static final List<List<String>> MAYBE_FILES = List.of(List.of("data", "market"), List.of("data", "riskfree"));

    private final Path from;
    private final Path to;

    /**
     * @param from the folder the tree's relative paths are relative to now
     * @param to the folder they must be relative to
     */
    PathRebase(Path from, Path to) {
        this.from = from.toAbsolutePath().normalize();
        this.to = to.toAbsolutePath().normalize();
    }

    YamlNode.Mapping apply(YamlNode.Mapping root) {
        YamlNode.Mapping out = root;
        for (List<String> key : FILES) {
            out = rebase(out, key, text -> true);
        }
        for (List<String> key : MAYBE_FILES) {
            out = rebase(out, key, PathRebase::looksLikeFile);
        }
        if (out.entries().get("strategies") != null && out.entries().get("strategies").value() instanceof YamlNode.Sequence q) {
            for (int i = 0; i < q.items().size(); i++) {
                out = rebase(out, List.of("strategies", String.valueOf(i), "alphas"), text -> true);
                // The reader takes every factors text but the word for the sectors model as a file.
                out = rebase(out, List.of("strategies", String.valueOf(i), "factors"),
                        text -> !text.equals(StudyDefaults.FACTORS.spelling()));
            }
        }
        return out;
    }

    private YamlNode.Mapping rebase(YamlNode.Mapping root, List<String> key, Predicate<String> isFile) {
        if (!present(root, key)) {
            return root;
        }
        return (YamlNode.Mapping) TreeEdit.at(root, key, 0, node -> {
            if (node instanceof YamlNode.Scalar s && s.kind() == YamlNode.Scalar.Kind.STRING && s.text() != null
                    && !s.text().isBlank() && isFile.test(s.text().strip())) {
                return new YamlNode.Scalar(moved(s.text().strip()), s.kind(), s.line(), s.column());
            }
            return node;
        });
    }

    private static boolean looksLikeFile(String text) {
        return text.toLowerCase(Locale.ROOT).endsWith(".csv") || text.contains("/");
    }

    private String moved(String text) {
        Path p = Path.of(text);
        if (p.isAbsolute()) {
            return text;
        }
        return to.relativize(from.resolve(p).normalize()).toString().replace('\\', '/');
    }

    private static boolean present(YamlNode node, List<String> key) {
        YamlNode at = node;
        for (String step : key) {
            if (at instanceof YamlNode.Mapping m && m.entries().get(step) != null) {
                at = m.entries().get(step).value();
            } else if (at instanceof YamlNode.Sequence q && step.chars().allMatch(Character::isDigit)
                    && step.length() <= 9 && Integer.parseInt(step) < q.items().size()) {
                at = q.items().get(Integer.parseInt(step));
            } else {
                return false;
            }
        }
        return true;
    }
}
