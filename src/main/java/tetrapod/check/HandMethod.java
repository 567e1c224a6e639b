package tetrapod.check;

/**
 * The hand method for the leg base forces of a four-leg tower: the legs alone resist the base
 * moment as a rigid group, sharing the vertical load equally. Pure functions, SI units (N, N·m, m).
 *
 * <ul>
 * <li>Wind on the base diagonal: one leg takes the whole moment over the diagonal,
 *     F = N/4 ± M/d, d = √(b_x² + b_y²).</li>
 * <li>Wind normal to a face: two legs share it, F = N/4 ± M/(2b), b the base width along the
 *     wind (across the face).</li>
 * <li>Any azimuth θ (0 = wind towards +x): the moment's components about the two base axes split
 *     the same way, F = N/4 ± M (|cos θ|/(2 b_x) + |sin θ|/(2 b_y)); it is N/4 ± M/(2b) at 0° and
 *     90° and N/4 ± M/d when the wind blows along a diagonal (tan θ = b_y/b_x).</li>
 * </ul>
 * A leg force is returned as compression (N/4 + M/lever, pressing the footing) and tension
 * (M/lever − N/4, the uplift; negative when every leg stays in compression).
 */
public final class HandMethod {

    private HandMethod() { }

    /** The most compressed and the most pulled leg, N. */
    public record LegForces(double compression, double tension) { }

    /** The hand method at one azimuth, with the values it started from. */
    public record Result(double azimuthDeg, double n, double h, double zH, double m, double d, LegForces legs) {

        /** Analysis versus hand method, percent of the hand value: 100 (fe − hand)/|hand|; 0 when both are 0. */
        public static double differencePct(double hand, double fe) {
            if (hand == 0) {
                return fe == 0 ? 0 : Math.copySign(100.0, fe);
            }
            return 100 * (fe - hand) / Math.abs(hand);
        }
    }

    /** Base diagonal d = √(b_x² + b_y²), m. */
    public static double baseDiagonal(double widthX, double widthY) {
        requirePositive(widthX, widthY);
        return Math.hypot(widthX, widthY);
    }

    /** Base moment of a horizontal resultant H (N) acting at height z_H (m), N·m. */
    public static double baseMoment(double h, double zH) {
        return h * zH;
    }

    /** N/4 ± M/d: wind on the diagonal. */
    public static LegForces diagonal(double n, double m, double d) {
        requirePositive(d, d);
        return new LegForces(n / 4 + m / d, m / d - n / 4);
    }

    /** N/4 ± M/(2b): wind normal to a face, b the base width along the wind. */
    public static LegForces faceNormal(double n, double m, double b) {
        requirePositive(b, b);
        return new LegForces(n / 4 + m / (2 * b), m / (2 * b) - n / 4);
    }

    /** N/4 ± M (|cos θ|/(2 b_x) + |sin θ|/(2 b_y)): any azimuth. */
    public static LegForces atAzimuth(double n, double m, double azimuthDeg, double widthX, double widthY) {
        requirePositive(widthX, widthY);
        double theta = Math.toRadians(azimuthDeg);
        double perMoment = Math.abs(Math.cos(theta)) / (2 * widthX) + Math.abs(Math.sin(theta)) / (2 * widthY);
        return new LegForces(n / 4 + m * perMoment, m * perMoment - n / 4);
    }

    /**
     * The hand method for one azimuth of the sweep: N the total vertical load (N, downwards
     * positive), H the horizontal wind resultant (N) at height z_H (m), plus any other base moment
     * about the axis normal to the wind (N·m), on a base of widths b_x, b_y (m).
     */
    public static Result forAzimuth(double azimuthDeg, double n, double h, double zH, double otherMoment,
                                    double widthX, double widthY) {
        double m = baseMoment(h, zH) + otherMoment;
        return new Result(azimuthDeg, n, h, zH, m, baseDiagonal(widthX, widthY),
                atAzimuth(n, m, azimuthDeg, widthX, widthY));
    }

    private static void requirePositive(double a, double b) {
        if (!(a > 0) || !(b > 0) || !Double.isFinite(a) || !Double.isFinite(b)) {
            throw new IllegalArgumentException("base widths and lever arms must be finite and > 0 m");
        }
    }
}
