package tetrapod.report;

import java.util.List;
import tetrapod.report.Rows.FootingCheck;
import tetrapod.report.Rows.FootingRow;
import tetrapod.report.Table.Cell;

/** The footing and anchor-rod checks: each kind where it governs (every leg base is in the appendix). */
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
        out.p("Each leg stands on a concrete block (input, check settings). For every kind of check, the leg base "
                + "where it governs, over every combination and azimuth; appendix D gives every leg base. "
                + "Allowable-stress rules (a factor of safety, an allowable bearing pressure, allowable rod stresses, "
                + "sliding) take the unfactored service reactions of the 'service: ...' combinations; partial-factor "
                + "rules (EN 1997-1 UPL, EN 1993-1-8 rods) the factored ones.");
        Table t = new Table("foundation-table", "", List.of("check", "leg base node", "utilisation", "clause",
                "reactions", "case", "values that decided it"));
        java.util.Map<String, FootingCheck> worst = new java.util.LinkedHashMap<>();
        java.util.Map<String, Integer> where = new java.util.HashMap<>();
        for (FootingRow f : footings) {
            for (FootingCheck c : f.checks()) {
                FootingCheck w = worst.get(c.name());
                if (w == null || c.utilisation() > w.utilisation()) {
                    worst.put(c.name(), c);
                    where.put(c.name(), f.node());
                }
            }
        }
        worst.forEach((name, c) -> t.row(Cell.of(Words.of(name)), Cell.num(Integer.toString(where.get(name))),
                Cell.utilisation(c.utilisation(), ""), Cell.of(Recalled.strip(c.clause())), Cell.of(c.reactions()),
                Cell.caseId(c.caseId()), Cell.of(Recalled.strip(c.note()))));
        t.writeTo(out);
        double volume = footings.stream().mapToDouble(FootingRow::concreteVolumeRequired).max().orElse(0);
        out.p("Concrete volume whose weight alone would balance the governing uplift with the model's margin: "
                + Format.fixed(volume, 2) + " m³ per leg.");
    }
}
