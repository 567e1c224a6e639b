package tetrapod.solve;

import java.util.Objects;
import tetrapod.model.Vec3;

/**
 * A restraint the solver added because the lattice model legitimately has no stiffness there
 * (see {@link StabilityInspector}). It is exact, not a spring: the degree of freedom is eliminated.
 *
 * @param node      node id
 * @param dof       {@code ux uy uz rx ry rz} when the restrained direction is a global axis,
 *                  {@code "un"} for a translation along the skew unit vector {@code direction},
 *                  {@code "rn"} for a rotation about the skew unit vector {@code direction}
 * @param direction unit vector of the restrained translation or rotation axis, tower axes
 * @param reason    why the model has no stiffness there, for people
 */
public record AutoRestraint(int node, String dof, Vec3 direction, String reason) {

    /** Name of a skew translational auto-restraint. */
    public static final String SKEW = "un";
    /** Name of a skew rotational auto-restraint. */
    public static final String SKEW_ROTATION = "rn";

    public AutoRestraint {
        Objects.requireNonNull(dof, "dof");
        Objects.requireNonNull(direction, "direction");
        Objects.requireNonNull(reason, "reason");
    }

    public boolean isSkew() {
        return SKEW.equals(dof) || SKEW_ROTATION.equals(dof);
    }

    /** True for a rotational restraint (rx, ry, rz or rn). */
    public boolean isRotation() {
        return dof.startsWith("r");
    }
}
