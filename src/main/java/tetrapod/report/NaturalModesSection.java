package tetrapod.report;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Locale;
import tetrapod.report.Rows.ModeRow;
import tetrapod.report.Table.Cell;

/** The tower's lowest natural frequencies, with what each mode does. */
final class NaturalModesSection implements Section {

    @Override
    public String id() {
        return "natural-modes";
    }

    @Override
    public String title() {
        return "Natural frequencies and elastic stability";
    }

    @Override
    public void write(Html out, ReportInput ri) {
        Map<String, Object> so = Tree.mapOrEmpty(ri.results().document(), "secondOrder");
        Double alpha = Tree.numOrNull(so, "alphaCr");
        if (alpha == null) {
            out.p("Elastic critical load factor: no case solved in full can buckle the structure as a whole.");
        } else {
            String first = "Elastic critical load factor: the smallest over the first-order cases solved in full is α_cr = "
                    + Format.fixed(alpha, 1) + " (case " + Tree.str(so, "case") + "), from the geometric stiffness of the "
                    + "members' axial forces (chord rotation, P-Δ; a bracing member split at nodes only its bending holds "
                    + "taken as one line). ";
            if (!Tree.bool(so, "applied")) {
                out.p(first + "At 10 or more a first-order analysis suffices (EN 1993-1-1 5.2.1 (3)).");
            } else {
                out.p(first + "Below 10 second-order effects matter (EN 1993-1-1 5.2.1 (3)): by 5.2.2 (5)B every wind "
                        + "force is multiplied by 1/(1 − 1/α_cr) = " + Format.fixed(Tree.num(so, "amplification"), 3)
                        + " in the sweep, the checks and the cases of this report (the wind tables show the wind itself)."
                        + (Tree.bool(so, "beyondAmplification") ? " α_cr is below 3, where 5.2.2 (6)B asks for a "
                        + "second-order analysis instead: the amplification is outside its range; stiffen the tower." : ""));
            }
        }
        alphaByCombination(out, Tree.maps(ri.results().document(), "cases"));
        List<ModeRow> modes = ri.results().modes();
        if (modes.isEmpty()) {
            out.p("No natural modes were computed (nothing carries mass).");
            return;
        }
        out.p("The lowest natural modes of the analysis model (the same stiffness as the static analysis), with "
                + "the dead load's masses (steelwork with the connection allowance and the ancillaries' weight) "
                + "lumped at the leg nodes, no ice, no rotary inertia. Each mode is named by its effective modal "
                + "masses as a share of the total (x, y, z) and of the rotational inertia about the tower's axis "
                + "(twist); a mode whose shares add up to less than 5 % moves parts of the tower against each "
                + "other (a member's vibration, a distortion of the cross-section) rather than the whole tower. "
                + "The mode shapes are in results.json.");
        StringBuilder first = new StringBuilder();
        for (String kind : List.of("sway", "torsion")) {
            modes.stream().filter(m -> m.kind().equals(kind)).findFirst().ifPresent(m -> first.append(String.format(
                    Locale.ROOT, "First %s mode: %s Hz (mode %d). ", kind, Format.fixed(m.frequencyHz(), 3), m.number())));
        }
        if (!first.isEmpty()) {
            out.p(first.toString().strip());
        }
        Table t = new Table("mode-table", "", List.of("mode", "frequency, Hz", "period, s", "what it does",
                "sway direction, °", "share x", "share y", "share z", "share of twist"));
        for (ModeRow m : modes) {
            t.row(Cell.num(Integer.toString(m.number())), Cell.num(Format.fixed(m.frequencyHz(), 3)),
                    Cell.num(Format.fixed(m.periodS(), 3)), Cell.of(label(m.kind())),
                    Cell.num(m.swayDirectionDeg() == null ? "" : Format.fixed(m.swayDirectionDeg(), 0)),
                    Cell.num(Format.fixed(m.massX(), 3)), Cell.num(Format.fixed(m.massY(), 3)),
                    Cell.num(Format.fixed(m.massZ(), 3)), Cell.num(Format.fixed(m.inertiaZ(), 3)));
        }
        t.writeTo(out);
    }

    /** The smallest α_cr of each combination's cases solved in full, with the wind amplification its cases took. */
    private static void alphaByCombination(Html out, List<Map<String, Object>> cases) {
        Map<String, Map<String, Object>> least = new LinkedHashMap<>();
        for (Map<String, Object> c : cases) {
            least.merge(Tree.str(c, "combination"), c, (a, b) -> alpha(b) < alpha(a) ? b : a);
        }
        if (least.isEmpty()) {
            return;
        }
        Table t = new Table("alpha-table", "", List.of("combination", "smallest α_cr", "its case",
                "wind amplification 1/(1 − 1/α_cr)"));
        least.forEach((combination, c) -> {
            Double a = Tree.numOrNull(c, "alphaCr");
            Double amplification = Tree.numOrNull(c, "windAmplification");
            t.row(Cell.of(combination), Cell.num(a == null ? "none" : Format.fixed(a, 1)), Cell.of(Tree.str(c, "id")),
                    Cell.num(amplification == null || amplification == 1.0 ? "—" : Format.fixed(amplification, 3)));
        });
        t.writeTo(out);
    }

    private static double alpha(Map<String, Object> c) {
        Double a = Tree.numOrNull(c, "alphaCr");
        return a == null ? Double.POSITIVE_INFINITY : a;
    }

    private static String label(String kind) {
        return switch (kind) {
            case "sway" -> "sway";
            case "torsion" -> "twist about the axis";
            case "vertical" -> "vertical";
            default -> "parts against each other";
        };
    }
}
