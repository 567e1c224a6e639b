package tetrapod.view;

import java.util.List;
import java.util.Optional;

/**
 * Where the picked member's info box goes: at one of the window's four corners or four side
 * middles, the one that covers least of the tower's projected bounding box, then least of what is
 * already on the image (caption, legend, help, axis triad), then is farthest from the tower (gap
 * between the rectangles, then distance between their centres); always clamped inside the window.
 * Pure Java.
 */
public final class InfoBoxPlacement {

    private InfoBoxPlacement() { }

    /**
     * The box's rectangle.
     *
     * @param width  window width, px
     * @param height window height, px
     * @param boxW   box width, px
     * @param boxH   box height, px
     * @param tower  the tower's projected bounding box, px (may reach beyond the window)
     * @param taken  rectangles already drawn on the image, px
     * @param inset  distance kept from the window edges, px
     */
    public static ScreenRect place(int width, int height, double boxW, double boxH, ScreenRect tower,
                                   List<ScreenRect> taken, double inset) {
        double left = inset;
        double right = width - inset - boxW;
        double midX = (width - boxW) / 2;
        double top = inset;
        double bottom = height - inset - boxH;
        double midY = (height - boxH) / 2;
        double[][] candidates = {
            {right, bottom}, {right, top}, {left, top}, {left, bottom},
            {right, midY}, {midX, top}, {left, midY}, {midX, bottom},
        };
        ScreenRect best = null;
        double[] bestScore = null;
        for (double[] c : candidates) {
            ScreenRect r = clamped(c[0], c[1], boxW, boxH, width, height);
            double covered = 0;
            for (ScreenRect t : taken) {
                covered += r.overlapArea(t);
            }
            double[] score = {r.overlapArea(tower), covered, -r.gap(tower),
                -Math.hypot(r.centreX() - tower.centreX(), r.centreY() - tower.centreY())};
            if (bestScore == null || better(score, bestScore)) {
                best = r;
                bestScore = score;
            }
        }
        return best;
    }

    /** The bounding box of the projected end points of {@code members} in front of the eye, or empty. */
    public static Optional<ScreenRect> towerBounds(SegmentInstances members, Projector projector) {
        double[] p = new double[4];
        double x0 = Double.MAX_VALUE;
        double y0 = Double.MAX_VALUE;
        double x1 = -Double.MAX_VALUE;
        double y1 = -Double.MAX_VALUE;
        boolean any = false;
        for (int k = 0; k < members.count(); k++) {
            for (var v : new tetrapod.model.Vec3[] {members.start(k), members.end(k)}) {
                if (projector.project(v.x(), v.y(), v.z(), p)) {
                    x0 = Math.min(x0, p[0]);
                    y0 = Math.min(y0, p[1]);
                    x1 = Math.max(x1, p[0]);
                    y1 = Math.max(y1, p[1]);
                    any = true;
                }
            }
        }
        return any ? Optional.of(new ScreenRect(x0, y0, x1, y1)) : Optional.empty();
    }

    private static ScreenRect clamped(double x, double y, double w, double h, int width, int height) {
        double cx = Math.max(0, Math.min(x, width - w));
        double cy = Math.max(0, Math.min(y, height - h));
        return ScreenRect.at(cx, cy, w, h);
    }

    /** Lexicographic: smaller first entry wins, ties (within 1e-9) go to the next. */
    private static boolean better(double[] a, double[] b) {
        for (int k = 0; k < a.length; k++) {
            if (a[k] < b[k] - 1e-9) {
                return true;
            }
            if (a[k] > b[k] + 1e-9) {
                return false;
            }
        }
        return false;
    }
}
