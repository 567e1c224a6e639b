package tetrapod.section;

import java.util.Collection;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

/** "Did you mean" lists: known names ranked by Levenshtein edit distance, ignoring case. */
public final class Suggestions {

    private Suggestions() { }

    /**
     * Up to {@code count} of {@code known} nearest to {@code query}, nearest first; equal distances
     * in alphabetical order, so the answer never depends on the order of {@code known}.
     */
    public static List<String> nearest(String query, Collection<String> known, int count) {
        if (count <= 0 || query == null) {
            return List.of();
        }
        String q = query.trim().toUpperCase(Locale.ROOT);
        record Scored(String name, int distance) { }
        return known.stream()
                .distinct()
                .map(n -> new Scored(n, levenshtein(q, n.toUpperCase(Locale.ROOT))))
                .sorted(Comparator.comparingInt(Scored::distance).thenComparing(Scored::name))
                .limit(count)
                .map(Scored::name)
                .toList();
    }

    /** The least number of single-character insertions, deletions and substitutions turning a into b. */
    public static int levenshtein(String a, String b) {
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
