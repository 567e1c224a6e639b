package tetrapod.check;

import java.util.Locale;
import tetrapod.common.Units;
import tetrapod.model.Section;
import tetrapod.model.SectionShape;

/**
 * The class of a cross-section in compression (EN 1993-1-1 5.5, Table 5.2) and its effective area.
 *
 * <p>Angles: Table 5.2 (sheet 3) gives only the class 3 limits, h/t ≤ 15ε and (b + h)/(2t) ≤ 11.5ε;
 * an angle meeting them is class 3 (its elastic properties are used), otherwise class 4 and its
 * area is reduced leg by leg by the effective width of an outstand in uniform compression,
 * EN 1993-1-5 4.4: k_σ = 0.43 (Table 4.2, ψ = 1), λ̄p = (c/t)/(28.4 ε √k_σ) (4.4 (2)),
 * ρ = (λ̄p − 0.188)/λ̄p² ≤ 1 (4.3), with the full leg width as c. Tubes: d/t ≤ 50ε², 70ε², 90ε²
 * for classes 1, 2, 3; a class 4 tube is outside EN 1993-1-1 (its local buckling is EN 1993-1-6)
 * and is flagged, not reduced. Sections given by properties have no known shape: class 3 is
 * assumed. The words of {@link #note()} are made only when asked for.
 *
 * @param sectionClass  1 … 4
 * @param effectiveArea A_eff for class 4, A otherwise, m²
 * @param flagged       a class 4 section this method cannot reduce (a class 4 tube)
 * @param slendernessRatio the decisive width-to-thickness ratio (h/t of an angle, d/t of a tube; 0 if unknown)
 * @param classThreeLimit  the class 3 limit of that ratio (15ε, 90ε²; 0 if unknown)
 * @param section       the section classified
 * @param fy            the yield strength it was classified for, Pa
 * @param unreduced     a class 4 angle whose legs all have ρ = 1 (no area lost)
 */
record En1993Section(int sectionClass, double effectiveArea, boolean flagged, double slendernessRatio,
                     double classThreeLimit, Section section, double fy, boolean unreduced) {

    /** k_σ of an outstand in uniform compression, EN 1993-1-5 Table 4.2 (ψ = 1). */
    static final double K_SIGMA_OUTSTAND = 0.43;

    /** ε = √(235 / f_y), f_y in MPa (EN 1993-1-1 Table 5.2). */
    static double epsilon(double fy) {
        return Math.sqrt(235 * Units.MPA / fy);
    }

    static En1993Section of(Section section, double fy) {
        double eps = epsilon(fy);
        double area = section.area();
        if (section.shape() instanceof SectionShape.Angle a) {
            double h = a.legA();
            double b = a.legB();
            double t = a.t();
            boolean classThree = h / t <= 15 * eps && (b + h) / (2 * t) <= 11.5 * eps;   // EN 1993-1-1 Table 5.2 (sheet 3)
            if (classThree) {
                return new En1993Section(3, area, false, h / t, 15 * eps, section, fy, false);
            }
            double lost = (1 - rho(h / t, eps)) * h * t + (1 - rho(b / t, eps)) * b * t;
            double effective = Math.max(area - lost, 0.05 * area);
            return new En1993Section(4, effective, false, h / t, 15 * eps, section, fy, lost == 0);
        }
        if (section.shape() instanceof SectionShape.Tube tube) {
            double ratio = tube.d() / tube.t();
            double e2 = eps * eps;
            int cls = ratio <= 50 * e2 ? 1 : ratio <= 70 * e2 ? 2 : ratio <= 90 * e2 ? 3 : 4;   // EN 1993-1-1 Table 5.2 (sheet 3)
            return new En1993Section(cls, area, cls == 4, ratio, 90 * e2, section, fy, false);
        }
        return new En1993Section(3, area, false, 0, 0, section, fy, false);
    }

    /** How the class was found, for the notes of the checks that use it. */
    String note() {
        double eps = epsilon(fy);
        if (section.shape() instanceof SectionShape.Angle a) {
            double h = a.legA();
            double b = a.legB();
            double t = a.t();
            if (sectionClass == 3) {
                return "class 3 (h/t = " + f(h / t) + " ≤ 15ε = " + f(15 * eps) + ")";
            }
            String why = h / t > 15 * eps ? "h/t = " + f(h / t) + " > 15ε = " + f(15 * eps)
                    : "(b+h)/2t = " + f((b + h) / (2 * t)) + " > 11.5ε = " + f(11.5 * eps);
            return "class 4 (" + why + "), A_eff/A = " + f(effectiveArea / section.area()) + " by EN 1993-1-5 4.4"
                    + (unreduced ? " (ρ = 1: no reduction)" : "");
        }
        if (section.shape() instanceof SectionShape.Tube) {
            double e2 = eps * eps;
            return "class " + sectionClass + " tube (d/t = " + f(slendernessRatio)
                    + (sectionClass == 4 ? " > 90ε² = " + f(90 * e2) + ": outside EN 1993-1-1, see EN 1993-1-6)" : ")");
        }
        return "class 3 assumed (section given by its properties)";
    }

    /** Reduction factor of an outstand, EN 1993-1-5 4.4 (2) (4.3), with c/t the leg's width over thickness. */
    static double rho(double widthOverThickness, double eps) {
        double lambdaP = widthOverThickness / (28.4 * eps * Math.sqrt(K_SIGMA_OUTSTAND));   // EN 1993-1-5 4.4 (2)
        if (lambdaP <= 0.748) {
            return 1.0;
        }
        return Math.min(1.0, (lambdaP - 0.188) / (lambdaP * lambdaP));                      // EN 1993-1-5 (4.3)
    }

    private static String f(double v) {
        return String.format(Locale.ROOT, "%.3g", v);
    }
}
