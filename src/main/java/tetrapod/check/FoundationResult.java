package tetrapod.check;

import java.util.Comparator;
import java.util.List;

/**
 * Every check of one leg's footing for one load case.
 *
 * @param checks                 at least one
 * @param concreteVolumeRequired volume of concrete alone (no soil) that would balance this case's
 *                               uplift with the chosen factor, m³ (0 without uplift)
 */
public record FoundationResult(List<CheckResult> checks, double concreteVolumeRequired) {

    public FoundationResult {
        checks = List.copyOf(checks);
        if (checks.isEmpty()) {
            throw new IllegalArgumentException("a footing has at least one check");
        }
        if (!Double.isFinite(concreteVolumeRequired) || concreteVolumeRequired < 0) {
            throw new IllegalArgumentException("required volume must be finite and >= 0");
        }
    }

    public CheckResult governing() {
        return checks.stream().max(Comparator.comparingDouble(CheckResult::utilisation)).orElseThrow();
    }
}
