package tetrapod.check;

import java.util.List;
import java.util.Locale;
import tetrapod.model.spec.BoltGrade;

/**
 * Anchor rods as bolts of EN 1993-1-8 Table 3.4: tension F_t,Rd = k2 f_ub A_s/γM2 with k2 = 0.9,
 * shear through the threads F_v,Rd = α_v f_ub A_s/γM2, and tension with shear
 * F_v,Ed/F_v,Rd + F_t,Ed/(1.4 F_t,Rd) ≤ 1. A_s is the tensile stress area of ISO 898-1
 * ({@link MetricThreads}). The rods share the forces equally.
 *
 * @param diameter nominal diameter, m (a metric coarse size M12 … M72)
 */
public record En1993AnchorRods(int count, double diameter, BoltGrade grade, double gammaM2) implements AnchorRodCheck {

    /** k2 of EN 1993-1-8 Table 3.4 (not countersunk). */
    static final double K2 = 0.9;

    public En1993AnchorRods {
        if (count < 1 || !(gammaM2 > 0)) {
            throw new IllegalArgumentException("anchor rods: count >= 1, γM2 > 0");
        }
        MetricThreads.pitch(diameter);   // must be a known size
    }

    /** F_t,Rd of one rod, N. EN 1993-1-8 Table 3.4. */
    public double tensionResistance() {
        return K2 * BoltStrengths.ultimate(grade) * MetricThreads.stressArea(diameter) / gammaM2;   // EN 1993-1-8 Table 3.4
    }

    /** F_v,Rd of one rod with the shear plane through the threads, N. EN 1993-1-8 Table 3.4. */
    public double shearResistance() {
        return BoltStrengths.alphaVThreads(grade) * BoltStrengths.ultimate(grade) * MetricThreads.stressArea(diameter)
                / gammaM2;                                                                            // EN 1993-1-8 Table 3.4
    }

    @Override
    public List<CheckResult> check(double tension, double shear) {
        double ft = tension / count;
        double fv = shear / count;
        double ftRd = tensionResistance();
        double fvRd = shearResistance();
        String rods = String.format(Locale.ROOT, "%d × M%.0f %s, A_s = %.0f mm²", count, diameter * 1e3, grade.jsonName(),
                MetricThreads.stressArea(diameter) * 1e6);
        return List.of(
                new CheckResult(CheckMode.ANCHOR_TENSION, CheckResult.ratio(ft, ftRd), "EN 1993-1-8 Table 3.4 (F_t,Rd)",
                        rods + String.format(Locale.ROOT, ", F_t,Rd = %.1f kN per rod", ftRd / 1e3)),
                new CheckResult(CheckMode.ANCHOR_SHEAR, CheckResult.ratio(fv, fvRd), "EN 1993-1-8 Table 3.4 (F_v,Rd)",
                        String.format(Locale.ROOT, "F_v,Rd = %.1f kN per rod", fvRd / 1e3)),
                new CheckResult(CheckMode.ANCHOR_COMBINED, CheckResult.ratio(fv, fvRd) + CheckResult.ratio(ft, 1.4 * ftRd),
                        "EN 1993-1-8 Table 3.4 (shear with tension)", ""));
    }
}
