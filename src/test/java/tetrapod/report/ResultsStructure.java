package tetrapod.report;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import tetrapod.solve.DenseSystem;
import tetrapod.solve.NaturalElement;

/**
 * The structure of a results.json, rebuilt from that document alone (plain JSON: model.nodes,
 * members, supports, autoRestraints, continuityNodes) as a dense stiffness of its own
 * ({@link NaturalElement}, {@link DenseSystem}): members with their A, Iy, Iz, J, E, G, axialOnly
 * and orientation (local x from i to j, y the orientation made perpendicular to x, z = x × y);
 * in a truss every member a bar and the rotations no degrees of freedom. Constraints: the
 * supports' held axes and every automatic restraint's direction at its node, as listed.
 */
final class ResultsStructure {

    /** An automatic restraint as listed: node index, a unit 6-vector at the node, its largest force. */
    record Restraint(int node, double[] direction, boolean rotation, double largestForce) { }

    private final Map<Integer, Integer> index = new HashMap<>();
    private final double[][] position;
    private final DenseSystem system;
    private final Map<Integer, NaturalElement> elements = new HashMap<>();
    private final Map<Integer, int[]> ends = new HashMap<>();
    private final Set<Integer> axialOnly = new HashSet<>();
    private final List<List<double[]>> constrained = new ArrayList<>();
    private final List<Restraint> restraints = new ArrayList<>();
    private final boolean[][] supportHeld;

    /** @param model the document's {@code model} object (input) */
    ResultsStructure(JsonNode model) {
        JsonNode nodes = model.get("nodes");
        position = new double[nodes.size()][];
        for (int n = 0; n < nodes.size(); n++) {
            JsonNode node = nodes.get(n);
            index.put(node.get("id").asInt(), n);
            position[n] = new double[] {node.get("x").asDouble(), node.get("y").asDouble(), node.get("z").asDouble()};
            constrained.add(new ArrayList<>());
        }
        boolean truss = "truss".equals(model.get("idealisation").asText());
        system = new DenseSystem(nodes.size());
        for (JsonNode m : model.get("members")) {
            int i = index(m.get("i"));
            int j = index(m.get("j"));
            double e = m.get("E").asDouble();
            NaturalElement element = new NaturalElement(position[i], position[j], vector(m.get("orientation")),
                    e * m.get("A").asDouble(), e * m.get("Iy").asDouble(), e * m.get("Iz").asDouble(),
                    m.get("G").asDouble() * m.get("J").asDouble(), truss || m.get("axialOnly").asBoolean());
            elements.put(m.get("id").asInt(), element);
            if (truss || m.get("axialOnly").asBoolean()) {
                axialOnly.add(m.get("id").asInt());
            }
            ends.put(m.get("id").asInt(), new int[] {i, j});
            system.addMember(i, j, element);
        }
        for (JsonNode c : model.get("continuityNodes")) {
            int start = index(c.get("line").get(0));
            int node = index(c.get("node"));
            int end = index(c.get("line").get(1));
            system.addContinuity(start, node, end, new double[][] {position[start], position[node], position[end]},
                    c.get("stiffness").asDouble());
        }
        supportHeld = new boolean[nodes.size()][6];
        for (JsonNode s : model.get("supports")) {
            int n = index(s.get("node"));
            for (int q = 0; q < 6; q++) {
                supportHeld[n][q] = s.get("restraint").get(q).asInt() == 1 && !(truss && q >= 3);
            }
        }
        for (int n = 0; n < nodes.size(); n++) {
            for (int q = 0; q < 6; q++) {
                if (supportHeld[n][q] || (truss && q >= 3)) {
                    double[] axis = new double[6];
                    axis[q] = 1;
                    constrained.get(n).add(axis);
                }
            }
        }
        for (JsonNode a : model.get("autoRestraints")) {
            int n = index(a.get("node"));
            boolean rotation = a.get("dof").asText().startsWith("r");
            double[] d = vector(a.get("direction"));
            double[] six = new double[6];
            System.arraycopy(d, 0, six, rotation ? 3 : 0, 3);
            constrained.get(n).add(six);
            restraints.add(new Restraint(n, six, rotation, a.get("largestForce").asDouble()));
        }
    }

    int index(JsonNode nodeId) {
        return index.get(nodeId.asInt());
    }

    int nodes() {
        return position.length;
    }

    double[] position(int node) {
        return position[node].clone();
    }

    /** True when a support holds DOF {@code dof} (ux … rz) of node index {@code node}; never a truss rotation. */
    boolean supportHolds(int node, int dof) {
        return supportHeld[node][dof];
    }

    List<Restraint> restraints() {
        return List.copyOf(restraints);
    }

    /** Diagonal of the nodes' bounding box, m. */
    double size() {
        double[] lo = position[0].clone();
        double[] hi = position[0].clone();
        for (double[] p : position) {
            for (int q = 0; q < 3; q++) {
                lo[q] = Math.min(lo[q], p[q]);
                hi[q] = Math.max(hi[q], p[q]);
            }
        }
        return Math.sqrt(Math.pow(hi[0] - lo[0], 2) + Math.pow(hi[1] - lo[1], 2) + Math.pow(hi[2] - lo[2], 2));
    }

    /** The load vector of a case: 6 components per node index, tower axes. */
    double[] loads(JsonNode caseNode) {
        double[] f = new double[6 * nodes()];
        for (JsonNode l : caseNode.get("loads")) {
            int n = index(l.get("node"));
            for (int q = 0; q < 6; q++) {
                f[6 * n + q] += l.get("F").get(q).asDouble();
            }
        }
        return f;
    }

    /** Displacements for every load vector, 6 per node index (dense LU of the reduced system). */
    double[][] solve(double[][] loads) {
        List<List<double[]>> free = new ArrayList<>();
        for (List<double[]> c : constrained) {
            free.add(DenseSystem.complement(c));
        }
        return system.solve(free, List.of(), loads);
    }

    /** K·u − f: the forces the supports and restraints exert, 6 per node index. */
    double[] residual(double[] u, double[] f) {
        return system.residual(u, f);
    }

    /** Whether member {@code id} carries axial force only (a truss, or model.members[].axialOnly). */
    boolean axialOnly(int id) {
        return axialOnly.contains(id);
    }

    /** End actions of member {@code id} in its local axes from u: {at i (6), at j (6)}. */
    double[][] endForces(int id, double[] u) {
        int[] e = ends.get(id);
        double[] d = new double[12];
        System.arraycopy(u, 6 * e[0], d, 0, 6);
        System.arraycopy(u, 6 * e[1], d, 6, 6);
        return elements.get(id).endForces(d);
    }

    private static double[] vector(JsonNode v) {
        return new double[] {v.get(0).asDouble(), v.get(1).asDouble(), v.get(2).asDouble()};
    }
}
