package tetrapod.size;

import java.util.Comparator;
import java.util.Objects;
import tetrapod.model.Role;

/**
 * The members that share one section: those of one role in one segment, as the spec's
 * {@code segments[i].sections} groups them. Ordered by segment (bottom first), then role.
 *
 * @param segment 1 = the bottom segment ({@code segments[0]})
 */
public record SizingGroup(int segment, Role role) implements Comparable<SizingGroup> {

    private static final Comparator<SizingGroup> ORDER = Comparator.comparingInt(SizingGroup::segment)
            .thenComparing(SizingGroup::role);

    public SizingGroup {
        Objects.requireNonNull(role, "role");
        if (segment < 1) {
            throw new IllegalArgumentException("segments are numbered from 1, was " + segment);
        }
    }

    /** Where the group's section stands in the model file, e.g. {@code segments[0].sections.leg}. */
    public String path() {
        return "segments[" + (segment - 1) + "].sections." + role.jsonName();
    }

    /** {@code segment 2 diagonal}. */
    public String label() {
        return "segment " + segment + " " + role.jsonName();
    }

    /** Whether the members bolt to the legs (every role but the legs themselves). */
    boolean isBracing() {
        return role != Role.LEG;
    }

    @Override
    public int compareTo(SizingGroup o) {
        return ORDER.compare(this, o);
    }
}
