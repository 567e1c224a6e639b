package tetrapod.generate;

import tetrapod.model.spec.Bracing;

/** How the diagonals of a face are laid out in one panel. One implementation per bracing family. */
sealed interface FacePattern permits XBracing, KBracing, SingleBracing {

    /**
     * The diagonals of {@code face} in panel {@code panelInSegment} (1 = the bottom panel of its
     * segment).
     */
    FaceBracing brace(PanelFace face, int panelInSegment);

    static FacePattern of(Bracing bracing, boolean crossingConnected) {
        return switch (bracing) {
            case X -> new XBracing(crossingConnected);
            case K -> new KBracing();
            case SINGLE -> new SingleBracing();
        };
    }
}
