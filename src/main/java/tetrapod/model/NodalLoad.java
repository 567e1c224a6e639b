package tetrapod.model;

/** A load at a node in tower axes: forces Fx, Fy, Fz in N and moments Mx, My, Mz in N·m. */
public record NodalLoad(int node, double fx, double fy, double fz, double mx, double my, double mz) {

    public NodalLoad {
        for (double v : new double[] {fx, fy, fz, mx, my, mz}) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("load at node " + node + " is not finite");
            }
        }
    }

    public static NodalLoad force(int node, double fx, double fy, double fz) {
        return new NodalLoad(node, fx, fy, fz, 0, 0, 0);
    }

    public NodalLoad plus(NodalLoad o) {
        if (o.node != node) {
            throw new IllegalArgumentException("cannot add loads at nodes " + node + " and " + o.node);
        }
        return new NodalLoad(node, fx + o.fx, fy + o.fy, fz + o.fz, mx + o.mx, my + o.my, mz + o.mz);
    }

    public NodalLoad times(double factor) {
        return new NodalLoad(node, fx * factor, fy * factor, fz * factor, mx * factor, my * factor, mz * factor);
    }
}
