package tetrapod.check;

import java.util.List;
import java.util.Locale;

/**
 * Anchor rods checked by allowable stresses on their gross (nominal) area π d²/4 (common
 * practice): f_t = T/(n A) ≤ σ_t,allow, f_v = V/(n A) ≤ τ_allow, and with both
 * (f_t/σ_t,allow)² + (f_v/τ_allow)² ≤ 1 (common practice). The rods share the forces equally.
 *
 * @param diameter         m
 * @param allowableTension Pa
 * @param allowableShear   Pa
 */
public record AllowableStressAnchorRods(int count, double diameter, double allowableTension, double allowableShear)
        implements AnchorRodCheck {

    public AllowableStressAnchorRods {
        if (count < 1 || !(diameter > 0) || !(allowableTension > 0) || !(allowableShear > 0)) {
            throw new IllegalArgumentException("anchor rods: count >= 1, diameter and allowable stresses > 0");
        }
    }

    /** Gross area of one rod, m². */
    public double area() {
        return MetricThreads.grossArea(diameter);
    }

    /** Tension the rods of the leg carry at the allowable stress, N. */
    public double tensionCapacity() {
        return count * area() * allowableTension;
    }

    @Override
    public List<CheckResult> check(double tension, double shear) {
        double ut = CheckResult.ratio(tension, tensionCapacity());
        double uv = CheckResult.ratio(shear, count * area() * allowableShear);
        return List.of(
                CheckResult.noted(CheckMode.ANCHOR_TENSION, ut, "allowable tensile stress on the gross area (common practice)",
                        () -> String.format(Locale.ROOT, "%d rods Ø%.0f mm, A = %.0f mm² each, %.1f kN in tension",
                                count, diameter * 1e3, area() * 1e6, tensionCapacity() / 1e3)),
                new CheckResult(CheckMode.ANCHOR_SHEAR, uv, "allowable shear stress on the gross area (common practice)", ""),
                new CheckResult(CheckMode.ANCHOR_COMBINED, ut * ut + uv * uv,
                        "tension with shear, (f_t/F_t)² + (f_v/F_v)² ≤ 1 (common practice)", ""));
    }
}
