package tetrapod.load;

import java.util.List;

/**
 * What the wind meets in one panel, independent of the azimuth: the areas of the two pairs of
 * opposite faces (each pair the mean of its two faces, which are alike in a generated tower), the
 * reference height and the nodes that take the panel's force.
 *
 * @param panel   panel number, 1 at the bottom
 * @param zBottom height of the panel's bottom level, m
 * @param zTop    height of the panel's top level, m
 * @param zRef    reference height: the centroid of the projected member area of the four faces, m
 * @param xFaces  the faces normal to x (±x), met by wind along x
 * @param yFaces  the faces normal to y (±y), met by wind along y
 * @param shares  the panel's leg nodes at its two levels with the fraction of its force each takes
 */
public record PanelExposure(int panel, double zBottom, double zTop, double zRef, FaceAreas xFaces, FaceAreas yFaces,
                            List<NodeShare> shares) {
    public PanelExposure {
        shares = List.copyOf(shares);
    }
}
