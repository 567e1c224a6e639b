package tetrapod.generate;

import java.util.ArrayList;
import java.util.List;
import tetrapod.common.Problem;
import tetrapod.model.spec.SegmentSpec;
import tetrapod.model.spec.TowerSpec;

/** The checks a tower spec must pass before its levels can be laid out. Collects every problem. */
final class GeometryChecks {

    /** Panel heights must add up to the segment height within this, m. */
    static final double HEIGHT_SUM_TOLERANCE = 1e-3;

    private GeometryChecks() { }

    static List<Problem> check(TowerSpec spec) {
        List<Problem> problems = new ArrayList<>();
        if (spec.idealisation() == null) {
            problems.add(Problem.at("idealisation", "is required: \"continuous-legs\", \"truss\" or \"frame\""));
        }
        if (spec.supports() == null) {
            problems.add(Problem.at("supports", "is required: \"pinned\" or \"fixed\""));
        }
        if (!Double.isFinite(spec.connectionAllowance()) || spec.connectionAllowance() < 0) {
            problems.add(Problem.at("connectionAllowance",
                    "must be a fraction >= 0 (0.10 = 10 %), was " + spec.connectionAllowance()));
        }
        if (spec.base() == null) {
            problems.add(Problem.at("base", "is required for a generated tower (or give an explicit frame)"));
        } else {
            positive(problems, "base.widthX", spec.base().widthX());
            positive(problems, "base.widthY", spec.base().widthY());
        }
        if (spec.segments().isEmpty()) {
            problems.add(Problem.at("segments", "a generated tower needs at least one segment"));
        }
        for (int s = 0; s < spec.segments().size(); s++) {
            checkSegment(problems, "segments[" + s + "]", spec.segments().get(s));
        }
        return problems;
    }

    private static void checkSegment(List<Problem> problems, String path, SegmentSpec seg) {
        positive(problems, path + ".height", seg.height());
        positive(problems, path + ".topWidthX", seg.topWidthX());
        positive(problems, path + ".topWidthY", seg.topWidthY());
        if (seg.panels() < 1) {
            problems.add(Problem.at(path + ".panels", "must be at least 1, was " + seg.panels()));
        }
        if (seg.bracing() == null) {
            problems.add(Problem.at(path + ".bracing", "is required: \"x\", \"k\" or \"single\""));
        }
        if (seg.horizontals() == null) {
            problems.add(Problem.at(path + ".horizontals", "is required: \"all\", \"ends\" or \"none\""));
        }
        if (seg.redundants() < 0 || seg.redundants() > 2) {
            problems.add(Problem.at(path + ".redundants", "must be 0, 1 or 2, was " + seg.redundants()));
        }
        checkPanelHeights(problems, path, seg);
    }

    private static void checkPanelHeights(List<Problem> problems, String path, SegmentSpec seg) {
        List<Double> heights = seg.panelHeights();
        if (heights.isEmpty()) {
            return;
        }
        if (heights.size() != seg.panels()) {
            problems.add(Problem.at(path + ".panelHeights",
                    "gives " + heights.size() + " heights for " + seg.panels() + " panels"));
        }
        double sum = 0;
        boolean allValid = true;
        for (int k = 0; k < heights.size(); k++) {
            Double h = heights.get(k);
            if (h == null || !Double.isFinite(h) || h <= 0) {
                problems.add(Problem.at(path + ".panelHeights[" + k + "]", "must be > 0 m, was " + h));
                allValid = false;
            } else {
                sum += h;
            }
        }
        if (allValid && Double.isFinite(seg.height()) && Math.abs(sum - seg.height()) > HEIGHT_SUM_TOLERANCE) {
            problems.add(Problem.at(path + ".panelHeights", "sum to " + Metres.of(sum) + " but the segment is "
                    + Metres.of(seg.height()) + " high (tolerance 1 mm)"));
        }
    }

    private static void positive(List<Problem> problems, String path, double metres) {
        if (!Double.isFinite(metres) || metres <= 0) {
            problems.add(Problem.at(path, "must be > 0 m, was " + metres));
        }
    }
}
