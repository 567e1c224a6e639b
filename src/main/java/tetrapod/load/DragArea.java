package tetrapod.load;

import java.util.List;

/**
 * What the wind pushes on one panel or one ancillary from one direction, without the pressure:
 * its force coefficient (with the incidence factor) × its projected area, and the nodes its force
 * goes to. The force is the pressure times this area; the aerodynamic damping of a mode takes it
 * with the mean wind speed (EN 1991-1-4 F.16).
 *
 * @param area   c_f × A, m² (for an ancillary c_f × A × (1 − shielding))
 * @param shares the nodes that take the force, with their fractions (summing to 1)
 */
public record DragArea(double area, List<NodeShare> shares) {
    public DragArea {
        shares = List.copyOf(shares);
    }
}
