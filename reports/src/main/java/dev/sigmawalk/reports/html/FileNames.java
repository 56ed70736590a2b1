package dev.sigmawalk.reports.html;

import java.text.Normalizer;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * Names that are safe in a file name and an element id, made from strategy names: lower case
 * letters, digits and '-', unique among the names given ("Min var" and "min-var" become
 * {@code min-var} and {@code min-var-2}), so a PNG copy says whose chart it is.
 */
final class FileNames {
    /**
     * The longest slug. A chart's file name adds at most about 45 characters to it, which keeps
     * every name well inside the 255 bytes a file system allows for one name.
     */
    static final int LONGEST = 80;

    private final Map<String, String> slugs;

    private FileNames(Map<String, String> slugs) {
        this.slugs = Map.copyOf(slugs);
    }

    /** Slugs for {@code names} in order; an earlier name keeps the plain slug when two collide. */
    static FileNames of(List<String> names) {
        Map<String, String> out = new LinkedHashMap<>();
        Set<String> taken = new HashSet<>();
        for (String name : names) {
            if (out.containsKey(name)) {
                continue;
            }
            String base = slug(name);
            String s = base;
            for (int k = 2; !taken.add(s); k++) {
                s = base + "-" + k;
            }
            out.put(name, s);
        }
        return new FileNames(out);
    }

    /** The slug of a registered name. */
    String of(String name) {
        String s = slugs.get(name);
        if (s == null) {
            throw new IllegalArgumentException("no file name registered for '" + name + "'");
        }
        return s;
    }

    /**
     * Accents dropped, then every run of other characters turned into one '-', then cut to
     * {@link #LONGEST} characters.
     */
    static String slug(String name) {
        String plain = Normalizer.normalize(name, Normalizer.Form.NFD).replaceAll("\\p{M}+", "");
        String s = plain.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("^-+|-+$", "");
        if (s.length() > LONGEST) {
            s = s.substring(0, LONGEST).replaceAll("-+$", "");
        }
        return s.isEmpty() ? "strategy" : s;
    }
}
