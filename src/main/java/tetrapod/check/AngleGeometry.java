package tetrapod.check;

import java.util.List;
import tetrapod.model.SectionProperties;
import tetrapod.model.SectionShape;
import tetrapod.model.spec.ConnectedLeg;

/**
 * Elastic stresses in a single angle, in the axes of the section catalogue: origin at the heel,
 * leg A (length a) along +y, leg B (length b) along +z, centroid at (ȳ, z̄) = (centroidY,
 * centroidZ). Extreme fibres are taken at the corners of the outline with the toe and root radii
 * left out (the heel and the four corners of the toes), which is exact for the heel and slightly
 * conservative at the rounded toes.
 */
final class AngleGeometry {

    private final SectionShape.Angle angle;
    private final SectionProperties p;
    /** Product of inertia ∫(y − ȳ)(z − z̄) dA, m⁴ (negative for this placement of the legs). */
    private final double iyz;
    /** Angle of the major principal axis u–u from the y axis, rad. */
    private final double phiU;

    AngleGeometry(SectionShape.Angle angle, SectionProperties properties) {
        this.angle = angle;
        this.p = properties;
        double half = (p.iu() - p.iv()) / 2;
        double diff = (p.iy() - p.iz()) / 2;
        this.iyz = -Math.sqrt(Math.max(0, half * half - diff * diff));   // Mohr's circle
        double phi1 = 0.5 * Math.atan2(2 * iyz, p.iz() - p.iy());
        this.phiU = secondMomentAbout(phi1) >= secondMomentAbout(phi1 + Math.PI / 2) ? phi1 : phi1 + Math.PI / 2;
    }

    /** Corners of the outline, (y, z) from the heel, m. */
    private List<double[]> corners() {
        double a = angle.legA();
        double b = angle.legB();
        double t = angle.t();
        return List.of(new double[] {0, 0}, new double[] {a, 0}, new double[] {a, t},
                new double[] {0, b}, new double[] {t, b});
    }

    /** Second moment about a centroidal axis at angle φ from y, m⁴: sin²φ Iz + cos²φ Iy − sin 2φ Iyz. */
    private double secondMomentAbout(double phi) {
        double s = Math.sin(phi);
        double c = Math.cos(phi);
        return s * s * p.iz() + c * c * p.iy() - 2 * s * c * iyz;
    }

    /** Largest distance of the outline from a centroidal axis at angle φ from y, m. */
    private double extremeDistance(double phi) {
        double s = Math.sin(phi);
        double c = Math.cos(phi);
        double max = 0;
        for (double[] q : corners()) {
            double dy = q[0] - p.centroidY();
            double dz = q[1] - p.centroidZ();
            max = Math.max(max, Math.abs(-dy * s + dz * c));
        }
        return max;
    }

    /** Elastic section modulus about the major principal axis u–u (local y), m³. */
    double elasticModulusU() {
        return p.iu() / extremeDistance(phiU);
    }

    /** Elastic section modulus about the minor principal axis v–v (local z), m³. */
    double elasticModulusV() {
        return p.iv() / extremeDistance(phiU + Math.PI / 2);
    }

    /**
     * The largest normal stress magnitude (Pa per N of axial force) when the force acts in the
     * plane of the gusset, at the back of the connected leg: an eccentricity e (the centroid's
     * distance from that back) out of the gusset's plane. The gusset holds the angle to bending
     * about the geometric axis parallel to the connected leg (restrained bending, common practice
     * for an angle bolted to a gusset), so σ = N/A + N e z/I with z measured from that axis: at the
     * back of the connected leg N (1/A + e²/I), at the toe of the other leg N (1/A − e (w − e)/I),
     * w that leg's width.
     */
    double eccentricStressPerNewton(ConnectedLeg leg) {
        double e = outOfPlaneEccentricity(leg);
        double inertia = leg == ConnectedLeg.LONG ? p.iy() : p.iz();
        double otherLeg = leg == ConnectedLeg.LONG ? angle.legB() : angle.legA();
        double back = 1 / p.area() + e * e / inertia;
        double toe = 1 / p.area() - e * (otherLeg - e) / inertia;
        return Math.max(Math.abs(back), Math.abs(toe));
    }

    /** Out-of-plane eccentricity of the bolt line's force from the centroid, m. */
    double outOfPlaneEccentricity(ConnectedLeg leg) {
        return leg == ConnectedLeg.LONG ? p.centroidZ() : p.centroidY();
    }
}
