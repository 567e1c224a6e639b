package tetrapod.load;

/**
 * The force coefficient of a panel for wind normal to one pair of faces, and how it grows when the
 * wind turns away from the face normal: at angle θ from the normal the coefficient is
 * {@code cf × (1 + incidenceAmplitude × sin²2θ)}, the form of EN 1993-3-1's K_θ, which also carries
 * ASCE 7's diagonal-wind factor to the azimuths between face and diagonal.
 *
 * @param cf                 coefficient for wind normal to the face, on the face's projected member area
 * @param incidenceAmplitude the increase at 45° (K_θ − 1 at θ = 45°), ≥ 0
 */
public record FaceCoefficient(double cf, double incidenceAmplitude) {

    /** The incidence factor at angle θ (degrees) from the face normal. */
    public double incidenceFactor(double thetaDeg) {
        double s = Math.sin(Math.toRadians(2 * thetaDeg));
        return 1 + incidenceAmplitude * s * s;
    }
}
