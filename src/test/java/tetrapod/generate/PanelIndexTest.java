package tetrapod.generate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import tetrapod.model.Face;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.Role;
import tetrapod.model.Vec3;

/** The panels of the three-segment tower ({@link ThreeSegments}): ranges, leg nodes, member ownership. */
class PanelIndexTest {

    private static final double TOL = 1e-9;

    @Test
    void panelsSpanTheLevelsBottomToTop() throws Exception {
        Tower tower = Specs.generate(ThreeSegments.spec());
        List<Panel> panels = tower.panels();
        assertEquals(7, panels.size());
        assertEquals(List.of(0.0, 5.0, 10.0, 13.0, 16.0, 18.0, 21.0), panels.stream().map(Panel::zBottom).toList());
        assertEquals(List.of(5.0, 10.0, 13.0, 16.0, 18.0, 21.0, 25.0), panels.stream().map(Panel::zTop).toList());
        assertEquals(List.of(1, 1, 2, 2, 3, 3, 3), panels.stream().map(Panel::segment).toList());
        assertEquals(List.of(1, 2, 1, 2, 1, 2, 3), panels.stream().map(Panel::panelInSegment).toList());
        assertEquals(List.of(1, 2, 3, 4, 5, 6, 7), panels.stream().map(Panel::number).toList());
        for (int p = 1; p < panels.size(); p++) {
            assertEquals(panels.get(p - 1).topLegNodes(), panels.get(p).bottomLegNodes());
        }
        // leg 2 at the top of panel 1 (z = 5): the width there is 6 − 2·(5/10) = 5 m
        assertEquals(new Vec3(2.5, 2.5, 5), FrameChecks.at(tower.frame(), panels.get(0).topLegNodes().get(2)));
        assertEquals(25.0, tower.height(), 0.0);
        assertEquals(3, tower.panelAt(10.0).orElseThrow().number());
        assertEquals(7, tower.panelAt(25.0).orElseThrow().number());
        assertTrue(tower.panelAt(25.5).isEmpty());
    }

    @Test
    void levelsKnowTheirHorizontalsAndPlanBracing() throws Exception {
        Tower tower = Specs.generate(ThreeSegments.spec());
        // worked in MemberCountTest.threeSegmentsWithPlanBracing
        assertEquals(List.of(true, false, true, false, true, true, true, true),
                tower.levels().stream().map(PanelLevel::horizontals).toList());
        assertEquals(List.of(true, false, true, false, true, false, false, false),
                tower.levels().stream().map(PanelLevel::planBracing).toList());
    }

    @Test
    void everyMemberIsCountedInExactlyOnePanel() throws Exception {
        Tower tower = Specs.generate(ThreeSegments.spec());
        List<Integer> counted = new ArrayList<>();
        tower.panels().forEach(p -> counted.addAll(p.allMembers()));
        assertEquals(tower.frame().members().size(), counted.size());
        assertEquals(tower.frame().members().size(), new HashSet<>(counted).size());
    }

    @Test
    void boundaryHorizontalsAndPlanBracingBelongWhereTheRulesSay() throws Exception {
        Tower tower = Specs.generate(ThreeSegments.spec());
        Frame frame = tower.frame();
        for (Member m : frame.members()) {
            double z = FrameChecks.at(frame, m.i()).z();
            if (m.role() == Role.HORIZONTAL && z == 10.0) {
                // both A and B sit on 10 m; A asks (ends), so A's section and A's top panel
                assertEquals(List.of(1, 2, "L80x8"), List.of(m.segment(), m.panel(), m.section().name()));
            }
            if (m.role() == Role.HORIZONTAL && z == 16.0) {
                // B has none, only C asks: C's section, C's panel 1
                assertEquals(List.of(3, 1, "L70x7"), List.of(m.segment(), m.panel(), m.section().name()));
            }
            if (m.role() == Role.HORIZONTAL && z == 0.0) {
                assertEquals(List.of(1, 1), List.of(m.segment(), m.panel()));
            }
            if (m.role() == Role.PLAN && z == 16.0) {
                // plan bracing takes the section of the segment below (B)
                assertEquals(List.of(2, 2, "L60x6"), List.of(m.segment(), m.panel(), m.section().name()));
            }
            if (m.role() == Role.PLAN && z == 0.0) {
                assertEquals(List.of(1, 1, "L50x5"), List.of(m.segment(), m.panel(), m.section().name()));
            }
        }
        // panel 5 (C panel 1) holds the 16 m horizontals: four, each split in two by B's K apex
        assertEquals(8, tower.panels().get(4).bracingMembers().values().stream()
                .flatMap(List::stream).filter(id -> frame.members().get(id - 1).role() == Role.HORIZONTAL
                        && FrameChecks.at(frame, frame.members().get(id - 1).i()).z() == 16.0).count());
    }

    @Test
    void faceMembersLieInTheirFace() throws Exception {
        Tower tower = Specs.generate(ThreeSegments.spec());
        Frame frame = tower.frame();
        Panel first = tower.panels().get(0);
        // face Y_MINUS of panel 1 lies in the plane y = −(6 − 2 z/10)/2, i.e. y = −3 + 0.1 z
        for (int id : first.membersInFace(Face.Y_MINUS)) {
            Member m = frame.members().get(id - 1);
            for (int node : List.of(m.i(), m.j())) {
                Vec3 p = FrameChecks.at(frame, node);
                assertEquals(-3 + 0.1 * p.z(), p.y(), TOL, "member " + id + " in face -y");
                assertTrue(p.z() >= 0 && p.z() <= 5);
            }
        }
        // legs 0 and 1 (1 member each) + 4 half diagonals + the base horizontal
        assertEquals(7, first.membersInFace(Face.Y_MINUS).size());
        Set<Integer> legs = new HashSet<>();
        first.legMembers().forEach(legs::addAll);
        assertEquals(4, legs.size());
        // panel 5 (segment C, one redundant level): each leg in two members
        tower.panels().get(4).legMembers().forEach(leg -> assertEquals(2, leg.size()));
        // outline of face −y, panel 1: widths 6 m at z = 0 and 5 m at z = 5 → (6 + 5)/2 · 5 = 27.5 m²
        assertEquals(27.5, first.faceOutlineArea(Face.Y_MINUS), 1e-12);
        assertEquals(5.5, first.faceWidthAt(Face.X_PLUS, 2.5), 1e-12);
    }
}
