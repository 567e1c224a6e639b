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
                + "check, the governing case over every combination and azimuth.");
        Table t = new Table("foundation-table", "", List.of("node", "check", "utilisation", "clause", "case", "note"));
        for (FootingRow f : footings) {
            for (FootingCheck c : f.checks()) {
                t.row(Cell.num(Integer.toString(f.node())), Cell.of(Words.of(c.name())), Cell.utilisation(c.utilisation(), ""),
                        Cell.of(Recalled.strip(c.clause())), Cell.caseId((c.caseId())), Cell.of(Recalled.strip(c.note())));
            }
        }
        t.writeTo(out);
        double volume = footings.stream().mapToDouble(FootingRow::concreteVolumeRequired).max().orElse(0);
        out.p("Concrete volume whose weight alone would balance the governing uplift with the model's margin: "
                + Format.fixed(volume, 2) + " m³ per leg.");
    }
}
