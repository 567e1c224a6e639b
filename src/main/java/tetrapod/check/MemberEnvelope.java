package tetrapod.check;

import java.util.ArrayList;
import java.util.List;

/**
 * One member's results over every load case (combination × azimuth): the governing strength check
 * with its case and azimuth, the largest tension and compression, and each requirement at its
 * largest ratio to its limit. Immutable: {@link #with} returns the envelope including one more
 * case; cases added in a fixed order give a deterministic envelope (ties keep the earlier case).
 *
 * @param governing      the strength check with the largest utilisation over all cases (null before any)
 * @param governingWhere its utilisation, case and azimuth
 * @param governingForces the member's own forces in that case (before a redundant's nominal force),
 *                       null before any case
 * @param maxTension     largest axial tension, N
 * @param maxCompression largest axial compression as a positive number, N
 * @param requirements   per requirement mode, its check at the largest ratio over all cases (a
 *                       buckling length, and so a slenderness, can depend on the forces of the
 *                       other diagonals), in the order the method first made them
 */
public record MemberEnvelope(int member, CheckResult governing, Extreme governingWhere, MemberForces governingForces,
                             Extreme maxTension, Extreme maxCompression, List<CheckResult> requirements) {

    public MemberEnvelope {
        requirements = List.copyOf(requirements);
    }

    public static MemberEnvelope empty(int member) {
        return new MemberEnvelope(member, null, Extreme.NONE, null, Extreme.NONE, Extreme.NONE, List.of());
    }

    /** The envelope with the case {@code caseId} (azimuth in degrees, or null) added. */
    public MemberEnvelope with(MemberCheckResult result, MemberForces forces, String caseId, Double azimuthDeg) {
        if (result.member() != member) {
            throw new IllegalArgumentException("result of member " + result.member() + " added to member " + member);
        }
        CheckResult candidate = result.governing();
        Extreme where = governingWhere.max(candidate.utilisation(), caseId, azimuthDeg);
        CheckResult kept = where == governingWhere ? governing : candidate;
        MemberForces keptForces = where == governingWhere ? governingForces : forces;
        return new MemberEnvelope(member, kept, where, keptForces, maxTension.max(forces.tension(), caseId, azimuthDeg),
                maxCompression.max(forces.compression(), caseId, azimuthDeg), worse(requirements, result.requirements()));
    }

    /** True when every requirement is met (ratio ≤ 1). */
    public boolean requirementsMet() {
        return requirements.stream().allMatch(CheckResult::passes);
    }

    private static List<CheckResult> worse(List<CheckResult> kept, List<CheckResult> added) {
        if (added.isEmpty()) {
            return kept;
        }
        List<CheckResult> out = new ArrayList<>(kept);
        for (CheckResult a : added) {
            int at = -1;
            for (int k = 0; k < out.size(); k++) {
                if (out.get(k).mode() == a.mode()) {
                    at = k;
                }
            }
            if (at < 0) {
                out.add(a);
            } else if (a.utilisation() > out.get(at).utilisation()) {
                out.set(at, a);
            }
        }
        return out;
    }
}
