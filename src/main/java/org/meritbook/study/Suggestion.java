package org.meritbook.study;

import java.util.List;
import java.util.Optional;

/** "Did you mean ...?" for misspelt kinds, options, values and aliases: the closest word by edit distance. */
public final class Suggestion {
    private Suggestion() {
    }

    static Optional<String> closest(String written, List<String> candidates) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String c : candidates) {
            int d = distance(written.toLowerCase(java.util.Locale.ROOT), c.toLowerCase(java.util.Locale.ROOT));
            if (d < bestDistance) {
                best = c;
                bestDistance = d;
            }
        }
        // Close enough to be a slip of the keyboard, not a different word.
        int tolerance = Math.max(1, Math.min(3, written.length() / 3));
        return best != null && bestDistance <= tolerance ? Optional.of(best) : Optional.empty();
    }

    /** " (did you mean 'x'?)" or nothing. */
    public static String hint(String written, List<String> candidates) {
        return closest(written, candidates).map(c -> " (did you mean '" + c + "'?)").orElse("");
    }

    /** Levenshtein distance. */
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
