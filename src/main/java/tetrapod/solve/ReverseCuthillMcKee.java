package tetrapod.solve;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Reverse Cuthill–McKee ordering of an undirected graph (here: nodes joined by members), and the
 * bandwidth and profile of an ordering.
 *
 * <p>E. Cuthill, J. McKee, "Reducing the bandwidth of sparse symmetric matrices", Proc. 24th ACM
 * National Conference, 1969; reversed as proposed by A. George (1971); starting node from the
 * pseudo-peripheral node search of N.E. Gibbs, W.G. Poole, P.K. Stockmeyer (1976) as simplified by
 * A. George and J.W.H. Liu, <i>Computer Solution of Large Sparse Positive Definite Systems</i>,
 * Prentice-Hall 1981, §4.3. Ties are broken by the lower vertex index, so the result is
 * deterministic.
 */
final class ReverseCuthillMcKee {

    private ReverseCuthillMcKee() { }

    /**
     * @param adjacency input: adjacency[v] lists the neighbours of vertex v (no self-loops)
     * @return order[k] = the vertex placed k-th
     */
    static int[] order(int[][] adjacency) {
        int n = adjacency.length;
        int[] degree = new int[n];
        for (int v = 0; v < n; v++) {
            degree[v] = adjacency[v].length;
        }
        boolean[] placed = new boolean[n];
        int[] order = new int[n];
        int count = 0;
        for (int seed = 0; seed < n; seed++) {
            if (placed[seed]) {
                continue;
            }
            int start = pseudoPeripheral(adjacency, degree, minimumDegreeVertex(adjacency, degree, seed));
            ArrayDeque<Integer> queue = new ArrayDeque<>();
            queue.add(start);
            placed[start] = true;
            while (!queue.isEmpty()) {
                int v = queue.poll();
                order[count++] = v;
                int[] next = Arrays.stream(adjacency[v]).filter(u -> !placed[u]).distinct().toArray();
                Integer[] boxed = Arrays.stream(next).boxed().toArray(Integer[]::new);
                Arrays.sort(boxed, (a, b) -> degree[a] != degree[b] ? Integer.compare(degree[a], degree[b])
                        : Integer.compare(a, b));
                for (int u : boxed) {
                    placed[u] = true;
                    queue.add(u);
                }
            }
        }
        for (int a = 0, b = n - 1; a < b; a++, b--) {
            int t = order[a];
            order[a] = order[b];
            order[b] = t;
        }
        return order;
    }

    /** The vertex of least degree in the component of {@code seed}. */
    private static int minimumDegreeVertex(int[][] adjacency, int[] degree, int seed) {
        int best = seed;
        for (int v : levels(adjacency, seed).stream().flatMap(List::stream).toList()) {
            if (degree[v] < degree[best] || (degree[v] == degree[best] && v < best)) {
                best = v;
            }
        }
        return best;
    }

    private static int pseudoPeripheral(int[][] adjacency, int[] degree, int start) {
        int current = start;
        List<List<Integer>> levels = levels(adjacency, current);
        while (true) {
            List<Integer> last = levels.get(levels.size() - 1);
            int candidate = last.get(0);
            for (int v : last) {
                if (degree[v] < degree[candidate] || (degree[v] == degree[candidate] && v < candidate)) {
                    candidate = v;
                }
            }
            List<List<Integer>> candidateLevels = levels(adjacency, candidate);
            if (candidateLevels.size() <= levels.size()) {
                return current;
            }
            current = candidate;
            levels = candidateLevels;
        }
    }

    /** Breadth-first level structure rooted at {@code root}. */
    private static List<List<Integer>> levels(int[][] adjacency, int root) {
        List<List<Integer>> levels = new ArrayList<>();
        boolean[] seen = new boolean[adjacency.length];
        List<Integer> level = List.of(root);
        seen[root] = true;
        while (!level.isEmpty()) {
            levels.add(level);
            List<Integer> next = new ArrayList<>();
            for (int v : level) {
                for (int u : adjacency[v]) {
                    if (!seen[u]) {
                        seen[u] = true;
                        next.add(u);
                    }
                }
            }
            level = next;
        }
        return levels;
    }

    /** Largest |position(u) − position(v)| over the edges; position[v] = place of vertex v. */
    static int bandwidth(int[][] adjacency, int[] position) {
        int band = 0;
        for (int v = 0; v < adjacency.length; v++) {
            for (int u : adjacency[v]) {
                band = Math.max(band, Math.abs(position[u] - position[v]));
            }
        }
        return band;
    }

    /** Envelope size Σ_v (position(v) − min over v and its neighbours of position). */
    static long profile(int[][] adjacency, int[] position) {
        long profile = 0;
        for (int v = 0; v < adjacency.length; v++) {
            int first = position[v];
            for (int u : adjacency[v]) {
                first = Math.min(first, position[u]);
            }
            profile += position[v] - first;
        }
        return profile;
    }

    /** position[order[k]] = k. */
    static int[] positions(int[] order) {
        int[] position = new int[order.length];
        for (int k = 0; k < order.length; k++) {
            position[order[k]] = k;
        }
        return position;
    }
}
