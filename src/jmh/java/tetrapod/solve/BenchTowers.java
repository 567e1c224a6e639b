package tetrapod.solve;

import tetrapod.model.NodeForce;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import tetrapod.model.Face;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Material;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.Restraint;
import tetrapod.model.Role;
import tetrapod.model.Section;
import tetrapod.model.SectionProperties;
import tetrapod.model.SectionShape;
import tetrapod.model.Support;
import tetrapod.model.Vec3;

/**
 * Frames for the benchmarks: square four-leg towers, frame idealisation (legs continuous
 * beam-columns, bracing pin-ended), X-bracing joined at the crossing, horizontals at every panel
 * level, fixed bases, nodes numbered bottom-up. Panels 1 m high; the base widens with the height
 * (1/8 of it, at least 4 m) so that even the largest stays a plausible, well-conditioned structure.
 * Each panel adds 8 nodes (48 DOFs, of which 16 are auto-restrained at the crossing nodes).
 */
final class BenchTowers {

    private static final Material STEEL = new Material("S355", 210e9, 81e9, 7850,
            List.of(new Material.StrengthBand(Double.POSITIVE_INFINITY, 355e6, 490e6)), "benchmark");
    private static final Section LEG = section("L200x20", 7.6e-3, 4.6e-5, 1.2e-5, 1.0e-7);
    private static final Section BRACE = section("L100x10", 1.9e-3, 2.8e-6, 0.74e-6, 6.4e-9);

    private BenchTowers() { }

    private static Section section(String name, double a, double iu, double iv, double j) {
        return new Section(name, new SectionShape.Given(0.1, true), new SectionProperties(a, iu, iv, iu, iv, j, 0, 0, 0, a * 7850));
    }

    /** Panels needed for about {@code dofs} free DOFs (32 per panel). */
    static int panelsFor(int dofs) {
        return Math.max(2, Math.round(dofs / 32f));
    }

    /** A tower of {@code panels} panels; node list scrambled with {@code seed} when it is non-zero. */
    static Frame tower(int panels, long seed) {
        double height = panels;
        double base = Math.max(4, height / 8);
        double top = 0.35 * base;
        List<Node> nodes = new ArrayList<>();
        int[][] corner = new int[panels + 1][4];
        int[][] crossing = new int[panels][4];
        for (int k = 0; k <= panels; k++) {
            for (int c = 0; c < 4; c++) {
                corner[k][c] = add(nodes, position(k, c, panels, base, top, height));
            }
            if (k < panels) {
                double wb = width(k, panels, base, top);
                double wt = width(k + 1, panels, base, top);
                for (int f = 0; f < 4; f++) {
                    Vec3 a = position(k, f, panels, base, top, height);
                    Vec3 b = position(k + 1, (f + 1) % 4, panels, base, top, height);
                    crossing[k][f] = add(nodes, a.lerp(b, wb / (wb + wt)));
                }
            }
        }
        List<Member> members = new ArrayList<>();
        for (int k = 0; k < panels; k++) {
            for (int c = 0; c < 4; c++) {
                double sx = (c == 0 || c == 3) ? -1 : 1;
                double sy = (c == 0 || c == 1) ? -1 : 1;
                members.add(new Member(members.size() + 1, corner[k][c], corner[k + 1][c], Role.LEG, 1, k + 1,
                        Face.NONE, LEG, false, new Vec3(sx, sy, 0).unit()));
            }
            for (int f = 0; f < 4; f++) {
                int g = (f + 1) % 4;
                brace(members, corner[k][f], crossing[k][f], Role.DIAGONAL, k);
                brace(members, crossing[k][f], corner[k + 1][g], Role.DIAGONAL, k);
                brace(members, corner[k][g], crossing[k][f], Role.DIAGONAL, k);
                brace(members, crossing[k][f], corner[k + 1][f], Role.DIAGONAL, k);
                brace(members, corner[k + 1][f], corner[k + 1][g], Role.HORIZONTAL, k);
            }
        }
        List<Support> supports = new ArrayList<>();
        for (int c = 0; c < 4; c++) {
            supports.add(new Support(corner[0][c], Restraint.FIXED));
        }
        if (seed != 0) {
            Collections.shuffle(nodes, new Random(seed));
        }
        return new Frame("benchmark tower, " + panels + " panels", Idealisation.FRAME, STEEL, nodes, members, supports);
    }

    /** Horizontal wind-like loads at every top corner and a vertical load on each. */
    static LoadVector topLoads(Frame frame, int panels) {
        List<NodeForce> loads = new ArrayList<>();
        for (int c = 0; c < 4; c++) {
            loads.add(NodeForce.force(8 * panels + 1 + c, 10e3, 4e3, -20e3));
        }
        return new LoadVector("top", loads);
    }

    private static void brace(List<Member> members, int i, int j, Role role, int k) {
        members.add(new Member(members.size() + 1, i, j, role, 1, k + 1, Face.NONE, BRACE, true, Vec3.Z));
    }

    private static double width(int level, int panels, double base, double top) {
        return base + (top - base) * level / panels;
    }

    private static Vec3 position(int level, int c, int panels, double base, double top, double height) {
        double h = width(level, panels, base, top) / 2;
        double sx = (c == 0 || c == 3) ? -1 : 1;
        double sy = (c == 0 || c == 1) ? -1 : 1;
        return new Vec3(sx * h, sy * h, height * level / panels);
    }

    private static int add(List<Node> nodes, Vec3 p) {
        int id = nodes.size() + 1;
        nodes.add(new Node(id, p.x(), p.y(), p.z()));
        return id;
    }
}
