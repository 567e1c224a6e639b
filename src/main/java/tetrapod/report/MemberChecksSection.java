package tetrapod.report;

import java.util.List;
import tetrapod.report.Rows.CheckRow;
import tetrapod.report.Rows.MemberRow;
import tetrapod.report.Table.Cell;

/** Every member's governing check, largest tension and largest compression. */
final class MemberChecksSection implements Section {

    @Override
    public String id() {
        return "member-checks";
    }

    @Override
    public String title() {
        return "Member checks";
    }

    @Override
    public void write(Html out, ReportInput ri) {
        Results r = ri.results();
        out.p("For each member, over every load case: the largest tension and compression, and the check with the "
                + "largest utilisation (demand over resistance; above 1.000 fails, marked). The note gives the values "
                + "that decided the check. members.csv has the same table for spreadsheets.");
        Table t = new Table("member-table", "", List.of("member", "role", "segment", "panel", "section", "length, m",
                "max tension, kN", "max compression, kN", "utilisation", "check", "clause", "case", "note"));
        for (CheckRow c : r.checks()) {
            MemberRow m = r.member(c.member());
            t.row(Cell.num(Integer.toString(m.id())), Cell.of(m.role()), Cell.num(Integer.toString(m.segment())),
                    Cell.num(Integer.toString(m.panel())), Cell.of(m.section()), Cell.num(Format.fixed(m.length(), 3)),
                    Cell.num(Format.kN(c.maxTension().value())), Cell.num(Format.kN(c.maxCompression().value())),
                    Cell.utilisation(c.utilisation(), ""), Cell.of(c.mode()), Cell.of(c.clause()),
                    Cell.caseId((c.caseId())), Cell.of(c.note()));
        }
        out.open("div", "class=\"wide\"");
        t.writeTo(out);
        out.close("div");
    }
}
