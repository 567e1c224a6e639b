package tetrapod.report;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import tetrapod.report.Rows.CheckRow;
import tetrapod.report.Rows.MemberRow;
import tetrapod.report.Table.Cell;

/**
 * What governs the members: for each role in each segment, the member with the largest
 * utilisation and the largest tension and compression of the group. Every member is in the
 * appendix and in members.csv.
 */
final class MemberChecksSection implements Section {

    private static final List<String> ROLES = List.of("leg", "diagonal", "horizontal", "redundant", "plan");

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
        out.p("For each role in each segment, over every load case: the member whose check has the largest "
                + "utilisation (demand over resistance; above 1.000 fails, marked), the values that decided it, and "
                + "the largest tension and compression of any member of the group. Every member is listed in "
                + "appendix A and in members.csv.");
        Table t = new Table("governing-members", "", List.of("role", "segment", "sections", "members",
                "governing member", "utilisation", "check and clause", "case", "values that decided it",
                "largest tension in the group, kN", "largest compression in the group, kN"));
        for (Group g : groups(r)) {
            CheckRow c = g.governing;
            t.row(Cell.of(Words.of(g.role)), Cell.num(Integer.toString(g.segment)), Cell.of(String.join(", ", g.sections)),
                    Cell.num(Integer.toString(g.count)), Cell.num(Integer.toString(c.member())),
                    Cell.utilisation(c.utilisation(), ""),
                    Cell.of(Words.of(c.mode()) + ": " + Recalled.strip(c.clause())).withClass("clause"),
                    Cell.caseId(c.caseId()), Cell.of(Recalled.strip(c.note())).withClass("note"), Cell.num(Format.kN(g.tension)),
                    Cell.num(Format.kN(g.compression)));
        }
        out.open("div", "class=\"wide dense\"");
        t.writeTo(out);
        out.close("div");
    }

    /** The members of one role in one segment and what governs them. */
    private static final class Group {
        final String role;
        final int segment;
        final Set<String> sections = new LinkedHashSet<>();
        int count;
        CheckRow governing;
        double tension;
        double compression;

        Group(String role, int segment) {
            this.role = role;
            this.segment = segment;
        }
    }

    /** Legs first, then the bracing from the main members to the secondary ones. */
    private static int roleOrder(String role) {
        int k = ROLES.indexOf(role);
        return k < 0 ? ROLES.size() : k;
    }

    /** The groups in segment order, roles from legs to secondary members. */
    private static List<Group> groups(Results r) {
        Map<Integer, Map<String, Group>> bySegment = new TreeMap<>();
        for (CheckRow c : r.checks()) {
            MemberRow m = r.member(c.member());
            Group g = bySegment.computeIfAbsent(m.segment(), k -> new java.util.LinkedHashMap<>())
                    .computeIfAbsent(m.role(), k -> new Group(m.role(), m.segment()));
            g.sections.add(m.section());
            g.count++;
            if (g.governing == null || c.utilisation() > g.governing.utilisation()) {
                g.governing = c;
            }
            g.tension = Math.max(g.tension, c.maxTension().value());
            g.compression = Math.max(g.compression, c.maxCompression().value());
        }
        List<Group> out = new ArrayList<>();
        for (Map<String, Group> m : bySegment.values()) {
            List<Group> segment = new ArrayList<>(m.values());
            segment.sort(java.util.Comparator.comparingInt(g -> roleOrder(g.role)));
            out.addAll(segment);
        }
        return out;
    }
}
