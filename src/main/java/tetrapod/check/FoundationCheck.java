package tetrapod.check;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import tetrapod.common.Units;
import tetrapod.model.spec.FoundationSpec;
import tetrapod.model.spec.PartialFactors;

/**
 * The footing of one leg (all four legs alike): uplift against the weight of the block and of the
 * soil frustum above it, pressure under the block, sliding, and the anchor rods.
 *
 * <ul>
 * <li>Uplift, with a factor of safety (common practice): T × FS ≤ W_block + W_frustum; or with
 *     EN 1997-1 UPL partial factors (2.4.7.4 (2.8)): T_d ≤ γ_G,stb (W_block + W_frustum), the uplift
 *     being the design value of the factored load case.</li>
 * <li>Bearing (common practice): (C + W_block + W_soil on block) / (b_x b_y) ≤ q_allow.</li>
 * <li>Sliding (common practice): H × FS_sliding ≤ μ N, N the vertical force on the base (the
 *     compression plus the weights, or the weights less the uplift). Under uplift with anchor rods
 *     the horizontal force is left to the rods (their shear check).</li>
 * <li>The concrete volume that would balance the uplift alone, without soil: T × FS/γ_c, or
 *     T/(γ_G,stb γ_c).</li>
 * </ul>
 * The allowable-stress rules (factor of safety, allowable bearing pressure, sliding, allowable rod
 * stresses) take service reactions, the partial-factor rules (UPL, rods by grade) factored ones
 * ({@link ReactionLevel}).
 */
public final class FoundationCheck {

    private final FootingBlock block;
    private final FoundationSpec spec;
    private final AnchorRodCheck rods;

    public FoundationCheck(FoundationSpec spec, PartialFactors factors) {
        this.spec = spec;
        this.block = FootingBlock.of(spec);
        this.rods = spec.anchorRods() == null ? null : AnchorRodCheck.of(spec.anchorRods(), factors);
    }

    public FootingBlock block() {
        return block;
    }

    /** Factor applied to the uplift against the stabilising weights (FS, or 1/γ_G,stb). */
    double upliftFactor() {
        if (spec.uplift() instanceof FoundationSpec.FactorOfSafety fs) {
            return fs.factor();
        }
        return 1 / ((FoundationSpec.PartialFactor) spec.uplift()).gammaStabilising();
    }

    /** Concrete volume (m³) whose weight alone balances {@code uplift} (N) with the uplift factor. */
    public double concreteVolumeToBalance(double uplift) {
        return Math.max(0, uplift) * upliftFactor() / block.concreteUnitWeight();
    }

    /** The level of reactions the uplift rule takes: service for a factor of safety, factored for UPL. */
    public ReactionLevel upliftLevel() {
        return spec.uplift() instanceof FoundationSpec.FactorOfSafety ? ReactionLevel.SERVICE : ReactionLevel.FACTORED;
    }

    private ReactionLevel rodLevel() {
        return rods instanceof AllowableStressAnchorRods ? ReactionLevel.SERVICE : ReactionLevel.FACTORED;
    }

    /** Whether any rule takes reactions of {@code level} (bearing and sliding always take service ones). */
    public boolean checksAt(ReactionLevel level) {
        return level == ReactionLevel.SERVICE || upliftLevel() == level || (rods != null && rodLevel() == level);
    }

    /** Every check of the rules that take reactions of {@code level}; null when none does. */
    public FoundationResult check(LegBaseForces forces, ReactionLevel level) {
        List<CheckResult> out = new ArrayList<>();
        if (upliftLevel() == level) {
            out.add(uplift(forces));
        }
        if (level == ReactionLevel.SERVICE) {
            out.add(bearing(forces));
            out.add(sliding(forces));
        }
        if (rods != null && rodLevel() == level) {
            out.addAll(rods.check(forces.uplift(), forces.horizontal()));
        }
        if (out.isEmpty()) {
            return null;
        }
        return new FoundationResult(out, upliftLevel() == level ? concreteVolumeToBalance(forces.uplift()) : 0);
    }

    private CheckResult uplift(LegBaseForces forces) {
        double weights = block.concreteWeight() + block.frustumWeight();
        boolean fs = spec.uplift() instanceof FoundationSpec.FactorOfSafety;
        return CheckResult.noted(CheckMode.UPLIFT, CheckResult.ratio(forces.uplift() * upliftFactor(), weights),
                fs ? "uplift × FS ≤ weight of block and soil frustum (common practice)"
                   : "EN 1997-1 2.4.7.4 (2.8) UPL, γ_G,stb on block and soil frustum",
                () -> String.format(Locale.ROOT, "block %.2f m³ (%.1f kN), frustum %.2f m³ (%.1f kN), factor %.3f",
                        block.concreteVolume(), block.concreteWeight() / 1e3, block.frustumVolume(),
                        block.frustumWeight() / 1e3, upliftFactor()));
    }

    private CheckResult bearing(LegBaseForces forces) {
        double onBase = forces.compression() + block.concreteWeight() + block.soilOnBlockWeight();
        double pressure = onBase / block.baseArea();
        return CheckResult.noted(CheckMode.BEARING_PRESSURE, pressure / (spec.allowableBearing() * Units.KPA),
                "allowable bearing pressure (common practice)",
                () -> String.format(Locale.ROOT, "q = %.1f kPa, allowable %.1f kPa", pressure / 1e3, spec.allowableBearing()));
    }

    private CheckResult sliding(LegBaseForces forces) {
        if (forces.uplift() > 0 && rods != null) {
            return new CheckResult(CheckMode.SLIDING, 0, "H × FS ≤ μ N (common practice)",
                    "the leg pulls up: the horizontal force is carried by the anchor rods (anchorShear)");
        }
        double normal = Math.max(0, forces.vertical() + block.concreteWeight() + block.soilOnBlockWeight());
        double friction = spec.friction() * normal;
        double demand = forces.horizontal() * spec.slidingFactorOfSafety();
        double sliding = demand <= 0 ? 0 : friction > 0 ? demand / friction : CheckResult.NO_RESISTANCE;
        return CheckResult.noted(CheckMode.SLIDING, sliding, "H × FS ≤ μ N (common practice)",
                () -> String.format(Locale.ROOT, "H = %.1f kN, μ N = %.1f kN%s", forces.horizontal() / 1e3, friction / 1e3,
                        friction > 0 ? "" : " (the block lifts off its base)"));
    }
}
