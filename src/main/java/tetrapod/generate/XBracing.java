package tetrapod.generate;

import java.util.List;

/**
 * Two crossing diagonals per panel. When {@code crossingConnected}, a joint is made where they
 * truly cross in the face plane: for a tapered face (a trapezoid with half-widths a at the bottom
 * and b at the top) that is at the height fraction a / (a + b), above mid-height.
 */
record XBracing(boolean crossingConnected) implements FacePattern {

    @Override
    public FaceBracing brace(PanelFace f, int panelInSegment) {
        Line rising = new Line(f.bottomStart(), f.topEnd());
        Line falling = new Line(f.bottomEnd(), f.topStart());
        return new FaceBracing(List.of(rising, falling),
                crossingConnected ? List.of(rising.intersection(falling)) : List.of());
    }
}
