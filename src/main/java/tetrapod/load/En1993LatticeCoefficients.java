package tetrapod.load;

/**
 * Force coefficients of square and rectangular lattice towers by EN 1993-3-1:2006 Annex B:
 * c_f,S = K_θ c_f,S,0 with c_f,S,0 the area-weighted mean of the flat-sided, subcritical circular
 * and supercritical circular expressions (B.2.2), C1 = 2.25 and C2 = 1.5 for square and
 * rectangular plans, and the wind-incidence factor K_θ = 1 + K1 K2 sin²2θ.
 * The constants of K1 and K2 are recalled from memory (docs/methods.md).
 */
public record En1993LatticeCoefficients() implements LatticeCoefficients {

    /** C1 of a square or rectangular tower (a triangular one has 1.9). */
    public static final double C1 = 2.25;
    /** C2 of a square or rectangular tower (a triangular one has 1.4). */
    public static final double C2 = 1.5;
    /** Reynolds number from which a circular member is taken as supercritical (recalled from memory). */
    public static final double SUPERCRITICAL_RE = 4e5;

    /** c_f,S,0 of flat-sided members: 1.76 C1 (1 − C2 φ + φ²). */
    public static double flatSided(double phi) {
        return 1.76 * C1 * (1 - C2 * phi + phi * phi);   // EN 1993-3-1 Annex B.2.2, flat-sided members
    }

    /** c_f,S,0 of circular members in subcritical flow: C1 (1 − C2 φ) + (C1 + 0.875) φ². */
    public static double circularSubcritical(double phi) {
        return C1 * (1 - C2 * phi) + (C1 + 0.875) * phi * phi;   // EN 1993-3-1 Annex B.2.2, circular, subcritical
    }

    /** c_f,S,0 of circular members in supercritical flow: 1.9 − √((1 − φ)(2.8 − 1.14 C1 + φ)). */
    public static double circularSupercritical(double phi) {
        return 1.9 - Math.sqrt((1 - phi) * (2.8 - 1.14 * C1 + phi));   // EN 1993-3-1 Annex B.2.2, circular, supercritical
    }

    /** K2 of the wind-incidence factor: 0.2 for φ ≤ 0.2 and φ ≥ 0.8, φ up to 0.5, 1 − φ from 0.5 to 0.8. */
    public static double incidenceK2(double phi) {
        if (phi <= 0.2 || phi >= 0.8) {   // EN 1993-3-1 Annex B.2.2, K_θ (recalled from memory)
            return 0.2;
        }
        return phi <= 0.5 ? phi : 1 - phi;
    }

    /** K1 = (0.55 A_f + 0.8 (A_c + A_c,sup)) / A_s. */
    public static double incidenceK1(double flatArea, double roundArea) {
        double total = flatArea + roundArea;
        return total > 0 ? (0.55 * flatArea + 0.8 * roundArea) / total : 0;   // EN 1993-3-1 Annex B.2.2, K_θ (recalled from memory)
    }

    /** Reynolds number Re = b v / ν of a circular member of diameter b (m) in wind of velocity v (m/s). */
    public static double reynolds(double diameter, double velocity) {
        return diameter * velocity / En1991Wind.KINEMATIC_VISCOSITY;   // EN 1991-1-4 7.9.1 (7.15)
    }

    @Override
    public FaceCoefficient of(FaceAreas face, double flowVelocity) {
        double total = face.total();
        if (!(total > 0)) {
            return new FaceCoefficient(0, 0);
        }
        double phi = face.solidity();
        double subcritical = 0;
        double supercritical = 0;
        for (FaceAreas.RoundArea r : face.round()) {
            if (reynolds(r.diameter(), flowVelocity) >= SUPERCRITICAL_RE) {
                supercritical += r.area();
            } else {
                subcritical += r.area();
            }
        }
        double cf0 = (face.flat() * flatSided(phi) + subcritical * circularSubcritical(phi)
                + supercritical * circularSupercritical(phi)) / total;   // EN 1993-3-1 Annex B.2.2: weighted by A_f, A_c, A_c,sup
        return new FaceCoefficient(cf0, incidenceK1(face.flat(), face.roundTotal()) * incidenceK2(phi));
    }
}
