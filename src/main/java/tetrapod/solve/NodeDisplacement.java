package tetrapod.solve;

/**
 * Displacement of a node in tower axes: translations (m) and right-handed rotations (rad).
 * Degrees of freedom that are not in the model (rotations of a truss) are zero.
 */
public record NodeDisplacement(int node, double ux, double uy, double uz, double rx, double ry, double rz) {

    /** Component {@code k} in the order ux, uy, uz, rx, ry, rz. */
    public double component(int k) {
        return switch (k) {
            case 0 -> ux;
            case 1 -> uy;
            case 2 -> uz;
            case 3 -> rx;
            case 4 -> ry;
            case 5 -> rz;
            default -> throw new IndexOutOfBoundsException("component " + k);
        };
    }

    /** Length of the translation, m. */
    public double translation() {
        return Math.sqrt(ux * ux + uy * uy + uz * uz);
    }
}
