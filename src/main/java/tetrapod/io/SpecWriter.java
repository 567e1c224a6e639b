package tetrapod.io;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import tetrapod.model.Face;
import tetrapod.model.Restraint;
import tetrapod.model.Role;
import tetrapod.model.spec.AncillarySpec;
import tetrapod.model.spec.CombinationSpec;
import tetrapod.model.spec.BucklingOverride;
import tetrapod.model.spec.ChecksSpec;
import tetrapod.model.spec.ConnectionSpec;
import tetrapod.model.spec.ExplicitFrameSpec;
import tetrapod.model.spec.FoundationSpec;
import tetrapod.model.spec.ExplicitFrameSpec.MemberSpec;
import tetrapod.model.spec.ExplicitFrameSpec.NodeSpec;
import tetrapod.model.spec.ExplicitFrameSpec.SupportSpec;
import tetrapod.model.spec.IceSpec;
import tetrapod.model.spec.LoadAction;
import tetrapod.model.spec.LoadsSpec;
import tetrapod.model.spec.LoadsSpec.NodalLoadSpec;
import tetrapod.model.spec.MaterialSpec;
import tetrapod.model.spec.PartialFactors;
import tetrapod.model.spec.SegmentSpec;
import tetrapod.model.spec.ServiceabilitySpec;
import tetrapod.model.spec.TowerSpec;
import tetrapod.model.spec.ActionFactorSet;
import tetrapod.model.spec.ActionFactors;
import tetrapod.model.spec.DesignBasis;
import tetrapod.model.spec.UserSectionSpec;
import tetrapod.model.spec.WindSpec;

/**
 * Writes a {@link TowerSpec} in the model-file format, so that reading the text back gives an
 * equal spec. Keys come in the format's order; defaults are written out (description,
 * idealisation, material, supports, connection allowance, plan levels, top widths, horizontals,
 * crossingConnected, redundants, member role and continuity). What is absent rather than
 * defaulted is left out: equal panels (no panelHeights), no orientation, no mass_kg_per_m, no
 * user sections, no loads (and within loads: no wind, ancillaries, ice, combinations, c_dir table
 * or face; the sweep step only with wind or when it is not the default). An explicit frame has
 * no base, segments, supports or plan levels.
 */
public final class SpecWriter {

    private SpecWriter() { }

    /** The spec as pretty JSON text, ending with a newline. */
    public static String write(TowerSpec spec) {
        return JsonOutput.toJson(toMap(spec));
    }

    /** Replaces {@code file} atomically with the spec as pretty JSON. */
    public static void write(Path file, TowerSpec spec) throws IOException {
        JsonOutput.write(file, toMap(spec));
    }

    /**
     * The spec as ordered plain values (maps, lists, text, numbers, booleans) for
     * {@link JsonOutput}, e.g. to embed it in a results file.
     */
    public static Map<String, Object> toMap(TowerSpec spec) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("name", spec.name());
        m.put("description", spec.description());
        if (!spec.project().isEmpty()) {
            m.put("project", ProjectReader.toMap(spec.project()));
        }
        m.put("idealisation", spec.idealisation().jsonName());
        m.put("basis", spec.basis().jsonName());
        if (spec.mixedBasis()) {
            m.put("mixedBasis", true);
        }
        if (!spec.isExplicit()) {
            m.put("base", ordered("widthX", spec.base().widthX(), "widthY", spec.base().widthY()));
            m.put("segments", spec.segments().stream().map(SpecWriter::segment).toList());
        }
        m.put("material", material(spec.material()));
        if (!spec.isExplicit()) {
            m.put("supports", spec.supports().jsonName());
        }
        m.put("connectionAllowance", spec.connectionAllowance());
        if (!spec.isExplicit()) {
            m.put("planBracingLevels", spec.planBracingLevels());
        }
        if (!spec.userSections().isEmpty()) {
            Map<String, Object> sections = new TreeMap<>();
            spec.userSections().forEach((name, section) -> sections.put(name, userSection(section)));
            m.put("userSections", sections);
        }
        spec.explicitFrame().ifPresent(frame -> m.put("frame", frame(frame)));
        Map<String, Object> loads = loads(spec.loads(), spec.basis());
        if (!loads.isEmpty()) {
            m.put("loads", loads);
        }
        m.put("checks", checks(spec.checks()));
        if (!spec.serviceability().isEmpty()) {
            m.put("serviceability", serviceability(spec.serviceability()));
        }
        return m;
    }

    /** {@code serviceability}, as given: the service wind's one key, the level ranges and item limits. */
    private static Map<String, Object> serviceability(ServiceabilitySpec s) {
        Map<String, Object> m = new LinkedHashMap<>();
        if (s.wind() != null) {
            m.put("wind", ordered(s.wind().key(), s.wind().value()));
        }
        if (!s.levels().isEmpty()) {
            m.put("levels", s.levels().stream().map(l -> {
                Map<String, Object> level = new LinkedHashMap<>();
                putIfGiven(level, "from", l.from());
                putIfGiven(level, "to", l.to());
                level.putAll(limits(l.limits()));
                return level;
            }).toList());
        }
        if (!s.ancillaries().isEmpty()) {
            m.put("ancillaries", s.ancillaries().stream().map(a -> {
                Map<String, Object> item = new LinkedHashMap<>();
                item.put("name", a.name());
                item.putAll(limits(a.limits()));
                return item;
            }).toList());
        }
        return m;
    }

    private static Map<String, Object> limits(ServiceabilitySpec.LimitSpec l) {
        Map<String, Object> m = new LinkedHashMap<>();
        putIfGiven(m, "sway_mm", l.swayMm());
        putIfGiven(m, "swayHeightRatio", l.swayHeightRatio());
        putIfGiven(m, "tilt_deg", l.tiltDeg());
        putIfGiven(m, "twist_deg", l.twistDeg());
        return m;
    }

    private static void putIfGiven(Map<String, Object> m, String key, double value) {
        if (!Double.isNaN(value)) {
            m.put(key, value);
        }
    }

    /**
     * {@code checks}: the method always; partial factors when they differ from the recommended
     * ones; buckling overrides, connections and the foundation when given, with their defaults
     * written out.
     */
    private static Map<String, Object> checks(ChecksSpec c) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("method", c.method().jsonName());
        if (!c.partialFactors().equals(PartialFactors.RECOMMENDED)) {
            PartialFactors f = c.partialFactors();
            m.put("partialFactors", ordered("gammaM0", f.gammaM0(), "gammaM1", f.gammaM1(), "gammaM2", f.gammaM2()));
        }
        if (!c.bucklingLengths().isEmpty()) {
            m.put("bucklingLengths", c.bucklingLengths().stream().map(SpecWriter::bucklingOverride).toList());
        }
        if (!c.connections().isEmpty()) {
            m.put("connections", c.connections().stream().map(SpecWriter::connection).toList());
        }
        c.foundationSpec().ifPresent(f -> m.put("foundation", foundation(f)));
        return m;
    }

    private static Map<String, Object> bucklingOverride(BucklingOverride b) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("role", b.role().jsonName());
        if (!b.segments().isEmpty()) {
            m.put("segments", b.segments());
        }
        m.put("minorAxisFactor", b.minorAxisFactor());
        m.put("geometricAxisFactor", b.geometricAxisFactor());
        m.put("crossing", b.crossing().jsonName());
        return m;
    }

    private static Map<String, Object> connection(ConnectionSpec c) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("role", c.role().jsonName());
        if (!c.segments().isEmpty()) {
            m.put("segments", c.segments());
        }
        m.put("bolts", c.bolts());
        m.put("diameter_mm", wholeMillimetres(c.diameter()));
        m.put("grade", c.grade().jsonName());
        m.put("holeClearance_mm", c.holeClearance());
        m.put("endDistance_mm", c.endDistance());
        m.put("edgeDistance_mm", c.edgeDistance());
        m.put("pitch_mm", c.pitch());
        m.put("shearPlanes", c.shearPlanes());
        m.put("threadsInShearPlane", c.threadsInShearPlane());
        m.put("holesInSection", c.holesInSection());
        m.put("connectedLeg", c.connectedLeg().jsonName());
        return m;
    }

    /** A metric bolt size as a whole number (16, not 16.0), as the schema lists the sizes. */
    private static Object wholeMillimetres(double mm) {
        return mm == Math.rint(mm) ? (Object) (int) mm : (Object) mm;
    }

    private static Map<String, Object> foundation(FoundationSpec f) {
        Map<String, Object> m = new LinkedHashMap<>();
        FoundationSpec.Block b = f.block();
        m.put("block", ordered("widthX", b.widthX(), "widthY", b.widthY(), "height", b.height(), "depth", b.depth()));
        m.put("concreteUnitWeight", f.concreteUnitWeight());
        m.put("soilUnitWeight", f.soilUnitWeight());
        m.put("frustumHalfAngle", f.frustumHalfAngle());
        if (f.uplift() instanceof FoundationSpec.FactorOfSafety fs) {
            m.put("uplift", ordered("factorOfSafety", fs.factor()));
        } else {
            m.put("uplift", ordered("gammaStabilising", ((FoundationSpec.PartialFactor) f.uplift()).gammaStabilising()));
        }
        m.put("allowableBearing", f.allowableBearing());
        m.put("friction", f.friction());
        m.put("slidingFactorOfSafety", f.slidingFactorOfSafety());
        if (f.anchorRods() instanceof FoundationSpec.RodsByGrade g) {
            m.put("anchorRods", ordered("count", g.count(), "diameter_mm", wholeMillimetres(g.diameter()), "grade", g.grade().jsonName()));
        } else if (f.anchorRods() instanceof FoundationSpec.RodsByAllowableStress a) {
            m.put("anchorRods", ordered("count", a.count(), "diameter_mm", a.diameter(),
                    "allowableTension", a.allowableTension(), "allowableShear", a.allowableShear()));
        }
        return m;
    }

    private static Map<String, Object> segment(SegmentSpec s) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("height", s.height());
        m.put("topWidthX", s.topWidthX());
        m.put("topWidthY", s.topWidthY());
        m.put("panels", s.panels());
        if (!s.panelHeights().isEmpty()) {
            m.put("panelHeights", s.panelHeights());
        }
        m.put("bracing", s.bracing().jsonName());
        m.put("horizontals", s.horizontals().jsonName());
        m.put("crossingConnected", s.crossingConnected());
        m.put("redundants", s.redundants());
        Map<String, Object> sections = new LinkedHashMap<>();
        for (Role role : Role.values()) {
            if (s.sections().containsKey(role)) {
                sections.put(role.jsonName(), s.sections().get(role));
            }
        }
        m.put("sections", sections);
        return m;
    }

    private static Object material(MaterialSpec material) {
        if (material.isGrade()) {
            return material.name();
        }
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("name", material.name());
        m.put("E", material.e());
        m.put("G", material.g());
        m.put("fy", material.fy());
        m.put("fu", material.fu());
        m.put("density", material.density());
        return m;
    }

    private static Map<String, Object> userSection(UserSectionSpec section) {
        Map<String, Object> body = new LinkedHashMap<>();
        String kind;
        if (section instanceof UserSectionSpec.Angle a) {
            kind = "angle";
            body.put("legA_mm", a.legA());
            body.put("legB_mm", a.legB());
            body.put("t_mm", a.t());
            body.put("r1_mm", a.r1());
            body.put("r2_mm", a.r2());
        } else if (section instanceof UserSectionSpec.Tube t) {
            kind = "tube";
            body.put("d_mm", t.d());
            body.put("t_mm", t.t());
        } else {
            UserSectionSpec.Properties p = (UserSectionSpec.Properties) section;
            kind = "properties";
            body.put("A_cm2", p.area());
            body.put("Iy_cm4", p.iy());
            body.put("Iz_cm4", p.iz());
            body.put("Iv_cm4", p.iv());
            body.put("J_cm4", p.torsion());
            body.put("width_mm", p.width());
            body.put("flatSided", p.flatSided());
            if (!Double.isNaN(p.massPerMetre())) {
                body.put("mass_kg_per_m", p.massPerMetre());
            }
        }
        return ordered(kind, body);
    }

    private static Map<String, Object> frame(ExplicitFrameSpec frame) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("nodes", frame.nodes().stream().map(SpecWriter::node).toList());
        m.put("members", frame.members().stream().map(SpecWriter::member).toList());
        m.put("supports", frame.supports().stream().map(SpecWriter::support).toList());
        return m;
    }

    private static Map<String, Object> node(NodeSpec n) {
        return ordered("id", n.id(), "x", n.x(), "y", n.y(), "z", n.z());
    }

    private static Map<String, Object> member(MemberSpec mem) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("id", mem.id());
        m.put("i", mem.i());
        m.put("j", mem.j());
        m.put("section", mem.section());
        m.put("role", mem.role().jsonName());
        m.put("continuous", mem.continuous());
        if (mem.orientation() != null) {
            m.put("orientation", mem.orientation());
        }
        return m;
    }

    private static Map<String, Object> support(SupportSpec s) {
        if (s.restraint().equals(Restraint.PINNED)) {
            return ordered("node", s.node(), "type", "pinned");
        }
        if (s.restraint().equals(Restraint.FIXED)) {
            return ordered("node", s.node(), "type", "fixed");
        }
        List<Integer> flags = new ArrayList<>();
        for (int dof = 0; dof < Restraint.DOF_NAMES.size(); dof++) {
            flags.add(s.restraint().holds(dof) ? 1 : 0);
        }
        return ordered("node", s.node(), "restraint", flags);
    }

    /**
     * The loads with their defaults written out; nothing for what is absent; the sweep step with wind
     * or when not the default; the action factors with any other load, or alone when they are not
     * the basis's default.
     */
    private static Map<String, Object> loads(LoadsSpec loads, DesignBasis basis) {
        Map<String, Object> m = new LinkedHashMap<>();
        if (!loads.nodal().isEmpty()) {
            m.put("nodal", loads.nodal().stream().map(SpecWriter::nodalLoad).toList());
        }
        if (loads.hasWind()) {
            m.put("wind", wind(loads.wind()));
        }
        if (!loads.ancillaries().isEmpty()) {
            m.put("ancillaries", loads.ancillaries().stream().map(SpecWriter::ancillary).toList());
        }
        if (loads.hasIce()) {
            m.put("ice", ice(loads.ice()));
        }
        if (!loads.combinations().isEmpty()) {
            m.put("combinations", loads.combinations().stream().map(SpecWriter::combination).toList());
        }
        if (loads.hasWind() || loads.sweepStep() != LoadsSpec.DEFAULT_SWEEP_STEP) {
            m.put("sweepStep", loads.sweepStep());
        }
        ActionFactors factors = loads.actionFactorsOrDefault();
        if (!m.isEmpty() || !factors.equals(ActionFactors.defaultFor(basis))) {
            m.put("actionFactors", factors.set().jsonName());
            if (factors.set() == ActionFactorSet.EN1993_3_1) {
                m.put("reliabilityClass", factors.reliabilityClass());
            }
        }
        return m;
    }

    private static Map<String, Object> wind(WindSpec wind) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("method", wind.method());
        if (wind instanceof WindSpec.En1991 en) {
            m.put("basicSpeed", en.basicSpeed());
            m.put("terrain", en.terrain().jsonName());
            if (!en.directionFactors().isEmpty()) {
                m.put("directionFactors", en.directionFactors());
            }
            m.put("seasonFactor", en.seasonFactor());
            m.put("orography", en.orography());
            if (!en.structuralFactorComputed()) {
                m.put("structuralFactor", en.structuralFactor());
            }
            m.put("turbulenceFactor", en.turbulenceFactor());
            m.put("airDensity", en.airDensity());
            m.put("structuralDamping", en.structuralDamping());
        } else if (wind instanceof WindSpec.Asce7 a) {
            m.put("edition", a.edition().jsonName());
            m.put("speed", a.speed());
            m.put("exposure", a.exposure().jsonName());
            m.put("topographicFactor", a.topographicFactor());
            m.put("elevationFactor", a.elevationFactor());
            m.put("directionalityFactor", a.directionalityFactor());
            if (!a.gustFactorComputed()) {
                m.put("gustFactor", a.gustFactor());
            }
            m.put("dampingRatio", a.dampingRatio());
        } else {
            WindSpec.Uniform u = (WindSpec.Uniform) wind;
            m.put("pressure", u.pressure());
            m.put("forceCoefficient", u.forceCoefficient());
        }
        return m;
    }

    private static Map<String, Object> ancillary(AncillarySpec item) {
        Map<String, Object> m = new LinkedHashMap<>();
        if (item instanceof AncillarySpec.Point p) {
            m.put("kind", "point");
            m.put("name", p.name());
            m.put("height", p.height());
            m.put("weight", p.weight());
            m.put("area", p.area());
            m.put("forceCoefficient", p.forceCoefficient());
            m.put("shielding", p.shielding());
        } else {
            AncillarySpec.Linear l = (AncillarySpec.Linear) item;
            m.put("kind", "linear");
            m.put("name", l.name());
            m.put("from", l.from());
            m.put("to", l.to());
            m.put("weight", l.weight());
            m.put("width", l.width());
            m.put("forceCoefficient", l.forceCoefficient());
            m.put("shielding", l.shielding());
        }
        if (item.face() != Face.NONE) {
            m.put("face", item.face().label());
        }
        return m;
    }

    private static Map<String, Object> ice(IceSpec ice) {
        Map<String, Object> m = new LinkedHashMap<>();
        if (ice.thickness() instanceof IceSpec.Asce7Map map) {
            m.put("nominalThickness_mm", map.nominal());
            m.put("importanceFactor", map.importanceFactor());
            m.put("density", ice.density());
        } else {
            IceSpec.Given given = (IceSpec.Given) ice.thickness();
            m.put("thickness_mm", given.thickness());
            m.put("density", ice.density());
            m.put("heightFactor", given.heightFactor());
        }
        if (!Double.isNaN(ice.windSpeed())) {
            m.put("windSpeed", ice.windSpeed());
        }
        if (!Double.isNaN(ice.windPressure())) {
            m.put("windPressure", ice.windPressure());
        }
        return m;
    }

    private static Map<String, Object> combination(CombinationSpec c) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("name", c.name());
        for (LoadAction a : LoadAction.values()) {
            if (c.factors().containsKey(a)) {
                m.put(a.jsonName(), c.factor(a));
            }
        }
        return m;
    }

    private static Map<String, Object> nodalLoad(NodalLoadSpec load) {
        boolean moments = load.mx() != 0 || load.my() != 0 || load.mz() != 0;
        List<Double> f = moments
                ? List.of(load.fx(), load.fy(), load.fz(), load.mx(), load.my(), load.mz())
                : List.of(load.fx(), load.fy(), load.fz());
        return ordered("node", load.node(), "F", f);
    }

    /** A map keeping the order of its alternating key, value arguments. */
    private static Map<String, Object> ordered(Object... keysAndValues) {
        Map<String, Object> m = new LinkedHashMap<>();
        for (int k = 0; k < keysAndValues.length; k += 2) {
            m.put((String) keysAndValues[k], keysAndValues[k + 1]);
        }
        return m;
    }
}
