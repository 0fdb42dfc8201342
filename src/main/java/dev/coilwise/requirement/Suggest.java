package dev.coilwise.requirement;

import java.util.Collection;
import java.util.Locale;
import java.util.Optional;

/**
 * Finds the nearest allowed word to a misspelt one, by Levenshtein edit distance, for "did you mean" hints. Public
 * so that the readers of other input files (stock catalogues and their column mappings) give the same hints.
 */
public final class Suggest {
    private Suggest() {
    }

    /**
     * The allowed word nearest to {@code word}, if it is close enough to be a likely misspelling: at most a third of
     * the word's length (and at least 1, at most 3) edits away, ignoring case, '-' versus '_' and surrounding spaces.
     */
    public static Optional<String> nearest(String word, Collection<String> allowed) {
        String w = normal(word);
        int limit = Math.max(1, Math.min(3, w.length() / 3));
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String candidate : allowed) {
            int d = distance(w, normal(candidate));
            if (d < bestDistance) {
                bestDistance = d;
                best = candidate;
            }
        }
        return bestDistance <= limit ? Optional.ofNullable(best) : Optional.empty();
    }

    /** " (did you mean 'x'?)" or the empty string. */
    public static String hint(String word, Collection<String> allowed) {
        return nearest(word, allowed).map(s -> " (did you mean '" + s + "'?)").orElse("");
    }

    private static String normal(String s) {
        return s.strip().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /** Levenshtein distance with two rolling rows. */
    static int distance(String a, String b) {
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                cur[j] = Math.min(Math.min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + cost);
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
    }
}
