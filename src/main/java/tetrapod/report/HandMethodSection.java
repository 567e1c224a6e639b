package tetrapod.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.ToDoubleFunction;
import tetrapod.report.Rows.HandCase;
import tetrapod.report.Rows.HandRow;
import tetrapod.report.Table.Cell;

/** The hand method (N/4 ± M/lever) beside the analysis, with the reasons they differ in plain words. */
final class HandMethodSection implements Section {

    @Override
    public String id() {
        return "hand-method";
    }

    @Override
    public String title() {
        return "Hand method beside the analysis";
    }

    @Override
    public void write(Html out, ReportInput ri) {
        Results r = ri.results();
        Optional<HandCase> compression = r.handCase("compression");
        Optional<HandCase> uplift = r.handCase("uplift");
        if (compression.isEmpty() || uplift.isEmpty()) {
            out.p("No comparison: the hand method needs a generated tower with wind (an explicit frame has no base "
                    + "width to split the moment over).");
            return;
        }
        out.p("The hand method treats the four legs as a rigid group: they share the total vertical load N equally "
                + "and resist the overturning moment M about the base centre as a couple, so the most loaded leg "
                + "carries N/4 + M/lever and the most lifted one M/lever − N/4. The lever is d = √(bx² + by²) for wind "
                + "along the base diagonal and 2b for wind normal to a face; for any azimuth θ the moment is split "
                + "as M (|cos θ|/(2 bx) + |sin θ|/(2 by)). The analysis takes the same loads through the 3D frame.");
        HandCase c = compression.get();
        HandCase u = uplift.get();
        out.p("Each quantity is compared in the combination that governs it: compression in " + c.combination()
                + ", the combination of the analysis' largest leg compression (" + Format.kN(c.fe()) + " kN at "
                + Format.degrees(c.azimuthDeg()) + "°); uplift in " + u.combination() + ", the combination of its "
                + "largest uplift (" + Format.kN(u.fe()) + " kN at " + Format.degrees(u.azimuthDeg()) + "°). "
                + "results.json names both and gives every combination at every azimuth "
                + "of the sweep.");
        List<HandRow> all = r.hand();
        List<Double> reported = r.wind().stream().map(Rows.WindRow::azimuthDeg).toList();
        out.element("h3", "Compression, " + c.combination());
        table("hand-compression", all, c.combination(), reported, HandRow::handCompression, HandRow::feCompression,
                HandRow::compressionDiffPct).writeTo(out);
        out.element("h3", "Uplift, " + u.combination());
        table("hand-uplift", all, u.combination(), reported, HandRow::handUplift, HandRow::feUplift,
                HandRow::upliftDiffPct).writeTo(out);
        Charts.handComparison(r).ifPresent(f -> ReportHtml.figure(out, f));
        double worstDiff = 0;
        Double worstAt = null;
        for (HandRow h : all) {
            double d = Math.max(h.combination().equals(c.combination()) ? Math.abs(h.compressionDiffPct()) : 0,
                    h.combination().equals(u.combination()) ? Math.abs(h.upliftDiffPct()) : 0);
            if (d > worstDiff) {
                worstDiff = d;
                worstAt = h.azimuthDeg();
            }
        }
        out.element("h3", "Why the two differ");
        out.open("ul");
        for (String reason : reasons(r, worstDiff, worstAt)) {
            out.element("li", reason);
        }
        out.close("ul");
    }

    /** One combination's rows at the reported azimuths: N, M, the hand value, the analysis' value, the difference. */
    private static Table table(String id, List<HandRow> all, String combination, List<Double> reported,
                               ToDoubleFunction<HandRow> hand, ToDoubleFunction<HandRow> fe,
                               ToDoubleFunction<HandRow> diff) {
        Table t = new Table(id, "", List.of("azimuth", "N, kN", "H, kN", "z of H, m", "M, kN·m", "hand, kN",
                "analysis, kN", "difference, %"));
        for (HandRow h : all) {
            if (!h.combination().equals(combination) || (!reported.isEmpty() && !reported.contains(h.azimuthDeg()))) {
                continue;
            }
            t.row(Cell.num(Format.degrees(h.azimuthDeg()) + "°"), Cell.num(Format.kN(h.n())), Cell.num(Format.kN(h.h())),
                    Cell.num(Format.metres(h.zH())), Cell.num(Format.kNm(h.m())), Cell.num(Format.kN(hand.applyAsDouble(h))),
                    Cell.num(Format.kN(fe.applyAsDouble(h))), Cell.num(Format.fixed(diff.applyAsDouble(h), 1)));
        }
        return t;
    }

    private static List<String> reasons(Results r, double worstDiff, Double worstAt) {
        Map<String, Object> base = Tree.mapOrEmpty(r.input(), "base");
        List<String> out = new ArrayList<>();
        out.add("Load sharing through the bracing: the analysis lets the diagonals and horizontals carry shear and "
                + "pass load between the legs, and the legs' own stiffness decides their shares; the hand method "
                + "assumes the legs act alone as a rigid group. Where the bracing is stiff and the base square, the "
                + "two agree closely for wind normal to a face.");
        Double bx = Tree.numOrNull(base, "widthX");
        Double by = Tree.numOrNull(base, "widthY");
        if (bx != null && by != null && Math.abs(bx - by) > 1e-9) {
            out.add("Rectangular plan (" + InputTables.plain(bx) + " m × " + InputTables.plain(by) + " m): the hand "
                    + "method takes fixed levers (2 bx, 2 by, and a linear split between them for oblique wind); in the "
                    + "frame the two pairs of faces differ in width, bracing angle and stiffness and share the shear "
                    + "and the moment by stiffness, not by that rule, so the two can differ even for wind along a face.");
        } else {
            out.add("Square plan: the hand method's levers are exact for wind normal to a face and along a diagonal; "
                    + "between them, the frame's distribution is not the hand method's linear split.");
        }
        List<Map<String, Object>> ancillaries = Tree.maps(Tree.mapOrEmpty(r.input(), "loads"), "ancillaries");
        boolean eccentric = ancillaries.stream().anyMatch(a -> a.get("face") != null);
        out.add(eccentric
                ? "Eccentric ancillaries: items fixed to one face load the two legs of that face only, so the legs are "
                        + "not loaded symmetrically; the hand method puts all load through the tower's centre."
                : "Ancillaries (if any) are spread over the four legs, as the hand method assumes; an item on one face "
                        + "would load that face's legs more.");
        out.add("Wind incidence: for oblique wind the hand method shares the moment between the two lever arms by "
                + "the rule above, while in the frame the wind meets two faces at once and the shear flows through both "
                + "pairs of faces' bracing; each panel's force also enters the legs at its own height, where the hand "
                + "method knows only the resultant H at its height zH (the same base moment, none of the local effects).");
        if (worstAt != null) {
            out.add("Here the largest difference is " + Format.fixed(worstDiff, 1) + " % at " + Format.degrees(worstAt)
                    + "°. A large difference is a prompt to look at that azimuth, not in itself an error.");
        }
        return out;
    }
}
