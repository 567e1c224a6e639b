package tetrapod.view;

import java.util.List;
import java.util.Locale;
import tetrapod.model.Restraint;
import tetrapod.model.Vec3;

/** The ground grid, the axes, the wind dial and arrow, and the support marks. */
final class GroundDecorations {

    static final Rgb GRID = Rgb.hex(0xD9DCDF);
    static final Rgb DIAL = Rgb.hex(0xA9B4BC);
    static final Rgb WIND = Rgb.hex(0x0E7C86);
    static final Rgb SUPPORT = Rgb.hex(0x4A4A4A);
    static final Rgb AXIS_X = Rgb.hex(0xC8553D);
    static final Rgb AXIS_Y = Rgb.hex(0x3C9A5F);
    static final Rgb AXIS_Z = Rgb.hex(0x3A6FC4);

    private GroundDecorations() { }

    /** A square grid on z = 0 about {@code centre}, at least {@code halfSize} m each way, in round steps. */
    static void grid(SegmentInstances.Builder out, Vec3 centre, double halfSize) {
        double step = roundStep(halfSize / 5);
        int n = (int) Math.ceil(halfSize / step);
        double cx = Math.round(centre.x() / step) * step;
        double cy = Math.round(centre.y() / step) * step;
        double h = n * step;
        for (int k = -n; k <= n; k++) {
            double o = k * step;
            out.add(new Vec3(cx + o, cy - h, 0), new Vec3(cx + o, cy + h, 0), GRID, 1.0, 1.0, false);
            out.add(new Vec3(cx - h, cy + o, 0), new Vec3(cx + h, cy + o, 0), GRID, 1.0, 1.0, false);
        }
    }

    /** 1, 2 or 5 × 10^k, the nearest at or above {@code x}. */
    static double roundStep(double x) {
        double p = Math.pow(10, Math.floor(Math.log10(x)));
        for (double m : new double[] {1, 2, 5, 10}) {
            if (m * p >= x * (1 - 1e-9)) {
                return m * p;
            }
        }
        return 10 * p;
    }

    /**
     * The directions of the x, y, z axes as arrows {@code length} m long from {@code at} (a corner of
     * the grid, where the tower does not hide them), with their labels.
     */
    static void axes(SegmentInstances.Builder out, List<SceneLabel> labels, Vec3 at, double length) {
        double head = 0.25 * length;
        Vec3[] tips = {at.plus(Vec3.X.times(length)), at.plus(Vec3.Y.times(length)), at.plus(Vec3.Z.times(length))};
        Rgb[] colours = {AXIS_X, AXIS_Y, AXIS_Z};
        String[] names = {"x", "y", "z"};
        for (int k = 0; k < 3; k++) {
            ArrowGlyphs.add(out, at, tips[k], colours[k], head);
            labels.add(new SceneLabel(names[k], LabelStyle.AXIS,
                    new LabelAnchor.AtPoint(at.lerp(tips[k], 1.12), 0, 0, LabelAnchor.Align.CENTRE)));
        }
    }

    /**
     * A dial on the ground about the tower (a ring with a tick every 45 deg) and an arrow blowing
     * towards the tower from {@code azimuthDeg}'s upwind side, labelled with the azimuth.
     */
    static void wind(SegmentInstances.Builder ground, SegmentInstances.Builder out, List<SceneLabel> labels, Vec3 centre, double radius,
                     double azimuthDeg) {
        int sides = 72;
        for (int k = 0; k < sides; k++) {
            ground.add(onRing(centre, radius, 2 * Math.PI * k / sides), onRing(centre, radius, 2 * Math.PI * (k + 1) / sides),
                    DIAL, 1.4, 1.4, true);
        }
        for (int k = 0; k < 8; k++) {
            double a = Math.PI / 4 * k;
            ground.add(onRing(centre, radius, a), onRing(centre, radius * (k % 2 == 0 ? 1.12 : 1.06), a), DIAL, 1.4,
                    1.4, false);
        }
        double a = Math.toRadians(azimuthDeg);
        Vec3 tail = onRing(centre, radius * 2.0, a + Math.PI);
        Vec3 tip = onRing(centre, radius * 1.15, a + Math.PI);
        ArrowGlyphs.add(out, tail, tip, WIND, 0.3 * radius);
        labels.add(new SceneLabel(String.format(Locale.ROOT, "wind %.0f°", Angles.normaliseDeg(azimuthDeg)),
                LabelStyle.WIND, new LabelAnchor.AtPoint(tail, 0, 16, LabelAnchor.Align.CENTRE)));
    }

    /** The point at angle {@code a} (radians from +x towards +y) on a ring on z = 0. */
    static Vec3 onRing(Vec3 centre, double radius, double a) {
        return new Vec3(centre.x() + radius * Math.cos(a), centre.y() + radius * Math.sin(a), 0);
    }

    /** A support mark under a node: a triangle pointing at it, and a base slab when rotations are held too. */
    static void support(SegmentInstances.Builder out, Vec3 node, Restraint restraint, double height) {
        Vec3 base = node.minus(Vec3.Z.times(height));
        out.add(base, node, SUPPORT, 16, 0, false);
        if (restraint.rx() && restraint.ry()) {
            out.add(base, base.minus(Vec3.Z.times(0.3 * height)), SUPPORT, 24, 24, false);
        }
    }
}
