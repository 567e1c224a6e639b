package tetrapod.solve;

import tetrapod.model.NodeForce;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import tetrapod.common.Units;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Material;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.Restraint;
import tetrapod.model.Section;
import tetrapod.model.Support;

/**
 * The 25-bar transmission-tower space truss (R.T. Haftka, Z. Gürdal, <i>Elements of Structural
 * Optimization</i>, 3rd ed., Kluwer 1992, p. 245; H.-S. Li, S.-K. Au, Structural Safety 32(6),
 * 2010), load case 2, all areas 1 in², as stored in models/benchmark-25-bar-space-truss.json
 * (m, kN, MPa). No published displacements exist for equal areas, so the reference is an
 * independent dense solve ({@link DenseReference}) of the source data typed here in the source's
 * own units (in, lbf, psi), converted to SI only for the comparison. This also checks the unit
 * conversion of the model file.
 */
class TwentyFiveBarTrussTest {

    private static final double IN = 0.0254;        // m, exact
    private static final double LBF = 0.45359237 * 9.80665; // N: 1 lbf = 1 lb × standard gravity, exact by definition

    /** Node coordinates in inches, nodes 1..10 (Haftka & Gürdal p. 245). */
    private static final double[][] NODES_IN = {
        {-37.5, 0, 200}, {37.5, 0, 200}, {-37.5, 37.5, 100}, {37.5, 37.5, 100}, {37.5, -37.5, 100},
        {-37.5, -37.5, 100}, {-100, 100, 0}, {100, 100, 0}, {100, -100, 0}, {-100, -100, 0}};
    /** Members 1..25: end nodes. */
    private static final int[][] MEMBERS = {
        {1, 2}, {1, 4}, {2, 3}, {1, 5}, {2, 6}, {2, 4}, {2, 5}, {1, 3}, {1, 6}, {3, 6}, {4, 5}, {3, 4}, {5, 6},
        {3, 10}, {6, 7}, {4, 9}, {5, 8}, {4, 7}, {3, 8}, {5, 10}, {6, 9}, {6, 10}, {3, 7}, {4, 8}, {5, 9}};
    /** Load case 2, lbf: node, Fx, Fy, Fz. */
    private static final double[][] LOADS_LB = {
        {1, 1000, 10000, -5000}, {2, 0, 10000, -5000}, {3, 500, 0, 0}, {6, 500, 0, 0}};

    @Test
    void displacementsForcesAndReactionsEqualAnIndependentDenseSolveOfTheSourceData() throws Exception {
        ModelFile file = ModelFile.read(Path.of("models/benchmark-25-bar-space-truss.json"));
        Solution s = Solver.factor(StructuralModel.of(file.frame)).solve(file.loads);

        // reference: inches, pounds, psi
        List<Node> nodes = new ArrayList<>();
        for (int n = 0; n < NODES_IN.length; n++) {
            nodes.add(new Node(n + 1, NODES_IN[n][0], NODES_IN[n][1], NODES_IN[n][2]));
        }
        Section oneSquareInch = TestFrames.section("1 in2", 1.0, 0.08, 0.08, 0.16);
        List<Member> members = new ArrayList<>();
        for (int m = 0; m < MEMBERS.length; m++) {
            members.add(TestFrames.bar(m + 1, MEMBERS[m][0], MEMBERS[m][1], oneSquareInch));
        }
        List<Support> supports = new ArrayList<>();
        for (int n = 7; n <= 10; n++) {
            supports.add(new Support(n, Restraint.PINNED));
        }
        Frame inches = TestFrames.frame("25-bar (in, lb)", Idealisation.TRUSS, TestFrames.material(1e7, 3.76e6),
                nodes, members, supports);
        double[] loads = new double[6 * nodes.size()];
        for (double[] l : LOADS_LB) {
            int b = 6 * ((int) l[0] - 1);
            loads[b] = l[1];
            loads[b + 1] = l[2];
            loads[b + 2] = l[3];
        }
        DenseReference.Solved ref = new DenseReference(inches, List.of()).solve(loads);

        double maxU = 0;
        for (int n = 1; n <= 10; n++) {
            maxU = Math.max(maxU, Math.abs(ref.displacement(n)[1]) * IN);
        }
        for (int n = 1; n <= 10; n++) {
            double[] expected = ref.displacement(n);
            NodeDisplacement actual = s.displacement(n);
            for (int k = 0; k < 3; k++) {
                assertEquals(expected[k] * IN, actual.component(k), 1e-9 * maxU, "node " + n + " u" + k);
            }
        }
        for (int m = 1; m <= 25; m++) {
            double expected = ref.memberEnd().get(m)[1][0] * LBF; // N at end j, tension positive
            assertEquals(expected, s.memberForces(m).axial(), 1e-9 * 10000 * LBF, "member " + m);
        }
        for (int n = 7; n <= 10; n++) {
            double[] expected = ref.residualAt(n);
            NodeForce r = s.reaction(n);
            for (int k = 0; k < 3; k++) {
                assertEquals(expected[k] * LBF, r.component(k), 1e-9 * 10000 * LBF, "reaction " + n + " " + k);
            }
        }
        assertTrue(s.equilibriumError() < 1e-9, "equilibrium " + s.equilibriumError());
        assertTrue(s.autoRestraintForces().isEmpty(), "no auto-restraints in the 25-bar truss");
        // magnitude sanity, from statics: the vertical reactions carry the 10 kip of vertical load
        double vertical = 0;
        for (int n = 7; n <= 10; n++) {
            vertical += s.reaction(n).fz();
        }
        assertEquals(10000 * LBF, vertical, 1e-9 * 10000 * LBF, "ΣRz = −ΣFz (statics)");
    }

    /** Just enough of the explicit-frame model format to build the frame (the real reader is tetrapod.io). */
    private record ModelFile(Frame frame, LoadVector loads) {
        static ModelFile read(Path path) throws Exception {
            JsonNode root = new ObjectMapper().readTree(path.toFile());
            JsonNode mat = root.get("material");
            Material material = new Material(mat.get("name").asText(), mat.get("E").asDouble() * Units.MPA,
                    mat.get("G").asDouble() * Units.MPA, mat.get("density").asDouble(),
                    List.of(new Material.StrengthBand(Double.POSITIVE_INFINITY, mat.get("fy").asDouble() * Units.MPA,
                            mat.get("fu").asDouble() * Units.MPA)), "model file");
            Map<String, Section> sections = new HashMap<>();
            root.get("userSections").fields().forEachRemaining(e -> {
                JsonNode p = e.getValue().get("properties");
                sections.put(e.getKey(), TestFrames.section(e.getKey(), p.get("A_cm2").asDouble() * Units.CM2,
                        p.get("Iy_cm4").asDouble() * Units.CM4, p.get("Iv_cm4").asDouble() * Units.CM4,
                        p.get("J_cm4").asDouble() * Units.CM4));
            });
            JsonNode frame = root.get("frame");
            List<Node> nodes = new ArrayList<>();
            frame.get("nodes").forEach(n -> nodes.add(new Node(n.get("id").asInt(), n.get("x").asDouble(),
                    n.get("y").asDouble(), n.get("z").asDouble())));
            List<Member> members = new ArrayList<>();
            frame.get("members").forEach(m -> members.add(TestFrames.bar(m.get("id").asInt(), m.get("i").asInt(),
                    m.get("j").asInt(), sections.get(m.get("section").asText()))));
            List<Support> supports = new ArrayList<>();
            frame.get("supports").forEach(s -> supports.add(new Support(s.get("node").asInt(),
                    "pinned".equals(s.get("type").asText()) ? Restraint.PINNED : Restraint.FIXED)));
            List<NodeForce> loads = new ArrayList<>();
            root.get("loads").get("nodal").forEach(l -> loads.add(NodeForce.force(l.get("node").asInt(),
                    l.get("F").get(0).asDouble() * Units.KN, l.get("F").get(1).asDouble() * Units.KN,
                    l.get("F").get(2).asDouble() * Units.KN)));
            Idealisation idealisation = "truss".equals(root.get("idealisation").asText()) ? Idealisation.TRUSS : Idealisation.FRAME;
            return new ModelFile(new Frame(root.get("name").asText(), idealisation, material, nodes, members, supports),
                    new LoadVector("load case 2", loads));
        }
    }
}
