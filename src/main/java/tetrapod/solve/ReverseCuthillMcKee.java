package tetrapod.solve;

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
     * @param adjacency input: adjacency[v] lists the neighbours of vertex v (no self-loops, no repeats)
     * @return order[k] = the vertex placed k-th
     */
    static int[] order(int[][] adjacency) {
        int n = adjacency.length;
        boolean[] placed = new boolean[n];
        int[] order = new int[n];
        int[] buffer = new int[n];
        Levels levels = new Levels(n);
        int count = 0;
        for (int seed = 0; seed < n; seed++) {
            if (placed[seed]) {
                continue;
            }
            int start = pseudoPeripheral(adjacency, levels, minimumDegreeVertex(adjacency, levels, seed));
            int head = count;
            order[count++] = start;
            placed[start] = true;
            while (head < count) {
                int v = order[head++];
                int k = 0;
                for (int u : adjacency[v]) {
                    if (!placed[u]) {
                        placed[u] = true;
                        buffer[k++] = u;
                    }
                }
                sortByDegree(buffer, k, adjacency);
                System.arraycopy(buffer, 0, order, count, k);
                count += k;
            }
        }
        for (int a = 0, b = n - 1; a < b; a++, b--) {
            int t = order[a];
            order[a] = order[b];
            order[b] = t;
        }
        return order;
    }

    /** Insertion sort of buffer[0..k) by (degree, index): neighbour lists are short. */
    private static void sortByDegree(int[] buffer, int k, int[][] adjacency) {
        for (int a = 1; a < k; a++) {
            int v = buffer[a];
            int b = a - 1;
            while (b >= 0 && before(v, buffer[b], adjacency)) {
                buffer[b + 1] = buffer[b];
                b--;
            }
            buffer[b + 1] = v;
        }
    }

    private static boolean before(int v, int w, int[][] adjacency) {
        int dv = adjacency[v].length;
        int dw = adjacency[w].length;
        return dv < dw || (dv == dw && v < w);
    }

    /** The vertex of least degree (then lowest index) in the component of {@code seed}. */
    private static int minimumDegreeVertex(int[][] adjacency, Levels levels, int seed) {
        levels.build(adjacency, seed);
        int best = seed;
        for (int k = 0; k < levels.size; k++) {
            int v = levels.vertices[k];
            if (before(v, best, adjacency)) {
                best = v;
            }
        }
        return best;
    }

    private static int pseudoPeripheral(int[][] adjacency, Levels levels, int start) {
        int current = start;
        int depth = levels.build(adjacency, current);
        while (true) {
            int candidate = -1;
            for (int k = levels.lastLevelStart; k < levels.size; k++) {
                int v = levels.vertices[k];
                if (candidate < 0 || before(v, candidate, adjacency)) {
                    candidate = v;
                }
            }
            int candidateDepth = levels.build(adjacency, candidate);
            if (candidateDepth <= depth) {
                return current;
            }
            current = candidate;
            depth = candidateDepth;
        }
    }

    /** A reusable breadth-first level structure (vertices in BFS order, start of the last level). */
    private static final class Levels {
        final int[] vertices;
        final int[] mark;
        int stamp;
        int size;
        int lastLevelStart;

        Levels(int n) {
            vertices = new int[n];
            mark = new int[n];
        }

        /** BFS from root over its component; returns the number of levels. */
        int build(int[][] adjacency, int root) {
            stamp++;
            size = 0;
            vertices[size++] = root;
            mark[root] = stamp;
            int levelStart = 0;
            int depth = 0;
            while (levelStart < size) {
                int levelEnd = size;
                lastLevelStart = levelStart;
                depth++;
                for (int k = levelStart; k < levelEnd; k++) {
                    for (int u : adjacency[vertices[k]]) {
                        if (mark[u] != stamp) {
                            mark[u] = stamp;
                            vertices[size++] = u;
                        }
                    }
                }
                levelStart = levelEnd;
            }
            return depth;
        }
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
