package tetrapod.view;

/** Small helpers for angles in degrees, as people give them. */
final class Angles {

    private Angles() { }

    /** {@code deg} brought into [0, 360). */
    static double normaliseDeg(double deg) {
        double r = deg % 360.0;
        return r < 0 ? r + 360.0 : r;
    }

    /** The signed difference a − b brought into [−180, 180). */
    static double differenceDeg(double a, double b) {
        double d = normaliseDeg(a - b);
        return d >= 180.0 ? d - 360.0 : d;
    }
}
