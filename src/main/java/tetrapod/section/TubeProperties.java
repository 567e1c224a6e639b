package tetrapod.section;

import tetrapod.model.SectionProperties;
import tetrapod.model.SectionShape;

/**
 * Properties of a circular hollow section (an annulus of outside diameter D and wall t; d = D − 2t),
 * exact: A = π(D² − d²)/4, I = π(D⁴ − d⁴)/64 about every centroidal axis, J = 2I (polar moment,
 * which is the torsion constant of a closed circular ring), mass = ρA.
 */
public final class TubeProperties {

    private TubeProperties() { }

    /** Properties of {@code tube} (input, m) in steel of density {@link SteelGrades#DENSITY}. */
    public static SectionProperties of(SectionShape.Tube tube) {
        return of(tube, SteelGrades.DENSITY);
    }

    /**
     * Properties of {@code tube} (input, m) in a material of {@code density} (kg/m³).
     *
     * @throws IllegalArgumentException unless D &gt; 2t &gt; 0
     */
    public static SectionProperties of(SectionShape.Tube tube, double density) {
        double outside = tube.d();
        double t = tube.t();
        if (!(t > 0) || !(outside > 2 * t) || Double.isInfinite(outside)) {
            throw new IllegalArgumentException("a tube needs D > 2t > 0, was D = " + outside + " m, t = "
                    + t + " m");
        }
        double inside = outside - 2 * t;
        double area = Math.PI * (outside * outside - inside * inside) / 4;
        double i = Math.PI * (Math.pow(outside, 4) - Math.pow(inside, 4)) / 64;
        return new SectionProperties(area, i, i, i, i, 2 * i, 0, 0, 0, area * density);
    }
}
