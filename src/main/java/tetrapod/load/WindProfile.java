package tetrapod.load;

/**
 * How strongly the wind blows at each height, by a published method, and which lattice force
 * coefficients go with it. SI units: heights in m, pressures in Pa, velocities in m/s.
 *
 * <p>The force on a panel at azimuth θ is {@code responseFactor() × directionalFactor(θ) ×
 * pressure(zRef) × c_f × A}: everything that depends on θ is in {@link #directionalFactor} and in
 * the incidence factor of the coefficients, which keeps the wind load linear in a few
 * θ-independent basis vectors (see {@link WindBasis}).
 */
public sealed interface WindProfile permits En1991Wind, Asce7Wind, UniformWind {

    /** The method's name as the model file writes it: en1991, asce7, uniform. */
    String method();

    /** The pressure at height z for the wind direction of directional factor 1, Pa. */
    double pressure(double z);

    /** The factor on {@link #pressure} for wind blowing towards azimuth θ (degrees), at most 1. */
    double directionalFactor(double azimuthDeg);

    /** The factor on every wind force: c_s·c_d (EN 1991-1-4), G (ASCE 7), 1 (uniform). */
    double responseFactor();

    /** The lattice force coefficients that go with this method. */
    LatticeCoefficients coefficients();

    /**
     * The wind velocity at height z that decides the flow regime of circular members (m/s):
     * the lowest over the directions, so that a member is taken as supercritical only when it is
     * so from every direction.
     */
    double flowVelocity(double z);
}
