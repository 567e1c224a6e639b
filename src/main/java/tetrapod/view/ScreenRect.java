package tetrapod.view;

/** A rectangle on the image in px, y down: from ({@code x0}, {@code y0}) inclusive to ({@code x1}, {@code y1}). */
public record ScreenRect(double x0, double y0, double x1, double y1) {

    public ScreenRect {
        if (!(x1 >= x0) || !(y1 >= y0)) {
            throw new IllegalArgumentException("rectangle corners out of order: " + x0 + ", " + y0 + " to " + x1 + ", " + y1);
        }
    }

    /** The rectangle {@code w} × {@code h} px with its top-left corner at ({@code x}, {@code y}). */
    public static ScreenRect at(double x, double y, double w, double h) {
        return new ScreenRect(x, y, x + w, y + h);
    }

    public double width() {
        return x1 - x0;
    }

    public double height() {
        return y1 - y0;
    }

    public double centreX() {
        return 0.5 * (x0 + x1);
    }

    public double centreY() {
        return 0.5 * (y0 + y1);
    }

    /** The area both rectangles cover, px². */
    public double overlapArea(ScreenRect o) {
        double w = Math.min(x1, o.x1) - Math.max(x0, o.x0);
        double h = Math.min(y1, o.y1) - Math.max(y0, o.y0);
        return w > 0 && h > 0 ? w * h : 0;
    }

    /** The shortest distance between the two rectangles, px; 0 when they touch or overlap. */
    public double gap(ScreenRect o) {
        double dx = Math.max(0, Math.max(o.x0 - x1, x0 - o.x1));
        double dy = Math.max(0, Math.max(o.y0 - y1, y0 - o.y1));
        return Math.hypot(dx, dy);
    }
}
