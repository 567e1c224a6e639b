package tetrapod.report;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.plot.PolarPlot;
import org.jfree.chart.renderer.DefaultPolarItemRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import tetrapod.report.ChartData.Point;

/**
 * Leg base reactions against azimuth as polar plots seen from above: the angle is the wind azimuth
 * (0° to the right, towards +x; 90° up, towards +y; counter-clockwise, as the tower's plan), the
 * distance from the centre the force in kN.
 */
final class PolarCharts {

    static final int SIZE = 520;

    /** What a polar chart shows. */
    enum Kind {
        COMPRESSION("fig-polar-compression", "leg base compression, kN",
                "Largest compression of each leg base against wind azimuth, over every combination."),
        UPLIFT("fig-polar-uplift", "leg base uplift, kN",
                "Largest uplift of each leg base against wind azimuth, over every combination (0 where the leg stays in compression)."),
        SHEAR("fig-polar-shear", "leg base horizontal force, kN",
                "Largest horizontal reaction of each leg base against wind azimuth, over every combination.");

        final String id;
        final String axisLabel;
        final String caption;

        Kind(String id, String axisLabel, String caption) {
            this.id = id;
            this.axisLabel = axisLabel;
            this.caption = caption;
        }
    }

    private PolarCharts() { }

    /**
     * Radius ticks at a 1-2-2.5-5 unit, at most four of them up to the largest force, and the
     * circle half a unit beyond the last tick: the tick labels are centred on their ticks along the
     * 0° spoke, so a last tick near the circle would put its label on the "0°" azimuth label.
     */
    record RadiusTicks(double unit, double upper) {
        static RadiusTicks covering(double max) {
            if (!(max > 0)) {
                return new RadiusTicks(0.25, 1.125);
            }
            double target = max / 4;
            double decade = Math.pow(10, Math.floor(Math.log10(target)));
            double unit = 10 * decade;
            for (double m : new double[] {1, 2, 2.5, 5}) {
                if (m * decade >= target) {
                    unit = m * decade;
                    break;
                }
            }
            double last = Math.ceil(max / unit - 1e-9) * unit;
            return new RadiusTicks(unit, last + unit / 2);
        }
    }

    static Optional<Figure> legBases(Results r, Kind kind) {
        if (r.legSweeps().isEmpty()) {
            return Optional.empty();
        }
        Map<Integer, List<Point>> lines = switch (kind) {
            case COMPRESSION -> ChartData.legBaseEnvelope(r.legSweeps(), false);
            case UPLIFT -> ChartData.legBaseEnvelope(r.legSweeps(), true);
            case SHEAR -> ChartData.legBaseShear(r.legSweeps());
        };
        XYSeriesCollection data = new XYSeriesCollection();
        double max = 0;
        for (Map.Entry<Integer, List<Point>> e : lines.entrySet()) {
            XYSeries s = new XYSeries("leg base node " + e.getKey(), false, true);
            for (Point p : e.getValue()) {
                s.add(p.x(), p.y() / 1e3);
                max = Math.max(max, p.y() / 1e3);
            }
            data.addSeries(s);
        }
        JFreeChart chart = ChartFactory.createPolarChart(null, data, true, false, false);
        ChartStyle.apply(chart);
        PolarPlot plot = (PolarPlot) chart.getPlot();
        plot.setAngleOffset(0);
        plot.setCounterClockwise(true);
        plot.setAngleTickUnit(new NumberTickUnit(45));
        // the unit goes in a title above the plot: an axis label along the radius would lie on the tick labels
        NumberAxis radius = new NumberAxis(null);
        chart.addSubtitle(new org.jfree.chart.title.TextTitle(kind.axisLabel + " (distance from the centre)",
                new java.awt.Font(java.awt.Font.SANS_SERIF, java.awt.Font.PLAIN, 12)));
        RadiusTicks ticks = RadiusTicks.covering(max);
        radius.setTickUnit(new NumberTickUnit(ticks.unit()));
        radius.setRange(0, ticks.upper());
        plot.setAxis(radius);
        plot.setAngleGridlinePaint(ChartStyle.GRID);
        plot.setRadiusGridlinePaint(ChartStyle.GRID);
        DefaultPolarItemRenderer renderer = (DefaultPolarItemRenderer) plot.getRenderer();
        renderer.setShapesVisible(false);
        renderer.setConnectFirstAndLastPoint(true);
        for (int k = 0; k < data.getSeriesCount(); k++) {
            renderer.setSeriesPaint(k, ChartStyle.series(k));
            renderer.setSeriesStroke(k, ChartStyle.LINE);
        }
        return Optional.of(Figure.draw(kind.id, kind.caption, chart, SIZE, SIZE));
    }
}
