package tetrapod.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import tetrapod.report.Rows.CheckRow;
import tetrapod.report.Rows.FootingCheck;
import tetrapod.report.Rows.FootingRow;
import tetrapod.report.Rows.LegBaseRow;
import tetrapod.report.Rows.MemberRow;
import tetrapod.report.Rows.Peak;
import tetrapod.report.Table.Cell;

/** The verdict, the most utilised members, the governing azimuths, the leg base reactions and the steel mass. */
final class SummarySection implements Section {

    static final int MOST_UTILISED = 5;

    @Override
    public String id() {
        return "summary";
    }

    @Override
    public String title() {
        return "Summary";
    }

    @Override
    public void write(Html out, ReportInput input) {
        Results r = input.results();
        double max = r.maxUtilisation();
        boolean over = max > 1.0;
        out.open("div", Html.attr("class", over ? "verdict over" : "verdict pass") + " id=\"verdict\"")
                .element("strong", over ? "OVERSTRESSED" : "All checks pass")
                .text(": the largest strength utilisation (design force effect over design resistance) of any member or footing is ")
                .element("span", "id=\"max-utilisation\"", Format.utilisation(max))
                .text(over ? " (above 1.000)." : " (at most 1.000).")
                .close("div");
        boolean broken = !r.requirementsNotMet().isEmpty();
        out.element("div", Html.attr("class", broken ? "verdict over" : "verdict pass") + " id=\"requirements-verdict-summary\"",
                RequirementsVerdict.text(r.requirementsNotMet()));
        if (!r.basisLine().isEmpty()) {
            out.p("Design basis " + r.basisLine() + ".");
        }
        for (String warning : r.basisWarnings()) {
            out.element("div", "class=\"verdict over\" id=\"basis-warning\"", "Mixed design basis (allowed by mixedBasis): "
                    + warning + ".");
        }
        boolean swept = !r.legSweeps().isEmpty();
        out.p(String.format(java.util.Locale.ROOT, "%s: %s model, %d nodes, %d members; %d load case%s solved in "
                        + "full (largest equilibrium residual of the applied loads against the support reactions alone %.1e)%s.", r.name(), r.idealisation(), r.nodeCount(),
                r.members().size(), r.caseCountInFull(), r.caseCountInFull() == 1 ? "" : "s", r.worstEquilibriumError(),
                swept ? r.sweepStepDeg().map(s -> "; every combination with wind swept round the tower in steps of "
                        + Format.degrees(s) + "°").orElse("") : "; no wind"));

        input.towerPngBase64().ifPresent(png -> out.open("figure", "class=\"picture\" id=\"fig-tower\"")
                .raw("<img alt=\"3D view of the tower, members coloured by governing utilisation\" src=\"data:image/png;base64,")
                .raw(png).raw("\">")
                .element("figcaption", "The tower in 3D, each member coloured by its governing utilisation over every "
                        + "case. The arrows at the leg bases are the forces the supports exert on each leg (vertical and "
                        + "horizontal) in the case of that leg's largest compression, as in the table of leg base reactions.")
                .close("figure"));

        out.element("h3", "Most utilised members");
        mostUtilised(r).writeTo(out);
        out.element("h3", "Governing azimuths");
        governing(r).writeTo(out);
        out.element("h3", "Leg base reactions");
        out.p("The largest force each support exerts on its leg over every case: compression when it pushes up, "
                + "uplift when it pulls down, shear the horizontal resultant.");
        reactions(r).writeTo(out);
        out.element("h3", "Steel");
        steel(r).writeTo(out);
    }

    private static Table mostUtilised(Results r) {
        Table t = new Table("most-utilised", "", List.of("member", "role", "segment", "section", "utilisation",
                "check", "clause", "case"));
        List<CheckRow> top = r.checksByUtilisation();
        for (int k = 0; k < Math.min(MOST_UTILISED, top.size()); k++) {
            CheckRow c = top.get(k);
            MemberRow m = r.member(c.member());
            t.row(Cell.num(Integer.toString(m.id())), Cell.of(m.role()), Cell.num(Integer.toString(m.segment())),
                    Cell.of(m.section()), Cell.utilisation(c.utilisation(), "top-" + (k + 1) + "-utilisation"),
                    Cell.of(Words.of(c.mode())), Cell.of(Recalled.strip(c.clause())), Cell.caseId((c.caseId())));
        }
        return t;
    }

    private static Table governing(Results r) {
        Table t = new Table("governing-azimuths", "", List.of("what governs", "value", "case", "azimuth"));
        List<CheckRow> top = r.checksByUtilisation();
        if (!top.isEmpty()) {
            CheckRow c = top.get(0);
            t.row(Cell.of("most utilised member (" + c.member() + ", " + Words.of(c.mode()) + ")"),
                    Cell.num(Format.utilisation(c.utilisation())), Cell.caseId((c.caseId())),
                    Cell.num(Format.azimuth(c.azimuthDeg())).withId("governing-member-azimuth"));
        }
        r.utilisationByAzimuth().stream().max(java.util.Comparator.comparingDouble(Rows.AzimuthPeak::utilisation))
                .ifPresent(p -> t.row(Cell.of("largest utilisation in the sweep (member " + p.member() + ")"),
                        Cell.num(Format.utilisation(p.utilisation())), Cell.of(p.combination()),
                        Cell.num(Format.azimuth(p.azimuthDeg()))));
        worstLeg(r, "largest leg base compression", LegBaseRow::compression, "compression", t);
        worstLeg(r, "largest leg base uplift", LegBaseRow::uplift, "uplift", t);
        worstLeg(r, "largest leg base shear", LegBaseRow::shear, "shear", t);
        Map<String, FootingCheck> worst = new java.util.LinkedHashMap<>();
        Map<String, Integer> where = new java.util.HashMap<>();
        for (FootingRow f : r.foundations()) {
            for (FootingCheck c : f.checks()) {
                FootingCheck old = worst.get(c.name());
                if (old == null || c.utilisation() > old.utilisation()) {
                    worst.put(c.name(), c);
                    where.put(c.name(), f.node());
                }
            }
        }
        worst.forEach((name, c) -> t.row(Cell.of("footing " + Words.of(name) + " (node " + where.get(name) + ")"),
                Cell.num(Format.utilisation(c.utilisation())), Cell.caseId((c.caseId())),
                Cell.num(Format.azimuth(c.azimuthDeg()))));
        return t;
    }

    private static void worstLeg(Results r, String label, java.util.function.Function<LegBaseRow, Peak> what,
                                 String key, Table t) {
        LegBaseRow best = null;
        for (LegBaseRow l : r.legBases()) {
            if (what.apply(l).occurs() && (best == null || what.apply(l).value() > what.apply(best).value())) {
                best = l;
            }
        }
        if (best != null) {
            Peak p = what.apply(best);
            t.row(Cell.of(label + " (node " + best.node() + ")"), Cell.num(Format.kN(p.value()) + " kN"),
                    Cell.caseId((p.caseId())), Cell.num(Format.azimuth(p.azimuthDeg()))
                            .withId("governing-" + key + "-azimuth"));
        }
    }

    private static Table reactions(Results r) {
        Table t = new Table("reactions", "", List.of("node", "x, m", "y, m", "compression, kN", "case", "uplift, kN",
                "case", "shear, kN", "case"));
        for (LegBaseRow l : r.legBases()) {
            List<Cell> row = new ArrayList<>(List.of(Cell.num(Integer.toString(l.node())), Cell.num(Format.metres(l.x())),
                    Cell.num(Format.metres(l.y()))));
            String[] keys = {"compression", "uplift", "shear"};
            Peak[] peaks = {l.compression(), l.uplift(), l.shear()};
            for (int k = 0; k < 3; k++) {
                row.add(Cell.num(peaks[k].occurs() ? Format.kN(peaks[k].value()) : "none")
                        .withId("reaction-" + l.node() + "-" + keys[k]));
                row.add(Cell.caseId((peaks[k].caseId())));
            }
            t.row(row);
        }
        return t;
    }

    private static Table steel(Results r) {
        Map<String, Object> steel = r.steel();
        Table t = new Table("steel", "", List.of("quantity", "value"));
        if (steel.isEmpty()) {
            return t;
        }
        Tree.mapOrEmpty(steel, "byRole").forEach((role, kg) -> t.row(Cell.of("bare mass of the " + Words.of(role) + " members"),
                Cell.num(Format.fixed(((Number) kg).doubleValue(), 0) + " kg")));
        t.row(Cell.of("bare steel mass"), Cell.num(Format.fixed(Tree.num(steel, "bareMass"), 0) + " kg"));
        t.row(Cell.of("total steel mass with " + Format.fixed(100 * Tree.num(steel, "connectionAllowance"), 0)
                        + " % for bolts, gussets and galvanising"),
                Cell.num(Format.fixed(Tree.num(steel, "massWithAllowance"), 0) + " kg").withId("steel-mass"));
        return t;
    }

    static String caseText(String caseId) {
        return caseId == null ? "–" : caseId;
    }
}
