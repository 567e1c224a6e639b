package tetrapod.model.spec;

/**
 * Radial ice on members and ancillaries (ASCE 7 chapter 10 geometry).
 *
 * @param thickness    design radial ice thickness at 10 m above ground, mm
 * @param density      ice density, kg/m³
 * @param heightFactor whether the thickness grows with height by ASCE 7's f_z = (z/10 m)^0.10
 * @param windSpeed    wind speed that comes with the ice, m/s (en1991: v_b,0; asce7: V_c), or NaN
 *                     for the wind's own speed
 * @param windPressure uniform method: the pressure that comes with the ice, kPa, or NaN for the
 *                     wind's own pressure
 */
public record IceSpec(double thickness, double density, boolean heightFactor, double windSpeed, double windPressure) {

    /** ASCE 7-16 §10.4.1: ice density not less than 56 pcf (≈ 900 kg/m³). */
    public static final double DEFAULT_DENSITY = 900.0;
}
