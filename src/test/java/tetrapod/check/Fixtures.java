package tetrapod.check;

import java.util.List;
import tetrapod.model.Face;
import tetrapod.model.Material;
import tetrapod.model.Member;
import tetrapod.model.Role;
import tetrapod.model.Section;
import tetrapod.model.SectionProperties;
import tetrapod.model.SectionShape;
import tetrapod.model.Vec3;

/** Materials and sections for the check tests, with the sources of their numbers. */
final class Fixtures {

    private Fixtures() { }

    /**
     * S355 by EN 10025-2 Table 7: f_y 355 MPa up to 16 mm, 345 MPa to 40 mm; f_u 470 MPa;
     * E = 210 000 MPa, G = 81 000 MPa (EN 1993-1-1 3.2.6).
     */
    static final Material S355 = new Material("S355", 210e9, 81e9, 7850,
            List.of(new Material.StrengthBand(0.016, 355e6, 470e6), new Material.StrengthBand(0.040, 345e6, 470e6)),
            "EN 10025-2 Table 7");

    /**
     * ASTM A36 as a test material: F_y = 36 ksi, F_u = 58 ksi, E = 29 000 ksi (the values of
     * ASTM A36 and AISC; 1 ksi = 6.894757 MPa).
     */
    static final Material A36 = new Material("A36", 29000 * 6.894757e6, 11200 * 6.894757e6, 7850,
            List.of(new Material.StrengthBand(1.0, 36 * 6.894757e6, 58 * 6.894757e6)), "ASTM A36");

    /**
     * An L80x80x10 angle with the rounded properties of the section tables (SCI P363 / EN 10056-1,
     * recalled from memory, and equal to Tetrapod's catalogue values to the digits shown):
     * A = 15.1 cm², I_y = I_z = 87.5 cm⁴, I_u = 139 cm⁴, I_v = 36.4 cm⁴, c = 23.4 mm, r1 = 10 mm.
     * The hand calculations in the tests start from these numbers.
     */
    static Section l80x10() {
        SectionShape.Angle shape = new SectionShape.Angle(0.080, 0.080, 0.010, 0.010, 0.005);
        SectionProperties p = new SectionProperties(15.1e-4, 87.5e-8, 87.5e-8, 139e-8, 36.4e-8, 5.45e-8,
                0.0234, 0.0234, 1.0, 11.9);
        return new Section("L80x10", shape, p);
    }

    static Member member(int id, Role role, Section section) {
        return new Member(id, 1, 2, role, 1, 1, role == Role.LEG ? Face.NONE : Face.Y_MINUS, section, true,
                new Vec3(0, 1, 0));
    }
}
