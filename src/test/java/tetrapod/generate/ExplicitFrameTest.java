package tetrapod.generate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.model.Face;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Member;
import tetrapod.model.Restraint;
import tetrapod.model.Role;
import tetrapod.model.Support;
import tetrapod.model.Vec3;
import tetrapod.model.spec.ExplicitFrameSpec;
import tetrapod.model.spec.ExplicitFrameSpec.MemberSpec;
import tetrapod.model.spec.ExplicitFrameSpec.NodeSpec;
import tetrapod.model.spec.ExplicitFrameSpec.SupportSpec;

/** Frames given node by node. */
class ExplicitFrameTest {

    private static final double TOL = 1e-12;

    private static List<NodeSpec> nodes() {
        return new ArrayList<>(List.of(new NodeSpec(10, 0, 0, 0), new NodeSpec(20, 4, 0, 0),
                new NodeSpec(30, 2, 0, 3), new NodeSpec(40, 0, 0, 5)));
    }

    private static List<MemberSpec> members() {
        return new ArrayList<>(List.of(
                new MemberSpec(101, 10, 20, "L90x8", null, false, null),
                new MemberSpec(102, 20, 30, "L90x8", Role.DIAGONAL, false, null),
                new MemberSpec(103, 30, 10, "L150x15", Role.LEG, true, null),
                new MemberSpec(104, 10, 40, "L150x15", null, true, List.of(1.0, 0.0, 1.0)),
                new MemberSpec(105, 20, 40, "L80x8", null, false, List.of(0.0, 1.0, 0.0))));
    }

    private static List<SupportSpec> supports() {
        return new ArrayList<>(List.of(new SupportSpec(10, Restraint.FIXED), new SupportSpec(20, Restraint.PINNED)));
    }

    private static Frame build(Idealisation idealisation, List<NodeSpec> nodes, List<MemberSpec> members,
                               List<SupportSpec> supports) throws BadInputException {
        return ExplicitFrameBuilder.build("bench", idealisation, new ExplicitFrameSpec(nodes, members, supports),
                TestSections.INSTANCE, TestSections.STEEL);
    }

    private static Set<String> paths(List<NodeSpec> nodes, List<MemberSpec> members, List<SupportSpec> supports) {
        BadInputException e = assertThrows(BadInputException.class,
                () -> build(Idealisation.FRAME, nodes, members, supports));
        return e.problems().stream().map(Problem::path).collect(Collectors.toSet());
    }

    @Test
    void validFrameKeepsIdsOrderAndSupports() throws Exception {
        Frame frame = build(Idealisation.FRAME, nodes(), members(), supports());
        assertEquals(List.of(10, 20, 30, 40), frame.nodes().stream().map(n -> n.id()).toList());
        assertEquals(List.of(101, 102, 103, 104, 105), frame.members().stream().map(Member::id).toList());
        assertEquals(List.of(new Support(10, Restraint.FIXED), new Support(20, Restraint.PINNED)), frame.supports());
        Member first = frame.members().get(0);
        assertEquals(List.of(10, 20, 0, 0, Face.NONE, Role.GENERAL),
                List.of(first.i(), first.j(), first.segment(), first.panel(), first.face(), first.role()));
        assertEquals(Role.LEG, frame.members().get(2).role());
        assertEquals("L150x15", frame.members().get(2).section().name());
    }

    @Test
    void continuousMembersAreBeamColumnsOnlyInAFrame() throws Exception {
        Frame frame = build(Idealisation.FRAME, nodes(), members(), supports());
        assertEquals(List.of(true, true, false, false, true),
                frame.members().stream().map(Member::axialOnly).toList());
        Frame truss = build(Idealisation.TRUSS, nodes(), members(), supports());
        assertTrue(truss.members().stream().allMatch(Member::axialOnly));
    }

    @Test
    void orientationsGivenOrByTheDefaultRule() throws Exception {
        Frame frame = build(Idealisation.FRAME, nodes(), members(), supports());
        // 101 along +x, default Z × x = +y
        assertEquals(Vec3.Y, frame.members().get(0).orientation());
        // 104 vertical, given (1, 0, 1): axial part (0, 0, 1) removed → (1, 0, 0)
        Vec3 v = frame.members().get(3).orientation();
        assertEquals(1.0, v.x(), TOL);
        assertEquals(0.0, v.z(), TOL);
        // 105 from (4, 0, 0) to (0, 0, 5), given (0, 1, 0): already perpendicular
        assertEquals(Vec3.Y, frame.members().get(4).orientation());
        // a vertical member without orientation gets global X
        List<MemberSpec> vertical = List.of(new MemberSpec(1, 10, 40, "L90x8", null, false, null));
        assertEquals(Vec3.X, build(Idealisation.FRAME, nodes(), vertical, supports()).members().get(0).orientation());
    }

    @Test
    void unsupportedAndLooseFramesAreStillBuilt() throws Exception {
        List<NodeSpec> nodes = nodes();
        nodes.add(new NodeSpec(50, 9, 9, 9));
        Frame frame = build(Idealisation.TRUSS, nodes, members(), List.of());
        assertTrue(frame.supports().isEmpty());
        assertFalse(FrameChecks.connected(frame));
    }

    @Test
    void generatorReturnsExplicitFramesWithoutPanels() throws Exception {
        Tower tower = Specs.generate(Specs.explicit(Idealisation.TRUSS,
                new ExplicitFrameSpec(nodes(), members(), supports())));
        assertFalse(tower.isGenerated());
        assertTrue(tower.levels().isEmpty());
        assertEquals(5, tower.frame().members().size());
        assertEquals("explicit", tower.frame().name());
    }

    @Test
    void memberEndOnAMissingNode() {
        List<MemberSpec> members = members();
        members.set(1, new MemberSpec(102, 20, 99, "L90x8", null, false, null));
        assertEquals(Set.of("frame.members[1].j"), paths(nodes(), members, supports()));
        members.set(1, new MemberSpec(102, 98, 30, "L90x8", null, false, null));
        assertEquals(Set.of("frame.members[1].i"), paths(nodes(), members, supports()));
    }

    @Test
    void duplicateIds() {
        List<NodeSpec> nodes = nodes();
        nodes.add(new NodeSpec(20, 7, 7, 7));
        List<MemberSpec> members = members();
        members.add(new MemberSpec(103, 10, 30, "L90x8", null, false, null));
        assertEquals(Set.of("frame.nodes[4].id", "frame.members[5].id"), paths(nodes, members, supports()));
    }

    @Test
    void zeroLengthMembers() {
        List<NodeSpec> nodes = nodes();
        nodes.add(new NodeSpec(60, 4, 0, 0));
        List<MemberSpec> members = members();
        members.add(new MemberSpec(106, 20, 60, "L90x8", null, false, null));
        members.add(new MemberSpec(107, 30, 30, "L90x8", null, false, null));
        assertEquals(Set.of("frame.members[5]", "frame.members[6]"), paths(nodes, members, supports()));
    }

    @Test
    void orientationAlongTheMemberOrMalformed() {
        List<MemberSpec> members = members();
        members.set(0, new MemberSpec(101, 10, 20, "L90x8", null, false, List.of(2.0, 0.0, 0.0)));
        members.set(1, new MemberSpec(102, 20, 30, "L90x8", null, false, List.of(1.0, 0.0)));
        assertEquals(Set.of("frame.members[0].orientation", "frame.members[1].orientation"),
                paths(nodes(), members, supports()));
    }

    @Test
    void unknownSection() {
        List<MemberSpec> members = members();
        members.set(4, new MemberSpec(105, 20, 40, "L80x9", null, false, null));
        BadInputException e = assertThrows(BadInputException.class,
                () -> build(Idealisation.FRAME, nodes(), members, supports()));
        assertEquals("frame.members[4].section", e.problems().get(0).path());
        assertTrue(e.problems().get(0).message().contains("nearest: L80x8"), e.getMessage());
    }

    @Test
    void badSupportsAndNodes() {
        List<SupportSpec> supports = supports();
        supports.add(new SupportSpec(77, Restraint.PINNED));
        supports.add(new SupportSpec(10, Restraint.PINNED));
        List<NodeSpec> nodes = nodes();
        nodes.add(new NodeSpec(80, Double.NaN, 0, 0));
        assertEquals(Set.of("frame.supports[2].node", "frame.supports[3].node", "frame.nodes[4]"),
                paths(nodes, members(), supports));
        assertEquals(Set.of("frame.nodes"), paths(List.of(), List.of(), List.of()));
    }
}
