package tetrapod.size;

import java.util.ArrayList;
import java.util.List;
import tetrapod.check.CheckResult;
import tetrapod.check.MemberCheck;
import tetrapod.check.MemberCheckInput;
import tetrapod.check.MemberCheckResult;
import tetrapod.check.MemberChecker;
import tetrapod.model.Material;
import tetrapod.model.Member;
import tetrapod.model.Section;

/**
 * Tries sections on one group under the forces of one analysis: the utilisation of a section is
 * the largest over the group's demands, each checked with that section in place of the member's
 * own. Mutable (it moves the demand that last failed a section to the front, so that the next,
 * similar, section is usually rejected by its first check); one per group and step.
 */
final class GroupTrial {

    /**
     * The governing check of a full trial: strength utilisation, the member and case that give it,
     * and the requirement with the largest ratio to its limit (null when the method has none).
     */
    record Worst(double utilisation, int member, CheckResult check, String caseId, CheckResult requirement) {

        /** The largest requirement ratio, 0 without requirements. */
        double requirementRatio() {
            return requirement == null ? 0 : requirement.utilisation();
        }

        /** How far from passing: max(utilisation / target, requirement ratio); ≤ 1 passes. */
        double shortfall(double target) {
            return Math.max(utilisation / target, requirementRatio());
        }

        /** For people: the strength check, and the requirement when it is broken. */
        String describe() {
            return check.mode().jsonName() + ", " + check.clause() + ", case " + caseId
                    + (requirementRatio() > 1 ? String.format(java.util.Locale.ROOT, "; breaks the %s (%.3f, %s)",
                    requirement.mode().label(), requirementRatio(), requirement.clause()) : "");
        }
    }

    /** The requirement of {@code r} with the largest ratio to its limit, or null. */
    static CheckResult worstRequirement(List<CheckResult> requirements) {
        CheckResult worst = null;
        for (CheckResult q : requirements) {
            if (worst == null || q.utilisation() > worst.utilisation()) {
                worst = q;
            }
        }
        return worst;
    }

    private final List<Demand> demands;
    private final MemberChecker checker;
    private final MemberCheck method;
    private final Material material;
    private final Section current;
    private final Worst exactCurrent;

    /**
     * @param demands      the group's demands (input)
     * @param current      the group's section in the analysed design
     * @param exactCurrent the group's governing check over every case with that section (from the envelope)
     */
    GroupTrial(List<Demand> demands, MemberChecker checker, Material material, Section current, Worst exactCurrent) {
        this.demands = new ArrayList<>(demands);
        this.checker = checker;
        this.material = material;
        this.method = checker.method();
        this.current = current;
        this.exactCurrent = exactCurrent;
    }

    /**
     * Whether {@code section} keeps every demand at or below {@code target} and meets every
     * requirement (slenderness, bolt spacing, width-to-thickness: constraints, not utilisation).
     * The analysed section is judged by its full envelope, so a design that keeps all its sections
     * is known to pass.
     */
    boolean passes(Section section, double target) {
        if (section.equals(current)) {
            return exactCurrent.shortfall(target) <= 1;
        }
        for (int k = 0; k < demands.size(); k++) {
            Demand d = demands.get(k);
            MemberCheckResult r = check(d, section);
            CheckResult requirement = worstRequirement(r.requirements());
            if (r.utilisation() > target || requirement != null && !requirement.passes()) {
                if (k > 0) {
                    demands.remove(k);
                    demands.add(0, d);
                }
                return false;
            }
        }
        return true;
    }

    /** The governing check of {@code section} over every demand. */
    Worst worst(Section section) {
        if (section.equals(current)) {
            return exactCurrent;
        }
        Worst worst = null;
        CheckResult requirement = null;
        for (Demand d : demands) {
            MemberCheckResult result = check(d, section);
            CheckResult r = result.governing();
            if (worst == null || r.utilisation() > worst.utilisation()) {
                worst = new Worst(r.utilisation(), d.member().id(), r, d.caseId(), null);
            }
            CheckResult q = worstRequirement(result.requirements());
            if (q != null && (requirement == null || q.utilisation() > requirement.utilisation())) {
                requirement = q;
            }
        }
        return new Worst(worst.utilisation(), worst.member(), worst.check(), worst.caseId(), requirement);
    }

    private MemberCheckResult check(Demand d, Section section) {
        Member m = d.member();
        Member trial = new Member(m.id(), m.i(), m.j(), m.role(), m.segment(), m.panel(), m.face(), section,
                m.axialOnly(), m.orientation());
        return method.check(new MemberCheckInput(trial, material, d.buckling(),
                checker.connectionOf(m.id()), d.forces()));
    }
}
