package tetrapod.view;

/**
 * How the picked member stands out: drawn wider in its own colour, inside a white band and a
 * near-black outline. Whatever the member's colour, one of the two bands contrasts with it and the
 * outline with the background (checked in PickHighlightTest). Pure Java.
 */
final class PickHighlight {

    static final Rgb OUTLINE = Rgb.hex(0x111111);
    static final Rgb BAND = Rgb.hex(0xFFFFFF);
    /** The picked member's own colour is drawn this much wider than the member. */
    static final double CORE_FACTOR = 1.6;
    /** Width of the white band and of the outline on each side, reference px. */
    static final double BAND_WIDTH = 2.5;

    private PickHighlight() { }

    /** Outline, band and core of member {@code k} of {@code members}, to draw before the members. */
    static SegmentInstances of(SegmentInstances members, int k) {
        double core = CORE_FACTOR * Math.max(members.startWidth(k), members.endWidth(k));
        double band = core + 2 * BAND_WIDTH;
        double outline = band + 2 * BAND_WIDTH;
        return SegmentInstances.builder(3)
                .line(members.start(k), members.end(k), OUTLINE, outline)
                .line(members.start(k), members.end(k), BAND, band)
                .line(members.start(k), members.end(k), members.colour(k), core)
                .build();
    }
}
