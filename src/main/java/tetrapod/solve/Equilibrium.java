package tetrapod.solve;

import tetrapod.model.NodeForce;
import java.util.List;
import tetrapod.model.Node;

/**
 * The global equilibrium check of a solution as the user reads it: applied loads against the
 * support reactions alone. Auto-restraint forces never count as supports: a load that went into
 * one shows here as a residual (and is refused by {@link LoadPath} before that).
 */
final class Equilibrium {

    private Equilibrium() { }

    /**
     * max(|ΣF|, |ΣM₀|/L) / Σ_loads(|F| + |M|/L), where the sums run over loads and support
     * reactions, M₀ are moments about the origin (r × F + M) and L the structure size; 0 when
     * there is no load.
     *
     * @param applied nodes × 6 load components, tower axes (input)
     */
    static double error(StructuralModel model, double[] applied, List<NodeForce> reactions) {
        List<Node> nodes = model.frame().nodes();
        double length = model.size();
        double[] sum = new double[6];
        double scale = 0;
        for (int n = 0; n < nodes.size(); n++) {
            double[] f = new double[6];
            System.arraycopy(applied, 6 * n, f, 0, 6);
            scale += Math.sqrt(f[0] * f[0] + f[1] * f[1] + f[2] * f[2])
                    + Math.sqrt(f[3] * f[3] + f[4] * f[4] + f[5] * f[5]) / length;
            accumulate(sum, nodes.get(n), f);
        }
        for (NodeForce r : reactions) {
            accumulate(sum, nodes.get(model.nodeIndex(r.node())), components(r));
        }
        if (scale == 0) {
            return 0;
        }
        double force = Math.sqrt(sum[0] * sum[0] + sum[1] * sum[1] + sum[2] * sum[2]);
        double moment = Math.sqrt(sum[3] * sum[3] + sum[4] * sum[4] + sum[5] * sum[5]) / length;
        return Math.max(force, moment) / scale;
    }

    private static double[] components(NodeForce f) {
        return new double[] {f.fx(), f.fy(), f.fz(), f.mx(), f.my(), f.mz()};
    }

    private static void accumulate(double[] sum, Node at, double[] f) {
        double x = at.x();
        double y = at.y();
        double z = at.z();
        sum[0] += f[0];
        sum[1] += f[1];
        sum[2] += f[2];
        sum[3] += y * f[2] - z * f[1] + f[3];
        sum[4] += z * f[0] - x * f[2] + f[4];
        sum[5] += x * f[1] - y * f[0] + f[5];
    }
}
