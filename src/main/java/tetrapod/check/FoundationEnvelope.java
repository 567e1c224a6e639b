package tetrapod.check;

import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;

/**
 * One leg base over every load case: for each check mode its largest utilisation with the check,
 * case and azimuth; the largest compression, uplift and shear; and the largest concrete volume
 * needed to balance the uplift. Immutable; ties keep the earlier case.
 *
 * @param node           the support node
 * @param checks         per mode, the governing check and where it occurred
 * @param maxCompression N
 * @param maxUplift      N
 * @param maxShear       N
 * @param concreteVolumeRequired m³, for the governing uplift
 */
public record FoundationEnvelope(int node, Map<CheckMode, Governing> checks, Extreme maxCompression, Extreme maxUplift,
                                 Extreme maxShear, double concreteVolumeRequired) {

    /** One mode's governing check, where it occurred, and whether it took factored or service reactions. */
    public record Governing(CheckResult check, Extreme where, ReactionLevel level) { }

    public FoundationEnvelope {
        checks = Collections.unmodifiableMap(new EnumMap<>(checks.isEmpty() ? new EnumMap<>(CheckMode.class) : checks));
    }

    public static FoundationEnvelope empty(int node) {
        return new FoundationEnvelope(node, Map.of(), Extreme.NONE, Extreme.NONE, Extreme.NONE, 0);
    }

    /**
     * The envelope with one more case: its checks and, for a factored case, its reactions (the
     * largest compression, uplift and shear are those of the factored cases).
     */
    public FoundationEnvelope with(FoundationResult result, LegBaseForces forces, String caseId, Double azimuthDeg,
                                   ReactionLevel level) {
        Map<CheckMode, Governing> next = new EnumMap<>(CheckMode.class);
        next.putAll(checks);
        for (CheckResult c : result.checks()) {
            Governing old = next.get(c.mode());
            Extreme where = (old == null ? Extreme.NONE : old.where()).max(c.utilisation(), caseId, azimuthDeg);
            if (old == null || where != old.where()) {
                next.put(c.mode(), new Governing(c, where, level));
            }
        }
        double volume = Math.max(concreteVolumeRequired, result.concreteVolumeRequired());
        if (level == ReactionLevel.SERVICE) {
            return new FoundationEnvelope(node, next, maxCompression, maxUplift, maxShear, volume);
        }
        Extreme uplift = maxUplift.max(forces.uplift(), caseId, azimuthDeg);
        return new FoundationEnvelope(node, next, maxCompression.max(forces.compression(), caseId, azimuthDeg), uplift,
                maxShear.max(forces.horizontal(), caseId, azimuthDeg), volume);
    }
}
