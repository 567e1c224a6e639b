package tetrapod.solve;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import tetrapod.model.Vec3;

/**
 * The straight lines whose chord rotation carries the geometric stiffness of the axial forces.
 * A pin-ended bracing member split at nodes that only its bending holds (a crossing, a redundant's
 * joint: a {@link ContinuityElement}) is one line from its first to its last node; every other
 * member is a line of its own. With the inner nodes moving with the chord, the P-Δ energy of the
 * segments, ½ Σ (N_s/L_s)(L_s Δ/L)², is that of one bar of length L under N = Σ N_s L_s / L (the
 * geometric stiffness of a bar, (N/L)(I − e eᵀ) on the transverse end displacements: J.S.
 * Przemieniecki, Theory of Matrix Structural Analysis, 1968, ch. 15, recalled from memory): the
 * tower's global P-Δ is kept, and a member's own buckling between its end nodes, which the member
 * checks cover, does not enter α_cr.
 *
 * @param from    node index of the line's first end
 * @param to      node index of its other end
 * @param members member indices (frame order) of its segments
 * @param lengths their lengths, m
 * @param length  the line's length, m
 * @param e       unit vector from → to, tower axes
 */
record GeometricLines(int from, int to, int[] members, double[] lengths, double length, Vec3 e) {

    /** Every line of {@code model}: each member once. */
    static List<GeometricLines> of(StructuralModel model) {
        List<MemberElement> elements = model.elements();
        int[] parent = new int[elements.size()];
        for (int m = 0; m < parent.length; m++) {
            parent[m] = m;
        }
        Map<Long, Integer> byEnds = new HashMap<>();
        for (int m = 0; m < elements.size(); m++) {
            MemberElement e = elements.get(m);
            if (!e.beam()) {
                byEnds.put(key(e.i(), e.j()), m);
            }
        }
        for (ContinuityElement c : model.continuity()) {
            Integer m1 = byEnds.get(key(c.a(), c.p()));
            Integer m2 = byEnds.get(key(c.a(), c.q()));
            if (m1 != null && m2 != null) {
                parent[find(parent, m1)] = find(parent, m2);
            }
        }
        Map<Integer, List<Integer>> groups = new LinkedHashMap<>();
        for (int m = 0; m < elements.size(); m++) {
            groups.computeIfAbsent(find(parent, m), k -> new ArrayList<>()).add(m);
        }
        List<GeometricLines> out = new ArrayList<>();
        var nodes = model.frame().nodes();
        for (List<Integer> group : groups.values()) {
            Map<Integer, Integer> degree = new HashMap<>();
            for (int m : group) {
                degree.merge(elements.get(m).i(), 1, Integer::sum);
                degree.merge(elements.get(m).j(), 1, Integer::sum);
            }
            List<Integer> ends = degree.entrySet().stream().filter(d -> d.getValue() == 1).map(Map.Entry::getKey)
                    .sorted().toList();
            if (group.size() > 1 && ends.size() != 2) {
                group.forEach(m -> out.add(single(elements.get(m), m, nodes)));  // not a simple path: member by member
                continue;
            }
            int from = group.size() == 1 ? elements.get(group.get(0)).i() : ends.get(0);
            int to = group.size() == 1 ? elements.get(group.get(0)).j() : ends.get(1);
            Vec3 a = nodes.get(from).position();
            Vec3 b = nodes.get(to).position();
            int[] members = group.stream().mapToInt(Integer::intValue).toArray();
            double[] lengths = new double[members.length];
            for (int k = 0; k < members.length; k++) {
                lengths[k] = elements.get(members[k]).length();
            }
            out.add(new GeometricLines(from, to, members, lengths, a.distanceTo(b), LocalAxes.direction(a, b)));
        }
        return out;
    }

    private static GeometricLines single(MemberElement e, int m, List<tetrapod.model.Node> nodes) {
        Vec3 a = nodes.get(e.i()).position();
        Vec3 b = nodes.get(e.j()).position();
        return new GeometricLines(e.i(), e.j(), new int[] {m}, new double[] {e.length()}, e.length(),
                LocalAxes.direction(a, b));
    }

    /** The line's equivalent axial force Σ N_s L_s / L, N (tension positive), for the members' forces {@code axial}. */
    double axial(double[] axial) {
        double sum = 0;
        for (int k = 0; k < members.length; k++) {
            sum += axial[members[k]] * lengths[k];
        }
        return sum / length;
    }

    /**
     * (N/L)·[P, −P; −P, P] with P = I − e eᵀ on the translations of the line's ends, in their DOF
     * bases (Q_aᵀ P Q_b), row-major 6×6, for axial force {@code n} (N, tension positive).
     */
    double[] matrix(NodeConstraints constraints, double n) {
        double[] p = new double[9];
        double[] d = {e.x(), e.y(), e.z()};
        for (int r = 0; r < 3; r++) {
            for (int c = 0; c < 3; c++) {
                p[3 * r + c] = (r == c ? 1 : 0) - d[r] * d[c];
            }
        }
        double s = n / length;
        double[][] q = {constraints.translationBasis(from), constraints.translationBasis(to)};
        double[] k = new double[36];
        for (int a = 0; a < 2; a++) {
            for (int b = 0; b < 2; b++) {
                double sign = a == b ? s : -s;
                for (int r = 0; r < 3; r++) {
                    for (int c = 0; c < 3; c++) {
                        double v = 0;
                        for (int x = 0; x < 3; x++) {
                            for (int y = 0; y < 3; y++) {
                                v += at(q[a], x, r) * p[3 * x + y] * at(q[b], y, c);
                            }
                        }
                        k[6 * (3 * a + r) + 3 * b + c] = sign * v;
                    }
                }
            }
        }
        return k;
    }

    /** DOF codes of the translations of the line's ends, in the order of {@link #matrix}. */
    int[] codes(DofNumbering numbering) {
        int[] c = new int[6];
        for (int d = 0; d < 3; d++) {
            c[d] = numbering.code(from, d);
            c[3 + d] = numbering.code(to, d);
        }
        return c;
    }

    /** Entry (row, col) of the basis Q, the identity when Q is null. */
    private static double at(double[] q, int row, int col) {
        return q == null ? (row == col ? 1 : 0) : q[3 * row + col];
    }

    private static long key(int a, int b) {
        return ((long) Math.min(a, b) << 32) | Math.max(a, b);
    }

    private static int find(int[] parent, int x) {
        while (parent[x] != x) {
            parent[x] = parent[parent[x]];
            x = parent[x];
        }
        return x;
    }
}
