package tetrapod.generate;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.TreeSet;
import tetrapod.common.Problem;
import tetrapod.model.spec.Horizontals;
import tetrapod.model.spec.SegmentSpec;
import tetrapod.model.spec.TowerSpec;

/**
 * The panel levels of a generated tower, bottom to top, with the leg spacings at each, and the
 * panels between consecutive levels. Built from a spec that passed {@link GeometryChecks}.
 *
 * @param levels     every panel level, index 0 at z = 0; a segment boundary is one level
 * @param panels     every panel bottom to top, numbered 1.. over the whole tower
 * @param segments   each segment's z range, widths and horizontals rule
 * @param planLevels indexes of the levels carrying plan bracing, ascending
 */
record LevelPlan(List<Level> levels, List<PanelSlot> panels, List<SegmentSpan> segments, List<Integer> planLevels) {

    /** A plan bracing level must be a panel level within this, m. */
    static final double LEVEL_MATCH_TOLERANCE = 1e-3;

    LevelPlan {
        levels = List.copyOf(levels);
        panels = List.copyOf(panels);
        segments = List.copyOf(segments);
        planLevels = List.copyOf(planLevels);
    }

    /**
     * A panel level. Segments are 0-based here (index into the spec), panels 1-based within their
     * segment; below/above are -1 at the base/top of the tower.
     */
    record Level(int index, double z, double widthX, double widthY,
                 int segmentBelow, int panelBelow, int segmentAbove, int panelAbove) {
        boolean isSegmentBoundary() {
            return segmentBelow != segmentAbove;
        }
    }

    /** A panel: {@code segment} 0-based, {@code panelInSegment} 1-based, {@code number} 1-based in the tower. */
    record PanelSlot(int number, int segment, int panelInSegment, int bottomLevel, int topLevel) { }

    record SegmentSpan(double zBottom, double zTop, double bottomWidthX, double bottomWidthY,
                       double topWidthX, double topWidthY, Horizontals horizontals) {
        double fraction(double z) {
            return (z - zBottom) / (zTop - zBottom);
        }
    }

    /** The segment (0-based) and panel in it (1-based) a member at a level is counted in. */
    record Owner(int segment, int panel) { }

    static LevelPlan of(TowerSpec spec, List<Problem> problems) {
        List<Level> levels = new ArrayList<>();
        List<PanelSlot> panels = new ArrayList<>();
        List<SegmentSpan> spans = new ArrayList<>();
        double zBottom = 0;
        double wx = spec.base().widthX();
        double wy = spec.base().widthY();
        levels.add(new Level(0, 0.0, wx, wy, -1, -1, 0, 1));
        for (int s = 0; s < spec.segments().size(); s++) {
            SegmentSpec seg = spec.segments().get(s);
            double zTop = zBottom + seg.height();
            SegmentSpan span = new SegmentSpan(zBottom, zTop, wx, wy, seg.topWidthX(), seg.topWidthY(), seg.horizontals());
            spans.add(span);
            double[] heights = panelHeights(seg);
            double z = zBottom;
            for (int p = 1; p <= seg.panels(); p++) {
                z = p == seg.panels() ? zTop : z + heights[p - 1];
                int index = levels.size();
                double f = span.fraction(z);
                boolean top = p == seg.panels();
                boolean lastSegment = s == spec.segments().size() - 1;
                int above = top ? (lastSegment ? -1 : s + 1) : s;
                int panelAbove = above < 0 ? -1 : (top ? 1 : p + 1);
                double levelWidthX = top ? seg.topWidthX() : wx + (seg.topWidthX() - wx) * f;
                double levelWidthY = top ? seg.topWidthY() : wy + (seg.topWidthY() - wy) * f;
                levels.add(new Level(index, z, levelWidthX, levelWidthY, s, p, above, panelAbove));
                panels.add(new PanelSlot(panels.size() + 1, s, p, index - 1, index));
            }
            zBottom = zTop;
            wx = seg.topWidthX();
            wy = seg.topWidthY();
        }
        return new LevelPlan(levels, panels, spans, matchPlanLevels(spec.planBracingLevels(), levels, problems));
    }

    private static double[] panelHeights(SegmentSpec seg) {
        double[] heights = new double[seg.panels()];
        for (int p = 0; p < heights.length; p++) {
            heights[p] = seg.panelHeights().isEmpty() ? seg.height() / seg.panels() : seg.panelHeights().get(p);
        }
        return heights;
    }

    private static List<Integer> matchPlanLevels(List<Double> wanted, List<Level> levels, List<Problem> problems) {
        TreeSet<Integer> found = new TreeSet<>();
        for (int k = 0; k < wanted.size(); k++) {
            String path = "planBracingLevels[" + k + "]";
            Double z = wanted.get(k);
            if (z == null || !Double.isFinite(z)) {
                problems.add(Problem.at(path, "must be a height in m, was " + z));
                continue;
            }
            Level nearest = levels.get(0);
            for (Level level : levels) {
                if (Math.abs(level.z() - z) < Math.abs(nearest.z() - z)) {
                    nearest = level;
                }
            }
            if (Math.abs(nearest.z() - z) > LEVEL_MATCH_TOLERANCE) {
                problems.add(Problem.at(path, Metres.of(z) + " is not a panel level; the nearest is "
                        + Metres.of(nearest.z())));
            } else if (!found.add(nearest.index())) {
                problems.add(Problem.at(path, "the level at " + Metres.of(nearest.z()) + " is listed twice"));
            }
        }
        return new ArrayList<>(found);
    }

    double height() {
        return levels.get(levels.size() - 1).z();
    }

    private SegmentSpan spanAt(double z) {
        for (SegmentSpan span : segments) {
            if (z <= span.zTop()) {
                return span;
            }
        }
        return segments.get(segments.size() - 1);
    }

    /** Leg spacing along x at height z (linear within each segment), m. */
    double widthXAt(double z) {
        SegmentSpan span = spanAt(z);
        return span.bottomWidthX() + (span.topWidthX() - span.bottomWidthX()) * span.fraction(z);
    }

    /** Leg spacing along y at height z (linear within each segment), m. */
    double widthYAt(double z) {
        SegmentSpan span = spanAt(z);
        return span.bottomWidthY() + (span.topWidthY() - span.bottomWidthY()) * span.fraction(z);
    }

    /**
     * Who owns the four horizontals of a level, if it has any. Inside a segment: the segment, when
     * its rule is {@code all}, counted in the panel below. At a segment boundary: the lower segment
     * when it asks ({@code all} or {@code ends}; counted in its top panel), else the upper one when
     * it asks (counted in its panel 1). At z = 0 segment 1 (panel 1) when it asks.
     */
    Optional<Owner> horizontalOwner(Level level) {
        if (!level.isSegmentBoundary()) {
            return segments.get(level.segmentBelow()).horizontals() == Horizontals.ALL
                    ? Optional.of(new Owner(level.segmentBelow(), level.panelBelow()))
                    : Optional.empty();
        }
        if (level.segmentBelow() >= 0 && segments.get(level.segmentBelow()).horizontals() != Horizontals.NONE) {
            return Optional.of(new Owner(level.segmentBelow(), level.panelBelow()));
        }
        if (level.segmentAbove() >= 0 && segments.get(level.segmentAbove()).horizontals() != Horizontals.NONE) {
            return Optional.of(new Owner(level.segmentAbove(), level.panelAbove()));
        }
        return Optional.empty();
    }

    /** Plan bracing of a level belongs to the segment and panel below it (segment 1, panel 1 at z = 0). */
    Owner planOwner(Level level) {
        return level.segmentBelow() >= 0
                ? new Owner(level.segmentBelow(), level.panelBelow())
                : new Owner(level.segmentAbove(), level.panelAbove());
    }
}
