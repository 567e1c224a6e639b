package tetrapod.model;

import java.util.Objects;

/** A node held by the ground. */
public record Support(int node, Restraint restraint) {
    public Support {
        Objects.requireNonNull(restraint, "restraint");
    }
}
