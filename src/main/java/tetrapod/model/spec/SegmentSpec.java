package tetrapod.model.spec;

import java.util.List;
import java.util.Map;
import tetrapod.model.Role;

/**
 * One segment of a generated tower, bottom to top. Its bottom widths are the previous
 * segment's top widths (the base widths for the first).
 *
 * @param height             m
 * @param topWidthX          leg spacing along x at the segment's top, m
 * @param topWidthY          leg spacing along y at the segment's top, m
 * @param panels             number of panels
 * @param panelHeights       explicit panel heights bottom to top (m, summing to height), or empty
 *                           for equal panels
 * @param crossingConnected  X bracing: whether the two diagonals are joined where they cross
 * @param redundants         0, 1 or 2 intermediate levels per panel with redundant members
 * @param sections           section name per member role present in the segment
 */
public record SegmentSpec(double height, double topWidthX, double topWidthY, int panels,
                          List<Double> panelHeights, Bracing bracing, Horizontals horizontals,
                          boolean crossingConnected, int redundants, Map<Role, String> sections) {

    public SegmentSpec {
        panelHeights = panelHeights == null ? List.of() : List.copyOf(panelHeights);
        sections = Map.copyOf(sections);
    }
}
