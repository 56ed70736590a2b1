package dev.sigmawalk.engine.study;

import java.util.Collection;

/** Suggests the valid key closest to a misspelt one by Levenshtein edit distance. */
final class NearestKey {
    /** Suggest only when at most this many single-character edits away; further is no longer a typo. */
    static final int MAX_EDITS = 3;

    private NearestKey() {
    }

    /** The closest of {@code valid} to {@code word}, or {@code null} when none is within {@link #MAX_EDITS}. */
    static String suggest(String word, Collection<String> valid) {
        String best = null;
        int bestDistance = MAX_EDITS + 1;
        for (String candidate : valid) {
            int d = distance(word, candidate);
            if (d < bestDistance) {
                best = candidate;
                bestDistance = d;
            }
        }
        return best;
    }

    /** Levenshtein distance: insertions, deletions and substitutions, each costing 1. */
    static int distance(String a, String b) {
        int[] previous = new int[b.length() + 1];
        int[] current = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            previous[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            current[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int substitution = previous[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
                current[j] = Math.min(substitution, Math.min(previous[j] + 1, current[j - 1] + 1));
            }
            int[] swap = previous;
            previous = current;
            current = swap;
        }
        return previous[b.length()];
    }
}
