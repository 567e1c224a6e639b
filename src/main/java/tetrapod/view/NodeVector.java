package tetrapod.view;

import java.util.Objects;
import tetrapod.model.Vec3;

/**
 * A vector at a node (by node id): a displacement in m, or a force in N.
 */
public record NodeVector(int node, Vec3 vector) {
    public NodeVector {
        Objects.requireNonNull(vector, "vector");
        if (!Double.isFinite(vector.x()) || !Double.isFinite(vector.y()) || !Double.isFinite(vector.z())) {
            throw new IllegalArgumentException("node " + node + " has a non-finite vector");
        }
    }
}
