package tetrapod.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import tetrapod.report.Rows.CombinationRow;
import tetrapod.report.Rows.IceRow;
import tetrapod.report.Rows.MemberRow;
import tetrapod.report.Table.Cell;

/**
 * The model as read: geometry, sections, material, wind, combinations and check settings; every
 * value Tetrapod filled in because the model file left it out is marked "default".
 */
final class InputSection implements Section {

    @Override
    public String id() {
        return "input";
    }

    @Override
    public String title() {
        return "Input and assumptions";
    }

    @Override
    public void write(Html out, ReportInput ri) {
        Results r = ri.results();
        Map<String, Object> in = r.input();
        out.p("The model file as Tetrapod read it. Values marked “default” were not in the file: Tetrapod assumed "
                + "them (appendix C lists each with where it belongs in the file). Units are those "
                + "of the model file: m, kN, kPa, MPa, m/s.");
        out.element("h3", "General");
        Table general = new Table("input-general", "", List.of("key", "value", "unit", "given or assumed"));
        for (String key : List.of("name", "description", "idealisation", "supports", "connectionAllowance")) {
            if (in.containsKey(key)) {
                general.row(Cell.of(Words.of(key)), Cell.of(InputTables.text(in.get(key))), Cell.of(InputUnits.of(key)),
                        InputTables.origin(r.isDefault("$." + key)));
            }
        }
        general.writeTo(out);

        out.element("h3", "Geometry");
        if (in.containsKey("segments")) {
            geometry(r, in).writeTo(out);
        } else {
            out.p("An explicit frame: " + r.nodeCount() + " nodes and " + r.members().size() + " members given node "
                    + "by node in the model file (results.json lists them).");
        }
        out.element("h3", "Sections");
        sections(r).writeTo(out);
        out.element("h3", "Material");
        material(r).writeTo(out);

        Map<String, Object> loads = Tree.mapOrEmpty(in, "loads");
        out.element("h3", "Loads");
        if (loads.isEmpty()) {
            out.p("The model file gives no loads.");
        } else {
            for (String key : List.of("wind", "ice", "nodal")) {
                if (loads.containsKey(key)) {
                    out.element("h4", key.equals("nodal") ? "nodal loads" : key);
                    InputTables.write(out, "input-" + key, r, loads.get(key), "$.loads." + key);
                }
                if (key.equals("ice")) {
                    r.ice().ifPresent(ice -> out.p(designIce(ice)));
                }
            }
            if (loads.containsKey("ancillaries")) {
                out.element("h4", "ancillaries");
                InputTables.write(out, "input-ancillaries", r, loads.get("ancillaries"), "$.loads.ancillaries");
            }
            if (loads.containsKey("sweepStep")) {
                out.p("Wind swept round the tower in steps of " + InputTables.text(loads.get("sweepStep")) + "°"
                        + (r.isDefault("$.loads.sweepStep") ? " (default)." : "."));
            }
        }
        out.element("h3", "Load combinations");
        boolean givenCombinations = loads.containsKey("combinations");
        out.p(givenCombinations ? "The combinations of the model file."
                : "The model file gives no combinations: Tetrapod used the default set of its wind method "
                        + "(Tetrapod's method notes, under combinations). These are defaults.");
        combinations(r, givenCombinations).writeTo(out);

        if (in.containsKey("checks")) {
            out.element("h3", "Check settings");
            InputTables.write(out, "input-checks", r, in.get("checks"), "$.checks");
        }
        long assumedConnections = r.checks().stream().filter(c -> c.note().contains("(assumed connection)")).count();
        if (assumedConnections > 0) {
            out.p(assumedConnections + " members have no connection in the model file and were checked with their "
                    + "role's assumed connection (members.csv notes each).");
        }
    }

    /** The design ice thickness the analysis used, with the rule that gave it. */
    private static String designIce(IceRow ice) {
        String rule = "asce7".equals(ice.rule())
                ? "computed by ASCE 7 (10.4-5), t_d = 2.0 t I_i f_z K_zt^0.35, from the map's nominal thickness t = "
                        + Format.fixed(ice.nominal() * 1e3, 1) + " mm, I_i = " + Format.fixed(ice.importanceFactor(), 2)
                        + " and the wind's K_zt = " + Format.fixed(ice.topographicFactor(), 2) + ", with f_z = (z/33 ft)^0.10"
                : "as the model file gives it" + (ice.heightFactor() ? ", grown with height by f_z = (z/33 ft)^0.10"
                        : ", the same at every height");
        return "Design ice thickness t_d " + rule + ": " + Format.fixed(ice.atReference() * 1e3, 1) + " mm at "
                + Format.metres(ice.referenceHeight()) + " m (33 ft) and " + Format.fixed(ice.atTop() * 1e3, 1)
                + " mm at the top (" + Format.metres(ice.topHeight()) + " m).";
    }

    private static Table geometry(Results r, Map<String, Object> in) {
        Map<String, Object> base = Tree.mapOrEmpty(in, "base");
        Table t = new Table("input-geometry", "Base: " + InputTables.text(base.get("widthX")) + " m × "
                + InputTables.text(base.get("widthY")) + " m between leg centre lines at z = 0.",
                List.of("segment", "height, m", "top width x, m", "top width y, m", "panels", "bracing", "horizontals",
                        "redundants", "diagonals joined where they cross", "sections"));
        List<Map<String, Object>> segments = Tree.maps(in, "segments");
        for (int k = 0; k < segments.size(); k++) {
            Map<String, Object> s = segments.get(k);
            String at = "$.segments[" + k + "].";
            List<String> sections = new ArrayList<>();
            Tree.mapOrEmpty(s, "sections").forEach((role, name) -> sections.add(role + " " + name));
            t.row(Cell.num(Integer.toString(k + 1)), value(r, s, at, "height"), value(r, s, at, "topWidthX"),
                    value(r, s, at, "topWidthY"), value(r, s, at, "panels"), value(r, s, at, "bracing"),
                    value(r, s, at, "horizontals"), value(r, s, at, "redundants"),
                    value(r, s, at, "crossingConnected"), Cell.of(String.join(", ", sections)));
        }
        return t;
    }

    private static Cell value(Results r, Map<String, Object> obj, String at, String key) {
        Cell c = Cell.of(InputTables.text(obj.get(key)) + (r.isDefault(at + key) ? " (default)" : ""));
        return r.isDefault(at + key) ? c.withClass(InputTables.DEFAULT_MARK) : c;
    }

    private static Table sections(Results r) {
        Map<String, List<MemberRow>> byName = new LinkedHashMap<>();
        for (MemberRow m : r.members()) {
            byName.computeIfAbsent(m.section(), k -> new ArrayList<>()).add(m);
        }
        Table t = new Table("input-sections", "", List.of("section", "used as", "members", "total length, m", "A, cm²",
                "I about local y, cm⁴", "I about local z, cm⁴"));
        byName.forEach((name, members) -> {
            Set<String> roles = new LinkedHashSet<>();
            double length = 0;
            for (MemberRow m : members) {
                roles.add(m.role());
                length += m.length();
            }
            MemberRow first = members.get(0);
            t.row(Cell.of(name), Cell.of(String.join(", ", roles)), Cell.num(Integer.toString(members.size())),
                    Cell.num(Format.fixed(length, 1)), Cell.num(Format.fixed(first.area() * 1e4, 2)),
                    Cell.num(Format.fixed(first.iy() * 1e8, 1)), Cell.num(Format.fixed(first.iz() * 1e8, 1)));
        });
        return t;
    }

    private static Table material(Results r) {
        Map<String, Object> m = r.material();
        Table t = new Table("input-material", m.isEmpty() ? "" : "Grade " + Tree.str(m, "name")
                + (r.isDefault("$.material") ? " (default)" : "") + ": E = "
                + Format.fixed(Tree.num(m, "E") / 1e9, 0) + " GPa, G = " + Format.fixed(Tree.num(m, "G") / 1e9, 0)
                + " GPa, density " + Format.fixed(Tree.num(m, "density"), 0) + " kg/m³; " + Tree.str(m, "source") + ".",
                List.of("thickness up to, mm", "fy, MPa", "fu, MPa"));
        for (Map<String, Object> band : Tree.maps(m, "strengths")) {
            Double tMax = Tree.numOrNull(band, "maxThickness");
            t.row(Cell.num(tMax == null ? "any" : Format.fixed(tMax * 1e3, 0)),
                    Cell.num(Format.fixed(Tree.num(band, "fy") / 1e6, 0)),
                    Cell.num(Format.fixed(Tree.num(band, "fu") / 1e6, 0)));
        }
        return t;
    }

    private static Table combinations(Results r, boolean given) {
        List<String> actions = List.of("dead", "wind", "ice", "windOnIce", "nodal");
        List<String> header = new ArrayList<>(List.of("combination"));
        actions.forEach(a -> header.add("factor on " + Words.of(a)));
        header.add("with wind");
        header.add("given or assumed");
        Table t = new Table("input-combinations", "", header);
        for (CombinationRow c : r.combinations()) {
            List<Cell> row = new ArrayList<>(List.of(Cell.of(c.name())));
            for (String a : actions) {
                Double f = c.factors().get(a);
                row.add(Cell.num(f == null ? "–" : Format.fixed(f, 2)));
            }
            row.add(Cell.of(c.wind() ? "every azimuth" : "no"));
            row.add(InputTables.origin(!given));
            t.row(row);
        }
        return t;
    }

    /** The input value at a path like {@code $.segments[0].horizontals}, or null. */
    static Object at(Map<String, Object> input, String path) {
        Object v = input;
        for (String part : path.substring(1).split("(?=[.\\[])")) {
            if (part.isEmpty()) {
                continue;
            }
            if (part.startsWith(".") && v instanceof Map<?, ?> m) {
                v = m.get(part.substring(1));
            } else if (part.startsWith("[") && v instanceof List<?> l) {
                int k = Integer.parseInt(part.substring(1, part.length() - 1));
                v = k < l.size() ? l.get(k) : null;
            } else {
                return null;
            }
        }
        return v;
    }
}
