package tetrapod.check;

import java.util.Map;
import java.util.OptionalDouble;
import java.util.TreeMap;
import tetrapod.common.Units;

/**
 * ISO metric coarse threads M12 … M72: pitch, tensile stress area and root (minor) area.
 *
 * <p>Pitches are the coarse series of ISO 261 (recalled from memory; M68 and M72 have no coarse
 * pitch in ISO 261 and take the 6 mm pitch that anchor rods of those sizes use). The tensile stress
 * area is the nominal A_s of ISO 898-1: A_s = π/4 · ((d2 + d3)/2)², with the basic profile of
 * ISO 724 / ISO 68-1: pitch diameter d2 = d − 0.649519 P and d3 = d − 1.226869 P (the minor
 * diameter of the external thread at the root). It gives the tabulated 84.3 mm² for M12, 157 for
 * M16, 245 for M20, 353 for M24, 561 for M30, 817 for M36.
 */
public final class MetricThreads {

    private static final Map<Integer, Double> COARSE_PITCH_MM = pitches();

    private MetricThreads() { }

    private static Map<Integer, Double> pitches() {
        Map<Integer, Double> p = new TreeMap<>();
        p.put(12, 1.75);
        p.put(14, 2.0);
        p.put(16, 2.0);
        p.put(18, 2.5);
        p.put(20, 2.5);
        p.put(22, 2.5);
        p.put(24, 3.0);
        p.put(27, 3.0);
        p.put(30, 3.5);
        p.put(33, 3.5);
        p.put(36, 4.0);
        p.put(39, 4.0);
        p.put(42, 4.5);
        p.put(45, 4.5);
        p.put(48, 5.0);
        p.put(52, 5.0);
        p.put(56, 5.5);
        p.put(60, 5.5);
        p.put(64, 6.0);
        p.put(68, 6.0);
        p.put(72, 6.0);
        return Map.copyOf(p);
    }

    /** The nominal diameters known, mm, ascending. */
    public static java.util.List<Integer> sizes() {
        return COARSE_PITCH_MM.keySet().stream().sorted().toList();
    }

    /** Whether {@code diameterMm} is a size of the table (within 1e-9 mm). */
    public static boolean isKnown(double diameterMm) {
        return pitchMm(diameterMm).isPresent();
    }

    private static OptionalDouble pitchMm(double diameterMm) {
        long rounded = Math.round(diameterMm);
        if (Math.abs(diameterMm - rounded) > 1e-9 || !COARSE_PITCH_MM.containsKey((int) rounded)) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(COARSE_PITCH_MM.get((int) rounded));
    }

    private static double requirePitch(double diameter) {
        double mm = diameter / Units.MM;
        return pitchMm(mm).orElseThrow(() -> new IllegalArgumentException(
                "no metric coarse thread M" + mm + "; known sizes " + sizes())) * Units.MM;
    }

    /** Coarse pitch P of the thread of nominal diameter {@code diameter} (m), m. */
    public static double pitch(double diameter) {
        return requirePitch(diameter);
    }

    /** Nominal tensile stress area A_s (ISO 898-1) of a thread of nominal diameter {@code diameter} (m), m². */
    public static double stressArea(double diameter) {
        double p = requirePitch(diameter);
        double d2 = diameter - 0.649519 * p;   // ISO 724 pitch diameter
        double d3 = diameter - 1.226869 * p;   // ISO 898-1 minor diameter of the external thread
        double mean = (d2 + d3) / 2;
        return Math.PI / 4 * mean * mean;       // ISO 898-1 nominal stress area
    }

    /** Area at the thread root π d3²/4 of a thread of nominal diameter {@code diameter} (m), m². */
    public static double rootArea(double diameter) {
        double d3 = diameter - 1.226869 * requirePitch(diameter);
        return Math.PI / 4 * d3 * d3;
    }

    /** Gross (shank) area π d²/4, m². */
    public static double grossArea(double diameter) {
        return Math.PI / 4 * diameter * diameter;
    }
}
