package tetrapod.size;

import java.util.Locale;
import java.util.Objects;

/**
 * A group that no allowed section can carry at the target.
 *
 * @param member          the member that fails with the best section (0 when no section was allowed at all)
 * @param bestSection     the allowed section with the lowest utilisation ("" when none is allowed)
 * @param bestUtilisation that section's utilisation (0 when none is allowed)
 * @param reason          what stands in the way, for people
 */
public record Shortfall(SizingGroup group, int member, String bestSection, double bestUtilisation, String reason) {
    public Shortfall {
        Objects.requireNonNull(group, "group");
        Objects.requireNonNull(bestSection, "bestSection");
        Objects.requireNonNull(reason, "reason");
    }

    /** One line: the group, the member and the best the allowed sections can do. */
    public String message() {
        if (bestSection.isEmpty()) {
            return group.label() + ": " + reason;
        }
        return String.format(Locale.ROOT, "%s: member %d needs more than any allowed section gives; best %s at "
                + "utilisation %.3f (%s)", group.label(), member, bestSection, bestUtilisation, reason);
    }
}
