package tetrapod.analysis;

/**
 * The movement a level or an ancillary may have; NaN where none is given.
 *
 * @param sway  m
 * @param tilt  rad
 * @param twist rad
 */
public record ServiceLimits(double sway, double tilt, double twist) {

    public static final ServiceLimits NONE = new ServiceLimits(Double.NaN, Double.NaN, Double.NaN);

    public ServiceLimits {
        for (double v : new double[] {sway, tilt, twist}) {
            if (!Double.isNaN(v) && !(v >= 0 && v < Double.POSITIVE_INFINITY)) {
                throw new IllegalArgumentException("a movement limit is ≥ 0 and finite, or NaN for none; was " + v);
            }
        }
    }

    public double of(Movement m) {
        return switch (m) {
            case SWAY -> sway;
            case TILT -> tilt;
            case TWIST -> twist;
        };
    }

    /** Whether a limit is given for {@code m}. */
    public boolean has(Movement m) {
        return !Double.isNaN(of(m));
    }

    /** Whether any limit is given. */
    public boolean any() {
        return has(Movement.SWAY) || has(Movement.TILT) || has(Movement.TWIST);
    }

    /** The stricter of each limit of the two. */
    ServiceLimits strictest(ServiceLimits other) {
        return new ServiceLimits(min(sway, other.sway), min(tilt, other.tilt), min(twist, other.twist));
    }

    private static double min(double a, double b) {
        return Double.isNaN(a) ? b : Double.isNaN(b) ? a : Math.min(a, b);
    }
}
