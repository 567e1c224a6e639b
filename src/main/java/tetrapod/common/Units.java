package tetrapod.common;

/**
 * Conversion factors to SI base units. Inside the code every quantity is SI (N, m, Pa, kg);
 * model files and people use kN, kN·m, MPa, kPa, mm: multiply on the way in, divide on the way out.
 */
public final class Units {
    public static final double KN = 1.0e3;
    public static final double KNM = 1.0e3;
    public static final double MPA = 1.0e6;
    public static final double KPA = 1.0e3;
    public static final double MM = 1.0e-3;
    public static final double CM = 1.0e-2;
    public static final double MM2 = 1.0e-6;
    public static final double CM2 = 1.0e-4;
    public static final double CM4 = 1.0e-8;
    public static final double MM4 = 1.0e-12;
    /** Standard gravity, m/s² (ISO 80000-3 conventional value). */
    public static final double G_ACCEL = 9.80665;

    private Units() { }
}
