package tetrapod.check;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
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

/** Small generated towers for the buckling-length and checker tests. */
final class Towers {

    private Towers() { }

    static Map<Role, String> sections() {
        Map<Role, String> s = new EnumMap<>(Role.class);
        s.put(Role.LEG, "L100x10");
        s.put(Role.DIAGONAL, "L60x6");
        s.put(Role.HORIZONTAL, "L60x6");
        s.put(Role.REDUNDANT, "L50x5");
        s.put(Role.PLAN, "L50x5");
        return s;
    }

    /** One prismatic segment, {@code width} square, {@code panels} panels of {@code panelHeight}. */
    static Tower prismatic(double width, int panels, double panelHeight, Bracing bracing, int redundants)
            throws Exception {
        SegmentSpec segment = new SegmentSpec(panels * panelHeight, width, width, panels, List.of(), bracing,
                Horizontals.ALL, true, redundants, sections());
        TowerSpec spec = new TowerSpec("test", "", Idealisation.TRUSS, new BaseSpec(width, width), List.of(segment),
                MaterialSpec.grade("S355"), SupportType.PINNED, 0.0, List.of(), Map.of(), null, null);
        return TowerGenerator.generate(spec, SectionCatalogue.standard(), SteelGrades.grade("S355"));
    }
}
