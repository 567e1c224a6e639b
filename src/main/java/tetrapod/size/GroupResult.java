package tetrapod.size;

import java.util.Objects;

/**
 * One group before and after sizing.
 *
 * @param before the group in the spec's own design (or the start design)
 * @param after  the group in the sized design; null when sizing found none
 */
public record GroupResult(SizingGroup group, GroupState before, GroupState after) {
    public GroupResult {
        Objects.requireNonNull(group, "group");
        Objects.requireNonNull(before, "before");
    }

    public boolean changed() {
        return after != null && !after.section().equals(before.section());
    }
}
