package tetrapod.generate;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
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

/** Builders of tower specs for the tests. */
final class Specs {

    private Specs() { }

    /** Sections for every role: leg L150x15, diagonal L90x8, horizontal L80x8, redundant L60x6, plan L50x5. */
    static Map<Role, String> allSections() {
        Map<Role, String> s = new EnumMap<>(Role.class);
        s.put(Role.LEG, "L150x15");
        s.put(Role.DIAGONAL, "L90x8");
        s.put(Role.HORIZONTAL, "L80x8");
        s.put(Role.REDUNDANT, "L60x6");
        s.put(Role.PLAN, "L50x5");
        return s;
    }

    static SegmentSpec segment(double height, double topX, double topY, int panels, Bracing bracing,
                               Horizontals horizontals, boolean crossingConnected, int redundants) {
        return new SegmentSpec(height, topX, topY, panels, List.of(), bracing, horizontals, crossingConnected,
                redundants, allSections());
    }

    static TowerSpec tower(double baseX, double baseY, List<SegmentSpec> segments, List<Double> planLevels) {
        return tower(Idealisation.TRUSS, baseX, baseY, segments, planLevels);
    }

    static TowerSpec tower(Idealisation idealisation, double baseX, double baseY, List<SegmentSpec> segments,
                           List<Double> planLevels) {
        return new TowerSpec("test tower", "", idealisation, new BaseSpec(baseX, baseY), segments,
                MaterialSpec.grade("S355"), SupportType.PINNED, 0.10, planLevels, Map.of(), null, null);
    }

    static TowerSpec explicit(Idealisation idealisation, ExplicitFrameSpec frame) {
        return new TowerSpec("explicit", "", idealisation, null, List.of(), MaterialSpec.grade("S355"),
                SupportType.PINNED, 0.0, List.of(), Map.of(), frame, null);
    }

    static Tower generate(TowerSpec spec) throws Exception {
        return TowerGenerator.generate(spec, TestSections.INSTANCE, TestSections.STEEL);
    }
}
