package tetrapod.solve;

import java.util.Arrays;
import java.util.List;
import tetrapod.model.Frame;
import tetrapod.model.Vec3;

/** Finds the eliminated DOF row of each auto-restraint, so that its force can be read per solution. */
final class AutoRestraintRows {

    private AutoRestraintRows() { }

    /** @return per auto-restraint (in {@link NodeConstraints#autoRestraints()} order) its restrained row */
    static int[] of(Frame frame, NodeConstraints constraints, DofNumbering numbering) {
        List<AutoRestraint> autos = constraints.autoRestraints();
        int[] rows = new int[autos.size()];
        Arrays.fill(rows, -1);
        for (int r = 0; r < numbering.restrainedCount(); r++) {
            int n = numbering.restrainedNode(r);
            int k = numbering.restrainedDof(r);
            if (constraints.kind(n, k) != NodeConstraints.AUTO) {
                continue;
            }
            int id = frame.nodes().get(n).id();
            Vec3 direction = direction(constraints, n, k);
            for (int a = 0; a < autos.size(); a++) {
                AutoRestraint auto = autos.get(a);
                if (rows[a] < 0 && auto.node() == id && auto.isRotation() == (k >= 3)
                        && Math.abs(auto.direction().dot(direction)) > 1 - DirectionRestraint.AXIS_TOLERANCE) {
                    rows[a] = r;
                    break;
                }
            }
        }
        for (int a = 0; a < rows.length; a++) {
            if (rows[a] < 0) {
                throw new IllegalStateException("auto-restraint " + autos.get(a) + " has no eliminated DOF");
            }
        }
        return rows;
    }

    /** The direction of DOF k (0..5) of node index n in its basis, tower axes. */
    private static Vec3 direction(NodeConstraints constraints, int n, int k) {
        double[] q = k < 3 ? constraints.translationBasis(n) : constraints.rotationBasis(n);
        int c = k % 3;
        if (q == null) {
            double[] axis = DirectionRestraint.unitAxis(c);
            return new Vec3(axis[0], axis[1], axis[2]);
        }
        return new Vec3(q[c], q[3 + c], q[6 + c]);
    }
}
