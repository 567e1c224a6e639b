package tetrapod.model.spec;

import java.util.Objects;

/**
 * The footing under each leg of a tower (all four alike): a concrete block with the soil above it,
 * and the anchor rods that hold the leg to it. Units as in the model file: m, kN/m³, kPa, degrees,
 * mm and MPa for the rods.
 *
 * @param block                 the concrete block
 * @param concreteUnitWeight    kN/m³
 * @param soilUnitWeight        unit weight of the backfill above the block, kN/m³
 * @param frustumHalfAngle      angle of the sides of the inverted soil frustum from the vertical,
 *                              degrees (0 = a vertical prism over the block)
 * @param uplift                how uplift is verified
 * @param allowableBearing      allowable soil pressure under the block, kPa
 * @param friction              coefficient of friction between block and soil, dimensionless
 * @param slidingFactorOfSafety factor of safety against sliding, dimensionless
 * @param anchorRods            the anchor rods of one leg, or null when the leg is cast in
 */
public record FoundationSpec(Block block, double concreteUnitWeight, double soilUnitWeight, double frustumHalfAngle,
                             UpliftRule uplift, double allowableBearing, double friction,
                             double slidingFactorOfSafety, AnchorRodSpec anchorRods) {

    public FoundationSpec {
        Objects.requireNonNull(block, "block");
        Objects.requireNonNull(uplift, "uplift");
        if (!(concreteUnitWeight > 0) || !(soilUnitWeight >= 0) || !(allowableBearing > 0) || !(friction > 0)
                || !(slidingFactorOfSafety > 0) || !(frustumHalfAngle >= 0 && frustumHalfAngle < 90)) {
            throw new IllegalArgumentException("foundation values out of range");
        }
    }

    /**
     * A concrete block, m: plan widths along x and y, its height, and the depth of its base below
     * the ground (a depth less than the height leaves the top standing out of the ground).
     */
    public record Block(double widthX, double widthY, double height, double depth) {
        public Block {
            if (!(widthX > 0) || !(widthY > 0) || !(height > 0) || !(depth >= 0)) {
                throw new IllegalArgumentException("block dimensions must be > 0 m");
            }
        }
    }

    /** How uplift is verified: a factor of safety on the weights, or EN 1997 UPL partial factors. */
    public sealed interface UpliftRule permits FactorOfSafety, PartialFactor { }

    /** Uplift × factor ≤ weight of block and soil (allowable-stress practice), dimensionless. */
    public record FactorOfSafety(double factor) implements UpliftRule {
        public FactorOfSafety {
            if (!(factor > 0)) {
                throw new IllegalArgumentException("factor of safety must be > 0");
            }
        }
    }

    /** Design uplift ≤ γ_G,stb × weight of block and soil (EN 1997-1 2.4.7.4 UPL), dimensionless. */
    public record PartialFactor(double gammaStabilising) implements UpliftRule {
        public PartialFactor {
            if (!(gammaStabilising > 0)) {
                throw new IllegalArgumentException("partial factor must be > 0");
            }
        }
    }

    /** The anchor rods of one leg: by grade (EN 1993-1-8) or by allowable stresses. */
    public sealed interface AnchorRodSpec permits RodsByGrade, RodsByAllowableStress {
        int count();

        /** Nominal diameter, mm. */
        double diameter();
    }

    /** {@code count} rods of nominal diameter (mm, a metric coarse size M12 … M72) and property class. */
    public record RodsByGrade(int count, double diameter, BoltGrade grade) implements AnchorRodSpec {
        public RodsByGrade {
            Objects.requireNonNull(grade, "grade");
            if (count < 1 || !(diameter > 0)) {
                throw new IllegalArgumentException("anchor rods: count >= 1 and diameter > 0 mm");
            }
        }
    }

    /**
     * {@code count} rods of diameter (mm) with allowable tensile and shear stresses (MPa) on their
     * gross area.
     */
    public record RodsByAllowableStress(int count, double diameter, double allowableTension, double allowableShear)
            implements AnchorRodSpec {
        public RodsByAllowableStress {
            if (count < 1 || !(diameter > 0) || !(allowableTension > 0) || !(allowableShear > 0)) {
                throw new IllegalArgumentException("anchor rods: count >= 1, diameter and allowable stresses > 0");
            }
        }
    }
}
