package tetrapod.generate;

import java.util.List;
import tetrapod.model.Vec3;

/**
 * Two diagonals per panel from the panel's bottom corners to the midpoint of its top level. The
 * horizontal of that level (if any) is split at the midpoint because a node lies on it; without
 * that horizontal the joint is a mechanism, which is generated anyway for the solver to report.
 */
record KBracing() implements FacePattern {

    @Override
    public FaceBracing brace(PanelFace f, int panelInSegment) {
        Vec3 apex = f.topStart().lerp(f.topEnd(), 0.5);
        return new FaceBracing(List.of(new Line(f.bottomStart(), apex), new Line(f.bottomEnd(), apex)), List.of());
    }
}
