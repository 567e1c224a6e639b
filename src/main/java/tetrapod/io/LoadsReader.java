package tetrapod.io;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.IntPredicate;
import tetrapod.model.Face;
import tetrapod.model.spec.ActionFactorSet;
import tetrapod.model.spec.ActionFactors;
import tetrapod.model.spec.AncillarySpec;
import tetrapod.model.spec.Asce7Edition;
import tetrapod.model.spec.CombinationSpec;
import tetrapod.model.spec.DesignBasis;
import tetrapod.model.spec.Exposure;
import tetrapod.model.spec.IceSpec;
import tetrapod.model.spec.LoadAction;
import tetrapod.model.spec.LoadsSpec;
import tetrapod.model.spec.LoadsSpec.NodalLoadSpec;
import tetrapod.model.spec.TerrainCategory;
import tetrapod.model.spec.WindSpec;

/**
 * Reads {@code loads}: nodal forces (kN) and moments (kN·m), the wind (m/s, kPa), ancillaries
 * (m, kN, kN/m, m²), ice (mm, kg/m³), combinations and the sweep step (degrees).
 */
final class LoadsReader {

    static final List<String> LOADS_KEYS = List.of("nodal", "wind", "ancillaries", "ice", "combinations", "sweepStep",
            "actionFactors", "reliabilityClass");
    static final List<String> NODAL_KEYS = List.of("node", "F");
    static final Map<String, List<String>> WIND_KEYS = windKeys();
    static final Map<String, List<String>> ANCILLARY_KEYS = Map.of(
            "point", List.of("kind", "name", "height", "weight", "area", "forceCoefficient", "shielding", "face"),
            "linear", List.of("kind", "name", "from", "to", "weight", "width", "forceCoefficient", "shielding", "face"));
    static final List<String> ICE_KEYS = List.of("thickness_mm", "nominalThickness_mm", "importanceFactor", "density",
            "heightFactor", "windSpeed", "windPressure");
    static final List<String> COMBINATION_KEYS = List.of("name", "dead", "wind", "ice", "windOnIce", "nodal");
    static final List<String> WIND_METHODS = List.of("en1991", "asce7", "uniform");

    /** Wind speeds above this (m/s) are taken for a unit mistake. */
    static final double MAX_SPEED = 100;
    /** Largest pressure of the uniform method, kPa. */
    static final double MAX_PRESSURE = 20;
    static final double MAX_ICE_MM = 300;
    /** Largest nominal thickness of the ASCE 7 map, mm: twice it (10.4-5) reaches the bound of the design thickness. */
    static final double MAX_NOMINAL_ICE_MM = MAX_ICE_MM / 2;
    /** Ice importance factors of ASCE 7 Table 1.5-2 lie between 0.8 and 1.25; above 2 is taken for a mistake. */
    private static final Bound IMPORTANCE = new Bound(0, false, 2, true);
    static final double MAX_FACTOR = 10;
    static final double MIN_STEP = 0.1;

    private static final Bound FRACTION_TO_ONE = new Bound(0, false, 1, true);
    private static final Bound SHIELDING = new Bound(0, true, 1, false);

    private final Problems problems;

    LoadsReader(Problems problems) {
        this.problems = problems;
    }

    private static Map<String, List<String>> windKeys() {
        Map<String, List<String>> m = new LinkedHashMap<>();
        m.put("en1991", List.of("method", "basicSpeed", "terrain", "directionFactors", "seasonFactor", "orography",
                "structuralFactor", "turbulenceFactor", "airDensity", "structuralDamping"));
        m.put("asce7", List.of("method", "edition", "speed", "exposure", "topographicFactor", "elevationFactor",
                "directionalityFactor", "gustFactor", "dampingRatio"));
        m.put("uniform", List.of("method", "pressure", "forceCoefficient"));
        return m;
    }

    /** What the reader knows of the tower the loads are on. */
    record Tower(boolean generated, double height) {
        static Tower explicit() {
            return new Tower(false, Double.NaN);
        }
    }

    /**
     * The loads, or null (reported).
     *
     * @param nodeExists whether a node id exists; null when the ids are not known yet (generated towers)
     * @param tower      whether the tower is generated and its height (NaN when not known)
     * @param basis      the model's design basis, whose action factors are the default
     */
    LoadsSpec read(Fields loads, IntPredicate nodeExists, Tower tower, DesignBasis basis) {
        int before = problems.count();
        loads.allowOnly(LOADS_KEYS);
        JsonNode nodal = tooMany(loads.array("nodal", false), loads.path("nodal"), PhysicalLimits.MAX_NODAL_LOADS);
        List<NodalLoadSpec> list = new ArrayList<>();
        if (nodal != null) {
            for (int k = 0; k < nodal.size(); k++) {
                Fields f = Fields.of(nodal.get(k), JsonPaths.index(loads.path("nodal"), k), problems);
                NodalLoadSpec load = f == null ? null : nodal(f, nodeExists);
                if (load != null) {
                    list.add(load);
                }
            }
        }
        WindSpec wind = null;
        List<AncillarySpec> ancillaries = List.of();
        IceSpec ice = null;
        if (!tower.generated()) {
            for (String key : List.of("wind", "ancillaries", "ice")) {
                if (loads.has(key)) {
                    problems.add(loads.path(key), "applies only to a generated tower (base and segments): wind,"
                            + " ancillaries and ice act on the tower panel by panel");
                }
            }
        } else {
            Fields windFields = loads.object("wind", false);
            wind = windFields == null ? null : wind(windFields);
            JsonNode items = tooMany(loads.array("ancillaries", false), loads.path("ancillaries"),
                    PhysicalLimits.MAX_ANCILLARIES);
            ancillaries = items == null ? List.of() : ancillaries(items, loads.path("ancillaries"), tower.height());
            Fields iceFields = loads.object("ice", false);
            ice = iceFields == null ? null : ice(iceFields, loads.has("wind") ? windMethod(loads.get("wind")) : null);
        }
        JsonNode combos = tooMany(loads.array("combinations", false), loads.path("combinations"),
                PhysicalLimits.MAX_COMBINATIONS);
        List<CombinationSpec> combinations = combos == null ? List.of()
                : combinations(combos, loads.path("combinations"), loads.has("wind") && tower.generated(),
                        loads.has("ice") && tower.generated());
        double step = loads.has("sweepStep") ? sweepStep(loads) : LoadsSpec.DEFAULT_SWEEP_STEP;
        ActionFactors factors = actionFactors(loads, basis);
        return problems.count() == before
                ? new LoadsSpec(list, wind, ancillaries, ice, combinations, step, factors)
                : null;
    }

    /** The array, or null (reported) when it lists more than {@code most} items. */
    private JsonNode tooMany(JsonNode array, String path, int most) {
        if (array != null && array.size() > most) {
            problems.add(path, "lists " + array.size() + " items; at most " + most + " are allowed");
            return null;
        }
        return array;
    }

    /** {@code actionFactors} (default: the basis's) and {@code reliabilityClass} (EN 1993-3-1 only, default 2). */
    private ActionFactors actionFactors(Fields loads, DesignBasis basis) {
        ActionFactors byDefault = ActionFactors.defaultFor(basis);
        ActionFactorSet set = Choices.ACTION_FACTORS.optional(loads, "actionFactors", byDefault.set());
        if (set == null) {
            return null;
        }
        if (!loads.has("reliabilityClass")) {
            return new ActionFactors(set, ActionFactors.DEFAULT_RELIABILITY_CLASS);
        }
        if (set != ActionFactorSet.EN1993_3_1) {
            problems.add(loads.path("reliabilityClass"), "applies only to actionFactors en1993-3-1 (EN 1993-3-1 Annex A);"
                    + " the action factors here are " + set.jsonName());
            return null;
        }
        Integer rc = Values.whole(loads.get("reliabilityClass"), loads.path("reliabilityClass"), 1, 3, problems);
        return rc == null ? null : new ActionFactors(set, rc);
    }

    private NodalLoadSpec nodal(Fields f, IntPredicate nodeExists) {
        int before = problems.count();
        f.allowOnly(NODAL_KEYS);
        Integer node = f.requiredWhole("node", Integer.MIN_VALUE, Integer.MAX_VALUE);
        if (node != null && nodeExists != null && !nodeExists.test(node)) {
            problems.add(f.path("node"), "node " + node + " does not exist");
        }
        double[] c = new double[6];
        JsonNode array = f.array("F", true);
        if (array != null) {
            String path = f.path("F");
            if (array.size() != 3 && array.size() != 6) {
                problems.add(path, "must be [Fx, Fy, Fz] in kN or [Fx, Fy, Fz, Mx, My, Mz] in kN and kN·m; had "
                        + array.size() + " values");
            } else {
                for (int k = 0; k < array.size(); k++) {
                    c[k] = Values.number(array.get(k), JsonPaths.index(path, k), PhysicalLimits.NODAL_FORCE,
                            k < 3 ? "kN" : "kN·m", problems);
                }
            }
        }
        return problems.count() == before ? new NodalLoadSpec(node, c[0], c[1], c[2], c[3], c[4], c[5]) : null;
    }

    /** The method named in a wind object, or null when it has none that is known. */
    private static String windMethod(JsonNode wind) {
        JsonNode m = wind.get("method");
        return m != null && m.isTextual() && WIND_METHODS.contains(m.textValue()) ? m.textValue() : null;
    }

    private WindSpec wind(Fields f) {
        int before = problems.count();
        String method = f.requiredChoice("method", "wind method", WIND_METHODS, WIND_METHODS);
        if (method == null) {
            return null;
        }
        allowKeysOf(f, method, WIND_KEYS, "method");
        Bound upToTwo = new Bound(0, false, 2, true);
        switch (method) {
            case "en1991" -> {
                double speed = speed(f, "basicSpeed");
                TerrainCategory terrain = Choices.TERRAIN.required(f, "terrain");
                List<Double> cdir = directionFactors(f);
                double season = f.optionalNumber("seasonFactor", FRACTION_TO_ONE, "", 1.0);
                double orography = f.optionalNumber("orography", PhysicalLimits.OROGRAPHY, "", 1.0);
                // absent: computed from the tower's first sway frequency (EN 1991-1-4 Annex B)
                double structural = f.optionalNumber("structuralFactor", upToTwo, "", Double.NaN);
                double turbulence = f.optionalNumber("turbulenceFactor", upToTwo, "", 1.0);
                double density = f.optionalNumber("airDensity", upToTwo, "kg/m³", WindSpec.En1991.DEFAULT_AIR_DENSITY);
                // δ_s of EN 1991-1-4 Table F.2: lattice steel towers 0.02 to 0.05; above 0.3 no structure of the table
                double damping = f.optionalNumber("structuralDamping", PhysicalLimits.LOG_DECREMENT, "",
                        WindSpec.En1991.DEFAULT_STRUCTURAL_DAMPING);
                return problems.count() == before
                        ? new WindSpec.En1991(speed, terrain, cdir, season, orography, structural, turbulence, density,
                                damping)
                        : null;
            }
            case "asce7" -> {
                Asce7Edition edition = Choices.EDITION.optional(f, "edition", Asce7Edition.ASCE_7_16);
                double speed = speed(f, "speed");
                Exposure exposure = Choices.EXPOSURE.required(f, "exposure");
                double kzt = f.optionalNumber("topographicFactor", new Bound(0, false, 5, true), "", 1.0);
                double ke = f.optionalNumber("elevationFactor", new Bound(0, false, 1.5, true), "", 1.0);
                double kd = f.optionalNumber("directionalityFactor", FRACTION_TO_ONE, "", 0.85);
                // absent: computed from the tower's first sway frequency (ASCE 7 §26.11)
                double g = f.optionalNumber("gustFactor", upToTwo, "", Double.NaN);
                double beta = f.optionalNumber("dampingRatio", PhysicalLimits.DAMPING_RATIO, "",
                        WindSpec.Asce7.DEFAULT_DAMPING_RATIO);
                return problems.count() == before
                        ? new WindSpec.Asce7(edition, speed, exposure, kzt, ke, kd, g, beta)
                        : null;
            }
            default -> {
                double pressure = f.requiredNumber("pressure", new Bound(0, false, MAX_PRESSURE, true), "kPa");
                double cf = f.optionalNumber("forceCoefficient", new Bound(0, false, 5, true), "", 1.0);
                return problems.count() == before ? new WindSpec.Uniform(pressure, cf) : null;
            }
        }
    }

    /**
     * Reports keys not in {@code kind}'s list: a key of another kind as such, any other with the
     * nearest valid key.
     */
    private void allowKeysOf(Fields f, String kind, Map<String, List<String>> keysByKind, String kindKey) {
        List<String> own = keysByKind.get(kind);
        List<String> tolerated = new ArrayList<>(own);
        for (String key : f.keys()) {
            if (own.contains(key)) {
                continue;
            }
            for (Map.Entry<String, List<String>> other : keysByKind.entrySet()) {
                if (other.getValue().contains(key)) {
                    problems.add(f.path(key), "is a key of " + kindKey + " '" + other.getKey() + "', not of '" + kind
                            + "'; '" + kind + "' takes " + String.join(", ", own.subList(1, own.size())));
                    tolerated.add(key);
                    break;
                }
            }
        }
        f.allowOnly(tolerated);
    }

    /** A wind speed in m/s, > 0; a value above 100 m/s is reported as a likely unit mistake. NaN (reported) otherwise. */
    private double speed(Fields f, String key) {
        if (!f.has(key)) {
            f.missing(key, "a wind speed > 0 m/s");
            return Double.NaN;
        }
        return speedValue(f.get(key), f.path(key));
    }

    private double speedValue(JsonNode node, String path) {
        double v = Values.number(node, path, Bound.POSITIVE, "m/s", problems);
        if (v > MAX_SPEED) {
            problems.add(path, "must be ≤ " + Numbers.format(MAX_SPEED) + " m/s, was " + Numbers.shown(node)
                    + ": wind speeds are in m/s (basic wind speeds lie between about 20 and 70 m/s);"
                    + " a value this large looks like km/h or mph");
            return Double.NaN;
        }
        return v;
    }

    private List<Double> directionFactors(Fields f) {
        if (!f.has("directionFactors")) {
            return List.of();
        }
        String path = f.path("directionFactors");
        List<Double> values = Values.numbers(f.get("directionFactors"), path, FRACTION_TO_ONE, "", problems);
        if (values != null && values.size() != 12) {
            problems.add(path, "must list 12 values of c_dir, for the 30° sectors centred on the azimuths 0°, 30°,"
                    + " ... 330° (the direction the wind blows towards); had " + values.size());
            return null;
        }
        return values;
    }

    private List<AncillarySpec> ancillaries(JsonNode array, String path, double towerHeight) {
        int before = problems.count();
        List<AncillarySpec> items = new ArrayList<>();
        Map<String, String> names = new HashMap<>();
        for (int k = 0; k < array.size(); k++) {
            String itemPath = JsonPaths.index(path, k);
            Fields f = Fields.of(array.get(k), itemPath, problems);
            if (f == null) {
                continue;
            }
            JsonNode name = array.get(k).get("name");
            if (name != null && name.isTextual()) {
                String first = names.putIfAbsent(name.textValue(), itemPath);
                if (first != null) {
                    problems.add(f.path("name"), "name '" + name.textValue() + "' is already used by " + first);
                }
            }
            AncillarySpec item = ancillary(f, towerHeight);
            if (item != null) {
                items.add(item);
            }
        }
        return problems.count() == before ? items : null;
    }

    private AncillarySpec ancillary(Fields f, double towerHeight) {
        int before = problems.count();
        String kind = f.requiredChoice("kind", "ancillary kind", List.of("point", "linear"), List.of("point", "linear"));
        if (kind == null) {
            return null;
        }
        allowKeysOf(f, kind, ANCILLARY_KEYS, "kind");
        String name = f.requiredText("name");
        Face face = Choices.FACE.optional(f, "face", Face.NONE);
        Face where = face == null ? Face.NONE : face;
        String label = name == null ? "" : name;
        if (kind.equals("point")) {
            double height = f.requiredNumber("height", PhysicalLimits.HEIGHT_ON_TOWER, "m");
            aboveTop(f, "height", height, towerHeight);
            double weight = f.requiredNumber("weight", PhysicalLimits.ANCILLARY_WEIGHT, "kN");
            double area = f.requiredNumber("area", PhysicalLimits.ANCILLARY_AREA, "m²");
            double cf = f.requiredNumber("forceCoefficient", new Bound(0, false, 5, true), "");
            double shielding = f.optionalNumber("shielding", SHIELDING, "", 0.0);
            return problems.count() == before
                    ? new AncillarySpec.Point(label, height, weight, area, cf, shielding, where)
                    : null;
        }
        double from = f.requiredNumber("from", PhysicalLimits.HEIGHT_ON_TOWER, "m");
        double to = f.requiredNumber("to", PhysicalLimits.HEIGHT_ON_TOWER, "m");
        if (to <= from) {
            problems.add(f.path("to"), "must be above from (" + Numbers.format(from) + " m), was " + Numbers.shown(f.get("to")));
        } else {
            aboveTop(f, "to", to, towerHeight);
        }
        double weight = f.requiredNumber("weight", PhysicalLimits.LINEAR_WEIGHT, "kN/m");
        double width = f.requiredNumber("width", PhysicalLimits.LINEAR_WIDTH, "m");
        double cf = f.requiredNumber("forceCoefficient", new Bound(0, false, 5, true), "");
        double shielding = f.optionalNumber("shielding", SHIELDING, "", 0.0);
        return problems.count() == before
                ? new AncillarySpec.Linear(label, from, to, weight, width, cf, shielding, where)
                : null;
    }

    private void aboveTop(Fields f, String key, double z, double towerHeight) {
        if (Double.isFinite(towerHeight) && z > towerHeight + 1e-9) {
            problems.add(f.path(key), "is above the tower top (" + Numbers.format(towerHeight) + " m), was "
                    + Numbers.shown(f.get(key)));
        }
    }

    /** @param method the wind method, or null when the file has no (valid) wind */
    private IceSpec ice(Fields f, String method) {
        int before = problems.count();
        f.allowOnly(ICE_KEYS);
        IceSpec.Thickness thickness = "asce7".equals(method) ? asce7Thickness(f) : givenThickness(f);
        double density = f.optionalNumber("density", new Bound(100, true, 1000, true), "kg/m³", IceSpec.DEFAULT_DENSITY);
        double windSpeed = Double.NaN;
        double windPressure = Double.NaN;
        if (f.has("windSpeed")) {
            if ("uniform".equals(method)) {
                problems.add(f.path("windSpeed"), "applies to the en1991 and asce7 methods; with the uniform method give"
                        + " windPressure (kPa)");
            } else {
                windSpeed = speedValue(f.get("windSpeed"), f.path("windSpeed"));
            }
        }
        if (f.has("windPressure")) {
            if (!"uniform".equals(method)) {
                problems.add(f.path("windPressure"), "applies to the uniform method; with en1991 and asce7 give"
                        + " windSpeed (m/s)");
            } else {
                windPressure = Values.number(f.get("windPressure"), f.path("windPressure"),
                        new Bound(0, false, MAX_PRESSURE, true), "kPa", problems);
            }
        }
        return problems.count() == before
                ? new IceSpec(thickness, density, windSpeed, windPressure)
                : null;
    }

    /** With the asce7 wind: the map's nominal thickness and I_i; t_d is computed by ASCE 7 (10.4-5). */
    private IceSpec.Thickness asce7Thickness(Fields f) {
        if (f.has("thickness_mm")) {
            problems.add(f.path("thickness_mm"), "is not read with the asce7 wind: give nominalThickness_mm, the nominal"
                    + " ice thickness t of the ASCE 7 map (mm), and importanceFactor (I_i); Tetrapod computes the design"
                    + " thickness t_d = 2.0 t I_i f_z K_zt^0.35 (ASCE 7 (10.4-5))");
        }
        if (f.has("heightFactor")) {
            problems.add(f.path("heightFactor"), "does not apply with the asce7 wind: the design thickness of ASCE 7"
                    + " (10.4-5) always grows with height by f_z");
        }
        double nominal = f.has("thickness_mm") && !f.has("nominalThickness_mm") ? Double.NaN   // reported above
                : f.requiredNumber("nominalThickness_mm", new Bound(0, true, MAX_NOMINAL_ICE_MM, true), "mm");
        double importance = f.optionalNumber("importanceFactor", IMPORTANCE, "",
                IceSpec.Asce7Map.DEFAULT_IMPORTANCE_FACTOR);
        return new IceSpec.Asce7Map(nominal, importance);
    }

    /** Without the asce7 wind: the design thickness at 10 m as given, constant or grown by f_z. */
    private IceSpec.Thickness givenThickness(Fields f) {
        for (String key : List.of("nominalThickness_mm", "importanceFactor")) {
            if (f.has(key)) {
                problems.add(f.path(key), "applies with the asce7 wind (ASCE 7 chapter 10 design thickness); without it"
                        + " give thickness_mm, the design ice thickness at 10 m");
            }
        }
        double thickness = f.has("nominalThickness_mm") && !f.has("thickness_mm") ? Double.NaN   // reported above
                : f.requiredNumber("thickness_mm", new Bound(0, true, MAX_ICE_MM, true), "mm");
        Boolean heightFactor = f.optionalBool("heightFactor", true);
        return new IceSpec.Given(thickness, heightFactor == null || heightFactor);   // null: reported
    }

    private List<CombinationSpec> combinations(JsonNode array, String path, boolean hasWind, boolean hasIce) {
        int before = problems.count();
        List<CombinationSpec> list = new ArrayList<>();
        Map<String, String> names = new HashMap<>();
        for (int k = 0; k < array.size(); k++) {
            String itemPath = JsonPaths.index(path, k);
            Fields f = Fields.of(array.get(k), itemPath, problems);
            if (f == null) {
                continue;
            }
            int start = problems.count();
            f.allowOnly(COMBINATION_KEYS);
            String name = f.requiredText("name");
            if (name != null) {
                String first = names.putIfAbsent(name, itemPath);
                if (first != null) {
                    problems.add(f.path("name"), "name '" + name + "' is already used by " + first);
                }
            }
            Map<LoadAction, Double> factors = new EnumMap<>(LoadAction.class);
            for (LoadAction a : LoadAction.values()) {
                double v = f.optionalNumber(a.jsonName(), new Bound(0, true, MAX_FACTOR, true), "", 0.0);
                if (v != 0) {
                    factors.put(a, v);
                }
            }
            if (factors.get(LoadAction.WIND) != null && !hasWind) {
                problems.add(f.path("wind"), "the model has no wind (loads.wind)");
            }
            if (factors.get(LoadAction.WIND_ON_ICE) != null && !(hasWind && hasIce)) {
                problems.add(f.path("windOnIce"), "needs both loads.wind and loads.ice");
            }
            if (factors.get(LoadAction.ICE) != null && !hasIce) {
                problems.add(f.path("ice"), "the model has no ice (loads.ice)");
            }
            if (problems.count() == start && factors.isEmpty()) {
                problems.add(f.path(), "must give a factor > 0 for at least one of dead, wind, ice, windOnIce, nodal");
            }
            if (problems.count() == start) {
                list.add(new CombinationSpec(name, factors));
            }
        }
        return problems.count() == before ? list : null;
    }

    private double sweepStep(Fields loads) {
        double step = Values.number(loads.get("sweepStep"), loads.path("sweepStep"), new Bound(MIN_STEP, true, 90, true),
                "degrees", problems);
        if (Double.isNaN(step)) {
            return step;
        }
        double n = 360 / step;
        if (Math.abs(n - Math.rint(n)) > 1e-6 * n) {
            problems.add(loads.path("sweepStep"), "360° is not a whole number of steps of " + Numbers.format(step)
                    + "°; give a step that divides 360, such as 10, 5, 2.5, 1, 0.5 or 0.1");
            return Double.NaN;
        }
        return step;
    }
}
