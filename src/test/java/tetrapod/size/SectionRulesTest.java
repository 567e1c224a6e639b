package tetrapod.size;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.check.Connection;
import tetrapod.check.MemberForces;
import tetrapod.model.Role;
import tetrapod.model.Section;
import tetrapod.model.spec.BoltGrade;
import tetrapod.model.spec.ConnectedLeg;
import tetrapod.model.spec.ConnectionSpec;
import tetrapod.section.SectionCatalogue;

/** The geometric rules, worked by hand with the EN 10056-1 dimensions (leg, thickness, root radius r1). */
class SectionRulesTest {

    private static Section angle(String name) {
        return SectionCatalogue.standard().find(name).orElseThrow();
    }

    private static Connection bolts(double diameterMm, double edgeMm, ConnectedLeg leg) {
        return Connection.of(new ConnectionSpec(Role.DIAGONAL, List.of(), 2, diameterMm, BoltGrade.G8_8, 2, 30, edgeMm,
                55, 1, true, 1, leg), false);
    }

    @Test
    void theHoleMustStayOnTheFlatOfTheConnectedLeg() {
        Connection m16 = bolts(16, 30, ConnectedLeg.LONG); // d0 = 18 mm: the hole reaches 30 + 9 = 39 mm from the toe
        assertFalse(SectionRules.holesFit(angle("L50x5"), Role.DIAGONAL, m16));   // flat 50 − 5 − 7 = 38 mm
        assertTrue(SectionRules.holesFit(angle("L50x4"), Role.DIAGONAL, m16));    // flat 50 − 4 − 7 = 39 mm, just
        assertTrue(SectionRules.holesFit(angle("L60x6"), Role.DIAGONAL, m16));    // flat 60 − 6 − 8 = 46 mm
        assertFalse(SectionRules.holesFit(angle("L45x4.5"), Role.DIAGONAL, m16)); // flat 45 − 4.5 − 7 = 33.5 mm
    }

    @Test
    void unequalAnglesUseTheConnectedLegAndLegsTheNarrowerOne() {
        Section a = angle("L100x50x6"); // r1 = 8 mm: flats 100 − 6 − 8 = 86 mm and 50 − 6 − 8 = 36 mm
        Connection m20 = bolts(20, 33, ConnectedLeg.LONG); // d0 = 22 mm: 33 + 11 = 44 mm
        assertTrue(SectionRules.holesFit(a, Role.DIAGONAL, m20));
        assertFalse(SectionRules.holesFit(a, Role.DIAGONAL, bolts(20, 33, ConnectedLeg.SHORT)));
        assertFalse(SectionRules.holesFit(a, Role.LEG, m20));
        assertEquals(0.050, SectionRules.narrowWidth(a), 1e-12);
        assertEquals(0.100, SectionRules.wideWidth(a), 1e-12);
    }

    @Test
    void minimumSizesByRole() {
        Connection none = bolts(12, 20, ConnectedLeg.LONG); // M12 fits everything here
        assertFalse(SectionRules.allowed(angle("L45x4.5"), Role.LEG, none, SizingRules.DEFAULT));   // legs ≥ 50 mm, ≥ 5 mm
        assertFalse(SectionRules.allowed(angle("L50x4"), Role.LEG, none, SizingRules.DEFAULT));
        assertTrue(SectionRules.allowed(angle("L50x5"), Role.LEG, none, SizingRules.DEFAULT));
        assertTrue(SectionRules.allowed(angle("L40x4"), Role.DIAGONAL, none, SizingRules.DEFAULT)); // bracing ≥ 40, ≥ 4 mm
        SizingRules thicker = SizingRules.DEFAULT.withMinima(java.util.Map.of(Role.DIAGONAL, 0.005), java.util.Map.of());
        assertFalse(SectionRules.allowed(angle("L40x4"), Role.DIAGONAL, none, thicker));
        assertTrue(SectionRules.allowed(angle("L40x5"), Role.DIAGONAL, none, thicker));
    }

    @Test
    void aDemandDominatesWhenNoForceQuantityIsSmaller() {
        MemberForces big = new MemberForces(-100e3, -2e3, 1e3, 0.5e3, 0.5e3);
        MemberForces smaller = new MemberForces(-90e3, -1e3, 1e3, 0.2e3, 0.1e3);
        assertTrue(Demands.dominates(big, MemberForces.axial(-100e3)));
        assertFalse(Demands.dominates(MemberForces.axial(-100e3), smaller), "moments add to every check");
        // internal moments −m_i and +m_j: big ψ_y = 1/2, ψ_z = −1; smaller ψ_y = 1 (single curvature), ψ_z = −1/2
        assertFalse(Demands.dominates(big, smaller), "a larger ψ raises C_m = 0.6 + 0.4ψ");
        MemberForces sameShape = new MemberForces(-90e3, -1e3, 0.5e3, 0.2e3, 0.2e3); // ψ_y = 1/2, ψ_z = −1
        assertTrue(Demands.dominates(big, sameShape));
    }
}
