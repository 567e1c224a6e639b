package tetrapod.check;

import java.util.Objects;

/**
 * The largest value of something over load cases, and where it occurred.
 *
 * @param value      the largest value seen (0 before any case)
 * @param caseId     the load case it occurred in, or null before any case
 * @param azimuthDeg the case's wind azimuth, degrees, or null for a case without wind
 */
public record Extreme(double value, String caseId, Double azimuthDeg) {

    public static final Extreme NONE = new Extreme(0, null, null);

    public Extreme {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("an extreme must be finite");
        }
    }

    /** This or the candidate, whichever is larger; on a tie the earlier (this) is kept. */
    public Extreme max(double candidate, String caseId, Double azimuthDeg) {
        Objects.requireNonNull(caseId, "caseId");
        if (this.caseId == null || candidate > value) {
            return new Extreme(candidate, caseId, azimuthDeg);
        }
        return this;
    }
}
