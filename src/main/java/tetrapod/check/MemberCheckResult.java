package tetrapod.check;

import java.util.ArrayList;
import java.util.List;

/**
 * Every check of one member for one load case, in two groups that are never mixed: the strength
 * checks, whose largest ratio is the member's utilisation ({@link #governing()}; the first listed on
 * a tie), and the requirements that do not depend on the load ({@link #requirements()}).
 *
 * @param member the member id
 * @param checks at least one strength check, and any requirements, in the order the method made them
 */
public record MemberCheckResult(int member, List<CheckResult> checks) {

    public MemberCheckResult {
        checks = List.copyOf(checks);
        if (checks.stream().allMatch(c -> c.mode().isRequirement())) {
            throw new IllegalArgumentException("member " + member + " has no strength check");
        }
    }

    /** The strength check with the largest utilisation (the first on a tie). */
    public CheckResult governing() {
        CheckResult worst = null;
        for (CheckResult c : checks) {
            if (!c.mode().isRequirement() && (worst == null || c.utilisation() > worst.utilisation())) {
                worst = c;
            }
        }
        return worst;
    }

    /** The member's strength utilisation: design force effect over design resistance. */
    public double utilisation() {
        return governing().utilisation();
    }

    /** The requirements (ratio to the limit in {@link CheckResult#utilisation()}), in the method's order. */
    public List<CheckResult> requirements() {
        List<CheckResult> out = new ArrayList<>();
        for (CheckResult c : checks) {
            if (c.mode().isRequirement()) {
                out.add(c);
            }
        }
        return out;
    }
}
