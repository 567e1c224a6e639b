package tetrapod.report;

import java.util.List;
import tetrapod.report.Rows.FootingCheck;
import tetrapod.report.Rows.FootingRow;
import tetrapod.report.Table.Cell;

/** Each leg base's footing and anchor-rod checks. */
final class FoundationsSection implements Section {

    @Override
    public String id() {
        return "foundations";
    }

    @Override
    public String title() {
        return "Foundations";
    }

    @Override
    public void write(Html out, ReportInput ri) {
        Results r = ri.results();
        List<FootingRow> footings = r.foundations();
        if (footings.isEmpty()) {
            out.p("Not checked: the model file gives no checks.foundation. The leg base reactions in the summary are "
                    + "what a footing must carry.");
            return;
        }
        out.p("Each leg stands on a concrete block (input, check settings). For every leg base and every kind of "
                + "check, the governing case over every combination and azimuth. Allowable-stress rules (a factor of "
                + "safety, an allowable bearing pressure, allowable rod stresses, sliding) take the unfactored service "
                + "reactions of the 'service: ...' combinations; partial-factor rules (EN 1997-1 UPL, EN 1993-1-8 rods) "
                + "the factored ones.");
        Table t = new Table("foundation-table", "", List.of("node", "check", "utilisation", "clause", "reactions", "case",
                "note"));
        for (FootingRow f : footings) {
            for (FootingCheck c : f.checks()) {
                t.row(Cell.num(Integer.toString(f.node())), Cell.of(c.name()), Cell.utilisation(c.utilisation(), ""),
                        Cell.of(c.clause()), Cell.of(c.reactions()), Cell.caseId((c.caseId())), Cell.of(c.note()));
            }
        }
        t.writeTo(out);
        double volume = footings.stream().mapToDouble(FootingRow::concreteVolumeRequired).max().orElse(0);
        out.p("Concrete volume whose weight alone would balance the governing uplift with the model's margin: "
                + Format.fixed(volume, 2) + " m³ per leg.");
    }
}
