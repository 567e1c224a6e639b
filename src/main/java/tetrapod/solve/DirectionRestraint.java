package tetrapod.solve;

import java.util.ArrayList;
import java.util.List;
import tetrapod.model.Vec3;

/**
 * Eliminates free directions at a node exactly: along a global axis the DOF itself, otherwise a
 * DOF of a rotated basis of the node's translations (or rotations) that contains the direction.
 */
final class DirectionRestraint {

    /** A unit vector this close to a global axis is taken as that axis. */
    static final double AXIS_TOLERANCE = 1e-9;
    private static final String[] DOF = {"ux", "uy", "uz", "rx", "ry", "rz"};
    private static final Vec3[] AXES = {Vec3.X, Vec3.Y, Vec3.Z};

    private DirectionRestraint() { }

    /**
     * Eliminates the unit directions {@code free} among the three DOFs at {@code offset} (0:
     * translations, 3: rotations) of a node, none of which may have a component along a held axis.
     * Axis directions are eliminated as they are; otherwise the triple gets a rotated basis: the
     * held axes first (they stay DOFs along the axes), then the free directions, then a completion.
     *
     * @return the basis Q (row-major, columns the new DOF directions), or null for the global axes
     */
    static double[] restrain(int id, byte[] kind, int offset, List<double[]> free, String reason,
                                     List<AutoRestraint> autos) {
        byte[] k3 = {kind[offset], kind[offset + 1], kind[offset + 2]};
        free = preferAxes(free, k3);
        boolean allAxes = true;
        for (double[] v : free) {
            allAxes &= axisOf(v) >= 0;
        }
        if (allAxes) {
            for (double[] v : free) {
                int a = axisOf(v);
                kind[offset + a] = NodeConstraints.AUTO;
                autos.add(new AutoRestraint(id, DOF[offset + a], AXES[a], reason));
            }
            return null;
        }
        List<double[]> basis = new ArrayList<>();
        List<Byte> basisKind = new ArrayList<>();
        for (int a = 0; a < 3; a++) {
            if (k3[a] == NodeConstraints.SUPPORT) {
                basis.add(unitAxis(a));
                basisKind.add(NodeConstraints.SUPPORT);
            }
        }
        for (double[] v : free) {
            int a = axisOf(v);
            double[] dir = a >= 0 ? unitAxis(a) : canonicalSign(v);
            basis.add(dir);
            basisKind.add(NodeConstraints.AUTO);
            String name = a >= 0 ? DOF[offset + a] : offset == 0 ? AutoRestraint.SKEW : AutoRestraint.SKEW_ROTATION;
            autos.add(new AutoRestraint(id, name, vec(dir), reason));
        }
        for (int a = 0; a < 3 && basis.size() < 3; a++) {
            double[] v = unitAxis(a);
            for (double[] b : basis) {
                double dot = dot(v, b);
                for (int r = 0; r < 3; r++) {
                    v[r] -= dot * b[r];
                }
            }
            double norm = Math.sqrt(dot(v, v));
            if (norm > 1e-3) {
                for (int r = 0; r < 3; r++) {
                    v[r] /= norm;
                }
                basis.add(v);
                basisKind.add(NodeConstraints.FREE);
            }
        }
        double[] q = new double[9];
        for (int c = 0; c < 3; c++) {
            for (int r = 0; r < 3; r++) {
                q[3 * r + c] = basis.get(c)[r];
            }
            kind[offset + c] = basisKind.get(c);
        }
        return q;
    }

    /** When a free global axis lies in span(free), use it as the first vector of the span. */
    private static List<double[]> preferAxes(List<double[]> free, byte[] kind) {
        if (free.size() != 2) {
            return free;
        }
        for (int a = 0; a < 3; a++) {
            if (kind[a] != NodeConstraints.FREE) {
                continue;
            }
            double p0 = free.get(0)[a];
            double p1 = free.get(1)[a];
            if (p0 * p0 + p1 * p1 > 1 - AXIS_TOLERANCE) {
                double[] axis = unitAxis(a);
                double[] other = free.get(0).clone(); // the in-span vector orthogonal to the axis
                double[] alt = free.get(1);
                double[] pick = Math.abs(p0) < Math.abs(p1) ? other : alt.clone();
                double dot = dot(pick, axis);
                for (int r = 0; r < 3; r++) {
                    pick[r] -= dot * axis[r];
                }
                double norm = Math.sqrt(dot(pick, pick));
                for (int r = 0; r < 3; r++) {
                    pick[r] /= norm;
                }
                return List.of(axis, pick);
            }
        }
        return free;
    }

    /** The global axis (0, 1, 2) that unit vector v lies along, or −1. */
    static int axisOf(double[] v) {
        for (int a = 0; a < 3; a++) {
            if (Math.abs(v[a]) > 1 - AXIS_TOLERANCE) {
                return a;
            }
        }
        return -1;
    }

    /**
     * v or −v, whichever has its largest component positive, with round-off components
     * (|c| &lt; 1e-14) set to zero, so that reports read naturally.
     */
    private static double[] canonicalSign(double[] v) {
        double[] out = v.clone();
        for (int a = 0; a < 3; a++) {
            if (Math.abs(out[a]) < 1e-14) {
                out[a] = 0;
            }
        }
        double norm = Math.sqrt(dot(out, out));
        int big = 0;
        for (int a = 1; a < 3; a++) {
            if (Math.abs(out[a]) > Math.abs(out[big]) + 1e-12) {
                big = a;
            }
        }
        double sign = out[big] < 0 ? -1 : 1;
        for (int a = 0; a < 3; a++) {
            out[a] = sign * out[a] / norm + 0.0; // + 0.0 turns −0.0 into 0.0
        }
        return out;
    }

    static double[] unitAxis(int a) {
        double[] v = new double[3];
        v[a] = 1;
        return v;
    }

    static double dot(double[] a, double[] b) {
        return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    }

    private static Vec3 vec(double[] v) {
        return new Vec3(v[0], v[1], v[2]);
    }
}
