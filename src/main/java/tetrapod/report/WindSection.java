package tetrapod.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import tetrapod.report.Rows.PanelRow;
import tetrapod.report.Rows.WindRow;
import tetrapod.report.Table.Cell;

/** The wind: the pressure profile against height and the wind on each panel. */
final class WindSection implements Section {

    @Override
    public String id() {
        return "wind";
    }

    @Override
    public String title() {
        return "Wind";
    }

    @Override
    public void write(Html out, ReportInput ri) {
        Results r = ri.results();
        List<WindRow> wind = r.wind();
        if (wind.isEmpty()) {
            out.p("The model has no wind (an explicit frame, or no loads.wind): nothing to show here.");
            return;
        }
        Map<String, Object> w = Tree.mapOrEmpty(Tree.mapOrEmpty(r.input(), "loads"), "wind");
        out.p("Method: " + methodName(Tree.str(w, "method")) + ". Each panel takes the velocity pressure q at its "
                + "reference height (the centroid of its projected member area); its force is the response factor × q "
                + "× the force coefficient cf × the projected member area, along the wind, shared among the eight leg "
                + "nodes of the panel. Ancillaries carry their own wind (not in this table).");
        structuralFactor(out, Tree.mapOrEmpty(r.document(), "structuralFactor"));
        gustFactor(out, Tree.mapOrEmpty(r.document(), "gustFactor"));
        Charts.pressureProfile(r).ifPresent(f -> ReportHtml.figure(out, f));

        WindRow first = wind.get(0);
        List<String> header = new ArrayList<>(List.of("panel", "z bottom, m", "z top, m", "z ref, m",
                "q at " + Format.degrees(first.azimuthDeg()) + "°, kPa", "solidity", "cf", "area, m²"));
        for (WindRow row : wind) {
            header.add("F at " + Format.degrees(row.azimuthDeg()) + "°, kN");
        }
        Table t = new Table("wind-panels", "Panel geometry, pressure and coefficient for wind at "
                + Format.degrees(first.azimuthDeg()) + "°; the force on each panel at each azimuth reported in full "
                + "(wind.csv gives every value at every one of them).", header);
        for (int k = 0; k < first.panels().size(); k++) {
            PanelRow p = first.panels().get(k);
            List<Cell> cells = new ArrayList<>(List.of(Cell.num(Integer.toString(p.panel())),
                    Cell.num(Format.metres(p.zBottom())), Cell.num(Format.metres(p.zTop())),
                    Cell.num(Format.metres(p.zRef())), Cell.num(Format.kPa(p.q())), Cell.num(Format.fixed(p.solidity(), 3)),
                    Cell.num(Format.fixed(p.cf(), 3)), Cell.num(Format.fixed(p.area(), 3))));
            for (WindRow row : wind) {
                cells.add(Cell.num(Format.fixed(row.panels().get(k).force() / 1e3, 2)));
            }
            t.row(cells);
        }
        List<Cell> total = new ArrayList<>(List.of(Cell.of("total"), Cell.of(""), Cell.of(""), Cell.of(""), Cell.of(""),
                Cell.of(""), Cell.of(""), Cell.of("")));
        for (WindRow row : wind) {
            double fx = 0;
            double fy = 0;
            for (PanelRow p : row.panels()) {
                fx += p.fx();
                fy += p.fy();
            }
            total.add(Cell.num(Format.fixed(Math.hypot(fx, fy) / 1e3, 2)));
        }
        t.row(total);
        t.writeTo(out);
    }

    /**
     * The response factor c_s·c_d of an EN wind: computed with its steps, or the user's value marked as
     * such with what the computation gives beside it (EN 1991-1-4 Annex B, damping F.5).
     */
    private static void structuralFactor(Html out, Map<String, Object> f) {
        if (f.isEmpty()) {
            return;
        }
        String value = Format.fixed(Tree.num(f, "value"), 3);
        boolean given = "given".equals(Tree.str(f, "source"));
        if (!f.containsKey("computed")) {
            out.p("Structural factor c_s·c_d = " + value + ": the user's value (the model's wind gives it; not computed).");
            return;
        }
        String steps = "by EN 1991-1-4 6.3.1 (6.2) and Annex B: first sway frequency n₁ = "
                + Format.fixed(Tree.num(f, "frequencyHz"), 2) + " Hz (of the natural modes below), logarithmic decrement "
                + "δ = δ_s + δ_a = " + Format.fixed(Tree.num(f, "structuralDamping"), 3) + " + "
                + Format.fixed(Tree.num(f, "aerodynamicDamping"), 3) + " = " + Format.fixed(Tree.num(f, "logDecrement"), 3)
                + " (δ_s structural, EN 1991-1-4 Table F.2 for lattice steel towers, values recalled from memory: the "
                + "model's, else the table's lowest; "
                + "δ_a aerodynamic, F.16 with the drag and the mass of the tower weighted by its own sway mode), h = "
                + Format.metres(Tree.num(f, "height")) + " m, b = "
                + Format.metres(Tree.num(f, "width")) + " m at z_s = " + Format.metres(Tree.num(f, "referenceHeight"))
                + " m, I_v(z_s) = " + Format.fixed(Tree.num(f, "turbulenceIntensity"), 3) + ", v_m(z_s) = "
                + Format.fixed(Tree.num(f, "meanVelocity"), 1) + " m/s, L(z_s) = " + Format.fixed(Tree.num(f, "lengthScale"), 1)
                + " m, B² = " + Format.fixed(Tree.num(f, "background"), 3) + ", R² = " + Format.fixed(Tree.num(f, "resonant"), 3)
                + ", ν = " + Format.fixed(Tree.num(f, "upCrossingHz"), 3) + " Hz, k_p = "
                + Format.fixed(Tree.num(f, "peakFactor"), 2) + ".";
        if (given) {
            out.p("Structural factor c_s·c_d = " + value + ": the user's value (the model's wind gives it), used by every "
                    + "wind force; computed from the tower it would be " + Format.fixed(Tree.num(f, "computed"), 3) + ", "
                    + steps);
        } else {
            out.p("Structural factor c_s·c_d = " + value + ", computed from the tower " + steps
                    + " A structural factor given in the model's wind replaces it.");
        }
    }

    /**
     * The gust-effect factor G of an ASCE 7 wind: rigid, flexible with its steps, or the user's value
     * marked as such with what the computation gives beside it (§26.11).
     */
    private static void gustFactor(Html out, Map<String, Object> g) {
        if (g.isEmpty()) {
            return;
        }
        String value = Format.fixed(Tree.num(g, "value"), 3);
        String source = Tree.str(g, "source");
        if (!g.containsKey("computed")) {
            out.p("Gust-effect factor G = " + value + ": the user's value (the model's wind gives it; not computed).");
            return;
        }
        String computed;
        if (!Tree.bool(g, "flexible")) {
            computed = "G = " + Format.fixed(Tree.num(g, "computed"), 3) + ": the tower's first sway frequency n₁ = "
                    + Format.fixed(Tree.num(g, "frequencyHz"), 2) + " Hz is at least 1 Hz, so it is rigid and ASCE 7 "
                    + "26.11.1 permits G = 0.85.";
        } else {
            computed = "G_f = " + Format.fixed(Tree.num(g, "computed"), 3) + " of a flexible tower by ASCE 7-16 26.11.5 "
                    + "(26.11-10): n₁ = " + Format.fixed(Tree.num(g, "frequencyHz"), 2) + " Hz, damping ratio β = "
                    + Format.fixed(Tree.num(g, "dampingRatio"), 4) + " (from the model, or δ/2π of the lowest EN 1991-1-4 "
                    + "Table F.2 value for lattice steel towers, the safe side), z̄ = "
                    + Format.metres(Tree.num(g, "equivalentHeight")) + " m, I_z̄ = "
                    + Format.fixed(Tree.num(g, "turbulenceIntensity"), 3) + ", L_z̄ = "
                    + Format.fixed(Tree.num(g, "lengthScale"), 1) + " m, Q² = " + Format.fixed(Tree.num(g, "background"), 3)
                    + ", V̄_z̄ = " + Format.fixed(Tree.num(g, "meanVelocity"), 1) + " m/s, R² = "
                    + Format.fixed(Tree.num(g, "resonant"), 3) + ", g_R = " + Format.fixed(Tree.num(g, "resonantPeakFactor"), 2)
                    + ".";
        }
        if ("given".equals(source)) {
            out.p("Gust-effect factor G = " + value + ": the user's value (the model's wind gives it), used by every wind "
                    + "force; computed from the tower it would be " + computed);
        } else {
            out.p("Gust-effect factor " + computed + " A gust factor given in the model's wind replaces it.");
        }
    }

    static String methodName(String method) {
        if (method == null) {
            return "none";
        }
        return switch (method) {
            case "en1991" -> "EN 1991-1-4 velocity pressure with the force coefficients of EN 1993-3-1 Annex B";
            case "asce7" -> "ASCE 7 velocity pressure (chapter 26) with the trussed-tower force coefficients (chapter 29)";
            case "uniform" -> "a uniform pressure on the projected member area (for hand calculations)";
            default -> method;
        };
    }
}
