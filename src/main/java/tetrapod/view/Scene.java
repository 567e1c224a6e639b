package tetrapod.view;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Everything to draw for one view, independent of how it is drawn.
 *
 * @param members        one instance per frame member, in the frame's member order
 * @param ground         the grid and the wind dial on z = 0: drawn first, under everything
 * @param decorations    axes, supports, reaction and wind arrows, undeformed ghost
 * @param reactionArrows the reaction arrows drawn among the decorations, for labels and checks
 * @param labels         text placed at world points or image corners
 * @param legend         the colour legend, when shown
 * @param bounds         what the camera must frame: the members, arrows and wind dial
 * @param axisTriad      whether the x, y, z directions are drawn in an inset of their own ({@link AxisTriad}),
 *                       turned with the camera but never zoomed or panned
 */
public record Scene(SegmentInstances members, SegmentInstances ground, SegmentInstances decorations, List<Arrow> reactionArrows,
                    List<SceneLabel> labels, Optional<Legend> legend, Bounds bounds, boolean axisTriad) {

    /** The colour the image is cleared to. */
    public static final Rgb BACKGROUND = Rgb.hex(0xF7F7F5);

    public Scene {
        Objects.requireNonNull(members, "members");
        Objects.requireNonNull(ground, "ground");
        Objects.requireNonNull(decorations, "decorations");
        Objects.requireNonNull(legend, "legend");
        Objects.requireNonNull(bounds, "bounds");
        reactionArrows = List.copyOf(reactionArrows);
        labels = List.copyOf(labels);
    }

    /** The same scene with more labels (e.g. a picked member's description). */
    public Scene withLabels(List<SceneLabel> more) {
        List<SceneLabel> all = new ArrayList<>(labels);
        all.addAll(more);
        return new Scene(members, ground, decorations, reactionArrows, all, legend, bounds, axisTriad);
    }

    /** The same scene with {@code more} drawn after the other decorations (and before the members). */
    public Scene withDecorations(SegmentInstances more) {
        return new Scene(members, ground, SegmentInstances.concat(decorations, more), reactionArrows, labels, legend,
                bounds, axisTriad);
    }

    /** The same scene with or without the axis triad inset. */
    public Scene withAxisTriad(boolean on) {
        return new Scene(members, ground, decorations, reactionArrows, labels, legend, bounds, on);
    }
}
