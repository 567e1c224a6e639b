package tetrapod.report;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.category.BarRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.category.DefaultCategoryDataset;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import tetrapod.report.ChartData.Point;
import tetrapod.report.Rows.AzimuthPeak;
import tetrapod.report.Rows.HandRow;

/**
 * The report's line and bar charts, drawn by JFreeChart and kept as SVG. Every axis names its
 * quantity and unit; forces are shown in kN, pressures in kPa, heights in m, azimuths in degrees.
 * A chart whose data the results do not have (no wind, an explicit frame) is empty.
 */
final class Charts {

    static final int WIDTH = 720;
    static final int HEIGHT = 430;
    /** Height of a chart of three panels side by side over height, px: short, to print in little space. */
    static final int SHORT_HEIGHT = 340;

    private Charts() { }

    /** Velocity pressure against height, a staircase over each panel, per distinct azimuth profile. */
    static Optional<Figure> pressureProfile(Results r) {
        Map<Double, List<Point>> profiles = ChartData.pressureProfiles(r.wind());
        if (profiles.isEmpty()) {
            return Optional.empty();
        }
        XYSeriesCollection data = new XYSeriesCollection();
        profiles.forEach((az, line) -> data.addSeries(series(profiles.size() == 1 ? "every azimuth"
                : "wind " + Format.degrees(az) + "°", line, 1e-3, 1)));
        JFreeChart chart = ChartFactory.createXYLineChart(null, "velocity pressure q at the panel's reference height, kPa",
                "height z, m", data, PlotOrientation.VERTICAL, profiles.size() > 1, false, false);
        style(chart);
        ((NumberAxis) chart.getXYPlot().getDomainAxis()).setAutoRangeIncludesZero(true);
        return Optional.of(Figure.draw("fig-pressure", "Velocity pressure against height: each panel's q (directional "
                + "factor included) drawn over the panel's height.", chart, WIDTH, HEIGHT));
    }

    /** The largest member utilisation at each azimuth of the sweep, with the limit 1.0. */
    static Optional<Figure> utilisationByAzimuth(Results r) {
        List<AzimuthPeak> peaks = r.utilisationByAzimuth();
        if (peaks.isEmpty()) {
            return Optional.empty();
        }
        XYSeries s = new XYSeries("largest member utilisation", false, true);
        peaks.forEach(p -> s.add(p.azimuthDeg(), p.utilisation()));
        JFreeChart chart = ChartFactory.createXYLineChart(null, "wind azimuth, degrees (0 = towards +x, 90 = towards +y)",
                "utilisation (demand / resistance)", new XYSeriesCollection(s), PlotOrientation.VERTICAL, false, false,
                false);
        style(chart);
        XYPlot plot = chart.getXYPlot();
        azimuthAxis((NumberAxis) plot.getDomainAxis());
        NumberAxis range = (NumberAxis) plot.getRangeAxis();
        range.setAutoRangeIncludesZero(true);
        double top = peaks.stream().mapToDouble(AzimuthPeak::utilisation).max().orElse(1);
        range.setRange(0, Math.max(1.1, top * 1.08));
        limit(plot, 1.0, "limit 1.0");
        return Optional.of(Figure.draw("fig-utilisation-azimuth", "The largest utilisation of any member at each "
                + "azimuth of the sweep, over every combination.", chart, WIDTH, HEIGHT));
    }

    /** Largest tension and compression of the legs against height. */
    static Optional<Figure> legAxialEnvelope(Results r) {
        List<List<Point>> lines = ChartData.legAxialEnvelope(r);
        if (lines.get(0).isEmpty()) {
            return Optional.empty();
        }
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(series("largest tension", lines.get(0), 1e-3, 1));
        data.addSeries(series("largest compression", lines.get(1), 1e-3, 1));
        JFreeChart chart = ChartFactory.createXYLineChart(null, "leg axial force N, kN (tension positive)",
                "height z, m", data, PlotOrientation.VERTICAL, true, false, false);
        style(chart);
        chart.getXYPlot().addDomainMarker(new ValueMarker(0, ChartStyle.TEXT, new java.awt.BasicStroke(1f)));
        return Optional.of(Figure.draw("fig-leg-envelope", "Leg axial force envelope: the largest tension and "
                + "compression of any leg over every case, panel by panel up the tower.", chart, WIDTH, HEIGHT));
    }

    /** How many members of each role fall into each utilisation band. */
    static Figure utilisationHistogram(Results r) {
        DefaultCategoryDataset data = new DefaultCategoryDataset();
        ChartData.histogram(r).forEach((role, counts) -> {
            for (int k = 0; k < counts.length; k++) {
                data.addValue(counts[k], role, ChartData.binLabel(k));
            }
        });
        JFreeChart chart = ChartFactory.createStackedBarChart(null, "governing utilisation (demand / resistance)",
                "number of members", data, PlotOrientation.VERTICAL, true, false, false);
        ChartStyle.apply(chart);
        CategoryPlot plot = chart.getCategoryPlot();
        BarRenderer renderer = (BarRenderer) plot.getRenderer();
        for (int k = 0; k < data.getRowCount(); k++) {
            renderer.setSeriesPaint(k, ChartStyle.role(data.getRowKey(k).toString()));
        }
        renderer.setItemMargin(0.0);
        plot.getDomainAxis().setMaximumCategoryLabelWidthRatio(1.6f);
        plot.getDomainAxis().setCategoryLabelPositions(org.jfree.chart.axis.CategoryLabelPositions.UP_45);
        ((NumberAxis) plot.getRangeAxis()).setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        return Figure.draw("fig-histogram", "Members by governing utilisation, stacked by role.", chart, WIDTH, HEIGHT);
    }

    /** Hand method and analysis leg forces against azimuth: compression and uplift each in the combination governing it. */
    static Optional<Figure> handComparison(Results r) {
        Optional<Rows.HandCase> compression = r.handCase("compression");
        Optional<Rows.HandCase> uplift = r.handCase("uplift");
        if (compression.isEmpty() || uplift.isEmpty()) {
            return Optional.empty();
        }
        String c = compression.get().combination();
        String u = uplift.get().combination();
        XYSeries handC = new XYSeries("compression, hand method", false, true);
        XYSeries feC = new XYSeries("compression, analysis", false, true);
        XYSeries handT = new XYSeries("uplift, hand method", false, true);
        XYSeries feT = new XYSeries("uplift, analysis", false, true);
        for (HandRow h : r.hand()) {
            if (h.combination().equals(c)) {
                handC.add(h.azimuthDeg(), h.handCompression() / 1e3);
                feC.add(h.azimuthDeg(), h.feCompression() / 1e3);
            }
            if (h.combination().equals(u)) {
                handT.add(h.azimuthDeg(), h.handUplift() / 1e3);
                feT.add(h.azimuthDeg(), h.feUplift() / 1e3);
            }
        }
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(handC);
        data.addSeries(feC);
        data.addSeries(handT);
        data.addSeries(feT);
        JFreeChart chart = ChartFactory.createXYLineChart(null, "wind azimuth, degrees (0 = towards +x, 90 = towards +y)",
                "largest leg base force, kN (uplift plotted positive; below 0: no leg lifts)", data, PlotOrientation.VERTICAL, true, false,
                false);
        style(chart);
        XYPlot plot = chart.getXYPlot();
        azimuthAxis((NumberAxis) plot.getDomainAxis());
        XYLineAndShapeRenderer renderer = (XYLineAndShapeRenderer) plot.getRenderer();
        renderer.setSeriesPaint(0, ChartStyle.series(0));
        renderer.setSeriesPaint(1, ChartStyle.series(0));
        renderer.setSeriesPaint(2, ChartStyle.series(1));
        renderer.setSeriesPaint(3, ChartStyle.series(1));
        renderer.setSeriesStroke(0, ChartStyle.DASHED);
        renderer.setSeriesStroke(2, ChartStyle.DASHED);
        return Optional.of(Figure.draw("fig-hand", "Leg base forces against azimuth, compression in " + c + ", uplift in "
                + u + ": the hand method (dashed) beside the analysis (solid).", chart, WIDTH, HEIGHT));
    }

    /**
     * Sway, tilt and twist against height under the serviceability combination, side by side on one
     * height axis: the levels' envelope (line), the ancillaries (points), and the limits in the limit
     * colour (the levels' as a dashed line, the ancillaries' as crosses).
     */
    static Optional<Figure> serviceability(Results r) {
        List<Rows.ServiceRow> rows = r.serviceability();
        if (rows.isEmpty()) {
            return Optional.empty();
        }
        NumberAxis height = new NumberAxis("height z, m");
        height.setAutoRangeIncludesZero(true);
        org.jfree.chart.plot.CombinedRangeXYPlot plot = new org.jfree.chart.plot.CombinedRangeXYPlot(height);
        plot.setGap(14);
        String[][] panels = {{"sway", "sway, mm"}, {"tilt", "tilt, degrees"}, {"twist", "twist, degrees"}};
        List<XYPlot> subplots = new java.util.ArrayList<>();
        for (String[] panel : panels) {
            List<List<Point>> lines = ChartData.movementLines(rows, panel[0]);
            XYSeriesCollection data = new XYSeriesCollection();
            data.addSeries(series("levels", lines.get(0), 1, 1));
            data.addSeries(series("ancillaries", lines.get(1), 1, 1));
            data.addSeries(series("limit of the levels", lines.get(2), 1, 1));
            data.addSeries(series("limit of an ancillary", lines.get(3), 1, 1));
            NumberAxis value = new NumberAxis(panel[1]);
            value.setAutoRangeIncludesZero(true);
            XYPlot sub = new XYPlot(data, value, null, new XYLineAndShapeRenderer());
            plot.add(sub, 1);
            subplots.add(sub);
        }
        JFreeChart chart = new JFreeChart(null, JFreeChart.DEFAULT_TITLE_FONT, plot, true);
        ChartStyle.apply(chart); // before the series' looks: the theme clears them
        for (XYPlot sub : subplots) {
            XYLineAndShapeRenderer renderer = (XYLineAndShapeRenderer) sub.getRenderer();
            renderer.setSeriesPaint(0, ChartStyle.series(0));
            renderer.setSeriesStroke(0, ChartStyle.LINE);
            renderer.setSeriesShapesVisible(0, false);
            renderer.setSeriesPaint(1, ChartStyle.series(1));
            renderer.setSeriesLinesVisible(1, false);
            renderer.setSeriesShape(1, new java.awt.geom.Ellipse2D.Double(-4, -4, 8, 8));
            renderer.setSeriesPaint(2, ChartStyle.LIMIT);
            renderer.setSeriesStroke(2, ChartStyle.DASHED);
            renderer.setSeriesShapesVisible(2, false);
            renderer.setSeriesPaint(3, ChartStyle.LIMIT);
            renderer.setSeriesLinesVisible(3, false);
            renderer.setSeriesShape(3, org.jfree.chart.util.ShapeUtils.createDiagonalCross(5, 1));
        }
        plot.setFixedLegendItems(subplots.get(0).getLegendItems());
        return Optional.of(Figure.draw("fig-serviceability", "Movement under the serviceability combination against "
                + "height, the largest over every azimuth: sway, tilt and twist of each panel level (line) and of each "
                + "ancillary (points), with the limits given (red).", chart, WIDTH, SHORT_HEIGHT));
    }

    /** Steel mass and largest utilisation at each iteration of tetrapod size (two range axes). */
    static Optional<Figure> sizingHistory(Map<String, Object> history) {
        List<Map<String, Object>> iterations = Tree.maps(history, "iterations");
        if (iterations.isEmpty()) {
            return Optional.empty();
        }
        XYSeries mass = new XYSeries("bare steel mass", false, true);
        XYSeries utilisation = new XYSeries("largest utilisation", false, true);
        for (Map<String, Object> it : iterations) {
            mass.add(Tree.integer(it, "iteration"), Tree.num(it, "steelMass"));
            utilisation.add(Tree.integer(it, "iteration"), Tree.num(it, "maxUtilisation"));
        }
        JFreeChart chart = ChartFactory.createXYLineChart(null, "iteration (analysis) of the sizing",
                "bare steel mass, kg", new XYSeriesCollection(mass), PlotOrientation.VERTICAL, true, false, false);
        style(chart);
        XYPlot plot = chart.getXYPlot();
        NumberAxis iterationAxis = (NumberAxis) plot.getDomainAxis();
        iterationAxis.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        ((NumberAxis) plot.getRangeAxis()).setAutoRangeIncludesZero(true);
        NumberAxis utilisationAxis = new NumberAxis("largest utilisation (demand / resistance)");
        utilisationAxis.setRange(0, Math.max(1.1, utilisation.getMaxY() * 1.08));
        utilisationAxis.setLabelFont(plot.getRangeAxis().getLabelFont());
        utilisationAxis.setTickLabelFont(plot.getRangeAxis().getTickLabelFont());
        plot.setRangeAxis(1, utilisationAxis);
        plot.setDataset(1, new XYSeriesCollection(utilisation));
        plot.mapDatasetToRangeAxis(1, 1);
        XYLineAndShapeRenderer second = new XYLineAndShapeRenderer(true, true);
        second.setSeriesPaint(0, ChartStyle.series(1));
        second.setSeriesStroke(0, ChartStyle.DASHED);
        plot.setRenderer(1, second);
        ((XYLineAndShapeRenderer) plot.getRenderer()).setDefaultShapesVisible(true);
        return Optional.of(Figure.draw("fig-sizing", "Sizing history: the bare steel mass (solid, left axis) and the "
                + "largest member utilisation (dashed, right axis) at each analysis of tetrapod size.", chart, WIDTH,
                HEIGHT));
    }

    private static XYSeries series(String name, List<Point> points, double xScale, double yScale) {
        XYSeries s = new XYSeries(name, false, true);
        for (Point p : points) {
            s.add(p.x() * xScale, p.y() * yScale);
        }
        return s;
    }

    private static void style(JFreeChart chart) {
        ChartStyle.apply(chart);
        XYPlot plot = chart.getXYPlot();
        XYLineAndShapeRenderer renderer = (XYLineAndShapeRenderer) plot.getRenderer();
        renderer.setDrawSeriesLineAsPath(true); // one SVG path per series, not one line per pair of points
        for (int k = 0; k < plot.getDataset().getSeriesCount(); k++) {
            renderer.setSeriesPaint(k, ChartStyle.series(k));
            renderer.setSeriesStroke(k, ChartStyle.LINE);
        }
    }

    private static void azimuthAxis(NumberAxis axis) {
        axis.setRange(0, 360);
        axis.setTickUnit(new NumberTickUnit(45));
    }

    private static void limit(XYPlot plot, double value, String label) {
        ValueMarker marker = new ValueMarker(value, ChartStyle.LIMIT, ChartStyle.DASHED);
        marker.setLabel(label);
        marker.setLabelPaint(ChartStyle.LIMIT);
        marker.setLabelAnchor(org.jfree.chart.ui.RectangleAnchor.TOP_LEFT);
        marker.setLabelTextAnchor(org.jfree.chart.ui.TextAnchor.BOTTOM_LEFT);
        plot.addRangeMarker(marker);
    }
}
