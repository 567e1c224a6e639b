package tetrapod.check;

/**
 * One member's results over every load case (combination × azimuth): the governing check with its
 * case and azimuth, and the largest tension and compression. Immutable: {@link #with} returns the
 * envelope including one more case; cases added in a fixed order give a deterministic envelope
 * (ties keep the earlier case).
 *
 * @param governing      the check with the largest utilisation over all cases (null before any)
 * @param governingWhere its utilisation, case and azimuth
 * @param maxTension     largest axial tension, N
 * @param maxCompression largest axial compression as a positive number, N
 */
public record MemberEnvelope(int member, CheckResult governing, Extreme governingWhere, Extreme maxTension,
                             Extreme maxCompression) {

    public static MemberEnvelope empty(int member) {
        return new MemberEnvelope(member, null, Extreme.NONE, Extreme.NONE, Extreme.NONE);
    }

    /** The envelope with the case {@code caseId} (azimuth in degrees, or null) added. */
    public MemberEnvelope with(MemberCheckResult result, MemberForces forces, String caseId, Double azimuthDeg) {
        if (result.member() != member) {
            throw new IllegalArgumentException("result of member " + result.member() + " added to member " + member);
        }
        CheckResult candidate = result.governing();
        Extreme where = governingWhere.max(candidate.utilisation(), caseId, azimuthDeg);
        CheckResult kept = where == governingWhere ? governing : candidate;
        return new MemberEnvelope(member, kept, where, maxTension.max(forces.tension(), caseId, azimuthDeg),
                maxCompression.max(forces.compression(), caseId, azimuthDeg));
    }
}
