package tetrapod.generate;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import tetrapod.common.Problem;
import tetrapod.model.Role;
import tetrapod.model.Section;
import tetrapod.model.SectionLookup;
import tetrapod.model.spec.Horizontals;
import tetrapod.model.spec.SegmentSpec;
import tetrapod.model.spec.TowerSpec;

/** Finds each segment's sections by name and reports missing and unknown ones. */
final class SectionResolver {

    private static final int SUGGESTIONS = 3;

    private SectionResolver() { }

    /**
     * The sections of every segment, by role. {@code plan} may be null (levels could not be laid
     * out); plan sections are then not asked for.
     */
    static List<Map<Role, Section>> resolve(TowerSpec spec, LevelPlan plan, SectionLookup lookup,
                                            List<Problem> problems) {
        List<Map<Role, Section>> resolved = new ArrayList<>();
        for (int s = 0; s < spec.segments().size(); s++) {
            SegmentSpec seg = spec.segments().get(s);
            String path = "segments[" + s + "].sections";
            Map<Role, Section> sections = new EnumMap<>(Role.class);
            for (Map.Entry<Role, String> given : new EnumMap<>(seg.sections()).entrySet()) {
                find(lookup, given.getValue(), path + "." + given.getKey().jsonName(), problems)
                        .ifPresent(section -> sections.put(given.getKey(), section));
            }
            for (Role role : requiredRoles(seg, s, plan)) {
                if (!seg.sections().containsKey(role)) {
                    problems.add(Problem.at(path + "." + role.jsonName(),
                            "is required: this segment has " + role.jsonName() + " members"));
                }
            }
            resolved.add(sections);
        }
        return resolved;
    }

    /** A section by name, or a problem naming the nearest known names. */
    static Optional<Section> find(SectionLookup lookup, String name, String path, List<Problem> problems) {
        if (name == null || name.isBlank()) {
            problems.add(Problem.at(path, "needs a section name"));
            return Optional.empty();
        }
        Optional<Section> section = lookup.find(name);
        if (section.isEmpty()) {
            List<String> nearest = lookup.nearest(name, SUGGESTIONS);
            problems.add(Problem.at(path, "unknown section '" + name + "'"
                    + (nearest.isEmpty() ? "" : "; nearest: " + String.join(", ", nearest))));
        }
        return section;
    }

    private static Set<Role> requiredRoles(SegmentSpec seg, int s, LevelPlan plan) {
        Set<Role> roles = EnumSet.of(Role.LEG, Role.DIAGONAL);
        if (seg.horizontals() != null && seg.horizontals() != Horizontals.NONE) {
            roles.add(Role.HORIZONTAL);
        }
        if (seg.redundants() > 0) {
            roles.add(Role.REDUNDANT);
        }
        if (plan != null) {
            for (int index : plan.planLevels()) {
                if (plan.planOwner(plan.levels().get(index)).segment() == s) {
                    roles.add(Role.PLAN);
                }
            }
        }
        return roles;
    }
}
