package tetrapod.analysis;

import java.util.List;
import tetrapod.model.Frame;
import tetrapod.model.NodeForce;
import tetrapod.model.Node;

/**
 * Resultants of load vectors about the base centre (0, 0, 0): Fx, Fy, Fz (N) and Mx, My (N·m),
 * one row per basis vector, superposable like the loads themselves.
 */
final class LoadResultants {

    private final double[][] rows; // [k][Fx, Fy, Fz, Mx, My]

    LoadResultants(Frame frame, List<List<NodeForce>> basis) {
        var index = frame.nodeIndex();
        rows = new double[basis.size()][5];
        for (int k = 0; k < basis.size(); k++) {
            for (NodeForce l : basis.get(k)) {
                Node n = frame.nodes().get(index.get(l.node()));
                double[] r = rows[k];
                r[0] += l.fx();
                r[1] += l.fy();
                r[2] += l.fz();
                r[3] += n.y() * l.fz() - n.z() * l.fy() + l.mx();
                r[4] += n.z() * l.fx() - n.x() * l.fz() + l.my();
            }
        }
    }

    /** Σ w_k · row_k into {@code out} (length 5). */
    double[] combine(double[] weights, double[] out) {
        java.util.Arrays.fill(out, 0);
        for (int k = 0; k < rows.length; k++) {
            for (int c = 0; c < 5; c++) {
                out[c] += weights[k] * rows[k][c];
            }
        }
        return out;
    }
}
