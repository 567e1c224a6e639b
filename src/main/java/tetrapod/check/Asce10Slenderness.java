package tetrapod.check;

/**
 * Effective slenderness KL/r of ASCE 10 (3.7.4, recalled from memory of ASCE 10-97) from L/r and
 * the member's ends.
 *
 * <ul>
 * <li>Legs bolted in both faces at their connections: KL/r = L/r (3.7-3).</li>
 * <li>Other compression members, 0 ≤ L/r ≤ 120, by end eccentricity: curve 1, concentric at both
 *     ends: KL/r = L/r (3.7-4); curve 2, concentric at one end and normal framing eccentricity at
 *     the other: KL/r = 30 + 0.75 L/r (3.7-5); curve 3, normal framing eccentricity at both ends:
 *     KL/r = 60 + 0.5 L/r (3.7-6).</li>
 * <li>Other compression members, L/r ≥ 120, by end restraint against rotation: curve 4,
 *     unrestrained at both ends: KL/r = L/r (3.7-7); curve 5, partially restrained at one end:
 *     KL/r = 28.6 + 0.762 L/r (3.7-8); curve 6, partially restrained at both ends:
 *     KL/r = 46.2 + 0.615 L/r (3.7-9).</li>
 * <li>Redundant members: KL/r = L/r up to 120, curves 4 to 6 beyond.</li>
 * </ul>
 * The curves meet at L/r = 120 (120, 120.04, 120.0). "Normal framing eccentricity" is an angle
 * bolted through one leg at the end of its line; an end where the member runs on through a node is
 * concentric. An end is partially restrained when it is bolted with two or more bolts or the member
 * runs on through it (common practice, as ASCE 10's commentary describes; recalled).
 */
final class Asce10Slenderness {

    /** L/r where the curves by eccentricity give way to the curves by restraint. */
    static final double CURVE_CHANGE = 120;

    private Asce10Slenderness() { }

    /** The curve number 1 … 6 for a member that is not a leg. */
    static int curve(double lOverR, boolean redundant, int eccentricEnds, int restrainedEnds) {
        if (lOverR <= CURVE_CHANGE) {
            return redundant ? 1 : 1 + eccentricEnds;
        }
        return 4 + restrainedEnds;
    }

    /** KL/r on curve {@code curve} (1 … 6) at {@code lOverR}. */
    static double effective(int curve, double lOverR) {
        return switch (curve) {
            case 1, 4 -> lOverR;                    // ASCE 10 (3.7-4), (3.7-7)
            case 2 -> 30 + 0.75 * lOverR;           // ASCE 10 (3.7-5)
            case 3 -> 60 + 0.5 * lOverR;            // ASCE 10 (3.7-6)
            case 5 -> 28.6 + 0.762 * lOverR;        // ASCE 10 (3.7-8)
            case 6 -> 46.2 + 0.615 * lOverR;        // ASCE 10 (3.7-9)
            default -> throw new IllegalArgumentException("no curve " + curve);
        };
    }

    /**
     * Design compressive stress F_a, Pa: [1 − ½ (KL/r / C_c)²] F_y for KL/r ≤ C_c (3.6-1), π²E/(KL/r)²
     * beyond (3.6-2), with C_c = π √(2E/F_y) (3.6-3). Where local buckling governs, F_cr replaces F_y.
     */
    static double fa(double klOverR, double fy, double e) {
        double cc = cc(fy, e);
        if (klOverR <= cc) {
            double ratio = klOverR / cc;
            return (1 - 0.5 * ratio * ratio) * fy;                 // ASCE 10 (3.6-1)
        }
        return Math.PI * Math.PI * e / (klOverR * klOverR);        // ASCE 10 (3.6-2)
    }

    /** C_c = π √(2E/F_y), ASCE 10 (3.6-3). */
    static double cc(double fy, double e) {
        return Math.PI * Math.sqrt(2 * e / fy);
    }
}
