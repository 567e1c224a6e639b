package tetrapod.view;

import java.util.Objects;
import tetrapod.model.Vec3;

/**
 * A force drawn as an arrow from {@code tail} to {@code tip} (m); the tip touches the point where
 * the force acts.
 *
 * @param node      the node the force acts on
 * @param component "Fz" (vertical) or "Fh" (horizontal resultant)
 * @param force     the component's value, N (for Fz: positive up; for Fh: its magnitude)
 */
public record Arrow(int node, String component, Vec3 tail, Vec3 tip, double force) {
    public Arrow {
        Objects.requireNonNull(component, "component");
        Objects.requireNonNull(tail, "tail");
        Objects.requireNonNull(tip, "tip");
    }

    public double length() {
        return tail.distanceTo(tip);
    }
}
