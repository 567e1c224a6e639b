package tetrapod.model;

/** A joint of the frame. {@code id} is the number people and results.json use; coordinates in m. */
public record Node(int id, double x, double y, double z) {

    public Node {
        if (!Double.isFinite(x) || !Double.isFinite(y) || !Double.isFinite(z)) {
            throw new IllegalArgumentException("node " + id + " has a non-finite coordinate");
        }
    }

    public Vec3 position() {
        return new Vec3(x, y, z);
    }
}
