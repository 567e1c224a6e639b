package tetrapod.report;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;
import tetrapod.analysis.AnalysisResult;
import tetrapod.analysis.AutoRestraintPeak;
import tetrapod.analysis.AzimuthUtilisation;
import tetrapod.analysis.ComputedStructuralFactor;
import tetrapod.analysis.HandComparison;
import tetrapod.analysis.HandGoverning;
import tetrapod.analysis.LegBaseExtremes;
import tetrapod.analysis.LegBaseSweep;
import tetrapod.analysis.MotionPeak;
import tetrapod.analysis.Movement;
import tetrapod.analysis.NaturalMode;
import tetrapod.analysis.SecondOrder;
import tetrapod.analysis.ServiceMotion;
import tetrapod.analysis.ServiceabilityResult;
import tetrapod.analysis.SolvedCase;
import tetrapod.check.Extreme;
import tetrapod.check.FoundationEnvelope;
import tetrapod.check.HandMethod;
import tetrapod.check.MemberEnvelope;
import tetrapod.check.MemberForces;
import tetrapod.generate.SteelMass;
import tetrapod.generate.Tower;
import tetrapod.io.ResultsReader;
import tetrapod.io.SpecWriter;
import tetrapod.load.Asce7GustFactor;
import tetrapod.load.Asce7Ice;
import tetrapod.load.AzimuthWind;
import tetrapod.load.Combination;
import tetrapod.load.En1991StructuralFactor;
import tetrapod.load.PanelForce;
import tetrapod.load.ResponseFactor;
import tetrapod.load.ServiceWind;
import tetrapod.model.Frame;
import tetrapod.model.Material;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.NodeForce;
import tetrapod.model.Restraint;
import tetrapod.model.SectionProperties;
import tetrapod.model.Support;
import tetrapod.model.Vec3;
import tetrapod.model.spec.ActionFactorSet;
import tetrapod.model.spec.ActionFactors;
import tetrapod.model.spec.LoadAction;
import tetrapod.model.spec.TowerSpec;
import tetrapod.model.spec.WindSpec;
import tetrapod.solve.AutoRestraint;
import tetrapod.solve.ContinuityNode;
import tetrapod.solve.MemberEndForces;
import tetrapod.solve.NodeDisplacement;
import tetrapod.solve.Solution;
import tetrapod.solve.StructuralModel;

/**
 * results.json as ordered plain values (the machine contract of DESIGN.md and
 * docs/results.schema.json): SI base units, N positive in tension, reactions the forces the
 * supports exert. Same input, same document.
 */
public final class ResultsDocument {

    public static final String FORMAT = ResultsReader.FORMAT;

    private ResultsDocument() { }

    /**
     * The document for {@code result} of {@code spec}.
     *
     * @param defaulted JSON paths of the spec's values that the model file did not give and Tetrapod
     *                  filled in (see {@link tetrapod.io.DefaultedKeys}), listed as {@code defaults}
     */
    public static Map<String, Object> build(TowerSpec spec, AnalysisResult result, List<String> defaulted) {
        return build(spec, result, defaulted, null);
    }

    /**
     * The model file a results document was computed from and the program that computed it, for
     * the report's title block: the file's name, the SHA-256 of its bytes (hex) and the program
     * with its version.
     */
    public record Source(String file, String sha256, String program) {
        Map<String, Object> toMap() {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("file", file);
            m.put("sha256", sha256);
            m.put("program", program);
            return m;
        }
    }

    /** The document for {@code result} of {@code spec}, with its {@code source} when given (else none). */
    public static Map<String, Object> build(TowerSpec spec, AnalysisResult result, List<String> defaulted,
                                            Source source) {
        return build(spec, result, defaulted, source, new ComputedStructuralFactor.Resolved(spec, Optional.empty(), true));
    }

    /** As above, with the wind's response factor as used and as computed from the tower. */
    public static Map<String, Object> build(TowerSpec spec, AnalysisResult result, List<String> defaulted,
                                            Source source, ComputedStructuralFactor.Resolved factor) {
        Optional<ResponseFactor> computed = factor.computed();
        boolean given = factor.given();
        Map<String, Object> doc = new LinkedHashMap<>();
        doc.put("format", FORMAT);
        if (source != null) {
            doc.put("source", source.toMap());
        }
        doc.put("input", SpecWriter.toMap(spec));
        doc.put("basis", basis(spec));
        doc.put("model", model(result.model(), result.autoRestraints()));
        Set<Integer> axialOnly = new HashSet<>();
        result.model().frame().members().stream().filter(Member::axialOnly).forEach(mb -> axialOnly.add(mb.id()));
        Set<String> withVectors = result.governingCaseIds();
        doc.put("cases", result.cases().stream()
                .map(c -> solvedCase(c, axialOnly, c.azimuthDeg() == null || withVectors.contains(c.id()))).toList());
        if (spec.loads().wind() instanceof WindSpec.En1991 en) {
            doc.put("structuralFactor", structuralFactor(en, given,
                    computed.filter(En1991StructuralFactor.class::isInstance).map(En1991StructuralFactor.class::cast)));
        } else if (spec.loads().wind() instanceof WindSpec.Asce7 a) {
            doc.put("gustFactor", gustFactor(a, given,
                    computed.filter(Asce7GustFactor.class::isInstance).map(Asce7GustFactor.class::cast)));
        }
        doc.put("secondOrder", secondOrder(result.secondOrder()));
        doc.put("wind", result.wind().stream().map(ResultsDocument::wind).toList());
        doc.put("sweep", sweep(result));
        doc.put("checks", result.members().stream().map(ResultsDocument::memberCheck).toList());
        doc.put("requirements", result.members().stream().flatMap(ResultsDocument::requirements).toList());
        doc.put("modes", result.modes().stream().map(mode -> mode(mode, result.tower().frame())).toList());
        doc.put("serviceability", result.serviceabilityResult().map(ResultsDocument::serviceability).orElse(null));
        doc.put("foundations", result.foundations().stream().map(ResultsDocument::foundation).toList());
        doc.put("legBases", result.legBases().stream().map(ResultsDocument::legBase).toList());
        doc.put("handMethod", result.hand().stream().map(ResultsDocument::hand).toList());
        doc.put("handMethodGoverning", result.handGoverning().map(ResultsDocument::handGoverning).orElse(null));
        doc.put("ice", ice(result));
        doc.put("combinations", result.loads().combinations().stream().map(ResultsDocument::combination).toList());
        doc.put("material", material(result.tower().frame().material()));
        doc.put("steel", steel(result.tower()));
        doc.put("defaults", List.copyOf(defaulted));
        return doc;
    }

    /** The design basis, its action factors, and one warning per value of the other family (allowed by mixedBasis). */
    private static Map<String, Object> basis(TowerSpec spec) {
        ActionFactors factors = spec.loads().actionFactorsOrDefault();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("family", spec.basis().jsonName());
        m.put("actionFactors", factors.set().jsonName());
        m.put("reliabilityClass", factors.set() == ActionFactorSet.EN1993_3_1 ? factors.reliabilityClass() : null);
        m.put("mixedBasis", spec.mixedBasis());
        m.put("warnings", spec.basisMixes().stream().map(x -> x.describe(spec.basis())).toList());
        return m;
    }

    private static Map<String, Object> combination(Combination c) {
        Map<String, Object> factors = new LinkedHashMap<>();
        for (LoadAction a : LoadAction.values()) {
            if (c.factor(a) != 0) {
                factors.put(a.jsonName(), c.factor(a));
            }
        }
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("name", c.name());
        m.put("factors", factors);
        m.put("wind", c.hasWind());
        return m;
    }

    private static Map<String, Object> material(Material material) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("name", material.name());
        m.put("E", material.e());
        m.put("G", material.g());
        m.put("density", material.density());
        List<Map<String, Object>> bands = new ArrayList<>();
        for (Material.StrengthBand b : material.bands()) {
            Map<String, Object> band = new LinkedHashMap<>();
            band.put("maxThickness", Double.isFinite(b.maxThickness()) ? b.maxThickness() : null);
            band.put("fy", b.fy());
            band.put("fu", b.fu());
            bands.add(band);
        }
        m.put("strengths", bands);
        m.put("source", material.source());
        return m;
    }

    private static Map<String, Object> steel(Tower tower) {
        Map<String, Object> byRole = new LinkedHashMap<>();
        SteelMass.byRole(tower.frame()).forEach((role, kg) -> byRole.put(role.jsonName(), kg));
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("bareMass", tower.steelMass());
        m.put("connectionAllowance", tower.connectionAllowance());
        m.put("massWithAllowance", tower.steelMassWithAllowance());
        m.put("byRole", byRole);
        return m;
    }

    private static Map<String, Object> memberCheck(MemberEnvelope e) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("member", e.member());
        m.put("utilisation", e.governing().utilisation());
        m.put("mode", e.governing().mode().jsonName());
        m.put("clause", e.governing().clause());
        m.put("note", e.governing().note());
        m.put("case", e.governingWhere().caseId());
        m.put("azimuthDeg", e.governingWhere().azimuthDeg());
        if (e.governingForces() != null) {
            MemberForces f = e.governingForces();
            Map<String, Object> forces = new LinkedHashMap<>();
            forces.put("N", f.axial());
            forces.put("My", List.of(f.myI(), f.myJ()));
            forces.put("Mz", List.of(f.mzI(), f.mzJ()));
            m.put("forces", forces);
        }
        m.put("maxTension", extreme(e.maxTension()));
        m.put("maxCompression", extreme(e.maxCompression()));
        return m;
    }

    private static java.util.stream.Stream<Map<String, Object>> requirements(MemberEnvelope e) {
        return e.requirements().stream().map(r -> {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("member", e.member());
            m.put("rule", r.mode().jsonName());
            m.put("ratio", r.utilisation());
            m.put("met", r.passes());
            m.put("clause", r.clause());
            m.put("note", r.note());
            return m;
        });
    }

    private static Map<String, Object> mode(NaturalMode mode, Frame frame) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("number", mode.number());
        m.put("frequencyHz", mode.frequencyHz());
        m.put("periodS", mode.periodS());
        m.put("kind", mode.kind().label());
        m.put("swayDirectionDeg", mode.swayDirectionDeg());
        Map<String, Object> mass = new LinkedHashMap<>();
        mass.put("x", mode.massX());
        mass.put("y", mode.massY());
        mass.put("z", mode.massZ());
        mass.put("rz", mode.inertiaZ());
        m.put("effectiveMass", mass);
        m.put("residual", mode.residual());
        List<Map<String, Object>> shape = new ArrayList<>(frame.nodes().size());
        double largest = 0;
        for (double v : mode.shape()) {
            largest = Math.max(largest, Math.abs(v));
        }
        RoundOff digits = RoundOff.forLargest(largest);
        for (int n = 0; n < frame.nodes().size(); n++) {
            Map<String, Object> node = new LinkedHashMap<>();
            node.put("node", frame.nodes().get(n).id());
            List<Double> u = new ArrayList<>(6);
            for (int k = 0; k < 6; k++) {
                u.add(digits.apply(mode.shape()[6 * n + k]));
            }
            node.put("u", u);
            shape.add(node);
        }
        m.put("shape", shape);
        return m;
    }

    /**
     * The serviceability envelope: the combination, the service wind, and each level's and
     * ancillary's largest sway (m), tilt and twist (rad) with the azimuth (and height) where each
     * occurs, its limits (null where none) and whether each is met (null without a limit).
     */
    private static Map<String, Object> serviceability(ServiceabilityResult s) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("combination", s.combination());
        m.put("wind", s.serviceWind().map(ResultsDocument::serviceWind).orElse(null));
        m.put("levels", s.levels().stream().map(l -> {
            Map<String, Object> level = new LinkedHashMap<>();
            level.put("level", l.level());
            level.put("z", l.z());
            movements(level, l, false);
            return level;
        }).toList());
        m.put("ancillaries", s.ancillaries().stream().map(a -> {
            Map<String, Object> item = new LinkedHashMap<>();
            item.put("name", a.name());
            item.put("kind", a.linear() ? "linear" : "point");
            item.put("face", a.face().label());
            item.put("zFrom", a.zFrom());
            item.put("zTo", a.zTo());
            movements(item, a, true);
            return item;
        }).toList());
        return m;
    }

    private static Map<String, Object> serviceWind(ServiceWind w) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("method", w.profile().method());
        m.put("rule", w.rule());
        m.put("returnPeriod", finiteOrNull(w.returnPeriod()));
        m.put("probabilityFactor", finiteOrNull(w.probabilityFactor()));
        m.put("speed", finiteOrNull(w.speed()));
        m.put("pressureRatio", w.pressureRatio());
        return m;
    }

    private static void movements(Map<String, Object> m, ServiceMotion motion, boolean withHeight) {
        Map<String, Object> limits = new LinkedHashMap<>();
        Map<String, Object> met = new LinkedHashMap<>();
        for (Movement q : Movement.values()) {
            MotionPeak p = motion.envelope().of(q);
            Map<String, Object> peak = new LinkedHashMap<>();
            peak.put("value", clean(p.value()));
            peak.put("azimuthDeg", p.azimuthDeg());
            if (withHeight) {
                peak.put("z", p.z());
            }
            m.put(q.label(), peak);
            limits.put(q.label(), finiteOrNull(motion.limits().of(q)));
            met.put(q.label(), motion.met(q));
        }
        m.put("limits", limits);
        m.put("met", met);
    }

    private static Double finiteOrNull(double v) {
        return Double.isFinite(v) ? v : null;
    }

    /** An extreme force as {value (N), case, azimuthDeg}; value 0 and case null when it never occurs. */
    private static Map<String, Object> extreme(Extreme e) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("value", clean(e.value()));
        m.put("case", e.caseId());
        m.put("azimuthDeg", e.azimuthDeg());
        return m;
    }

    private static Map<String, Object> foundation(FoundationEnvelope f) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("node", f.node());
        List<Map<String, Object>> checks = new ArrayList<>();
        f.checks().forEach((mode, g) -> {
            Map<String, Object> c = new LinkedHashMap<>();
            c.put("name", mode.jsonName());
            c.put("utilisation", g.check().utilisation());
            c.put("clause", g.check().clause());
            c.put("note", g.check().note());
            c.put("case", g.where().caseId());
            c.put("azimuthDeg", g.where().azimuthDeg());
            c.put("reactions", g.level().jsonName());
            checks.add(c);
        });
        m.put("checks", checks);
        m.put("concreteVolumeRequired", f.concreteVolumeRequired());
        return m;
    }

    private static Map<String, Object> legBase(LegBaseExtremes leg) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("node", leg.node());
        m.put("maxCompression", extreme(leg.compression()));
        m.put("maxUplift", extreme(leg.uplift()));
        m.put("maxShear", extreme(leg.shear()));
        return m;
    }

    private static Map<String, Object> hand(HandComparison h) {
        HandMethod.Result r = h.hand();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("combination", h.combination());
        m.put("azimuthDeg", r.azimuthDeg());
        m.put("N", clean(r.n()));
        m.put("H", clean(r.h()));
        m.put("zH", clean(r.zH()));
        m.put("M", clean(r.m()));
        m.put("d", r.d());
        m.put("legCompression", clean(r.legs().compression()));
        m.put("legTension", clean(r.legs().tension()));
        m.put("fe", Map.of("maxCompression", clean(h.feMaxCompression()), "maxTension", clean(h.feMaxTension())));
        Map<String, Object> diff = new LinkedHashMap<>();
        diff.put("compression", clean(h.compressionDifferencePct()));
        diff.put("tension", clean(h.tensionDifferencePct()));
        m.put("differencePct", diff);
        return m;
    }

    private static Map<String, Object> handGoverning(HandGoverning g) {
        Map<String, Object> m = new LinkedHashMap<>();
        HandComparison c = g.compression();
        m.put("compression", governingCase(c, c.hand().legs().compression(), c.feMaxCompression(),
                c.compressionDifferencePct()));
        HandComparison u = g.uplift();
        m.put("uplift", governingCase(u, u.hand().legs().tension(), u.feMaxTension(), u.tensionDifferencePct()));
        return m;
    }

    private static Map<String, Object> governingCase(HandComparison h, double hand, double fe, double differencePct) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("combination", h.combination());
        m.put("azimuthDeg", h.hand().azimuthDeg());
        m.put("N", clean(h.hand().n()));
        m.put("M", clean(h.hand().m()));
        m.put("hand", clean(hand));
        m.put("fe", clean(fe));
        m.put("differencePct", clean(differencePct));
        return m;
    }

    /** The ice and its design thickness at 33 ft and at the top of the tower; null without ice. */
    private static Map<String, Object> ice(AnalysisResult result) {
        Asce7Ice ice = result.loads().icing();
        if (ice.isNone()) {
            return null;
        }
        Asce7Ice.MapValues map = ice.map();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("rule", map == null ? "given" : "asce7");
        m.put("nominalThickness", map == null ? null : map.nominal());
        m.put("importanceFactor", map == null ? null : map.importanceFactor());
        m.put("topographicFactor", map == null ? null : map.topographicFactor());
        m.put("heightFactor", ice.heightFactor());
        m.put("density", ice.density());
        m.put("referenceHeight", Asce7Ice.REFERENCE_HEIGHT);
        m.put("designThicknessAtReference", ice.thicknessAt(Asce7Ice.REFERENCE_HEIGHT));
        double top = result.tower().height();
        m.put("topHeight", top);
        m.put("designThicknessAtTop", ice.thicknessAt(top));
        return m;
    }

    private static Map<String, Object> wind(AzimuthWind w) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("azimuthDeg", w.azimuthDeg());
        List<Map<String, Object>> panels = new ArrayList<>();
        for (PanelForce p : w.panels()) {
            Map<String, Object> panel = new LinkedHashMap<>();
            panel.put("panel", p.panel());
            panel.put("zBottom", p.zBottom());
            panel.put("zTop", p.zTop());
            panel.put("zRef", p.zRef());
            panel.put("q", p.q());
            panel.put("solidity", p.solidity());
            panel.put("cf", p.cf());
            panel.put("area", p.area());
            panel.put("force", List.of(clean(p.fx()), clean(p.fy())));
            panels.add(panel);
        }
        m.put("panels", panels);
        return m;
    }

    private static Map<String, Object> sweep(AnalysisResult result) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("stepDeg", result.loads().sweepStep());
        List<Map<String, Object>> bases = new ArrayList<>();
        for (LegBaseSweep s : result.sweep()) {
            Map<String, Object> b = new LinkedHashMap<>();
            b.put("node", s.node());
            b.put("combination", s.combination());
            b.put("azimuthDeg", s.azimuthDeg());
            b.put("Fz", s.fz().stream().map(ResultsDocument::clean).toList());
            b.put("Fh", s.fh().stream().map(ResultsDocument::clean).toList());
            bases.add(b);
        }
        m.put("legBases", bases);
        Map<String, Object> worst = new LinkedHashMap<>();
        List<AzimuthUtilisation> rows = result.utilisationByAzimuth();
        worst.put("azimuthDeg", rows.stream().map(AzimuthUtilisation::azimuthDeg).toList());
        worst.put("utilisation", rows.stream().map(AzimuthUtilisation::utilisation).toList());
        worst.put("member", rows.stream().map(AzimuthUtilisation::member).toList());
        worst.put("combination", rows.stream().map(AzimuthUtilisation::combination).toList());
        m.put("maxUtilisation", worst);
        return m;
    }

    private static Map<String, Object> model(StructuralModel model, List<AutoRestraintPeak> autoRestraints) {
        Frame frame = model.frame();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("name", frame.name());
        m.put("idealisation", frame.idealisation().jsonName());
        m.put("nodes", frame.nodes().stream().map(ResultsDocument::node).toList());
        m.put("members", frame.members().stream().map(member -> member(member, frame)).toList());
        m.put("supports", frame.supports().stream().map(ResultsDocument::support).toList());
        m.put("autoRestraints", autoRestraints.stream().map(ResultsDocument::autoRestraint).toList());
        m.put("continuityNodes", model.continuityNodes().stream().map(ResultsDocument::continuity).toList());
        return m;
    }

    private static Map<String, Object> node(Node n) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("id", n.id());
        m.put("x", n.x());
        m.put("y", n.y());
        m.put("z", n.z());
        return m;
    }

    private static Map<String, Object> member(Member member, Frame frame) {
        SectionProperties p = member.section().properties();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("id", member.id());
        m.put("i", member.i());
        m.put("j", member.j());
        m.put("role", member.role().jsonName());
        m.put("segment", member.segment());
        m.put("panel", member.panel());
        m.put("face", member.face().label());
        m.put("section", member.section().name());
        m.put("A", p.area());
        // Local y is the major principal axis u–u, local z the minor v–v (tetrapod.solve package-info).
        m.put("Iy", p.iu());
        m.put("Iz", p.iv());
        m.put("J", p.torsion());
        m.put("E", frame.material().e());
        m.put("G", frame.material().g());
        m.put("axialOnly", member.axialOnly());
        m.put("orientation", vector(member.orientation()));
        return m;
    }

    private static Map<String, Object> support(Support s) {
        List<Integer> flags = new ArrayList<>(6);
        for (int k = 0; k < 6; k++) {
            flags.add(s.restraint().holds(k) ? 1 : 0);
        }
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("node", s.node());
        m.put("restraint", flags);
        return m;
    }

    private static Map<String, Object> autoRestraint(AutoRestraintPeak peak) {
        AutoRestraint r = peak.restraint();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("node", r.node());
        m.put("dof", r.dof());
        m.put("direction", vector(r.direction()));
        m.put("reason", r.reason());
        m.put("largestForce", clean(peak.force()));
        m.put("largestForceCase", peak.caseId());
        return m;
    }

    private static Map<String, Object> continuity(ContinuityNode c) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("node", c.node());
        m.put("line", List.of(c.lineStart(), c.lineEnd()));
        m.put("stiffness", c.stiffness());
        return m;
    }

    /**
     * A case solved in full. Its load vector, displacements and member end forces are written when
     * {@code withVectors} (docs/methods.md, "The cases written in full"); its reactions, equilibrium
     * residual and α_cr always.
     *
     * @param axialOnly the ids of the members that carry axial force only: their N alone is written
     */
    private static Map<String, Object> solvedCase(SolvedCase c, Set<Integer> axialOnly, boolean withVectors) {
        Solution s = c.solution();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("id", c.id());
        m.put("combination", c.combination());
        m.put("azimuthDeg", c.azimuthDeg());
        if (withVectors) {
            m.put("loads", nodeForces(summedByNode(s.loads().loads())));
            RoundOff displacementDigits = RoundOff.forLargest(largestDisplacement(s.displacements()));
            m.put("displacements", s.displacements().stream().map(d -> displacement(d, displacementDigits)).toList());
        }
        m.put("reactions", nodeForces(s.reactions()));
        if (withVectors) {
            RoundOff forceDigits = RoundOff.forLargest(largestEndForce(s.memberForces()));
            m.put("memberForces", s.memberForces().stream()
                    .map(f -> memberForces(f, axialOnly.contains(f.member()), forceDigits)).toList());
        }
        m.put("equilibriumError", s.equilibriumError());
        m.put("alphaCr", Double.isFinite(c.alphaCr()) ? c.alphaCr() : null);
        m.put("windAmplification", c.windAmplification());
        return m;
    }

    private static double largestDisplacement(List<NodeDisplacement> displacements) {
        double largest = 0;
        for (NodeDisplacement d : displacements) {
            for (int k = 0; k < 6; k++) {
                largest = Math.max(largest, Math.abs(d.component(k)));
            }
        }
        return largest;
    }

    private static double largestEndForce(List<MemberEndForces> forces) {
        double largest = 0;
        for (MemberEndForces f : forces) {
            largest = Math.max(largest, Math.abs(f.axial()));
            for (int k = 0; k < 6; k++) {
                largest = Math.max(largest, Math.max(Math.abs(f.atI().component(k)), Math.abs(f.atJ().component(k))));
            }
        }
        return largest;
    }

    /** The load vector with the entries of each node added up, in ascending node id. */
    static List<NodeForce> summedByNode(List<NodeForce> loads) {
        Map<Integer, double[]> sums = new TreeMap<>();
        for (NodeForce f : loads) {
            double[] sum = sums.computeIfAbsent(f.node(), k -> new double[6]);
            for (int k = 0; k < 6; k++) {
                sum[k] += f.component(k);
            }
        }
        List<NodeForce> out = new ArrayList<>(sums.size());
        sums.forEach((node, v) -> out.add(new NodeForce(node, v[0], v[1], v[2], v[3], v[4], v[5])));
        return out;
    }

    private static List<Map<String, Object>> nodeForces(List<NodeForce> forces) {
        List<Map<String, Object>> out = new ArrayList<>(forces.size());
        for (NodeForce f : forces) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("node", f.node());
            m.put("F", six(f::component));
            out.add(m);
        }
        return out;
    }

    private static Map<String, Object> displacement(NodeDisplacement d, RoundOff digits) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("node", d.node());
        m.put("u", six(k -> digits.apply(d.component(k))));
        return m;
    }

    /** A member's end forces; of an axial-only member its N alone (its end forces are −N and N along its axis). */
    private static Map<String, Object> memberForces(MemberEndForces f, boolean axialOnly, RoundOff digits) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("member", f.member());
        m.put("N", digits.apply(f.axial()));
        if (!axialOnly) {
            m.put("endI", six(k -> digits.apply(f.atI().component(k))));
            m.put("endJ", six(k -> digits.apply(f.atJ().component(k))));
        }
        return m;
    }

    private static List<Double> six(java.util.function.IntToDoubleFunction component) {
        List<Double> v = new ArrayList<>(6);
        for (int k = 0; k < 6; k++) {
            v.add(clean(component.applyAsDouble(k)));
        }
        return v;
    }

    private static List<Double> vector(Vec3 v) {
        return List.of(clean(v.x()), clean(v.y()), clean(v.z()));
    }

    /** −0.0 written as 0.0, so that equal results give equal text. */
    private static double clean(double v) {
        return v == 0 ? 0.0 : v;
    }

    /** EN 1993-1-1 5.2.2(5)B: the smallest first-order α_cr and the wind amplification it asked for. */
    private static Map<String, Object> secondOrder(SecondOrder so) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("alphaCr", Double.isFinite(so.alphaCr()) ? so.alphaCr() : null);
        m.put("case", so.caseId());
        m.put("amplification", so.amplification());
        m.put("applied", so.applied());
        m.put("beyondAmplification", so.beyondAmplification());
        return m;
    }

    /**
     * G as used: given by the user, or from the first sway frequency by ASCE 7 §26.11; with the
     * computed value and its steps whenever it was computed (beside a given one too).
     */
    private static Map<String, Object> gustFactor(WindSpec.Asce7 a, boolean given, Optional<Asce7GustFactor> computed) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("value", given || computed.isEmpty() ? a.gustFactor() : computed.get().value());
        m.put("source", given || computed.isEmpty() ? "given" : computed.get().flexible() ? "flexible" : "rigid");
        computed.ifPresent(g -> {
            m.put("computed", g.value());
            m.put("flexible", g.flexible());
            m.put("method", g.flexible() ? "ASCE 7-16 26.11.5 (26.11-10)" : "ASCE 7-16 26.11.1 (rigid, n1 >= 1 Hz)");
            m.put("frequencyHz", g.frequency());
            m.put("dampingRatio", g.dampingRatio());
            m.put("height", g.height());
            m.put("width", g.width());
            m.put("equivalentHeight", g.equivalentHeight());
            m.put("turbulenceIntensity", g.turbulence());
            m.put("lengthScale", g.lengthScale());
            m.put("background", g.background());
            m.put("meanVelocity", g.meanVelocity());
            m.put("resonant", g.resonant());
            m.put("resonantPeakFactor", g.resonantPeak());
        });
        return m;
    }

    /**
     * c_s·c_d as used: given by the user, or computed by EN 1991-1-4 Annex B; with the computed value
     * and its steps whenever it was computed (beside a given one too).
     */
    private static Map<String, Object> structuralFactor(WindSpec.En1991 en, boolean given,
                                                        Optional<En1991StructuralFactor> computed) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("value", given || computed.isEmpty() ? en.structuralFactor() : computed.get().value());
        m.put("source", given || computed.isEmpty() ? "given" : "computed");
        computed.ifPresent(f -> {
            m.put("computed", f.value());
            m.put("method", "EN 1991-1-4 6.3.1 (6.2) with Annex B, damping F.5");
            m.put("frequencyHz", f.frequency());
            m.put("structuralDamping", f.structuralDamping());
            m.put("aerodynamicDamping", f.aerodynamicDamping());
            m.put("logDecrement", f.logDecrement());
            m.put("height", f.height());
            m.put("width", f.width());
            m.put("referenceHeight", f.referenceHeight());
            m.put("turbulenceIntensity", f.turbulence());
            m.put("meanVelocity", f.meanVelocity());
            m.put("lengthScale", f.lengthScale());
            m.put("background", f.background());
            m.put("resonant", f.resonant());
            m.put("upCrossingHz", f.upCrossing());
            m.put("peakFactor", f.peakFactor());
        });
        return m;
    }
}
