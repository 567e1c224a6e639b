package tetrapod.cli;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.function.IntToDoubleFunction;
import tetrapod.model.spec.ChecksSpec;
import tetrapod.check.MemberUtilisation;
import tetrapod.check.MemberChecker;
import tetrapod.analysis.AnalysisResult;
import tetrapod.analysis.LegBaseExtremes;
import tetrapod.analysis.SolvedCase;
import tetrapod.check.MemberEnvelope;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.Vec3;
import tetrapod.model.spec.AncillarySpec;
import tetrapod.model.spec.TowerSpec;
import tetrapod.solve.MemberEndForces;
import tetrapod.solve.NodeDisplacement;
import tetrapod.model.NodeForce;
import tetrapod.view.Colouring;
import tetrapod.view.MemberScalars;
import tetrapod.view.NodeVector;
import tetrapod.view.ViewAncillary;
import tetrapod.view.ViewCase;
import tetrapod.view.ViewData;

/**
 * The view's data from analysis results: first the envelope over every case (governing
 * utilisation, governing azimuth, the larger of the largest tension and compression), then each
 * case solved in full (axial forces, displacements, reactions), in the order of the results.
 */
final class ResultViews {

    private ResultViews() { }

    /** The items a model's tower carries, for drawing at their heights (m). */
    static List<ViewAncillary> ancillaries(TowerSpec spec) {
        List<ViewAncillary> out = new ArrayList<>();
        for (AncillarySpec a : spec.loads().ancillaries()) {
            if (a instanceof AncillarySpec.Point p) {
                out.add(new ViewAncillary(p.name(), p.height(), p.height(), p.face()));
            } else if (a instanceof AncillarySpec.Linear l) {
                out.add(new ViewAncillary(l.name(), l.from(), l.to(), l.face()));
            }
        }
        return out;
    }

    /**
     * Everything to show of {@code result}, starting with the envelope coloured by utilisation; each
     * case solved in full carries its members' axial forces and their strength utilisations under
     * {@code checks} in that case, so that stepping from the envelope to a case keeps a utilisation
     * colouring (issue 16 item 8).
     */
    static ViewData of(AnalysisResult result, ChecksSpec checks) {
        Frame frame = result.tower().frame();
        MemberChecker checker = MemberChecker.of(result.tower(), checks);
        List<ViewCase> cases = new ArrayList<>();
        cases.add(envelope(frame, result));
        for (SolvedCase c : result.cases()) {
            cases.add(solved(frame, c, checker));
        }
        return new ViewData(frame, cases, Colouring.UTILISATION);
    }

    /**
     * The envelope of {@code result} alone, coloured by utilisation: what tower.png shows, without
     * the cases solved in full that only the viewer steps through (their checks took a third of the
     * picture's time).
     */
    static ViewData envelopeOf(AnalysisResult result) {
        Frame frame = result.tower().frame();
        return new ViewData(frame, List.of(envelope(frame, result)), Colouring.UTILISATION);
    }

    private static ViewCase envelope(Frame frame, AnalysisResult result) {
        Map<Integer, MemberEnvelope> byId = new HashMap<>();
        result.members().forEach(e -> byId.put(e.member(), e));
        int n = frame.members().size();
        double[] utilisation = new double[n];
        double[] azimuth = new double[n];
        double[] axial = new double[n];
        List<String> notes = new ArrayList<>(n);
        List<Integer> breaks = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            MemberEnvelope e = byId.get(frame.members().get(k).id());
            if (e == null || e.governing() == null) {
                utilisation[k] = Double.NaN;
                azimuth[k] = Double.NaN;
                axial[k] = Double.NaN;
                notes.add("");
                continue;
            }
            utilisation[k] = e.governing().utilisation();
            Double az = e.governingWhere().azimuthDeg();
            azimuth[k] = az == null ? Double.NaN : az;
            double t = e.maxTension().value();
            double c = e.maxCompression().value();
            axial[k] = t >= c ? t : -c;
            StringBuilder note = new StringBuilder(String.format(Locale.ROOT, "%s %.3f, %s; case %s",
                    e.governing().mode().jsonName(), e.governing().utilisation(), e.governing().clause(),
                    e.governingWhere().caseId()));
            for (var q : e.requirements()) {
                if (!q.passes()) {
                    note.append(String.format(Locale.ROOT, "; breaks the %s (%.3f, %s)", q.mode().label(),
                            q.utilisation(), q.clause()));
                }
            }
            if (!e.requirementsMet()) {
                breaks.add(k);
            }
            notes.add(note.toString());
        }
        Map<Colouring, MemberScalars> scalars = new EnumMap<>(Colouring.class);
        scalars.put(Colouring.UTILISATION, MemberScalars.of(utilisation));
        scalars.put(Colouring.AZIMUTH, MemberScalars.of(azimuth));
        scalars.put(Colouring.AXIAL, MemberScalars.of(axial));
        List<NodeVector> reactions = governingReactions(result);
        return new ViewCase("envelope over " + result.caseCount() + (result.caseCount() == 1 ? " case" : " cases")
                + (reactions.isEmpty() ? "" : "; base reactions of each leg in its case of largest compression"),
                OptionalDouble.empty(), scalars, List.of(), reactions, notes, breaks);
    }

    /**
     * Each leg base's reaction (the force the support exerts, N) in the case of its largest
     * compression, which is solved in full; legs whose case is not among those solved in full are left out.
     */
    static List<NodeVector> governingReactions(AnalysisResult result) {
        Map<String, SolvedCase> byId = new HashMap<>();
        result.cases().forEach(c -> byId.put(c.id(), c));
        List<NodeVector> out = new ArrayList<>();
        for (LegBaseExtremes leg : result.legBases()) {
            SolvedCase c = leg.compression().caseId() == null ? null : byId.get(leg.compression().caseId());
            if (c == null) {
                continue;
            }
            for (NodeForce r : c.solution().reactions()) {
                if (r.node() == leg.node()) {
                    out.add(new NodeVector(r.node(), new Vec3(r.component(0), r.component(1), r.component(2))));
                }
            }
        }
        return out;
    }

    private static ViewCase solved(Frame frame, SolvedCase c, MemberChecker checker) {
        Map<Integer, Double> forces = new HashMap<>();
        Map<Integer, MemberEndForces> ends = new HashMap<>();
        for (MemberEndForces f : c.solution().memberForces()) {
            forces.put(f.member(), f.axial());
            ends.put(f.member(), f);
        }
        List<Member> members = frame.members();
        double[] axial = new double[members.size()];
        double[] utilisation = new double[members.size()];
        for (int k = 0; k < axial.length; k++) {
            axial[k] = forces.getOrDefault(members.get(k).id(), Double.NaN);
        }
        IntToDoubleFunction axialByIndex = k -> Double.isNaN(axial[k]) ? 0.0 : axial[k];
        for (int k = 0; k < axial.length; k++) {
            Member m = members.get(k);
            MemberEndForces f = ends.get(m.id());
            if (f == null) {
                utilisation[k] = Double.NaN;
                continue;
            }
            // the numbers of the checks (the same bits as their governing utilisation), no notes:
            // end actions at i and j, as the sweep takes them, my and mz at each end
            MemberUtilisation u = checker.utilisation(k);
            int state = u.state(axialByIndex);
            double design = u.designAxial(f.axial(), axialByIndex);
            utilisation[k] = m.axialOnly() ? u.of(state, design, 0, 0, 0, 0)
                    : u.of(state, design, f.atI().my(), f.atJ().my(), f.atI().mz(), f.atJ().mz());
        }
        List<NodeVector> displacements = new ArrayList<>();
        for (NodeDisplacement d : c.solution().displacements()) {
            displacements.add(new NodeVector(d.node(), new Vec3(d.ux(), d.uy(), d.uz())));
        }
        List<NodeVector> reactions = new ArrayList<>();
        for (NodeForce r : c.solution().reactions()) {
            reactions.add(new NodeVector(r.node(), new Vec3(r.component(0), r.component(1), r.component(2))));
        }
        OptionalDouble az = c.azimuthDeg() == null ? OptionalDouble.empty() : OptionalDouble.of(c.azimuthDeg());
        return new ViewCase(c.id(), az, Map.of(Colouring.AXIAL, MemberScalars.of(axial),
                Colouring.UTILISATION, MemberScalars.of(utilisation)), displacements, reactions, List.of());
    }
}
