package tetrapod.load;

import java.util.List;
import java.util.Objects;
import tetrapod.model.spec.TerrainCategory;

/**
 * The peak velocity pressure of EN 1991-1-4:2005 §4 (recommended values of the notes), paired with
 * the lattice force coefficients of EN 1993-3-1 Annex B. SI units.
 *
 * @param terrain          terrain category, Table 4.1
 * @param basicSpeed       fundamental value of the basic wind velocity v_b,0, m/s
 * @param seasonFactor     c_season
 * @param orography        orography factor c0(z), taken constant over the height
 * @param turbulenceFactor turbulence factor k_I (recommended 1.0)
 * @param airDensity       ρ, kg/m³ (recommended 1.25)
 * @param structuralFactor c_s·c_d (§6; 1.0 for structures that are not wind-sensitive)
 * @param directionFactors c_dir for the 12 azimuth sectors of 30° centred on 0°, 30°, ... 330°,
 *                         or empty for c_dir = 1
 */
public record En1991Wind(TerrainCategory terrain, double basicSpeed, double seasonFactor, double orography,
                         double turbulenceFactor, double airDensity, double structuralFactor,
                         List<Double> directionFactors) implements WindProfile {

    /** z0,II of (4.5), m. */
    public static final double Z0_II = 0.05;
    /** z_max of Table 4.1: the profile holds up to 200 m. */
    public static final double Z_MAX = 200.0;
    /** Kinematic viscosity of air, m²/s: EN 1991-1-4 7.9.1(1) note to (7.15). */
    public static final double KINEMATIC_VISCOSITY = 15e-6;
    /** Number of directional sectors of the user's c_dir table. */
    public static final int SECTORS = 12;

    public En1991Wind {
        Objects.requireNonNull(terrain, "terrain");
        directionFactors = List.copyOf(directionFactors);
        if (!directionFactors.isEmpty() && directionFactors.size() != SECTORS) {
            throw new IllegalArgumentException("c_dir needs " + SECTORS + " sectors, got " + directionFactors.size());
        }
        if (!(basicSpeed > 0) || !(airDensity > 0) || !(orography > 0) || !(seasonFactor > 0)) {
            throw new IllegalArgumentException("wind speed, air density, c0 and c_season must be > 0");
        }
        if (!(structuralFactor > 0)) {
            throw new IllegalArgumentException("c_s·c_d must be > 0, was " + structuralFactor
                    + " (a computed one is filled in before the wind is built: analysis.ComputedStructuralFactor)");
        }
    }

    /** With the recommended k_I = 1.0, ρ = 1.25 kg/m³, c_season = c0 = c_s·c_d = 1 and no c_dir table. */
    public static En1991Wind of(TerrainCategory terrain, double basicSpeed) {
        return new En1991Wind(terrain, basicSpeed, 1.0, 1.0, 1.0, 1.25, 1.0, List.of());
    }

    /** Roughness length z0 of Table 4.1, m. */
    public static double roughnessLength(TerrainCategory category) {
        return switch (category) {   // EN 1991-1-4 Table 4.1
            case CAT_0 -> 0.003;
            case CAT_I -> 0.01;
            case CAT_II -> 0.05;
            case CAT_III -> 0.3;
            case CAT_IV -> 1.0;
        };
    }

    /** Minimum height z_min of Table 4.1, m. */
    public static double minimumHeight(TerrainCategory category) {
        return switch (category) {   // EN 1991-1-4 Table 4.1
            case CAT_0, CAT_I -> 1.0;
            case CAT_II -> 2.0;
            case CAT_III -> 5.0;
            case CAT_IV -> 10.0;
        };
    }

    @Override
    public String method() {
        return "en1991";
    }

    /** Terrain factor k_r = 0.19 (z0/z0,II)^0.07. */
    public double terrainFactor() {
        return 0.19 * Math.pow(roughnessLength(terrain) / Z0_II, 0.07);   // EN 1991-1-4 4.3.2 (4.5)
    }

    /** Basic wind velocity v_b = c_dir·c_season·v_b,0 with c_dir = 1, m/s. */
    public double basicVelocity() {
        return seasonFactor * basicSpeed;   // EN 1991-1-4 4.2 (4.1), c_dir applied per azimuth
    }

    /** Basic velocity pressure q_b = ½ρv_b², Pa. */
    public double basicPressure() {
        return 0.5 * airDensity * basicVelocity() * basicVelocity();   // EN 1991-1-4 4.5 (4.10)
    }

    /** The height the profile formulas use: not below z_min. */
    private double profileHeight(double z) {
        if (z > Z_MAX + 1e-9) {
            throw new IllegalArgumentException("EN 1991-1-4 §4 holds up to " + Z_MAX + " m, asked for " + z + " m");
        }
        return Math.max(z, minimumHeight(terrain));
    }

    /** Roughness factor c_r(z) = k_r ln(z/z0), c_r(z_min) below z_min. */
    public double roughnessFactor(double z) {
        return terrainFactor() * Math.log(profileHeight(z) / roughnessLength(terrain));   // EN 1991-1-4 4.3.2 (4.4)
    }

    /** Mean wind velocity v_m(z) = c_r(z)·c0·v_b, m/s. */
    public double meanVelocity(double z) {
        return roughnessFactor(z) * orography * basicVelocity();   // EN 1991-1-4 4.3.1 (4.3)
    }

    /** Turbulence intensity I_v(z) = k_I / (c0 ln(z/z0)), I_v(z_min) below z_min. */
    public double turbulenceIntensity(double z) {
        return turbulenceFactor / (orography * Math.log(profileHeight(z) / roughnessLength(terrain)));   // EN 1991-1-4 4.4 (4.7)
    }

    /** Peak velocity pressure q_p(z) = [1 + 7 I_v(z)]·½ρ v_m(z)², Pa. */
    public double peakPressure(double z) {
        double vm = meanVelocity(z);
        return (1 + 7 * turbulenceIntensity(z)) * 0.5 * airDensity * vm * vm;   // EN 1991-1-4 4.5 (4.8)
    }

    /** Exposure factor c_e(z) = q_p(z)/q_b. */
    public double exposureFactor(double z) {
        return peakPressure(z) / basicPressure();   // EN 1991-1-4 4.5 (4.9)
    }

    /** Peak velocity v(z) = √(2 q_p(z)/ρ), m/s: the velocity of the Reynolds number. */
    public double peakVelocity(double z) {
        return Math.sqrt(2 * peakPressure(z) / airDensity);   // EN 1991-1-4 7.9.1 (7.15) with 4.5(1) note 2
    }

    /** c_dir for wind blowing towards azimuth θ: the value of the 30° sector containing θ. */
    public double directionFactor(double azimuthDeg) {
        if (directionFactors.isEmpty()) {
            return 1.0;
        }
        double a = ((azimuthDeg % 360) + 360) % 360;
        int sector = (int) Math.floor((a + 15) / 30) % SECTORS;
        return directionFactors.get(sector);
    }

    @Override
    public double pressure(double z) {
        return peakPressure(z);
    }

    /** c_dir(θ)²: q_p is proportional to v_b², and v_b to c_dir (4.1). */
    @Override
    public double directionalFactor(double azimuthDeg) {
        double c = directionFactor(azimuthDeg);
        return c * c;
    }

    @Override
    public double responseFactor() {
        return structuralFactor;
    }

    @Override
    public LatticeCoefficients coefficients() {
        return new En1993LatticeCoefficients();
    }

    @Override
    public double flowVelocity(double z) {
        double lowest = directionFactors.stream().mapToDouble(Double::doubleValue).min().orElse(1.0);
        return peakVelocity(z) * lowest;
    }

    /** This profile with another fundamental basic wind velocity (the wind that comes with ice), m/s. */
    public En1991Wind withBasicSpeed(double speed) {
        return new En1991Wind(terrain, speed, seasonFactor, orography, turbulenceFactor, airDensity, structuralFactor,
                directionFactors);
    }
}
