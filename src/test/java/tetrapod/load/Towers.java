package tetrapod.load;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import tetrapod.common.BadInputException;
import tetrapod.generate.Tower;
import tetrapod.generate.TowerGenerator;
import tetrapod.model.Idealisation;
import tetrapod.model.Role;
import tetrapod.model.spec.BaseSpec;
import tetrapod.model.spec.Bracing;
import tetrapod.model.spec.Horizontals;
import tetrapod.model.spec.MaterialSpec;
import tetrapod.model.spec.SegmentSpec;
import tetrapod.model.spec.SupportType;
import tetrapod.model.spec.TowerSpec;
import tetrapod.section.SectionCatalogue;
import tetrapod.section.SteelGrades;

/** Small generated towers for the load tests, built with the real catalogue. */
final class Towers {

    private Towers() { }

    static Map<Role, String> sections(String leg, String diagonal, String horizontal) {
        Map<Role, String> s = new EnumMap<>(Role.class);
        s.put(Role.LEG, leg);
        s.put(Role.DIAGONAL, diagonal);
        s.put(Role.HORIZONTAL, horizontal);
        s.put(Role.REDUNDANT, horizontal);
        s.put(Role.PLAN, horizontal);
        return s;
    }

    /**
     * One prismatic X-braced panel (diagonals joined at the crossing), horizontals at its bottom
     * and top: legs L100x10, diagonals L70x7, horizontals L60x6.
     */
    static Tower onePanel(double widthX, double widthY, double height) {
        SegmentSpec s = new SegmentSpec(height, widthX, widthY, 1, List.of(), Bracing.X, Horizontals.ENDS, true, 0,
                sections("L100x10", "L70x7", "L60x6"));
        return build(new TowerSpec("one panel", "", Idealisation.TRUSS, new BaseSpec(widthX, widthY), List.of(s),
                MaterialSpec.grade("S355"), SupportType.PINNED, 0.10, List.of(), Map.of(), null, null));
    }

    /** A tapered 3-segment tower with X, K and single bracing, redundants and a tube segment. */
    static Tower mixed(double baseX, double baseY) {
        List<SegmentSpec> segments = List.of(
                new SegmentSpec(12, baseX * 0.7, baseY * 0.7, 3, List.of(), Bracing.X, Horizontals.ENDS, true, 1,
                        sections("L150x15", "L90x8", "L80x8")),
                new SegmentSpec(9, baseX * 0.5, baseY * 0.5, 3, List.of(), Bracing.K, Horizontals.ALL, true, 0,
                        sections("CHS139.7x8", "CHS60.3x4", "L70x7")),
                new SegmentSpec(6, baseX * 0.5, baseY * 0.5, 2, List.of(), Bracing.SINGLE, Horizontals.ALL, true, 0,
                        sections("L100x10", "L60x6", "L60x6")));
        return build(new TowerSpec("mixed", "", Idealisation.TRUSS, new BaseSpec(baseX, baseY), segments,
                MaterialSpec.grade("S355"), SupportType.PINNED, 0.10, List.of(12.0), Map.of(), null, null));
    }

    static Tower build(TowerSpec spec) {
        try {
            return TowerGenerator.generate(spec, SectionCatalogue.standard(), SteelGrades.grade("S355"));
        } catch (BadInputException e) {
            throw new AssertionError(e.getMessage(), e);
        }
    }
}
