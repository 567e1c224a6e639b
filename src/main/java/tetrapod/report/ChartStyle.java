package tetrapod.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Paint;
import java.awt.Stroke;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.StandardChartTheme;
import org.jfree.chart.renderer.xy.StandardXYBarPainter;
import org.jfree.chart.renderer.category.StandardBarPainter;

/** One look for every chart of the report: white ground, light grid, a palette that stays distinct in grey and for colour-blind readers. */
final class ChartStyle {

    /**
     * Series colours: the eight-colour palette of Okabe and Ito ("Color Universal Design", 2002),
     * blue first (hex values recalled from memory).
     */
    static final Color[] SERIES = {
        new Color(0x0072B2), new Color(0xD55E00), new Color(0x009E73), new Color(0xCC79A7),
        new Color(0xE69F00), new Color(0x56B4E9), new Color(0xF0E442), new Color(0x000000)};
    static final Color GRID = new Color(0xD9D9D9);
    static final Color TEXT = new Color(0x222222);
    static final Color LIMIT = new Color(0xB00020);
    static final Stroke LINE = new BasicStroke(2.0f);
    static final Stroke DASHED = new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
            new float[] {6f, 4f}, 0f);

    private static final String FAMILY = Font.SANS_SERIF;

    private ChartStyle() { }

    /**
     * The colour of a role (its name in results.json, or in words) in every chart: the one the 3D
     * picture gives it ({@link tetrapod.model.RoleColours}).
     */
    static Color role(String role) {
        for (tetrapod.model.Role r : tetrapod.model.Role.values()) {
            if (r.jsonName().equals(role)) {
                return new Color(tetrapod.model.RoleColours.rgb(r));
            }
        }
        throw new IllegalArgumentException("no role '" + role + "'");
    }

    static Paint series(int k) {
        return SERIES[k % SERIES.length];
    }

    /** Applies the look to a chart made by a {@code ChartFactory} method. */
    static JFreeChart apply(JFreeChart chart) {
        StandardChartTheme theme = new StandardChartTheme("tetrapod");
        theme.setExtraLargeFont(new Font(FAMILY, Font.BOLD, 15));
        theme.setLargeFont(new Font(FAMILY, Font.PLAIN, 13));
        theme.setRegularFont(new Font(FAMILY, Font.PLAIN, 12));
        theme.setSmallFont(new Font(FAMILY, Font.PLAIN, 11));
        theme.setChartBackgroundPaint(Color.WHITE);
        theme.setPlotBackgroundPaint(Color.WHITE);
        theme.setPlotOutlinePaint(GRID);
        theme.setDomainGridlinePaint(GRID);
        theme.setRangeGridlinePaint(GRID);
        theme.setAxisLabelPaint(TEXT);
        theme.setTickLabelPaint(TEXT);
        theme.setTitlePaint(TEXT);
        theme.setLegendItemPaint(TEXT);
        theme.setLegendBackgroundPaint(Color.WHITE);
        theme.setXYBarPainter(new StandardXYBarPainter());
        theme.setBarPainter(new StandardBarPainter());
        theme.setShadowVisible(false);
        theme.apply(chart);
        chart.setAntiAlias(true);
        chart.setTextAntiAlias(true);
        return chart;
    }
}
