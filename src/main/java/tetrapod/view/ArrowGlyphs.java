package tetrapod.view;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import tetrapod.model.Vec3;

/** Arrows as segment instances (a shaft and a tapering head), and the base reaction arrows. */
final class ArrowGlyphs {

    static final Rgb REACTION_COLOUR = Rgb.hex(0x1F2328);
    static final double SHAFT_WIDTH = 2.4;
    static final double HEAD_WIDTH = 11;
    /** Reactions smaller than this fraction of the largest are not drawn (they would be dots). */
    private static final double NEGLIGIBLE = 1e-4;

    private ArrowGlyphs() { }

    /** Adds an arrow from {@code tail} to {@code tip}; its head is at most {@code maxHead} long (m). */
    static void add(SegmentInstances.Builder out, Vec3 tail, Vec3 tip, Rgb colour, double maxHead) {
        double length = tail.distanceTo(tip);
        if (!(length > 0)) {
            return;
        }
        double head = Math.min(0.35 * length, maxHead);
        Vec3 neck = tip.lerp(tail, head / length);
        out.add(tail, neck, colour, SHAFT_WIDTH, SHAFT_WIDTH, false);
        out.add(neck, tip, colour, HEAD_WIDTH, 0, false);
    }

    /**
     * The reaction arrows of one case: at each support node, the vertical component and the
     * horizontal resultant, each with its tip at the node, {@code metresPerNewton} long per N.
     *
     * @param positions node id → where the node is drawn
     */
    static List<Arrow> reactions(ViewCase c, Map<Integer, Vec3> positions, double metresPerNewton,
                                 double largest) {
        List<Arrow> arrows = new ArrayList<>();
        for (NodeVector r : c.reactions()) {
            Vec3 at = positions.get(r.node());
            Vec3 f = r.vector();
            if (Math.abs(f.z()) > NEGLIGIBLE * largest) {
                Vec3 vertical = new Vec3(0, 0, f.z());
                arrows.add(new Arrow(r.node(), "Fz", at.minus(vertical.times(metresPerNewton)), at, f.z()));
            }
            Vec3 horizontal = new Vec3(f.x(), f.y(), 0);
            double h = horizontal.norm();
            if (h > NEGLIGIBLE * largest) {
                arrows.add(new Arrow(r.node(), "Fh", at.minus(horizontal.times(metresPerNewton)), at, h));
            }
        }
        return arrows;
    }

    /** Largest vertical or horizontal reaction component over all cases, N (0 when there are none). */
    static double largestReaction(ViewData data) {
        double max = 0;
        for (ViewCase c : data.cases()) {
            for (NodeVector r : c.reactions()) {
                Vec3 f = r.vector();
                max = Math.max(max, Math.max(Math.abs(f.z()), Math.hypot(f.x(), f.y())));
            }
        }
        return max;
    }

    /** "Fz = 123.4 kN" / "Fz = −12.0 kN uplift" / "Fh = 4.2 kN". */
    static String label(Arrow a) {
        double kN = a.force() / 1000;
        String text = String.format(Locale.ROOT, "%s = %.1f kN", a.component(), kN);
        return a.component().equals("Fz") && kN < 0 ? text + " uplift" : text;
    }
}
