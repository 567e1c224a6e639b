package tetrapod.report;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import tetrapod.report.Rows.AzimuthPeak;
import tetrapod.report.Rows.CheckRow;
import tetrapod.report.Rows.ModeRow;
import tetrapod.report.Rows.RequirementRow;
import tetrapod.report.Rows.CombinationRow;
import tetrapod.report.Rows.FootingCheck;
import tetrapod.report.Rows.FootingRow;
import tetrapod.report.Rows.HandCase;
import tetrapod.report.Rows.HandRow;
import tetrapod.report.Rows.IceRow;
import tetrapod.report.Rows.LegBaseRow;
import tetrapod.report.Rows.LegSweep;
import tetrapod.report.Rows.MemberRow;
import tetrapod.report.Rows.PanelRow;
import tetrapod.report.Rows.Peak;
import tetrapod.report.Rows.WindRow;

/**
 * A results document (results.json as plain values, as {@link ResultsDocument} builds it or
 * {@code io.ResultsReader} reads it) seen as typed rows. The report and the CSV tables are built
 * from this alone, so that {@code tetrapod report} can rebuild them from a results file.
 */
public final class Results {

    private final Map<String, Object> doc;
    private final List<MemberRow> members;
    private final Map<Integer, MemberRow> memberById = new HashMap<>();
    private final Map<Integer, double[]> nodes = new HashMap<>();
    private final Map<String, String> combinationOfCase = new HashMap<>();

    public Results(Map<String, Object> doc) {
        this.doc = doc;
        Map<String, Object> model = Tree.map(doc, "model");
        for (Map<String, Object> n : Tree.maps(model, "nodes")) {
            nodes.put(Tree.integer(n, "id"), new double[] {Tree.num(n, "x"), Tree.num(n, "y"), Tree.num(n, "z")});
        }
        List<MemberRow> list = new ArrayList<>();
        for (Map<String, Object> m : Tree.maps(model, "members")) {
            double[] a = node(Tree.integer(m, "i"));
            double[] b = node(Tree.integer(m, "j"));
            double length = Math.sqrt(sq(b[0] - a[0]) + sq(b[1] - a[1]) + sq(b[2] - a[2]));
            MemberRow row = new MemberRow(Tree.integer(m, "id"), Tree.integer(m, "i"), Tree.integer(m, "j"),
                    Tree.str(m, "role"), m.containsKey("segment") ? Tree.integer(m, "segment") : 0,
                    m.containsKey("panel") ? Tree.integer(m, "panel") : 0, orEmpty(Tree.str(m, "face")),
                    Tree.str(m, "section"), Tree.num(m, "A"), Tree.num(m, "Iy"), Tree.num(m, "Iz"), length,
                    Math.min(a[2], b[2]), Math.max(a[2], b[2]));
            list.add(row);
            memberById.put(row.id(), row);
        }
        this.members = List.copyOf(list);
        for (Map<String, Object> c : Tree.maps(doc, "cases")) {
            combinationOfCase.put(Tree.str(c, "id"), Tree.str(c, "combination"));
        }
    }

    private static double sq(double v) {
        return v * v;
    }

    private static String orEmpty(String s) {
        return s == null ? "" : s;
    }

    /** The whole document, read-only by convention. */
    public Map<String, Object> document() {
        return doc;
    }

    public Map<String, Object> input() {
        return Tree.mapOrEmpty(doc, "input");
    }

    public String name() {
        return Tree.str(Tree.map(doc, "model"), "name");
    }

    public String idealisation() {
        return Tree.str(Tree.map(doc, "model"), "idealisation");
    }

    /** Node coordinates x, y, z in m. */
    public double[] node(int id) {
        double[] xyz = nodes.get(id);
        if (xyz == null) {
            throw new IllegalArgumentException("results: no node " + id);
        }
        return xyz.clone();
    }

    public int nodeCount() {
        return nodes.size();
    }

    public List<MemberRow> members() {
        return members;
    }

    public MemberRow member(int id) {
        MemberRow m = memberById.get(id);
        if (m == null) {
            throw new IllegalArgumentException("results: no member " + id);
        }
        return m;
    }

    /** The combination a case id belongs to: from the cases solved in full, else the id up to its '@'. */
    public String combinationOf(String caseId) {
        if (caseId == null) {
            return null;
        }
        String c = combinationOfCase.get(caseId);
        if (c != null) {
            return c;
        }
        int at = caseId.lastIndexOf('@');
        return at < 0 ? caseId : caseId.substring(0, at);
    }

    public int caseCountInFull() {
        return combinationOfCase.size();
    }

    /** The largest equilibrium residual of the cases solved in full (dimensionless). */
    public double worstEquilibriumError() {
        double worst = 0;
        for (Map<String, Object> c : Tree.maps(doc, "cases")) {
            worst = Math.max(worst, Tree.num(c, "equilibriumError"));
        }
        return worst;
    }

    /** Number of directions the solver restrained automatically (no stiffness in the lattice model). */
    public int autoRestraintCount() {
        return Tree.maps(Tree.map(doc, "model"), "autoRestraints").size();
    }

    /** The largest force (N, or N·m for a rotation) any automatic restraint carried over the sweep. */
    public double largestAutoRestraintForce() {
        double worst = 0;
        for (Map<String, Object> a : Tree.maps(Tree.map(doc, "model"), "autoRestraints")) {
            worst = Math.max(worst, Tree.num(a, "largestForce"));
        }
        return worst;
    }

    public List<CheckRow> checks() {
        List<CheckRow> out = new ArrayList<>();
        for (Map<String, Object> c : Tree.maps(doc, "checks")) {
            out.add(new CheckRow(Tree.integer(c, "member"), Tree.num(c, "utilisation"), Tree.str(c, "mode"),
                    Tree.str(c, "clause"), orEmpty(Tree.str(c, "note")), Tree.str(c, "case"),
                    Tree.numOrNull(c, "azimuthDeg"), peak(Tree.map(c, "maxTension")),
                    peak(Tree.map(c, "maxCompression"))));
        }
        return out;
    }

    /**
     * The smallest elastic critical load factor of the cases solved in full and its case, or empty
     * when no case can buckle the structure (results.json {@code cases[].alphaCr}).
     */
    public java.util.Optional<Map.Entry<String, Double>> smallestAlphaCr() {
        Map.Entry<String, Double> worst = null;
        for (Map<String, Object> c : Tree.maps(doc, "cases")) {
            Double a = Tree.numOrNull(c, "alphaCr");
            if (a != null && (worst == null || a < worst.getValue())) {
                worst = Map.entry(Tree.str(c, "id"), a);
            }
        }
        return java.util.Optional.ofNullable(worst);
    }

    /** The natural modes, lowest first (results.json {@code modes}; empty in older files). */
    public List<ModeRow> modes() {
        List<ModeRow> out = new ArrayList<>();
        for (Map<String, Object> m : Tree.maps(doc, "modes")) {
            Map<String, Object> e = Tree.map(m, "effectiveMass");
            out.add(new ModeRow(Tree.integer(m, "number"), Tree.num(m, "frequencyHz"), Tree.num(m, "periodS"),
                    Tree.str(m, "kind"), Tree.numOrNull(m, "swayDirectionDeg"), Tree.num(e, "x"), Tree.num(e, "y"),
                    Tree.num(e, "z"), Tree.num(e, "rz")));
        }
        return out;
    }

    /** The serviceability combination and its wind; empty when the results have none (an explicit frame, older files). */
    public Optional<Rows.ServiceCase> serviceCase() {
        Map<String, Object> s = Tree.mapOrEmpty(doc, "serviceability");
        if (s.isEmpty()) {
            return Optional.empty();
        }
        Map<String, Object> w = Tree.mapOrEmpty(s, "wind");
        return Optional.of(new Rows.ServiceCase(Tree.str(s, "combination"), orEmpty(Tree.str(w, "rule")),
                orNaN(w, "returnPeriod"), orNaN(w, "probabilityFactor"), orNaN(w, "speed"), orNaN(w, "pressureRatio")));
    }

    /** Every panel level (bottom to top), then every ancillary, with its movements; empty without serviceability. */
    public List<Rows.ServiceRow> serviceability() {
        Map<String, Object> s = Tree.mapOrEmpty(doc, "serviceability");
        List<Rows.ServiceRow> out = new ArrayList<>();
        if (s.isEmpty()) {
            return out;
        }
        for (Map<String, Object> l : Tree.maps(s, "levels")) {
            double z = Tree.num(l, "z");
            out.add(new Rows.ServiceRow("level", "level at " + Format.degrees(z) + " m", Tree.integer(l, "level"), "",
                    z, z, movement(l, "sway", z), movement(l, "tilt", z), movement(l, "twist", z)));
        }
        for (Map<String, Object> a : Tree.maps(s, "ancillaries")) {
            double z = Tree.num(a, "zFrom");
            out.add(new Rows.ServiceRow(Tree.str(a, "kind"), Tree.str(a, "name"), -1, Tree.str(a, "face"), z,
                    Tree.num(a, "zTo"), movement(a, "sway", z), movement(a, "tilt", z), movement(a, "twist", z)));
        }
        return out;
    }

    private static Rows.MovementRow movement(Map<String, Object> row, String label, double z) {
        Map<String, Object> peak = Tree.map(row, label);
        Double at = Tree.numOrNull(peak, "z");
        Object met = Tree.mapOrEmpty(row, "met").get(label);
        return new Rows.MovementRow(Tree.num(peak, "value"), Tree.numOrNull(peak, "azimuthDeg"), at == null ? z : at,
                orNaN(Tree.mapOrEmpty(row, "limits"), label), met instanceof Boolean b ? b : null);
    }

    /** Every requirement of every member, in member order (results.json {@code requirements}). */
    public List<RequirementRow> requirements() {
        List<RequirementRow> out = new ArrayList<>();
        for (Map<String, Object> c : Tree.maps(doc, "requirements")) {
            out.add(new RequirementRow(Tree.integer(c, "member"), Tree.str(c, "rule"), Tree.num(c, "ratio"),
                    Boolean.TRUE.equals(c.get("met")), Tree.str(c, "clause"), orEmpty(Tree.str(c, "note"))));
        }
        return out;
    }

    /** The requirements not met, from the largest ratio down (ties by member id). */
    public List<RequirementRow> requirementsNotMet() {
        List<RequirementRow> out = new ArrayList<>();
        for (RequirementRow q : requirements()) {
            if (!q.met()) {
                out.add(q);
            }
        }
        out.sort(Comparator.comparingDouble((RequirementRow q) -> -q.ratio()).thenComparingInt(RequirementRow::member));
        return out;
    }

    /** The checks from the most utilised down (ties by member id). */
    public List<CheckRow> checksByUtilisation() {
        List<CheckRow> list = new ArrayList<>(checks());
        list.sort(Comparator.comparingDouble((CheckRow c) -> -c.utilisation()).thenComparingInt(CheckRow::member));
        return list;
    }

    public List<FootingRow> foundations() {
        List<FootingRow> out = new ArrayList<>();
        for (Map<String, Object> f : Tree.maps(doc, "foundations")) {
            List<FootingCheck> checks = new ArrayList<>();
            for (Map<String, Object> c : Tree.maps(f, "checks")) {
                checks.add(new FootingCheck(Tree.str(c, "name"), Tree.num(c, "utilisation"), Tree.str(c, "clause"),
                        orEmpty(Tree.str(c, "note")), Tree.str(c, "case"), Tree.numOrNull(c, "azimuthDeg"),
                        Tree.str(c, "reactions")));
            }
            out.add(new FootingRow(Tree.integer(f, "node"), checks, Tree.num(f, "concreteVolumeRequired")));
        }
        return out;
    }

    public List<LegBaseRow> legBases() {
        List<LegBaseRow> out = new ArrayList<>();
        for (Map<String, Object> l : Tree.maps(doc, "legBases")) {
            int node = Tree.integer(l, "node");
            double[] xyz = node(node);
            out.add(new LegBaseRow(node, xyz[0], xyz[1], peak(Tree.map(l, "maxCompression")),
                    peak(Tree.map(l, "maxUplift")), peak(Tree.map(l, "maxShear"))));
        }
        return out;
    }

    public List<WindRow> wind() {
        List<WindRow> out = new ArrayList<>();
        for (Map<String, Object> w : Tree.maps(doc, "wind")) {
            List<PanelRow> panels = new ArrayList<>();
            for (Map<String, Object> p : Tree.maps(w, "panels")) {
                List<Double> f = Tree.nums(p, "force");
                panels.add(new PanelRow(Tree.integer(p, "panel"), Tree.num(p, "zBottom"), Tree.num(p, "zTop"),
                        Tree.num(p, "zRef"), Tree.num(p, "q"), Tree.num(p, "solidity"), Tree.num(p, "cf"),
                        Tree.num(p, "area"), f.get(0), f.get(1)));
            }
            out.add(new WindRow(Tree.num(w, "azimuthDeg"), panels));
        }
        return out;
    }

    /** Step of the azimuth sweep, degrees; empty when the document has no sweep. */
    public Optional<Double> sweepStepDeg() {
        Map<String, Object> sweep = Tree.mapOrEmpty(doc, "sweep");
        return Optional.ofNullable(Tree.numOrNull(sweep, "stepDeg"));
    }

    public List<LegSweep> legSweeps() {
        List<LegSweep> out = new ArrayList<>();
        for (Map<String, Object> s : Tree.maps(Tree.mapOrEmpty(doc, "sweep"), "legBases")) {
            out.add(new LegSweep(Tree.integer(s, "node"), Tree.str(s, "combination"), Tree.nums(s, "azimuthDeg"),
                    Tree.nums(s, "Fz"), Tree.nums(s, "Fh")));
        }
        return out;
    }

    public List<AzimuthPeak> utilisationByAzimuth() {
        Map<String, Object> m = Tree.mapOrEmpty(Tree.mapOrEmpty(doc, "sweep"), "maxUtilisation");
        List<Double> az = Tree.nums(m, "azimuthDeg");
        List<Double> u = Tree.nums(m, "utilisation");
        List<Object> member = Tree.list(m, "member");
        List<Object> combination = Tree.list(m, "combination");
        List<AzimuthPeak> out = new ArrayList<>();
        for (int k = 0; k < az.size(); k++) {
            out.add(new AzimuthPeak(az.get(k), u.get(k), ((Number) member.get(k)).intValue(),
                    String.valueOf(combination.get(k))));
        }
        return out;
    }

    public List<HandRow> hand() {
        List<HandRow> out = new ArrayList<>();
        for (Map<String, Object> h : Tree.maps(doc, "handMethod")) {
            Map<String, Object> fe = Tree.map(h, "fe");
            Map<String, Object> diff = Tree.map(h, "differencePct");
            out.add(new HandRow(Tree.str(h, "combination"), Tree.num(h, "azimuthDeg"), Tree.num(h, "N"),
                    Tree.num(h, "H"), Tree.num(h, "zH"), Tree.num(h, "M"), Tree.num(h, "d"),
                    Tree.num(h, "legCompression"), Tree.num(h, "legTension"), Tree.num(fe, "maxCompression"),
                    Tree.num(fe, "maxTension"), Tree.num(diff, "compression"), Tree.num(diff, "tension")));
        }
        return out;
    }

    /**
     * The hand-method comparison of {@code quantity} ("compression" or "uplift") in the case that
     * governs it; empty when the results have none.
     */
    public Optional<HandCase> handCase(String quantity) {
        Map<String, Object> c = Tree.mapOrEmpty(Tree.mapOrEmpty(doc, "handMethodGoverning"), quantity);
        if (c.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new HandCase(Tree.str(c, "combination"), Tree.num(c, "azimuthDeg"), Tree.num(c, "N"),
                Tree.num(c, "M"), Tree.num(c, "hand"), Tree.num(c, "fe"), Tree.num(c, "differencePct")));
    }

    /** The ice the analysis used; empty without ice. */
    public Optional<IceRow> ice() {
        Map<String, Object> i = Tree.mapOrEmpty(doc, "ice");
        if (i.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new IceRow(Tree.str(i, "rule"), orNaN(i, "nominalThickness"), orNaN(i, "importanceFactor"),
                orNaN(i, "topographicFactor"), Tree.bool(i, "heightFactor"), Tree.num(i, "referenceHeight"),
                Tree.num(i, "designThicknessAtReference"), Tree.num(i, "topHeight"),
                Tree.num(i, "designThicknessAtTop")));
    }

    private static double orNaN(Map<String, Object> parent, String key) {
        Double v = Tree.numOrNull(parent, key);
        return v == null ? Double.NaN : v;
    }

    public List<CombinationRow> combinations() {
        List<CombinationRow> out = new ArrayList<>();
        for (Map<String, Object> c : Tree.maps(doc, "combinations")) {
            Map<String, Double> factors = new LinkedHashMap<>();
            Tree.mapOrEmpty(c, "factors").forEach((k, v) -> factors.put(k, ((Number) v).doubleValue()));
            out.add(new CombinationRow(Tree.str(c, "name"), factors, Tree.bool(c, "wind")));
        }
        return out;
    }

    public Map<String, Object> material() {
        return Tree.mapOrEmpty(doc, "material");
    }

    public Map<String, Object> steel() {
        return Tree.mapOrEmpty(doc, "steel");
    }

    /** The design basis: family, action factors and reliability class as one line, e.g. {@code en: action factors en1993-3-1, reliability class 2}. */
    public String basisLine() {
        Map<String, Object> b = Tree.mapOrEmpty(doc, "basis");
        if (b.isEmpty()) {
            return "";
        }
        Double rc = Tree.numOrNull(b, "reliabilityClass");
        return Tree.str(b, "family") + ": action factors " + Tree.str(b, "actionFactors")
                + (rc == null ? "" : ", reliability class " + rc.intValue());
    }

    /** One line per value of the model that belongs to the other family than its basis (allowed by mixedBasis). */
    public List<String> basisWarnings() {
        List<String> out = new ArrayList<>();
        for (Object o : Tree.list(Tree.mapOrEmpty(doc, "basis"), "warnings")) {
            out.add(String.valueOf(o));
        }
        return out;
    }

    /** JSON paths of the input's values that Tetrapod filled in. */
    public List<String> defaults() {
        List<String> out = new ArrayList<>();
        for (Object o : Tree.list(doc, "defaults")) {
            out.add(String.valueOf(o));
        }
        return out;
    }

    /** Whether the value at {@code path} (e.g. {@code $.loads.wind.gustFactor}) or an object holding it was filled in. */
    public boolean isDefault(String path) {
        for (String d : defaults()) {
            if (path.equals(d) || path.startsWith(d + ".") || path.startsWith(d + "[")) {
                return true;
            }
        }
        return false;
    }

    /** The largest utilisation of any member check or footing check (dimensionless; 0 when there is none). */
    public double maxUtilisation() {
        double max = 0;
        for (CheckRow c : checks()) {
            max = Math.max(max, c.utilisation());
        }
        for (FootingRow f : foundations()) {
            for (FootingCheck c : f.checks()) {
                max = Math.max(max, c.utilisation());
            }
        }
        return max;
    }

    private static Peak peak(Map<String, Object> m) {
        return new Peak(Tree.num(m, "value"), Tree.str(m, "case"), Tree.numOrNull(m, "azimuthDeg"));
    }
}
