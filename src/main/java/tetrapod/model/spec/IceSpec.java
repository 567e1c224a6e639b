package tetrapod.model.spec;

import java.util.Objects;

/**
 * Radial ice on members and ancillaries (ASCE 7 chapter 10 geometry).
 *
 * @param thickness    how thick: the design thickness itself, or the ASCE 7 map's nominal thickness
 * @param density      ice density, kg/m³
 * @param windSpeed    wind speed that comes with the ice, m/s (en1991: v_b,0; asce7: V_c), or NaN
 *                     for the wind's own speed
 * @param windPressure uniform method: the pressure that comes with the ice, kPa, or NaN for the
 *                     wind's own pressure
 */
public record IceSpec(Thickness thickness, double density, double windSpeed, double windPressure) {

    /** ASCE 7-16 §10.4.1: ice density not less than 56 pcf (≈ 900 kg/m³). */
    public static final double DEFAULT_DENSITY = 900.0;

    public IceSpec {
        Objects.requireNonNull(thickness, "thickness");
    }

    /** The ice thickness as the model file gives it. Closed family: one record per way of giving it. */
    public sealed interface Thickness permits Given, Asce7Map { }

    /**
     * The design radial thickness itself (models without the asce7 wind).
     *
     * @param thickness    design radial ice thickness at 10 m above ground, mm
     * @param heightFactor whether the thickness grows with height by ASCE 7's f_z = (z/33 ft)^0.10
     */
    public record Given(double thickness, boolean heightFactor) implements Thickness { }

    /**
     * The values of the ASCE 7 ice map (models with the asce7 wind), from which the design thickness
     * t_d = 2.0 t I_i f_z K_zt^0.35 is computed (ASCE 7 chapter 10, (10.4-5)).
     *
     * @param nominal          nominal ice thickness t of the map (freezing rain, at 33 ft), mm
     * @param importanceFactor ice importance factor I_i for thickness (ASCE 7 Table 1.5-2), no unit
     */
    public record Asce7Map(double nominal, double importanceFactor) implements Thickness {

        /** I_i of risk category II (ASCE 7 Table 1.5-2, recalled from memory). */
        public static final double DEFAULT_IMPORTANCE_FACTOR = 1.0;
    }
}
