package tetrapod.report;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import tetrapod.report.Rows.CheckRow;
import tetrapod.report.Rows.FootingCheck;
import tetrapod.report.Rows.FootingRow;
import tetrapod.report.Rows.RequirementRow;
import tetrapod.report.Table.Cell;

/**
 * The values the checks used that have no published source read while Tetrapod was written, each
 * once with the clause or rule it belongs to and the checks that used it: the tables of the
 * report give the clause alone.
 */
final class SourcesSection implements Section {

    @Override
    public String id() {
        return "sources";
    }

    @Override
    public String title() {
        return "Values without a published source";
    }

    @Override
    public void write(Html out, ReportInput ri) {
        Results r = ri.results();
        Map<Recalled.Source, Map<String, Integer>> uses = new TreeMap<>(java.util.Comparator
                .comparing(Recalled.Source::reference).thenComparing(Recalled.Source::mark));
        for (CheckRow c : r.checks()) {
            note(uses, c.clause() + " " + c.note(), Words.of(c.mode()));
        }
        for (RequirementRow q : r.requirements()) {
            note(uses, q.clause() + " " + q.note(), q.ruleLabel());
        }
        for (FootingRow f : r.foundations()) {
            for (FootingCheck c : f.checks()) {
                note(uses, c.clause() + " " + c.note(), "footing " + Words.of(c.name()));
            }
        }
        note(uses, Tree.str(r.material(), "source"), "material");
        if (uses.isEmpty()) {
            out.p("Every check of this calculation rests on a published clause.");
            return;
        }
        out.p("These values were recalled from memory of the standard or taken as common practice: no published "
                + "source could be read while Tetrapod was written. Check each against the printed standard, or "
                + "replace it by the rule that applies locally, before relying on a result it decides. The tables "
                + "of this report give the clause alone.");
        Table t = new Table("sources-table", "", List.of("clause or rule", "how the value was found", "used by",
                "times used"));
        uses.forEach((source, by) -> t.row(Cell.of(source.reference()), Cell.of(source.mark()),
                Cell.of(String.join(", ", by.keySet())), Cell.num(Integer.toString(by.values().stream()
                        .mapToInt(Integer::intValue).sum()))));
        t.writeTo(out);
    }

    private static void note(Map<Recalled.Source, Map<String, Integer>> uses, String text, String usedBy) {
        for (Recalled.Source s : Recalled.find(text)) {
            uses.computeIfAbsent(s, k -> new LinkedHashMap<>()).merge(usedBy, 1, Integer::sum);
        }
    }
}
