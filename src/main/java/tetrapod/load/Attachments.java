package tetrapod.load;

import java.util.ArrayList;
import java.util.List;
import tetrapod.generate.Panel;
import tetrapod.generate.Tower;
import tetrapod.model.Face;

/**
 * Where a load at height z goes: to the leg nodes at the bottom and top of the panel containing z,
 * split between the two levels by the lever rule (so that force and moment about any level are
 * kept), and equally among the four legs, or the two legs of one face.
 */
final class Attachments {

    private Attachments() { }

    /** The shares of a load at height z (within the tower) on {@code face} ({@link Face#NONE}: all four legs). */
    static List<NodeShare> at(Tower tower, double z, Face face) {
        Panel panel = tower.panelAt(z).orElseThrow(
                () -> new IllegalArgumentException("height " + z + " m is outside the tower (0 to " + tower.height() + " m)"));
        return at(panel, z, face);
    }

    static List<NodeShare> at(Panel panel, double z, Face face) {
        double top = Math.min(1, Math.max(0, (z - panel.zBottom()) / panel.height()));
        List<Integer> legs = face == Face.NONE ? List.of(0, 1, 2, 3) : Panel.legsOf(face);
        List<NodeShare> shares = new ArrayList<>(2 * legs.size());
        for (int leg : legs) {
            if (top < 1) {
                shares.add(new NodeShare(panel.bottomLegNodes().get(leg), (1 - top) / legs.size()));
            }
            if (top > 0) {
                shares.add(new NodeShare(panel.topLegNodes().get(leg), top / legs.size()));
            }
        }
        return List.copyOf(shares);
    }
}
