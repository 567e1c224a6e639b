package tetrapod.load;

/**
 * Force coefficients of square and rectangular trussed towers by ASCE 7 (7-16 Table 29.4-3;
 * 7-22 the same values): C_f = 4.0ε² − 5.9ε + 4.0 on the solid area of one face, times
 * 0.51ε² + 0.57 (at most 1.0) for rounded members, and the diagonal-wind factor 1 + 0.75ε (at
 * most 1.2) for wind along a diagonal. Table and note numbers recalled from memory.
 *
 * <p>For a face with both flat and rounded members the rounded-member factor is applied to the
 * rounded members' share of the area; between face and diagonal the diagonal factor is spread as
 * 1 + (D − 1) sin²2θ. Both are Tetrapod's choices (docs/methods.md).
 */
public record Asce7TrussedTowerCoefficients() implements LatticeCoefficients {

    /** C_f of a square or rectangular tower of solidity ε (flat-sided members). */
    public static double forceCoefficient(double epsilon) {
        return 4.0 * epsilon * epsilon - 5.9 * epsilon + 4.0;   // ASCE 7-16 Table 29.4-3
    }

    /** Factor on C_f for rounded members: 0.51ε² + 0.57, not more than 1.0. */
    public static double roundedMemberFactor(double epsilon) {
        return Math.min(1.0, 0.51 * epsilon * epsilon + 0.57);   // ASCE 7-16 Table 29.4-3 note
    }

    /** Factor for wind along a tower diagonal: 1 + 0.75ε, not more than 1.2. */
    public static double diagonalFactor(double epsilon) {
        return Math.min(1.2, 1 + 0.75 * epsilon);   // ASCE 7-16 Table 29.4-3 note
    }

    @Override
    public FaceCoefficient of(FaceAreas face, double flowVelocity) {
        double total = face.total();
        if (!(total > 0)) {
            return new FaceCoefficient(0, 0);
        }
        double e = face.solidity();
        double share = (face.flat() + face.roundTotal() * roundedMemberFactor(e)) / total;
        return new FaceCoefficient(forceCoefficient(e) * share, diagonalFactor(e) - 1);
    }
}
