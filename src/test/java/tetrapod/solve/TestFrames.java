package tetrapod.solve;

import java.util.List;
import tetrapod.model.Face;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Material;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.Role;
import tetrapod.model.Section;
import tetrapod.model.SectionProperties;
import tetrapod.model.SectionShape;
import tetrapod.model.Support;
import tetrapod.model.Vec3;

/** Small helpers to build frames directly from the model records in tests. */
final class TestFrames {

    /** Structural steel: E = 210 GPa, G = 81 GPa (EN 1993-1-1 3.2.6), fy 355 MPa. */
    static final Material STEEL = material(210e9, 81e9);

    private TestFrames() { }

    static Material material(double e, double g) {
        return new Material("test", e, g, 7850,
                List.of(new Material.StrengthBand(Double.POSITIVE_INFINITY, 355e6, 490e6)), "test material");
    }

    /** A section given by A (m²), Iy = iu and Iz = iv about local y and z (m⁴), J (m⁴). */
    static Section section(String name, double area, double iu, double iv, double torsion) {
        return new Section(name, new SectionShape.Given(0.1, true),
                new SectionProperties(area, iu, iv, iu, iv, torsion, 0, 0, 0, area * 7850));
    }

    static Member bar(int id, int i, int j, Section s) {
        return new Member(id, i, j, Role.GENERAL, 0, 0, Face.NONE, s, true, Vec3.Z);
    }

    static Member beam(int id, int i, int j, Section s, Vec3 orientation) {
        return new Member(id, i, j, Role.GENERAL, 0, 0, Face.NONE, s, false, orientation);
    }

    static Frame frame(String name, Idealisation idealisation, Material material, List<Node> nodes,
                       List<Member> members, List<Support> supports) {
        return new Frame(name, idealisation, material, nodes, members, supports);
    }
}
