package tetrapod.report;

import java.util.List;
import java.util.Map;
import tetrapod.report.Table.Cell;

/**
 * How {@code tetrapod size} reached this design, when the report's folder holds its
 * size-history.json: the steel mass and largest utilisation at each iteration, and each group's
 * section before and after.
 */
final class SizingSection implements Section {

    @Override
    public String id() {
        return "sizing";
    }

    @Override
    public String title() {
        return "Sizing history";
    }

    @Override
    public void write(Html out, ReportInput ri) {
        Map<String, Object> h = ri.sizingHistory().orElseThrow();
        out.p("The sections of this model were chosen by tetrapod size: for each group (a role in a segment) the "
                + "lightest catalogue section whose utilisation stays at or below the target "
                + Format.utilisation(Tree.num(h, "target")) + " in every combination at every azimuth, the model "
                + "analysed again after each change. Outcome: " + Tree.str(h, "outcome") + " ("
                + Tree.str(h, "explanation") + "). Steel mass " + Format.fixed(Tree.num(h, "massBefore"), 0)
                + " kg before, " + Format.fixed(Tree.num(h, "massAfter"), 0) + " kg after (bare). Footings and bolts "
                + "were not sized.");
        Charts.sizingHistory(h).ifPresent(f -> ReportHtml.figure(out, f));
        Table t = new Table("sizing-table", "", List.of("segment", "role", "section before", "utilisation before",
                "section after", "utilisation after", "governing check after", "case"));
        for (Map<String, Object> g : Tree.maps(h, "groups")) {
            Map<String, Object> before = Tree.map(g, "before");
            Map<String, Object> after = Tree.map(g, "after");
            t.row(Cell.num(Integer.toString(Tree.integer(g, "segment"))), Cell.of(Tree.str(g, "role")),
                    Cell.of(Tree.str(before, "section")), Cell.utilisation(Tree.num(before, "utilisation"), ""),
                    Cell.of(Tree.str(after, "section")), Cell.utilisation(Tree.num(after, "utilisation"), ""),
                    Cell.of(Tree.str(after, "mode")), Cell.caseId(Tree.str(after, "case")));
        }
        t.writeTo(out);
    }
}
