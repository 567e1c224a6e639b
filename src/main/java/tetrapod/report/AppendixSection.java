package tetrapod.report;

import java.util.List;
import tetrapod.report.Rows.CheckRow;
import tetrapod.report.Rows.MemberRow;
import tetrapod.report.Rows.RequirementRow;
import tetrapod.report.Table.Cell;

/**
 * The long lists, after the calculation's body, in a compact layout: every member's governing
 * check (A), every requirement not met (B), every value Tetrapod assumed (C), every leg base's
 * footing checks (D) and every panel level's movement under the serviceability wind (E). The CSV files
 * hold the same and more.
 */
final class AppendixSection implements Section {

    /** The id of the appendix element: everything before it is the body of the calculation. */
    static final String ID = "appendix";

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String title() {
        return "Appendix";
    }

    @Override
    public void write(Html out, ReportInput ri) {
        Results r = ri.results();
        out.element("h3", "A. Every member");
        out.p("Each member's largest tension and compression over every load case and its check with the largest "
                + "utilisation. members.csv has the same rows with the clause and the values that decided each check.");
        Table members = new Table("member-table", "", List.of("member", "role", "seg.", "panel", "section",
                "length, m", "max tension, kN", "max compression, kN", "utilisation", "check", "case"));
        for (CheckRow c : r.checks()) {
            MemberRow m = r.member(c.member());
            members.row(Cell.num(Integer.toString(m.id())), Cell.of(Words.of(m.role())),
                    Cell.num(Integer.toString(m.segment())), Cell.num(Integer.toString(m.panel())), Cell.of(m.section()),
                    Cell.num(Format.fixed(m.length(), 3)), Cell.num(Format.kN(c.maxTension().value())),
                    Cell.num(Format.kN(c.maxCompression().value())), Cell.utilisation(c.utilisation(), ""),
                    Cell.of(Words.of(c.mode())), Cell.caseId(c.caseId()));
        }
        compact(out, members);

        List<RequirementRow> broken = r.requirementsNotMet();
        out.element("h3", "B. Members that break a requirement");
        if (broken.isEmpty()) {
            out.p("None: every member meets every requirement of the check method.");
        } else {
            out.p("From the largest ratio down; requirements.csv lists every member and rule.");
            Table t = new Table("requirements-not-met", "", List.of("member", "role", "seg.", "section", "rule",
                    "ratio", "values"));
            for (RequirementRow q : broken) {
                MemberRow m = r.member(q.member());
                t.row(Cell.num(Integer.toString(m.id())), Cell.of(Words.of(m.role())),
                        Cell.num(Integer.toString(m.segment())), Cell.of(m.section()), Cell.of(q.ruleLabel()),
                        Cell.utilisation(q.ratio(), ""), Cell.of(Recalled.strip(q.note())));
            }
            compact(out, t);
        }

        out.element("h3", "C. Everything Tetrapod assumed");
        out.p("Each value the model file left out and Tetrapod filled in; the input tables mark the same values “default”.");
        Table assumed = new Table("input-defaults", "", List.of("where in the model file", "value assumed"));
        for (String path : r.defaults()) {
            String unit = InputUnits.of(path.substring(path.lastIndexOf('.') + 1));
            assumed.row(Cell.of(Words.path(path)), new Cell(InputTables.text(InputSection.at(r.input(), path))
                    + (unit.isEmpty() ? "" : " " + unit), InputTables.DEFAULT_MARK, ""));
        }
        if (assumed.isEmpty()) {
            assumed.row(Cell.of("(none)"), Cell.of("the model file gives every value"));
        }
        compact(out, assumed);

        if (!r.foundations().isEmpty()) {
            out.element("h3", "D. Every leg base's footing checks");
            Table feet = new Table("foundation-all", "", List.of("node", "check", "utilisation", "clause", "case"));
            for (Rows.FootingRow f : r.foundations()) {
                for (Rows.FootingCheck c : f.checks()) {
                    feet.row(Cell.num(Integer.toString(f.node())), Cell.of(Words.of(c.name())),
                            Cell.utilisation(c.utilisation(), ""), Cell.of(Recalled.strip(c.clause())),
                            Cell.caseId(c.caseId()));
                }
            }
            compact(out, feet);
        }

        List<Rows.ServiceRow> movement = r.serviceability();
        if (!movement.isEmpty()) {
            out.element("h3", "E. Every panel level's movement under the serviceability wind");
            Table levels = new Table("serviceability-levels", "", List.of("level", "height, m", "sway, mm", "tilt, °",
                    "twist, °", "limits: sway mm, tilt °, twist °", "verdict"));
            movement.stream().filter(Rows.ServiceRow::isLevel).forEach(l -> levels.row(ServiceabilitySection.row(l)));
            compact(out, levels);
        }
    }

    private static void compact(Html out, Table t) {
        out.open("div", "class=\"compact\"");
        t.writeTo(out);
        out.close("div");
    }
}
