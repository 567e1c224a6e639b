package tetrapod.generate;

import java.util.List;

/**
 * A panel level of a generated tower: the level between two panels (or the base, or the top).
 *
 * @param index       0 at the base (z = 0), counting up
 * @param z           height, m
 * @param widthX      leg spacing along x there, m
 * @param widthY      leg spacing along y there, m
 * @param legNodes    node ids of legs 0, 1, 2, 3 at this level
 * @param horizontals whether the level carries horizontals
 * @param planBracing whether the level carries plan bracing
 */
public record PanelLevel(int index, double z, double widthX, double widthY, List<Integer> legNodes,
                         boolean horizontals, boolean planBracing) {

    public PanelLevel {
        legNodes = List.copyOf(legNodes);
        if (legNodes.size() != 4) {
            throw new IllegalArgumentException("a panel level has four leg nodes, got " + legNodes.size());
        }
    }
}
