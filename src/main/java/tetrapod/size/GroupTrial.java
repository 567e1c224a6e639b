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

    /** The governing check of a full trial: utilisation, the member and case that give it. */
    record Worst(double utilisation, int member, CheckResult check, String caseId) { }

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
     * Whether {@code section} keeps every demand at or below {@code target}. The analysed section
     * is judged by its full envelope, so a design that keeps all its sections is known to pass.
     */
    boolean passes(Section section, double target) {
        if (section.equals(current)) {
            return exactCurrent.utilisation() <= target;
        }
        for (int k = 0; k < demands.size(); k++) {
            Demand d = demands.get(k);
            if (check(d, section).utilisation() > target) {
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
        for (Demand d : demands) {
            CheckResult r = check(d, section).governing();
            if (worst == null || r.utilisation() > worst.utilisation()) {
                worst = new Worst(r.utilisation(), d.member().id(), r, d.caseId());
            }
        }
        return worst;
    }

    private MemberCheckResult check(Demand d, Section section) {
        Member m = d.member();
        Member trial = new Member(m.id(), m.i(), m.j(), m.role(), m.segment(), m.panel(), m.face(), section,
                m.axialOnly(), m.orientation());
        return method.check(new MemberCheckInput(trial, material, d.buckling(),
                checker.connectionOf(m.id()), d.forces()));
    }
}
