package tetrapod.analysis;

/**
 * The extreme of some quantity over the load cases, and the case where it occurs.
 *
 * @param value       in SI units (N for forces)
 * @param combination name of the combination
 * @param azimuthDeg  wind azimuth of the case, degrees; null for a case without wind
 */
public record Extreme(double value, String combination, Double azimuthDeg) {

    /** The case id as the load package names cases: {@code 1.35G + 1.5W@45}. */
    public String caseId() {
        return azimuthDeg == null ? combination : combination + "@" + tetrapod.load.CaseKey.degrees(azimuthDeg);
    }
}
