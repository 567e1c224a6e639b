package tetrapod.size;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import tetrapod.check.MemberEnvelope;
import tetrapod.model.Section;

/**
 * One sizing step: from the analysis of a design, the next design. Each bracing group (every
 * role but legs) takes the lightest allowed section that passes under the analysed forces; then
 * the legs, from the top segment down, the lightest allowed section that passes, is at least as
 * wide as the widest bracing of its segment and at least as heavy as the leg above. Sections
 * lighter than a group's floor (set when the designs cycled) are not considered.
 */
final class SectionChooser {

    /** The next design and the groups that no allowed section carries. */
    record Step(Map<SizingGroup, Section> next, List<Shortfall> shortfalls) {
        Step {
            next = Collections.unmodifiableMap(new TreeMap<>(next));
            shortfalls = List.copyOf(shortfalls);
        }
    }

    private final Map<SizingGroup, List<Integer>> membersOf;
    private final Map<SizingGroup, List<Section>> candidates;
    private final double target;

    /**
     * @param membersOf  the frame indices of each group's members
     * @param candidates each group's allowed sections, lightest first (after the per-group rules)
     */
    SectionChooser(Map<SizingGroup, List<Integer>> membersOf, Map<SizingGroup, List<Section>> candidates, double target) {
        this.membersOf = membersOf;
        this.candidates = candidates;
        this.target = target;
    }

    Step choose(Evaluation eval, Map<SizingGroup, Section> design, Map<SizingGroup, Section> floors) {
        Map<SizingGroup, Section> next = new TreeMap<>();
        List<Shortfall> shortfalls = new ArrayList<>();
        for (SizingGroup g : membersOf.keySet()) {
            if (g.isBracing()) {
                List<Section> allowed = heavierThan(candidates.get(g), floors.get(g));
                next.put(g, pick(g, allowed, eval, design, shortfalls, noRoom(g, floors)));
            }
        }
        List<SizingGroup> legs = new ArrayList<>();
        for (SizingGroup g : membersOf.keySet()) {
            if (!g.isBracing()) {
                legs.add(0, g); // top segment first
            }
        }
        Section above = null;
        for (SizingGroup g : legs) {
            double width = 0;
            String widest = null;
            for (Map.Entry<SizingGroup, Section> e : next.entrySet()) {
                if (e.getKey().segment() == g.segment() && SectionRules.wideWidth(e.getValue()) > width) {
                    width = SectionRules.wideWidth(e.getValue());
                    widest = e.getValue().name();
                }
            }
            double mass = above == null ? 0 : above.massPerMetre();
            List<Section> allowed = new ArrayList<>();
            for (Section s : heavierThan(candidates.get(g), floors.get(g))) {
                if (SectionRules.narrowWidth(s) >= width - 1e-12 && s.massPerMetre() >= mass) {
                    allowed.add(s);
                }
            }
            String why = String.format(Locale.ROOT, "no allowed leg section is at least %.0f mm wide (bracing %s bolts "
                    + "to it) and at least %.2f kg/m (the leg above%s)", width * 1e3, widest == null ? "-" : widest,
                    mass, above == null ? ": none" : " is " + above.name());
            Section chosen = pick(g, allowed, eval, design, shortfalls, why);
            next.put(g, chosen);
            above = chosen;
        }
        return new Step(next, shortfalls);
    }

    private String noRoom(SizingGroup g, Map<SizingGroup, Section> floors) {
        Section floor = floors.get(g);
        return "no allowed section meets the minimum sizes and fits the connection's holes"
                + (floor == null ? "" : " at or above " + floor.name());
    }

    /** The lightest of {@code allowed} that passes; else the one with the lowest utilisation, as a shortfall. */
    private Section pick(SizingGroup g, List<Section> allowed, Evaluation eval, Map<SizingGroup, Section> design,
                         List<Shortfall> shortfalls, String whyNone) {
        Section current = design.get(g);
        if (allowed.isEmpty()) {
            shortfalls.add(new Shortfall(g, 0, "", 0, whyNone));
            return current;
        }
        GroupTrial trial = trial(g, eval, current);
        for (Section s : allowed) {
            if (trial.passes(s, target)) {
                return s;
            }
        }
        Section best = null;
        GroupTrial.Worst bestWorst = null;
        for (Section s : allowed) {
            GroupTrial.Worst w = trial.worst(s);
            if (bestWorst == null || w.shortfall(target) < bestWorst.shortfall(target)) {
                best = s;
                bestWorst = w;
            }
        }
        shortfalls.add(new Shortfall(g, bestWorst.member(), best.name(), bestWorst.utilisation(),
                bestWorst.describe()));
        return best;
    }

    private GroupTrial trial(SizingGroup g, Evaluation eval, Section current) {
        List<Demand> all = new ArrayList<>();
        GroupTrial.Worst exact = null;
        List<tetrapod.check.CheckResult> requirements = new ArrayList<>();
        for (int m : membersOf.get(g)) {
            all.addAll(eval.demands().get(m));
            MemberEnvelope e = eval.envelopes().get(m);
            requirements.addAll(e.requirements());
            double u = Evaluation.utilisation(e);
            if (exact == null || u > exact.utilisation()) {
                exact = new GroupTrial.Worst(u, e.member(), e.governing(), e.governingWhere().caseId(), null);
            }
        }
        exact = new GroupTrial.Worst(exact.utilisation(), exact.member(), exact.check(), exact.caseId(),
                GroupTrial.worstRequirement(requirements));
        return new GroupTrial(Demands.reduce(all), eval.checker(), eval.frame().material(), current, exact);
    }

    private static List<Section> heavierThan(List<Section> sections, Section floor) {
        if (floor == null) {
            return sections;
        }
        List<Section> out = new ArrayList<>();
        for (Section s : sections) {
            if (s.massPerMetre() >= floor.massPerMetre()) {
                out.add(s);
            }
        }
        return out;
    }
}
