package tetrapod.report;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import tetrapod.report.Rows.RequirementRow;
import tetrapod.report.Table.Cell;

/**
 * The rules that do not depend on the load (slenderness limits, bolt end/edge distances and
 * spacing, width-to-thickness limits), apart from the utilisation: per rule, how many members it
 * applies to, how many break it and the largest ratio; the members that break one are in the appendix.
 */
final class RequirementsSection implements Section {

    @Override
    public String id() {
        return "requirements";
    }

    @Override
    public String title() {
        return "Requirements";
    }

    @Override
    public void write(Html out, ReportInput ri) {
        Results r = ri.results();
        List<RequirementRow> all = r.requirements();
        List<RequirementRow> broken = r.requirementsNotMet();
        out.p("Rules of the check method that do not depend on the load, each as the member's value over the rule's "
                + "limit (above 1.000: not met). They are not part of the utilisation; a member that breaks one needs "
                + "another section or detail whatever its forces. requirements.csv lists every member and rule.");
        out.element("p", "id=\"requirements-verdict\"", RequirementsVerdict.text(broken));
        Map<String, int[]> counts = new LinkedHashMap<>();
        Map<String, RequirementRow> worst = new LinkedHashMap<>();
        for (RequirementRow q : all) {
            int[] c = counts.computeIfAbsent(q.ruleLabel(), k -> new int[2]);
            c[0]++;
            c[1] += q.met() ? 0 : 1;
            RequirementRow w = worst.get(q.ruleLabel());
            if (w == null || q.ratio() > w.ratio()) {
                worst.put(q.ruleLabel(), q);
            }
        }
        Table summary = new Table("requirement-rules", "", List.of("rule", "members", "not met", "largest ratio",
                "member", "clause"));
        counts.forEach((rule, c) -> {
            RequirementRow w = worst.get(rule);
            summary.row(Cell.of(rule), Cell.num(Integer.toString(c[0])), Cell.num(Integer.toString(c[1])),
                    Cell.utilisation(w.ratio(), ""), Cell.num(Integer.toString(w.member())), Cell.of(Recalled.strip(w.clause())));
        });
        summary.writeTo(out);
        if (!broken.isEmpty()) {
            out.p("Appendix B lists every member that breaks a requirement, with the values that decided it.");
        }
    }
}
