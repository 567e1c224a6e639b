package tetrapod.check;

import tetrapod.common.Units;
import tetrapod.model.spec.FoundationSpec;

/**
 * A concrete footing block and the soil above it, SI units. The soil that must be lifted with the
 * block is an inverted frustum standing on the block's top face and widening upwards at the
 * half-angle θ from the vertical to the ground surface; its volume is the prismatoid's,
 * V = h/6 (A_bottom + 4 A_middle + A_top), exact for a frustum of a rectangular pyramid.
 *
 * @param widthX             plan width along x, m
 * @param widthY             plan width along y, m
 * @param height             height of the block, m
 * @param depth              depth of the block's base below the ground, m
 * @param concreteUnitWeight N/m³
 * @param soilUnitWeight     N/m³
 * @param halfAngle          frustum half-angle from the vertical, rad
 */
public record FootingBlock(double widthX, double widthY, double height, double depth, double concreteUnitWeight,
                           double soilUnitWeight, double halfAngle) {

    public FootingBlock {
        if (!(widthX > 0) || !(widthY > 0) || !(height > 0) || !(depth >= 0) || !(concreteUnitWeight > 0)
                || !(soilUnitWeight >= 0) || !(halfAngle >= 0 && halfAngle < Math.PI / 2)) {
            throw new IllegalArgumentException("footing block values out of range");
        }
    }

    /** From the model file's foundation (kN/m³ → N/m³, degrees → rad). */
    public static FootingBlock of(FoundationSpec spec) {
        FoundationSpec.Block b = spec.block();
        return new FootingBlock(b.widthX(), b.widthY(), b.height(), b.depth(), spec.concreteUnitWeight() * Units.KN,
                spec.soilUnitWeight() * Units.KN, Math.toRadians(spec.frustumHalfAngle()));
    }

    /** Prismatoid volume h/6 (A1 + 4 Am + A2), m³ (areas m², h m). */
    public static double prismatoidVolume(double h, double bottomArea, double middleArea, double topArea) {
        return h / 6 * (bottomArea + 4 * middleArea + topArea);
    }

    public double concreteVolume() {
        return widthX * widthY * height;
    }

    public double concreteWeight() {
        return concreteVolume() * concreteUnitWeight;
    }

    /** Height of soil above the block's top face, m (0 when the block stands out of the ground). */
    public double soilCover() {
        return Math.max(0, depth - height);
    }

    /** Volume of the inverted soil frustum over the block, m³. */
    public double frustumVolume() {
        double h = soilCover();
        double spread = h * Math.tan(halfAngle);
        double bottom = widthX * widthY;
        double middle = (widthX + spread) * (widthY + spread);
        double top = (widthX + 2 * spread) * (widthY + 2 * spread);
        return prismatoidVolume(h, bottom, middle, top);
    }

    public double frustumWeight() {
        return frustumVolume() * soilUnitWeight;
    }

    /** Weight of the soil standing directly on the block (a prism, no spread), N. */
    public double soilOnBlockWeight() {
        return widthX * widthY * soilCover() * soilUnitWeight;
    }

    public double baseArea() {
        return widthX * widthY;
    }
}
