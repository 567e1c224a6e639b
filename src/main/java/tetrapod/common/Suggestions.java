package tetrapod.common;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

/**
 * Nearest names to a misspelt one, by edit distance (Levenshtein with adjacent transpositions
 * counted as one edit, the "optimal string alignment" distance), ignoring letter case.
 */
public final class Suggestions {

    private Suggestions() { }

    /** Edit distance between two strings, letter case ignored. */
    public static int distance(String a, String b) {
        String s = a.toLowerCase(Locale.ROOT);
        String t = b.toLowerCase(Locale.ROOT);
        int n = s.length();
        int m = t.length();
        int[][] d = new int[n + 1][m + 1];
        for (int i = 0; i <= n; i++) {
            d[i][0] = i;
        }
        for (int j = 0; j <= m; j++) {
            d[0][j] = j;
        }
        for (int i = 1; i <= n; i++) {
            for (int j = 1; j <= m; j++) {
                int cost = s.charAt(i - 1) == t.charAt(j - 1) ? 0 : 1;
                int best = Math.min(Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1), d[i - 1][j - 1] + cost);
                if (i > 1 && j > 1 && s.charAt(i - 1) == t.charAt(j - 2) && s.charAt(i - 2) == t.charAt(j - 1)) {
                    best = Math.min(best, d[i - 2][j - 2] + 1);
                }
                d[i][j] = best;
            }
        }
        return d[n][m];
    }

    /**
     * The largest distance still worth suggesting for a name of this length: a third of its
     * letters, at least two (a slip of two keys is common; beyond that the guess is noise).
     */
    public static int tolerance(String name) {
        return Math.max(2, name.length() / 3);
    }

    /**
     * Up to {@code count} candidates within {@link #tolerance} of {@code name}, nearest first,
     * ties in the candidates' own order.
     */
    public static List<String> nearest(String name, Collection<String> candidates, int count) {
        record Scored(String candidate, int distance, int order) { }
        List<Scored> scored = new ArrayList<>();
        int order = 0;
        int limit = tolerance(name);
        for (String c : candidates) {
            int dist = distance(name, c);
            if (dist <= limit && !c.equals(name)) {
                scored.add(new Scored(c, dist, order));
            }
            order++;
        }
        scored.sort(Comparator.comparingInt(Scored::distance).thenComparingInt(Scored::order));
        return scored.stream().limit(count).map(Scored::candidate).toList();
    }

    /** The single nearest candidate, or null when none is near enough. */
    public static String nearest(String name, Collection<String> candidates) {
        List<String> found = nearest(name, candidates, 1);
        return found.isEmpty() ? null : found.get(0);
    }

    /**
     * Up to {@code count} of {@code known} ranked by distance to {@code query} however far, nearest
     * first; equal distances in alphabetical order, so the answer never depends on the order of
     * {@code known} ("nearest known: ..." lists of catalogues).
     */
    public static List<String> closest(String query, Collection<String> known, int count) {
        if (count <= 0 || query == null) {
            return List.of();
        }
        String q = query.trim();
        record Scored(String name, int distance) { }
        return known.stream()
                .distinct()
                .map(n -> new Scored(n, distance(q, n)))
                .sorted(Comparator.comparingInt(Scored::distance).thenComparing(Scored::name))
                .limit(count)
                .map(Scored::name)
                .toList();
    }
}
