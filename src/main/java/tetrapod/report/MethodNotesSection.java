package tetrapod.report;

import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import tetrapod.report.Rows.CheckRow;
import tetrapod.report.Rows.FootingCheck;
import tetrapod.report.Rows.FootingRow;
import tetrapod.report.Table.Cell;

/** How the numbers were found: the analysis, the loads, and every clause the checks used. */
final class MethodNotesSection implements Section {

    @Override
    public String id() {
        return "method-notes";
    }

    @Override
    public String title() {
        return "Method notes";
    }

    private static String idealisation(String name) {
        return switch (name) {
            case "truss" -> "pin-jointed members carrying axial force only";
            case "frame" -> "every member a beam-column with rigid joints";
            default -> "legs continuous beam-columns through every leg node, all other members pin-ended";
        };
    }

    @Override
    public void write(Html out, ReportInput ri) {
        Results r = ri.results();
        Map<String, Object> in = r.input();
        out.element("h3", "Analysis");
        out.p("Linear elastic, first-order, small-displacement analysis of the 3D " + r.idealisation() + " model ("
                + idealisation(r.idealisation()) + "). The stiffness matrix is assembled and "
                + "factorised once; every combination at every azimuth of the sweep is formed by superposing the "
                + "responses to a few load vectors that do not depend on the azimuth (exact, not an approximation), "
                + "and the cases reported in full are solved directly. Second-order effects, buckling of the tower "
                + "as a whole and dynamic response are not analysed.");
        out.p(String.format(java.util.Locale.ROOT, "Every load reaches the supports: %d direction%s in which the "
                + "lattice model has no stiffness (listed in results.json) %s held by the solver, and an analysis in "
                + "which such a restraint carries more than 1e-6 of a case's total load stops as an unstable structure. "
                + "The largest force any of them carried here is %.1e N (round-off). Equilibrium is checked on the "
                + "applied loads against the support reactions alone.", r.autoRestraintCount(),
                r.autoRestraintCount() == 1 ? "" : "s", r.autoRestraintCount() == 1 ? "is" : "are",
                r.largestAutoRestraintForce()));
        out.element("h3", "Loads");
        Map<String, Object> wind = Tree.mapOrEmpty(Tree.mapOrEmpty(in, "loads"), "wind");
        out.p("Self-weight: each member's mass per metre × length × g × (1 + connection allowance), half to each end. "
                + (wind.isEmpty() ? "No wind." : "Wind: " + WindSection.methodName(Tree.str(wind, "method")) + "; "
                + "formulas, clauses and Tetrapod's own rules (the force at any azimuth, the distribution to the "
                + "nodes) are listed in Tetrapod's method notes."));
        out.element("h3", "Clauses used by the checks");
        Map<String, int[]> members = new TreeMap<>();
        Map<String, String> modes = new TreeMap<>();
        for (CheckRow c : r.checks()) {
            String clause = Recalled.strip(c.clause());
            members.computeIfAbsent(clause, k -> new int[1])[0]++;
            modes.merge(clause, Words.of(c.mode()), (a, b) -> a.contains(b) ? a : a + ", " + b);
        }
        for (FootingRow f : r.foundations()) {
            for (FootingCheck c : f.checks()) {
                String clause = Recalled.strip(c.clause());
                members.computeIfAbsent(clause, k -> new int[1])[0]++;
                modes.merge(clause, "footing " + Words.of(c.name()), (a, b) -> a.contains(b) ? a : a + ", " + b);
            }
        }
        Table t = new Table("clauses", "Each clause that governs at least one member or footing check; the "
                + "formula of each is in Tetrapod's method notes, under checks.", List.of("clause", "checks", "members and footing "
                + "checks it governs"));
        members.forEach((clause, n) -> t.row(Cell.of(clause), Cell.of(modes.get(clause)),
                Cell.num(Integer.toString(n[0]))));
        t.writeTo(out);
        Map<String, Object> checks = Tree.mapOrEmpty(in, "checks");
        String method = Tree.str(checks, "method");
        out.p("asce10".equals(method)
                ? "Member and bolt checks: ASCE 10 design stresses at factored loads."
                : "Member and bolt checks: EN 1993-1-1, EN 1993-1-8 and EN 1993-3-1 with the partial factors listed "
                        + "in the input.");
        out.p("The values that rest on no published source are listed, each once, in the next section.");
    }
}
