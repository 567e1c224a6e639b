package tetrapod.generate;

import java.util.List;

/**
 * One diagonal per panel, alternating: odd panels of a segment (1, 3, ...) run from the bottom of
 * leg k to the top of leg k+1, even panels from the bottom of leg k+1 to the top of leg k. The
 * count restarts in every segment, so panel 1 of each segment starts at the bottom of leg k.
 */
record SingleBracing() implements FacePattern {

    @Override
    public FaceBracing brace(PanelFace f, int panelInSegment) {
        Line diagonal = panelInSegment % 2 == 1
                ? new Line(f.bottomStart(), f.topEnd())
                : new Line(f.bottomEnd(), f.topStart());
        return new FaceBracing(List.of(diagonal), List.of());
    }
}
