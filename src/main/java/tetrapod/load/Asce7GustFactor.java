package tetrapod.load;

import tetrapod.model.spec.Exposure;

/**
 * The gust-effect factor of ASCE 7-16 §26.11 for a tower of first frequency n₁: G = 0.85 for a
 * rigid structure (n₁ ≥ 1 Hz, §26.11.1 and 26.11.4), G_f of a flexible one (§26.11.5,
 * Eq. 26.11-10) below 1 Hz. Inputs SI; the Table 26.11-1 constants are in feet as the standard gives
 * them, heights are turned into feet for them (the speeds' units cancel: 88/60 ft/s per mi/h).
 *
 * @param height          h, m
 * @param width           B = L, the plan width at z̄, m
 * @param frequency       n₁, Hz
 * @param dampingRatio    β, fraction of critical
 * @param flexible        whether n₁ < 1 Hz (else the rigid value is used)
 * @param equivalentHeight z̄ = 0.6 h, not below z_min, m
 * @param turbulence      I_z̄ (26.11-7)
 * @param lengthScale     L_z̄, m (26.11-9)
 * @param background      Q² (26.11-8)
 * @param meanVelocity    V̄_z̄, m/s (26.11-16)
 * @param resonant        R² (26.11-12)
 * @param resonantPeak    g_R (26.11-11)
 * @param value           G or G_f
 */
public record Asce7GustFactor(double height, double width, double frequency, double dampingRatio, boolean flexible,
                              double equivalentHeight, double turbulence, double lengthScale, double background,
                              double meanVelocity, double resonant, double resonantPeak, double value)
        implements ResponseFactor {

    /** The first frequency below which a structure is flexible, Hz (§26.2 "flexible building"). */
    public static final double FLEXIBLE_BELOW_HZ = 1.0;
    /** g_Q = g_v = 3.4 (§26.11.4). */
    static final double PEAK = 3.4;

    /** Table 26.11-1 constants of one exposure: ᾱ, b̄, c, ℓ (ft), ε̄, z_min (ft); recalled, to be checked. */
    record Constants(double alphaBar, double bBar, double c, double lFeet, double epsilonBar, double zMinFeet) {
        static Constants of(Exposure exposure) {
            return switch (exposure) {   // ASCE 7-16 Table 26.11-1
                case B -> new Constants(1 / 4.0, 0.45, 0.30, 320, 1 / 3.0, 30);
                case C -> new Constants(1 / 6.5, 0.65, 0.20, 500, 1 / 5.0, 15);
                case D -> new Constants(1 / 9.0, 0.80, 0.15, 650, 1 / 8.0, 7);
            };
        }
    }

    /** G of a tower {@code height} m high, {@code width} m wide, swaying at {@code frequency} Hz, in wind {@code wind}. */
    public static Asce7GustFactor of(Asce7Wind wind, double height, double width, double frequency, double dampingRatio) {
        if (!(height > 0) || !(width > 0) || !(frequency > 0) || !(dampingRatio > 0)) {
            throw new IllegalArgumentException("height, width, frequency and damping must be > 0");
        }
        Constants k = Constants.of(wind.exposure());
        double hFt = height / Asce7Wind.FOOT;
        double zFt = Math.max(0.6 * hFt, k.zMinFeet());                                   // §26.11.4
        double iz = k.c() * Math.pow(33 / zFt, 1.0 / 6);                                  // (26.11-7)
        double lzFt = k.lFeet() * Math.pow(zFt / 33, k.epsilonBar());                     // (26.11-9)
        double bFt = width / Asce7Wind.FOOT;
        double q2 = 1 / (1 + 0.63 * Math.pow((bFt + hFt) / lzFt, 0.63));                 // (26.11-8), B = b
        double vz = k.bBar() * Math.pow(zFt / 33, k.alphaBar()) * wind.speed();           // (26.11-16), m/s
        double zM = zFt * Asce7Wind.FOOT;
        double lz = lzFt * Asce7Wind.FOOT;
        if (frequency >= FLEXIBLE_BELOW_HZ) {
            return new Asce7GustFactor(height, width, frequency, dampingRatio, false, zM, iz, lz, q2, vz, 0, 0,
                    Asce7Wind.RIGID_G);                                                    // §26.11.1
        }
        double n1 = frequency * lz / vz;                                                  // (26.11-14)
        double rn = 7.47 * n1 / Math.pow(1 + 10.3 * n1, 5.0 / 3);                         // (26.11-13)
        double rh = En1991StructuralFactor.aerodynamicAdmittance(4.6 * frequency * height / vz);   // (26.11-15)
        double rb = En1991StructuralFactor.aerodynamicAdmittance(4.6 * frequency * width / vz);
        double rl = En1991StructuralFactor.aerodynamicAdmittance(15.4 * frequency * width / vz);
        double r2 = rn * rh * rb * (0.53 + 0.47 * rl) / dampingRatio;                    // (26.11-12)
        double root = Math.sqrt(2 * Math.log(3600 * frequency));
        double gr = root + 0.577 / root;                                                  // (26.11-11)
        double gf = 0.925 * (1 + 1.7 * iz * Math.sqrt(PEAK * PEAK * q2 + gr * gr * r2))
                / (1 + 1.7 * PEAK * iz);                                                  // (26.11-10)
        return new Asce7GustFactor(height, width, frequency, dampingRatio, true, zM, iz, lz, q2, vz, r2, gr, gf);
    }
}
