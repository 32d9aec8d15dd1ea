package breakwater.diagnostic;

import java.util.Collection;
import java.util.Locale;
import java.util.Optional;

/** "Did you mean …" hints for misspelt keys and names, by Levenshtein edit distance. */
public final class Suggestions {
    private Suggestions() {
    }

    /** The closest candidate within a distance of max(2, length/3), compared case-insensitively. */
    public static Optional<String> closest(String word, Collection<String> candidates) {
        String w = word.toLowerCase(Locale.ROOT);
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String c : candidates) {
            int d = distance(w, c.toLowerCase(Locale.ROOT));
            if (d < bestDistance) {
                bestDistance = d;
                best = c;
            }
        }
        int allowed = Math.max(2, w.length() / 3);
        return best != null && bestDistance <= allowed ? Optional.of(best) : Optional.empty();
    }

    /** Levenshtein distance (insertions, deletions, substitutions each cost 1). */
    public static int distance(String a, String b) {
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
