package tetrapod.generate;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import tetrapod.model.Frame;
import tetrapod.model.Role;
import tetrapod.model.spec.Bracing;
import tetrapod.model.spec.Horizontals;
import tetrapod.model.spec.SegmentSpec;

/**
 * Node and member counts per role against closed forms worked out by hand below.
 *
 * <p>One segment of n panels, r redundant levels per panel. Let h be the number of levels carrying
 * horizontals: all → n + 1, ends → 2, none → 0.
 * <ul>
 * <li>Leg nodes: 4 at each of the n + 1 panel levels and at each of the n·r redundant levels:
 *     4(n + 1) + 4nr. Legs are split at every one of them: 4 legs × n panels × (r + 1) = 4n(r + 1).</li>
 * <li>X, crossing connected (no crossing on a redundant level): per face per panel two diagonals,
 *     each split at the crossing and at r redundant nodes into r + 2 pieces: diagonals 4n·2(r + 2).
 *     Extra nodes: 4n crossings, 4n·2r diagonal nodes on redundant levels. Redundant members per face
 *     per level: leg → diagonal → diagonal → leg = 3, so 12nr. Horizontals 4h, unsplit.</li>
 * <li>X, not connected: each diagonal in r + 1 pieces: 8n(r + 1); extra nodes 8nr; redundants 12nr;
 *     horizontals 4h.</li>
 * <li>K: two diagonals per face per panel, each in r + 1 pieces: 8n(r + 1). Extra nodes: 4n apexes
 *     (mid-points of the top levels 1..n) and 8nr diagonal nodes on redundant levels; redundants 12nr.
 *     The bottom level's horizontals are not split (4 members when present); every other level with
 *     horizontals has an apex on each face: 8 members. all → 4 + 8n, ends → 4 + 8 = 12, none → 0.</li>
 * <li>Single: one diagonal per face per panel in r + 1 pieces: 4n(r + 1); extra nodes 4nr; redundants
 *     per face per level leg → diagonal → leg = 2, so 8nr; horizontals 4h.</li>
 * </ul>
 * The segment is tapered 5 × 4 m → 3 × 2.5 m, so no X crossing lies at height fraction 1/3, 1/2 or
 * 2/3 of a panel (worked: for n = 1 the crossings are at 5/8 and 4/6.5 = 0.615; for n = 3 between
 * 0.53 and 0.55) and no redundant node merges with a crossing.
 */
class MemberCountTest {

    record Expected(int nodes, int legs, int diagonals, int horizontals, int redundants) { }

    static Expected closedForm(Bracing bracing, boolean connected, Horizontals horizontals, int r, int n) {
        int h = switch (horizontals) {
            case ALL -> n + 1;
            case ENDS -> 2;
            case NONE -> 0;
        };
        int legNodes = 4 * (n + 1) + 4 * n * r;
        int legs = 4 * n * (r + 1);
        return switch (bracing) {
            case X -> connected
                    ? new Expected(legNodes + 4 * n + 8 * n * r, legs, 8 * n * (r + 2), 4 * h, 12 * n * r)
                    : new Expected(legNodes + 8 * n * r, legs, 8 * n * (r + 1), 4 * h, 12 * n * r);
            case K -> new Expected(legNodes + 4 * n + 8 * n * r, legs, 8 * n * (r + 1),
                    switch (horizontals) {
                        case ALL -> 4 + 8 * n;
                        case ENDS -> 12;
                        case NONE -> 0;
                    }, 12 * n * r);
            case SINGLE -> new Expected(legNodes + 4 * n * r, legs, 4 * n * (r + 1), 4 * h, 8 * n * r);
        };
    }

    static Stream<Arguments> cases() {
        List<Arguments> cases = new ArrayList<>();
        for (Object[] pattern : new Object[][] {{Bracing.X, true}, {Bracing.X, false}, {Bracing.K, false},
                {Bracing.SINGLE, false}}) {
            for (Horizontals horizontals : Horizontals.values()) {
                for (int r = 0; r <= 2; r++) {
                    for (int n : new int[] {1, 3}) {
                        cases.add(Arguments.of(pattern[0], pattern[1], horizontals, r, n));
                    }
                }
            }
        }
        return cases.stream();
    }

    @ParameterizedTest(name = "{0} connected={1} horizontals={2} redundants={3} panels={4}")
    @MethodSource("cases")
    void countsMatchClosedForm(Bracing bracing, boolean connected, Horizontals horizontals, int r, int n)
            throws Exception {
        SegmentSpec seg = Specs.segment(9.0, 3.0, 2.5, n, bracing, horizontals, connected, r);
        Frame frame = Specs.generate(Specs.tower(5.0, 4.0, List.of(seg), List.of())).frame();
        Expected e = closedForm(bracing, connected, horizontals, r, n);
        assertCounts(frame, e.nodes(), e.legs(), e.diagonals(), e.horizontals(), e.redundants(), 0);
        FrameChecks.assertSound(frame);
        assertEquals(4, frame.supports().size());
    }

    /**
     * Prismatic square segment, X bracing, r = 1: the crossing lies exactly at mid-height, on the
     * redundant level, so crossing and both diagonal nodes merge into one node per face per panel,
     * connected or not. Per face per panel: diagonals 2 × 2 pieces = 4, redundants leg → centre → leg
     * = 2, nodes 1. With n = 3, all horizontals: nodes 4·4 (levels) + 4·3 (redundant leg nodes)
     * + 4·3 (centres) = 40; legs 4·3·2 = 24; diagonals 4·3·4 = 48; horizontals 4·4 = 16; redundants
     * 4·3·2 = 24.
     */
    @ParameterizedTest(name = "connected={0}")
    @org.junit.jupiter.params.provider.ValueSource(booleans = {true, false})
    void prismaticXWithOneRedundantMergesAtTheCrossing(boolean connected) throws Exception {
        SegmentSpec seg = Specs.segment(9.0, 4.0, 4.0, 3, Bracing.X, Horizontals.ALL, connected, 1);
        Frame frame = Specs.generate(Specs.tower(4.0, 4.0, List.of(seg), List.of())).frame();
        assertCounts(frame, 40, 24, 48, 16, 24, 0);
        FrameChecks.assertSound(frame);
    }

    /**
     * Prismatic, X connected, r = 2: crossing at 1/2, redundant levels at 1/3 and 2/3, no merge;
     * the general closed form holds: n = 2, ends: nodes 4·3 + 4·2·2 + 4·2 + 8·2·2 = 68; legs 4·2·3 = 24;
     * diagonals 8·2·4 = 64; horizontals 8; redundants 12·2·2 = 48.
     */
    @Test
    void prismaticXWithTwoRedundantsKeepsCrossingSeparate() throws Exception {
        SegmentSpec seg = Specs.segment(8.0, 4.0, 4.0, 2, Bracing.X, Horizontals.ENDS, true, 2);
        Frame frame = Specs.generate(Specs.tower(4.0, 4.0, List.of(seg), List.of())).frame();
        assertCounts(frame, 68, 24, 64, 8, 48, 0);
    }

    /**
     * Three segments, hand count:
     * A: 10 m, 2 panels, X connected, horizontals ends, r = 0, 6 → 4 m;
     * B: 6 m, 2 panels, K, horizontals none, prismatic 4 m;
     * C: 9 m, panel heights 2, 3, 4, single, horizontals all, r = 1, prismatic 4 m.
     * Plan bracing at 0, 10 (A/B) and 16 m (B/C).
     * Levels 0, 5, 10, 13, 16, 18, 21, 25 m: 8 × 4 = 32 leg nodes.
     * Horizontals: 0 (A ends), 10 (A top), 16 (only C asks), 18, 21, 25 (C all); not at 5 (A ends)
     * nor 13 (B none). The K apexes of B lie at 13 (no horizontal) and 16, which splits those four
     * into eight: 5 × 4 + 8 = 28.
     * Legs: A 2 × 4 + B 2 × 4 + C 3 × 2 × 4 = 40.
     * Diagonals: A 2 panels × 4 faces × 4 halves = 32; B 8 × 2 = 16; C 12 × 2 pieces = 24: 72.
     * Redundants: C 12 face-panels × 2 = 24.
     * Nodes: 32 + A crossings 8 + B apexes 8 + C redundant leg nodes 12 + C diagonal nodes 12 = 72,
     * plus 3 plan centres = 75. Plan members 3 levels × 4 = 12.
     */
    @Test
    void threeSegmentsWithPlanBracing() throws Exception {
        Tower tower = Specs.generate(ThreeSegments.spec());
        assertCounts(tower.frame(), 75, 40, 72, 28, 24, 12);
        FrameChecks.assertSound(tower.frame());
    }

    static void assertCounts(Frame frame, int nodes, int legs, int diagonals, int horizontals, int redundants,
                             int plan) {
        Map<Role, Integer> expected = new EnumMap<>(Role.class);
        expected.put(Role.LEG, legs);
        expected.put(Role.DIAGONAL, diagonals);
        if (horizontals > 0) {
            expected.put(Role.HORIZONTAL, horizontals);
        }
        if (redundants > 0) {
            expected.put(Role.REDUNDANT, redundants);
        }
        if (plan > 0) {
            expected.put(Role.PLAN, plan);
        }
        assertEquals(expected, FrameChecks.countByRole(frame), "members per role");
        assertEquals(nodes, frame.nodes().size(), "nodes");
    }
}
