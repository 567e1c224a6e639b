package tetrapod.section;

import java.util.ArrayList;
import java.util.List;
import tetrapod.common.Problem;
import tetrapod.model.SectionProperties;
import tetrapod.model.SectionShape;

/**
 * Properties of a hot-rolled angle computed from its dimensions, SI units (m, m², m⁴, kg/m).
 *
 * <p><b>Axes.</b> Origin at the heel (the outside corner). Leg A (the long leg, length a) lies
 * along +y, leg B (length b ≤ a) along +z, both of thickness t. The root fillet (radius r1) fills
 * the inside corner; each toe has its inside edge rounded with radius r2, as drawn in
 * EN 10056-1. y–y is the axis through the centroid parallel to leg A, z–z the axis through the
 * centroid parallel to leg B. So for an unequal angle Iy is the smaller and Iz the larger geometric
 * second moment (EN 10056-1 and SCI tables, which draw the long leg upright, call these Iz and Iy).
 * u–u and v–v are the major and minor principal axes through the centroid.
 *
 * <p><b>Geometry.</b> Area and moments are exact for the section built as two rectangles plus the
 * root-fillet spandrel minus the two toe spandrels ({@link AreaMoments}).
 *
 * @param area          A, m²
 * @param centroidY     ȳ: distance of the centroid from the back of leg B, m (EN 10056-1 c_y)
 * @param centroidZ     z̄: distance of the centroid from the back of leg A, m (EN 10056-1 c_z)
 * @param iy            ∫(z − z̄)² dA, about y–y (parallel to leg A), m⁴
 * @param iz            ∫(y − ȳ)² dA, about z–z (parallel to leg B), m⁴
 * @param iyz           product of inertia ∫(y − ȳ)(z − z̄) dA, m⁴; negative for this placement
 * @param iu            major principal second moment, m⁴
 * @param iv            minor principal second moment, m⁴
 * @param tanAlpha      tan α, α the angle between u–u and z–z (the geometric axis parallel to the
 *                      short leg); 1 for equal angles, as tabulated in EN 10056-1
 * @param torsion       St Venant torsion constant J, m⁴ (see {@link #torsionConstant})
 * @param massPerMetre  A × density, kg/m
 */
public record AngleProperties(double area, double centroidY, double centroidZ, double iy, double iz,
                              double iyz, double iu, double iv, double tanAlpha, double torsion,
                              double massPerMetre) {

    /** Properties of {@code angle} in steel of density {@link SteelGrades#DENSITY}. */
    public static AngleProperties of(SectionShape.Angle angle) {
        return of(angle, SteelGrades.DENSITY);
    }

    /**
     * Properties of {@code angle} (input, m) in a material of {@code density} (kg/m³).
     *
     * @throws IllegalArgumentException when the dimensions do not describe an angle (see
     *                                  {@link #problems})
     */
    public static AngleProperties of(SectionShape.Angle angle, double density) {
        List<Problem> problems = problems(angle, "angle");
        if (!problems.isEmpty()) {
            throw new IllegalArgumentException(problems.toString());
        }
        double a = angle.legA();
        double b = angle.legB();
        double t = angle.t();
        double r1 = angle.r1();
        double r2 = angle.r2();

        AreaMoments m = AreaMoments.rectangle(0, a, 0, t)
                .plus(AreaMoments.rectangle(0, t, t, b))
                .plus(AreaMoments.spandrel(t, t, r1, +1, +1))
                .minus(AreaMoments.spandrel(a, t, r2, -1, -1))
                .minus(AreaMoments.spandrel(t, b, r2, -1, -1));

        double iy = m.centroidalIy();
        double iz = m.centroidalIz();
        double iyz = m.centroidalIyz();
        // Mohr's circle: principal values and the angle of u–u from z–z
        double mean = (iy + iz) / 2;
        double radius = Math.hypot((iy - iz) / 2, iyz);
        double alpha = 0.5 * Math.atan2(2 * Math.abs(iyz), iz - iy);
        return new AngleProperties(m.area(), m.centroidY(), m.centroidZ(), iy, iz, iyz,
                mean + radius, mean - radius, Math.tan(alpha), torsionConstant(a, b, t, r1),
                m.area() * density);
    }

    /**
     * St Venant torsion constant of an angle with legs a (full length) and b, thickness t and root
     * radius r. Roark's Formulas for Stress and Strain, Table 10.7, L-section (after El Darwish and
     * Johnston, 1965), recalled from memory:
     * J = K1 + K2 + α D⁴, with
     * K1 = a t³ [1/3 − 0.21 (t/a)(1 − t⁴/(12 a⁴))] for leg A taken over its full length,
     * K2 = c t³ [1/3 − 0.105 (t/c)(1 − t⁴/(192 c⁴))] for leg B beyond leg A (c = b − t),
     * α = 0.07 + 0.076 r/t (both legs of thickness t), and
     * D = 2 [2t + 3r − √(2 (2r + t)²)], the diameter of the largest circle inscribed at the root.
     * Toe roundings are neglected (their effect on J is below 0.1 %). With r = 0 this is
     * (a + b − t) t³/3 − 0.18 t⁴, i.e. the thin-walled Σ b t³/3 over the leg centre lines with
     * end and junction corrections.
     */
    static double torsionConstant(double a, double b, double t, double r) {
        double c = b - t;
        double t3 = t * t * t;
        double t4 = t3 * t;
        double k1 = a * t3 * (1.0 / 3.0 - 0.21 * (t / a) * (1 - t4 / (12 * a * a * a * a)));
        double k2 = c * t3 * (1.0 / 3.0 - 0.105 * (t / c) * (1 - t4 / (192 * c * c * c * c)));
        double alpha = 0.07 + 0.076 * r / t;
        double d = 2 * (2 * t + 3 * r - Math.sqrt(2 * (2 * r + t) * (2 * r + t)));
        return k1 + k2 + alpha * d * d * d * d;
    }

    /** As the model's section properties (the product of inertia is not carried there). */
    public SectionProperties toSectionProperties() {
        return new SectionProperties(area, iy, iz, iu, iv, torsion, centroidY, centroidZ, tanAlpha,
                massPerMetre);
    }

    /** Radius of gyration about the minor principal axis, i_v = √(Iv/A), m. */
    public double radiusV() {
        return Math.sqrt(iv / area);
    }

    /**
     * Everything that keeps {@code angle} from being a buildable angle, each located at
     * {@code path}.{@code legA|legB|t|r1|r2}, with values printed in mm. Empty when it is fine.
     */
    public static List<Problem> problems(SectionShape.Angle angle, String path) {
        List<Problem> out = new ArrayList<>();
        double a = angle.legA();
        double b = angle.legB();
        double t = angle.t();
        positive(out, path + ".legA", a);
        positive(out, path + ".legB", b);
        positive(out, path + ".t", t);
        notNegative(out, path + ".r1", angle.r1());
        notNegative(out, path + ".r2", angle.r2());
        if (!out.isEmpty()) {
            return out;
        }
        if (a < b) {
            out.add(Problem.at(path + ".legB", "must not exceed legA (give the long leg first): legA "
                    + mm(a) + ", legB " + mm(b)));
        }
        if (t >= b) {
            out.add(Problem.at(path + ".t", "must be less than the shorter leg " + mm(b) + ", was " + mm(t)));
        } else if (angle.r1() + angle.r2() > b - t) {
            out.add(Problem.at(path + ".r1", "root radius " + mm(angle.r1()) + " plus toe radius "
                    + mm(angle.r2()) + " must fit on the inside face of the shorter leg, "
                    + mm(b - t)));
        }
        if (angle.r2() > t) {
            out.add(Problem.at(path + ".r2", "toe radius must not exceed the thickness " + mm(t)
                    + ", was " + mm(angle.r2())));
        }
        return out;
    }

    private static void positive(List<Problem> out, String path, double v) {
        if (!(v > 0) || Double.isInfinite(v)) {
            out.add(Problem.at(path, "must be a finite number > 0 mm, was " + mm(v)));
        }
    }

    private static void notNegative(List<Problem> out, String path, double v) {
        if (!(v >= 0) || Double.isInfinite(v)) {
            out.add(Problem.at(path, "must be a finite number ≥ 0 mm, was " + mm(v)));
        }
    }

    private static String mm(double metres) {
        return Formats.number(metres * 1e3) + " mm";
    }
}
