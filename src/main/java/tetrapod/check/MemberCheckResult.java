package tetrapod.check;

import java.util.Comparator;
import java.util.List;

/**
 * Every check of one member for one load case, and the governing one (the largest utilisation;
 * the first listed on a tie).
 *
 * @param member the member id
 * @param checks at least one check, in the order the method made them
 */
public record MemberCheckResult(int member, List<CheckResult> checks) {

    public MemberCheckResult {
        checks = List.copyOf(checks);
        if (checks.isEmpty()) {
            throw new IllegalArgumentException("member " + member + " has no check");
        }
    }

    public CheckResult governing() {
        return checks.stream().max(Comparator.comparingDouble(CheckResult::utilisation)).orElseThrow();
    }

    public double utilisation() {
        return governing().utilisation();
    }
}
