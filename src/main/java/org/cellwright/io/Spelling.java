package org.cellwright.io;

import java.util.Collection;
import java.util.Locale;
import java.util.Optional;

/**
 * "Did you mean" suggestions: the closest known name by Levenshtein edit distance, ignoring case.
 *
 * <p>A name is suggested when it is one edit away (names of two characters or more), two edits away (names
 * of five or more), or when it begins with what was written ("W" for "W/K"); shorter unrelated words are
 * not offered.
 */
public final class Spelling {

    private Spelling() {
    }

    /**
     * @param written what the person wrote
     * @param known the names that exist
     * @return the closest known name, if one is close enough
     */
    public static Optional<String> closest(String written, Collection<String> known) {
        String w = written.toLowerCase(Locale.ROOT);
        if (!w.isEmpty()) {
            for (String k : known) {
                if (k.toLowerCase(Locale.ROOT).startsWith(w) && !k.equals(written)) {
                    return Optional.of(k);
                }
            }
        }
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String k : known) {
            int d = distance(w, k.toLowerCase(Locale.ROOT));
            if (d < bestDistance) {
                bestDistance = d;
                best = k;
            }
        }
        if (best == null || bestDistance == 0 && best.equals(written)) {
            return Optional.empty();
        }
        int longer = Math.max(written.length(), best.length());
        boolean close = bestDistance == 1 && longer >= 2 || bestDistance == 2 && longer > 4;
        return close ? Optional.of(best) : Optional.empty();
    }

    /** @return "; did you mean 'x'?" for the closest known name, or "" */
    public static String suggestion(String written, Collection<String> known) {
        return closest(written, known).map(s -> "; did you mean '" + s + "'?").orElse("");
    }

    /** @return the Levenshtein distance between two strings (insertions, deletions, substitutions) */
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
