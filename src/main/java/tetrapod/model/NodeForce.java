package tetrapod.model;


/**
 * Forces Fx, Fy, Fz (N) and moments Mx, My, Mz (N·m) at a node, in tower axes: an applied load,
 * a support reaction or an auto-restraint force.
 */
public record NodeForce(int node, double fx, double fy, double fz, double mx, double my, double mz) {

    public NodeForce {
        if (!Double.isFinite(fx) || !Double.isFinite(fy) || !Double.isFinite(fz)
                || !Double.isFinite(mx) || !Double.isFinite(my) || !Double.isFinite(mz)) {
            throw new IllegalArgumentException("node " + node + ": a force or moment is not finite");
        }
    }

    /** A force without moment. */
    public static NodeForce force(int node, double fx, double fy, double fz) {
        return new NodeForce(node, fx, fy, fz, 0, 0, 0);
    }

    public Vec3 force() {
        return new Vec3(fx, fy, fz);
    }

    public Vec3 moment() {
        return new Vec3(mx, my, mz);
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

    public NodeForce times(double s) {
        return new NodeForce(node, fx * s, fy * s, fz * s, mx * s, my * s, mz * s);
    }

    /** The sum of two forces at the same node. */
    public NodeForce plus(NodeForce o) {
        if (o.node != node) {
            throw new IllegalArgumentException("cannot add forces at nodes " + node + " and " + o.node);
        }
        return new NodeForce(node, fx + o.fx, fy + o.fy, fz + o.fz, mx + o.mx, my + o.my, mz + o.mz);
    }
}
