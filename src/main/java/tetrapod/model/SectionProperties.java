package tetrapod.model;

/**
 * Properties of a cross-section, SI units (m², m⁴, m, kg/m).
 *
 * <p>Axes: y–y and z–z are the geometric axes through the centroid (for an angle, parallel to
 * its legs: y–y parallel to leg A ... as the section catalogue documents); u–u and v–v are the
 * principal axes, u the major. For doubly symmetric shapes Iy = Iz = Iu = Iv.
 *
 * @param area           A, m²
 * @param iy             second moment about the geometric y–y axis, m⁴
 * @param iz             second moment about the geometric z–z axis, m⁴
 * @param iu             second moment about the major principal axis u–u, m⁴
 * @param iv             second moment about the minor principal axis v–v, m⁴
 * @param torsion        St Venant torsion constant J, m⁴
 * @param centroidY      distance of the centroid from the back of leg B (angles), m; 0 otherwise
 * @param centroidZ      distance of the centroid from the back of leg A (angles), m; 0 otherwise
 * @param tanAlpha       tan α of the principal axes relative to the geometric axes (angles); 0 otherwise
 * @param massPerMetre   mass per unit length, kg/m
 */
public record SectionProperties(double area, double iy, double iz, double iu, double iv, double torsion,
                                double centroidY, double centroidZ, double tanAlpha, double massPerMetre) {

    public SectionProperties {
        if (!(area > 0) || !(iu > 0) || !(iv > 0) || !(torsion > 0) || !(massPerMetre > 0)) {
            throw new IllegalArgumentException("section properties must be positive");
        }
    }

    /** Minimum radius of gyration i_v = √(Iv/A), m. */
    public double iMin() {
        return Math.sqrt(iv / area);
    }

    /** Radius of gyration about the geometric y–y axis, m. */
    public double radiusY() {
        return Math.sqrt(iy / area);
    }

    /** Radius of gyration about the geometric z–z axis, m. */
    public double radiusZ() {
        return Math.sqrt(iz / area);
    }
}
