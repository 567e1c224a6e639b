package tetrapod.check;

import java.util.List;
import java.util.Locale;
import tetrapod.model.spec.BoltGrade;

/**
 * Anchor rods by EN 1993-1-8: tension F_t,Rd = k2 f_ub A_s/γM2 with k2 = 0.9 (Table 3.4), shear
 * F_2,vb,Rd = α_bc f_ub A_s/γM2 with α_bc = 0.44 − 0.0003 f_yb (6.2.2 (7), anchor bolts; in place of
 * the α_v of Table 3.4), and tension with shear F_v,Ed/F_v,Rd + F_t,Ed/(1.4 F_t,Rd) ≤ 1 (Table 3.4).
 * A_s is the tensile stress area of ISO 898-1 ({@link MetricThreads}). The rods share the forces
 * equally. The bearing of the rods on the base plate (F_1,vb,Rd of 6.2.2 (7)) is not checked: the
 * model gives no base plate.
 *
 * @param diameter nominal diameter, m (a metric coarse size M12 … M72)
 */
public record En1993AnchorRods(int count, double diameter, BoltGrade grade, double gammaM2) implements AnchorRodCheck {

    /** k2 of EN 1993-1-8 Table 3.4 (not countersunk). */
    static final double K2 = 0.9;

    /** The range of f_yb, Pa, for which EN 1993-1-8 6.2.2 (7) gives α_bc: 235 ≤ f_yb ≤ 640 N/mm². */
    static final double MIN_YIELD = 235e6;
    static final double MAX_YIELD = 640e6;

    public En1993AnchorRods {
        if (count < 1 || !(gammaM2 > 0)) {
            throw new IllegalArgumentException("anchor rods: count >= 1, γM2 > 0");
        }
        double fyb = BoltStrengths.yield(grade);
        if (fyb < MIN_YIELD || fyb > MAX_YIELD) {
            throw new IllegalArgumentException("anchor rods of grade " + grade.jsonName()
                    + ": EN 1993-1-8 6.2.2 (7) holds for 235 ≤ f_yb ≤ 640 MPa only");
        }
        MetricThreads.pitch(diameter);   // must be a known size
    }

    /** F_t,Rd of one rod, N. EN 1993-1-8 Table 3.4. */
    public double tensionResistance() {
        return K2 * BoltStrengths.ultimate(grade) * MetricThreads.stressArea(diameter) / gammaM2;   // EN 1993-1-8 Table 3.4
    }

    /** α_bc of an anchor bolt in shear, no unit. */
    public double alphaBc() {
        return 0.44 - 0.0003 * BoltStrengths.yield(grade) / 1e6;   // EN 1993-1-8 6.2.2 (7), f_yb in N/mm²
    }

    /** F_2,vb,Rd of one rod, its shear resistance, N. */
    public double shearResistance() {
        return alphaBc() * BoltStrengths.ultimate(grade) * MetricThreads.stressArea(diameter) / gammaM2;   // EN 1993-1-8 6.2.2 (7)
    }

    @Override
    public List<CheckResult> check(double tension, double shear) {
        double ft = tension / count;
        double fv = shear / count;
        double ftRd = tensionResistance();
        double fvRd = shearResistance();
        return List.of(
                CheckResult.noted(CheckMode.ANCHOR_TENSION, CheckResult.ratio(ft, ftRd), "EN 1993-1-8 Table 3.4 (F_t,Rd)",
                        () -> String.format(Locale.ROOT, "%d × M%.0f %s, A_s = %.0f mm², F_t,Rd = %.1f kN per rod", count,
                                diameter * 1e3, grade.jsonName(), MetricThreads.stressArea(diameter) * 1e6, ftRd / 1e3)),
                CheckResult.noted(CheckMode.ANCHOR_SHEAR, CheckResult.ratio(fv, fvRd), "EN 1993-1-8 6.2.2 (7) (F_2,vb,Rd)",
                        () -> String.format(Locale.ROOT, "α_bc = %.3f, F_v,Rd = %.1f kN per rod", alphaBc(), fvRd / 1e3)),
                new CheckResult(CheckMode.ANCHOR_COMBINED, CheckResult.ratio(fv, fvRd) + CheckResult.ratio(ft, 1.4 * ftRd),
                        "EN 1993-1-8 Table 3.4 (shear with tension)", ""));
    }
}
