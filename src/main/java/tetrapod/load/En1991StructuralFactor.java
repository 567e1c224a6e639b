package tetrapod.load;

/**
 * The structural factor c_s·c_d of EN 1991-1-4:2005 §6.3.1 with the procedure of Annex B, for a
 * vertical structure (a tower) in its fundamental along-wind sway mode, with the damping of
 * Annex F.5. SI units.
 *
 * @param height             h, m
 * @param width              b, m: the tower's width at the reference height
 * @param frequency          n_1,x, Hz: the first sway frequency
 * @param structuralDamping  δ_s, the logarithmic decrement of structural damping (F.5, Table F.2)
 * @param aerodynamicDamping δ_a, the logarithmic decrement of aerodynamic damping (F.16)
 * @param logDecrement       δ = δ_s + δ_a (F.15, no damping devices)
 * @param referenceHeight    z_s = 0.6 h, not below z_min (Figure 6.1 a)
 * @param turbulence         I_v(z_s) (4.7)
 * @param meanVelocity       v_m(z_s), m/s (4.3)
 * @param lengthScale        L(z_s), m (B.1)
 * @param background         B², the background factor (B.3)
 * @param resonant           R², the resonance response factor (B.6)
 * @param upCrossing         ν, Hz (B.5)
 * @param peakFactor         k_p (B.4)
 * @param value              c_s·c_d (6.2)
 */
public record En1991StructuralFactor(double height, double width, double frequency, double structuralDamping,
                                     double aerodynamicDamping, double logDecrement, double referenceHeight,
                                     double turbulence, double meanVelocity, double lengthScale, double background,
                                     double resonant, double upCrossing, double peakFactor, double value)
        implements ResponseFactor {

    /** Averaging time of the mean wind velocity, s (B.4). */
    static final double AVERAGING_TIME = 600;
    /** Reference height z_t = 200 m and length scale L_t = 300 m of (B.1). */
    static final double REFERENCE_HEIGHT_T = 200;
    static final double REFERENCE_LENGTH_T = 300;

    /** c_s·c_d with the logarithmic decrement δ given whole (no aerodynamic part). */
    public static En1991StructuralFactor of(En1991Wind wind, double height, double width, double frequency,
                                            double logDecrement) {
        return of(wind, height, width, frequency, logDecrement, 0);
    }

    /**
     * c_s·c_d of a tower {@code height} m high and {@code width} m wide at 0.6 h, swaying at
     * {@code frequency} Hz.
     *
     * @param structuralDamping δ_s (Table F.2)
     * @param dragPerMass       c_f b / m_e of (F.16), m²/kg: the mode's along-wind drag area per unit
     *                          height over its equivalent mass per unit height, both weighted by the
     *                          mode shape squared ((F.17); for a tower from its own mode,
     *                          {@code analysis.AerodynamicDamping}); 0 leaves out the aerodynamic damping
     */
    public static En1991StructuralFactor of(En1991Wind wind, double height, double width, double frequency,
                                            double structuralDamping, double dragPerMass) {
        if (!(height > 0) || !(width > 0) || !(frequency > 0) || !(structuralDamping > 0) || !(dragPerMass >= 0)) {
            throw new IllegalArgumentException("height, width, frequency and damping must be > 0");
        }
        double zMin = En1991Wind.minimumHeight(wind.terrain());
        double zs = Math.max(0.6 * height, zMin);                                       // Figure 6.1 (a)
        double iv = wind.turbulenceIntensity(zs);
        double vm = wind.meanVelocity(zs);
        double aerodynamic = wind.airDensity() * vm * dragPerMass / (2 * frequency);      // (F.16)
        double delta = structuralDamping + aerodynamic;                                   // (F.15), δ_d = 0
        double length = lengthScale(wind, zs);                                           // (B.1)
        double b2 = 1 / (1 + 0.9 * Math.pow((width + height) / length, 0.63));           // (B.3)
        double fl = frequency * length / vm;                                              // (B.2)
        double rh = aerodynamicAdmittance(4.6 * height * fl / length);                   // (B.7), (B.8)
        double rb = aerodynamicAdmittance(4.6 * width * fl / length);                    // (B.7), (B.8)
        double r2 = Math.PI * Math.PI / (2 * delta) * spectralDensity(fl) * rh * rb;     // (B.6)
        double nu = Math.max(frequency * Math.sqrt(r2 / (b2 + r2)), 0.08);               // (B.5), ν ≥ 0.08 Hz
        double root = Math.sqrt(2 * Math.log(nu * AVERAGING_TIME));
        double kp = Math.max(root + 0.6 / root, 3.0);                                    // (B.4), k_p ≥ 3
        double value = (1 + 2 * kp * iv * Math.sqrt(b2 + r2)) / (1 + 7 * iv);            // (6.2)
        return new En1991StructuralFactor(height, width, frequency, structuralDamping, aerodynamic, delta, zs, iv, vm,
                length, b2, r2, nu, kp, value);
    }

    /** L(z) = L_t (z / z_t)^α, α = 0.67 + 0.05 ln z0 (z0 in m), for z ≥ z_min (B.1). */
    static double lengthScale(En1991Wind wind, double z) {
        double alpha = 0.67 + 0.05 * Math.log(En1991Wind.roughnessLength(wind.terrain()));   // (B.1)
        return REFERENCE_LENGTH_T * Math.pow(z / REFERENCE_HEIGHT_T, alpha);                  // (B.1)
    }

    /** S_L(f_L) = 6.8 f_L / (1 + 10.2 f_L)^(5/3), the non-dimensional power spectral density (B.2). */
    static double spectralDensity(double fl) {
        return 6.8 * fl / Math.pow(1 + 10.2 * fl, 5.0 / 3);                                  // (B.2)
    }

    /** R = 1/η − (1 − e^(−2η)) / (2η²), and 1 at η = 0 (B.7). */
    static double aerodynamicAdmittance(double eta) {
        if (eta < 1e-4) {
            return 1 - 2 * eta / 3 + eta * eta / 3 - 2 * eta * eta * eta / 15;   // the series of (B.7) about 0
        }
        return 1 / eta + Math.expm1(-2 * eta) / (2 * eta * eta);
    }
}
