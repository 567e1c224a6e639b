package tetrapod.generate;

import java.util.List;
import tetrapod.model.Vec3;

/**
 * The bracing of one face of one panel: its diagonals as whole lines (they are split later at
 * every node lying on them) and the extra joints to create on them (the connected X crossing).
 */
record FaceBracing(List<Line> diagonals, List<Vec3> joints) {
    FaceBracing {
        diagonals = List.copyOf(diagonals);
        joints = List.copyOf(joints);
    }
}
