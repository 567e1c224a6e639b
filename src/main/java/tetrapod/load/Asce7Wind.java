package tetrapod.load;

import java.util.Objects;
import tetrapod.model.spec.Asce7Edition;
import tetrapod.model.spec.Exposure;

/**
 * The velocity pressure of ASCE 7 §26.10 (edition 7-16 or 7-22), paired with the trussed-tower
 * force coefficients and the gust-effect factor G of a rigid structure. SI units: heights m,
 * speeds m/s, pressures Pa.
 *
 * <p>The two editions differ in the exposure constants α and z_g (Table 26.11-1) and in the
 * constant of K_z (2.01 in 7-16, 2.41 in 7-22, Table 26.10-1 note); 7-22 also moves K_d from q_z
 * into the force equation. {@link #pressure} is q_z with K_d in it for both editions:
 * 0.613 K_z K_zt K_d K_e V², so the force is G × q × C_f × A_f either way.
 *
 * @param edition              7-16 or 7-22
 * @param exposure             B, C or D
 * @param speed                basic wind speed V, m/s
 * @param topographicFactor    K_zt (§26.8)
 * @param elevationFactor      K_e (§26.9; 1.0 is always permitted)
 * @param directionalityFactor K_d (Table 26.6-1: 0.85 for trussed towers)
 * @param gustFactor           G (§26.11: 0.85 for a rigid structure)
 */
public record Asce7Wind(Asce7Edition edition, Exposure exposure, double speed, double topographicFactor,
                        double elevationFactor, double directionalityFactor, double gustFactor) implements WindProfile {

    /** One foot, m. */
    public static final double FOOT = 0.3048;
    /** Below 15 ft K_z is taken at 15 ft (Table 26.10-1 note 1). */
    public static final double MIN_HEIGHT = 15 * FOOT;
    /** ½ρ in SI with ρ = 1.225 kg/m³: q = 0.613 ... V² N/m² with V in m/s (26.10-1, SI form). */
    public static final double HALF_RHO = 0.613;
    /** Table 26.6-1, trussed towers (triangular, square, rectangular). */
    public static final double TRUSSED_TOWER_KD = 0.85;
    /** §26.11.1 (7-16): gust-effect factor of a rigid structure. */
    public static final double RIGID_G = 0.85;

    public Asce7Wind {
        Objects.requireNonNull(edition, "edition");
        Objects.requireNonNull(exposure, "exposure");
        if (!(gustFactor > 0)) {
            throw new IllegalArgumentException("G must be > 0, was " + gustFactor
                    + " (a computed one is filled in before the wind is built: analysis.ComputedStructuralFactor)");
        }
        if (!(speed > 0)) {
            throw new IllegalArgumentException("wind speed must be > 0, was " + speed);
        }
    }

    /** With K_zt = K_e = 1, K_d = 0.85 and G = 0.85. */
    public static Asce7Wind of(Asce7Edition edition, Exposure exposure, double speed) {
        return new Asce7Wind(edition, exposure, speed, 1.0, 1.0, TRUSSED_TOWER_KD, RIGID_G);
    }

    /** Power-law exponent α of Table 26.11-1 for the edition and exposure. */
    public static double alpha(Asce7Edition edition, Exposure exposure) {
        return switch (edition) {
            case ASCE_7_16 -> switch (exposure) {   // ASCE 7-16 Table 26.11-1
                case B -> 7.0;
                case C -> 9.5;
                case D -> 11.5;
            };
            case ASCE_7_22 -> switch (exposure) {   // ASCE 7-22 Table 26.11-1
                case B -> 7.5;
                case C -> 9.8;
                case D -> 11.5;
            };
        };
    }

    /** Gradient height z_g of Table 26.11-1, ft. */
    public static double gradientHeightFeet(Asce7Edition edition, Exposure exposure) {
        return switch (edition) {
            case ASCE_7_16 -> switch (exposure) {   // ASCE 7-16 Table 26.11-1
                case B -> 1200;
                case C -> 900;
                case D -> 700;
            };
            case ASCE_7_22 -> switch (exposure) {   // ASCE 7-22 Table 26.11-1
                case B -> 3280;
                case C -> 2460;
                case D -> 1935;
            };
        };
    }

    /** The constant of the K_z formula: 2.01 (7-16) or 2.41 (7-22), Table 26.10-1 note 1. */
    public static double exposureConstant(Asce7Edition edition) {
        return edition == Asce7Edition.ASCE_7_16 ? 2.01 : 2.41;
    }

    @Override
    public String method() {
        return "asce7";
    }

    /**
     * Velocity pressure exposure coefficient K_z = c (z/z_g)^(2/α) for 15 ft ≤ z ≤ z_g, K_z(15 ft)
     * below 15 ft and K_z(z_g) above z_g.
     */
    public double exposureCoefficient(double z) {
        double zg = gradientHeightFeet(edition, exposure) * FOOT;
        double zz = Math.min(Math.max(z, MIN_HEIGHT), zg);
        return exposureConstant(edition) * Math.pow(zz / zg, 2 / alpha(edition, exposure));   // Table 26.10-1 note 1
    }

    /** q_z = 0.613 K_z K_zt K_d K_e V², Pa (7-16 Eq. 26.10-1; 7-22: K_d from Eq. 29.4-1 moved in). */
    public double velocityPressure(double z) {
        return HALF_RHO * exposureCoefficient(z) * topographicFactor * directionalityFactor * elevationFactor
                * speed * speed;   // ASCE 7-16 26.10 (26.10-1), SI
    }

    @Override
    public double pressure(double z) {
        return velocityPressure(z);
    }

    /** ASCE 7 has no directional factor beyond K_d, which is already in q_z. */
    @Override
    public double directionalFactor(double azimuthDeg) {
        return 1.0;
    }

    @Override
    public double responseFactor() {
        return gustFactor;
    }

    @Override
    public LatticeCoefficients coefficients() {
        return new Asce7TrussedTowerCoefficients();
    }

    /** Not used: the ASCE 7 trussed-tower coefficients do not depend on the Reynolds number. */
    @Override
    public double flowVelocity(double z) {
        return 0;
    }

    /** This profile with another basic wind speed (the speed V_c that comes with ice), m/s. */
    public Asce7Wind withSpeed(double v) {
        return new Asce7Wind(edition, exposure, v, topographicFactor, elevationFactor, directionalityFactor, gustFactor);
    }
}
