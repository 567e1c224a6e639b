package tetrapod.generate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.model.Idealisation;
import tetrapod.model.Role;
import tetrapod.model.spec.BaseSpec;
import tetrapod.model.spec.Bracing;
import tetrapod.model.spec.ExplicitFrameSpec;
import tetrapod.model.spec.Horizontals;
import tetrapod.model.spec.MaterialSpec;
import tetrapod.model.spec.SegmentSpec;
import tetrapod.model.spec.SupportType;
import tetrapod.model.spec.TowerSpec;

/** Bad tower specs give a BadInputException naming the JSON path of each problem. */
class SpecValidationTest {

    private static Set<String> paths(TowerSpec spec) {
        BadInputException e = assertThrows(BadInputException.class, () -> Specs.generate(spec));
        return e.problems().stream().map(Problem::path).collect(Collectors.toSet());
    }

    private static Problem problemAt(TowerSpec spec, String path) {
        BadInputException e = assertThrows(BadInputException.class, () -> Specs.generate(spec));
        return e.problems().stream().filter(p -> p.path().equals(path)).findFirst()
                .orElseThrow(() -> new AssertionError("no problem at " + path + " in " + e.getMessage()));
    }

    private static SegmentSpec ok() {
        return Specs.segment(9.0, 3.0, 3.0, 3, Bracing.X, Horizontals.ALL, true, 0);
    }

    private static SegmentSpec withSections(SegmentSpec s, Map<Role, String> sections) {
        return new SegmentSpec(s.height(), s.topWidthX(), s.topWidthY(), s.panels(), s.panelHeights(), s.bracing(),
                s.horizontals(), s.crossingConnected(), s.redundants(), sections);
    }

    private static Map<Role, String> without(Role role) {
        Map<Role, String> sections = new EnumMap<>(Specs.allSections());
        sections.remove(role);
        return sections;
    }

    private static TowerSpec tower(SegmentSpec... segments) {
        return Specs.tower(5.0, 5.0, List.of(segments), List.of());
    }

    @Test
    void missingDiagonalSectionInThirdSegment() {
        Problem p = problemAt(tower(ok(), ok(), withSections(ok(), without(Role.DIAGONAL))),
                "segments[2].sections.diagonal");
        assertTrue(p.message().contains("required"), p.message());
    }

    @Test
    void missingHorizontalAndRedundantSectionsWhenTheSegmentHasThem() {
        SegmentSpec s = Specs.segment(9.0, 3.0, 3.0, 3, Bracing.K, Horizontals.ENDS, false, 1);
        Map<Role, String> sections = without(Role.HORIZONTAL);
        sections.remove(Role.REDUNDANT);
        assertEquals(Set.of("segments[0].sections.horizontal", "segments[0].sections.redundant"),
                paths(tower(withSections(s, sections))));
    }

    @Test
    void sectionsForAbsentRolesAreNotRequired() throws Exception {
        SegmentSpec s = Specs.segment(9.0, 3.0, 3.0, 3, Bracing.X, Horizontals.NONE, false, 0);
        Map<Role, String> sections = new EnumMap<>(Role.class);
        sections.put(Role.LEG, "L150x15");
        sections.put(Role.DIAGONAL, "L90x8");
        assertEquals(4 * 3, Specs.generate(tower(withSections(s, sections))).frame().members().stream()
                .filter(m -> m.role() == Role.LEG).count());
    }

    @Test
    void unknownSectionNamesTheNearest() {
        Map<Role, String> sections = Specs.allSections();
        sections.put(Role.DIAGONAL, "L90x9");
        Problem p = problemAt(tower(withSections(ok(), sections)), "segments[0].sections.diagonal");
        assertTrue(p.message().contains("unknown section 'L90x9'"), p.message());
        assertTrue(p.message().contains("nearest: L90x8"), p.message());
    }

    @Test
    void planLevelThatIsNotAPanelLevel() {
        Problem p = problemAt(Specs.tower(5.0, 5.0, List.of(ok()), List.of(7.0)), "planBracingLevels[0]");
        assertTrue(p.message().contains("nearest is 6 m"), p.message());
    }

    @Test
    void planLevelWithinOneMillimetreIsAccepted() throws Exception {
        Tower tower = Specs.generate(Specs.tower(5.0, 5.0, List.of(ok()), List.of(6.0008)));
        assertTrue(tower.levels().get(2).planBracing());
    }

    @Test
    void planLevelListedTwice() {
        problemAt(Specs.tower(5.0, 5.0, List.of(ok()), List.of(3.0, 3.0)), "planBracingLevels[1]");
    }

    @Test
    void planSectionOfTheSegmentBelowIsRequired() {
        // plan bracing at 9 m (top of segment 1) needs segment 1's plan section; at 18 m segment 2's
        TowerSpec spec = Specs.tower(5.0, 5.0, List.of(withSections(ok(), without(Role.PLAN)),
                withSections(ok(), without(Role.PLAN))), List.of(9.0, 18.0));
        assertEquals(Set.of("segments[0].sections.plan", "segments[1].sections.plan"), paths(spec));
    }

    @Test
    void panelHeightsMustAddUpToTheSegmentHeight() {
        SegmentSpec s = new SegmentSpec(9.0, 3.0, 3.0, 3, List.of(3.0, 3.0, 2.99), Bracing.X, Horizontals.ALL,
                true, 0, Specs.allSections());
        Problem p = problemAt(tower(s), "segments[0].panelHeights");
        assertTrue(p.message().contains("8.99 m"), p.message());
    }

    @Test
    void panelHeightsMustMatchThePanelCountAndBePositive() {
        SegmentSpec count = new SegmentSpec(9.0, 3.0, 3.0, 3, List.of(4.5, 4.5), Bracing.X, Horizontals.ALL,
                true, 0, Specs.allSections());
        problemAt(tower(count), "segments[0].panelHeights");
        SegmentSpec negative = new SegmentSpec(9.0, 3.0, 3.0, 2, List.of(10.0, -1.0), Bracing.X, Horizontals.ALL,
                true, 0, Specs.allSections());
        assertEquals(Set.of("segments[0].panelHeights[1]"), paths(tower(negative)));
    }

    @Test
    void nonPositiveWidths() {
        SegmentSpec badTop = Specs.segment(9.0, 3.0, -1.0, 3, Bracing.X, Horizontals.ALL, true, 0);
        TowerSpec spec = Specs.tower(0.0, 5.0, List.of(ok(), badTop), List.of());
        assertEquals(Set.of("base.widthX", "segments[1].topWidthY"), paths(spec));
    }

    @Test
    void badCountsAndHeights() {
        SegmentSpec s = new SegmentSpec(-3.0, 3.0, 3.0, 0, List.of(), Bracing.X, Horizontals.ALL, true, 3,
                Specs.allSections());
        assertEquals(Set.of("segments[0].height", "segments[0].panels", "segments[0].redundants"),
                paths(tower(s)));
    }

    @Test
    void missingPatternAndRules() {
        SegmentSpec s = new SegmentSpec(9.0, 3.0, 3.0, 3, List.of(), null, null, true, 0, Specs.allSections());
        assertEquals(Set.of("segments[0].bracing", "segments[0].horizontals"), paths(tower(s)));
    }

    @Test
    void noSegmentsNoBaseAndNegativeAllowance() {
        TowerSpec spec = new TowerSpec("t", "", Idealisation.TRUSS, null, List.of(), MaterialSpec.grade("S355"),
                SupportType.PINNED, -0.1, List.of(), Map.of(), null, null);
        assertEquals(Set.of("base", "segments", "connectionAllowance"), paths(spec));
    }

    @Test
    void explicitFrameAndSegmentsTogether() {
        TowerSpec spec = new TowerSpec("t", "", Idealisation.TRUSS, new BaseSpec(5, 5), List.of(ok()),
                MaterialSpec.grade("S355"), SupportType.PINNED, 0, List.of(), Map.of(),
                new ExplicitFrameSpec(List.of(new ExplicitFrameSpec.NodeSpec(1, 0, 0, 0)), List.of(), List.of()),
                null);
        assertEquals(Set.of("frame"), paths(spec));
    }

    @Test
    void everyProblemIsReportedAtOnce() {
        Map<Role, String> sections = without(Role.LEG);
        sections.put(Role.DIAGONAL, "nonsense");
        SegmentSpec s = new SegmentSpec(9.0, 3.0, 0.0, 3, List.of(), Bracing.X, Horizontals.ALL, true, 0, sections);
        assertEquals(Set.of("segments[0].topWidthY", "segments[0].sections.leg", "segments[0].sections.diagonal"),
                paths(tower(s)));
    }
}
