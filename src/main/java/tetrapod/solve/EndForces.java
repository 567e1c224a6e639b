package tetrapod.solve;

/**
 * Six force components at one member end, in the member's local axes (x from i to j, y the
 * orientation, z = x × y): forces fx (axial), fy (shear Vy), fz (shear Vz) in N and moments mx
 * (torque T), my (My), mz (Mz) in N·m, all positive along the positive local axes (right-hand
 * rule for moments). What they mean (end action or stress resultant) is said where they are used,
 * see {@link MemberEndForces}.
 */
public record EndForces(double fx, double fy, double fz, double mx, double my, double mz) {

    public static final EndForces ZERO = new EndForces(0, 0, 0, 0, 0, 0);

    public EndForces negated() {
        return new EndForces(-fx, -fy, -fz, -mx, -my, -mz);
    }

    /** Component {@code k} in the order fx, fy, fz, mx, my, mz. */
    public double component(int k) {
        return switch (k) {
            case 0 -> fx;
            case 1 -> fy;
            case 2 -> fz;
            case 3 -> mx;
            case 4 -> my;
            case 5 -> mz;
            default -> throw new IndexOutOfBoundsException("component " + k);
        };
    }
}
