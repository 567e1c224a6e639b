package tetrapod.load;

import java.util.List;

/**
 * A concentrated wind catcher: an ancillary item, or the part of a linear item within one panel.
 * Its force is the same from every direction and acts along the wind.
 *
 * @param item          index of the ancillary in the spec's list
 * @param name          the ancillary's name
 * @param z             height of its centre, m
 * @param effectiveArea force coefficient × area × (1 − shielding), m²
 * @param shares        the nodes that take its force
 */
public record WindPoint(int item, String name, double z, double effectiveArea, List<NodeShare> shares) {
    public WindPoint {
        shares = List.copyOf(shares);
    }
}
