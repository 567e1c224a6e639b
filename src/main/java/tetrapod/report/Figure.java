package tetrapod.report;

import java.awt.Rectangle;
import java.util.Objects;
import org.jfree.chart.JFreeChart;
import org.jfree.svg.MeetOrSlice;
import org.jfree.svg.PreserveAspectRatio;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.ViewBox;

/**
 * A chart drawn as an inline SVG element, with the id the page gives it and the caption under it.
 *
 * @param id      unique in the page, e.g. {@code fig-pressure}
 * @param caption one sentence saying what the chart shows
 * @param svg     the {@code <svg>} element, scalable (a view box, no fixed size)
 */
public record Figure(String id, String caption, String svg) {

    public Figure {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(caption, "caption");
        Objects.requireNonNull(svg, "svg");
    }

    /** Draws {@code chart} on a {@code width} × {@code height} px canvas and keeps it as SVG. */
    static Figure draw(String id, String caption, JFreeChart chart, int width, int height) {
        SVGGraphics2D g2 = new SVGGraphics2D(width, height);
        // ids of clip paths and gradients: prefixed by the figure's id, so that they are unique in the
        // page and the same on every run (the library's default prefix is a clock reading)
        g2.setDefsKeyPrefix(id + "-");
        chart.draw(g2, new Rectangle(0, 0, width, height));
        String svg = g2.getSVGElement(id + "-svg", false, new ViewBox(0, 0, width, height), PreserveAspectRatio.XMID_YMID,
                MeetOrSlice.MEET);
        svg = svg.replaceFirst("<svg ", "<svg role=\"img\" aria-label=\"" + Html.escape(caption) + "\" ");
        return new Figure(id, caption, svg);
    }
}
