package tetrapod.generate;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import tetrapod.model.Role;
import tetrapod.model.spec.Bracing;
import tetrapod.model.spec.Horizontals;
import tetrapod.model.spec.SegmentSpec;
import tetrapod.model.spec.TowerSpec;

/**
 * The three-segment test tower: A (10 m, 2 panels, X connected, horizontals ends, 6 → 4 m),
 * B (6 m, 2 panels, K, no horizontals, 4 m), C (9 m, panel heights 2, 3, 4, single, horizontals all,
 * one redundant level, 4 m); plan bracing at 0, 10 and 16 m. Horizontal sections differ per segment
 * (A L80x8, C L70x7) so that ownership of boundary horizontals shows.
 */
final class ThreeSegments {

    private ThreeSegments() { }

    static TowerSpec spec() {
        Map<Role, String> a = Specs.allSections();
        Map<Role, String> b = new EnumMap<>(Role.class);
        b.put(Role.LEG, "L120x12");
        b.put(Role.DIAGONAL, "L70x7");
        b.put(Role.PLAN, "L60x6");
        Map<Role, String> c = new EnumMap<>(Role.class);
        c.put(Role.LEG, "L100x10");
        c.put(Role.DIAGONAL, "L60x6");
        c.put(Role.HORIZONTAL, "L70x7");
        c.put(Role.REDUNDANT, "L50x5");
        return Specs.tower(6.0, 6.0, List.of(
                new SegmentSpec(10.0, 4.0, 4.0, 2, List.of(), Bracing.X, Horizontals.ENDS, true, 0, a),
                new SegmentSpec(6.0, 4.0, 4.0, 2, List.of(), Bracing.K, Horizontals.NONE, false, 0, b),
                new SegmentSpec(9.0, 4.0, 4.0, 3, List.of(2.0, 3.0, 4.0), Bracing.SINGLE, Horizontals.ALL, false, 1, c)),
                List.of(0.0, 10.0, 16.0));
    }
}
