package tetrapod.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import tetrapod.model.spec.WindSpec;
import tetrapod.analysis.ComputedStructuralFactor;
import tetrapod.load.Asce7GustFactor;
import tetrapod.load.En1991StructuralFactor;
import tetrapod.load.ResponseFactor;
import tetrapod.model.spec.ActionFactorSet;
import tetrapod.model.spec.ActionFactors;
import tetrapod.model.spec.BasisMix;
import tetrapod.model.spec.TowerSpec;
import java.util.Map;
import tetrapod.analysis.Analysis;
import tetrapod.analysis.AnalysisResult;
import tetrapod.analysis.AutoRestraintPeak;
import tetrapod.analysis.HandComparison;
import tetrapod.analysis.LegBaseExtremes;
import tetrapod.analysis.NaturalMode;
import tetrapod.analysis.SecondOrder;
import tetrapod.analysis.SolvedCase;
import tetrapod.analysis.MotionPeak;
import tetrapod.analysis.Movement;
import tetrapod.analysis.ServiceMotion;
import tetrapod.analysis.ServiceabilityResult;
import tetrapod.analysis.ServiceabilityVerdict;
import tetrapod.load.ServiceWind;
import tetrapod.check.CheckResult;
import tetrapod.check.Extreme;
import tetrapod.check.RequirementVerdict;
import tetrapod.check.FoundationEnvelope;
import tetrapod.check.MemberEnvelope;
import tetrapod.load.Asce7Ice;
import tetrapod.load.CaseKey;
import tetrapod.model.Frame;
import tetrapod.model.Member;

/** The short summary {@code analyze} prints: governing members, leg bases, footings, hand method, verdict. */
final class AnalysisSummary {

    private static final int MOST_UTILISED = 5;

    private AnalysisSummary() { }

    static void print(PrintWriter out, TowerSpec spec, AnalysisResult r,
                      ComputedStructuralFactor.Resolved computed) {
        Frame frame = r.tower().frame();
        out.printf(Locale.ROOT, "%s: %s, %d nodes, %d members; %d load cases (%d combinations, sweep step %s deg)%n",
                frame.name(), frame.idealisation().jsonName(), frame.nodes().size(), frame.members().size(),
                r.caseCount(), r.loads().combinations().size(), CaseKey.degrees(r.loads().sweepStep()));
        basis(out, spec);
        structuralFactor(out, spec, computed);
        if (!r.model().autoRestraints().isEmpty()) {
            double largest = r.autoRestraints().stream().mapToDouble(AutoRestraintPeak::force).max().orElse(0);
            out.printf(Locale.ROOT, "auto-restrained: %d directions where the lattice model has no stiffness; none "
                    + "carries load (largest %.1e N or N·m over every case; results.json model.autoRestraints)%n",
                    r.model().autoRestraints().size(), largest);
        }
        if (!r.model().continuityNodes().isEmpty()) {
            out.printf(Locale.ROOT, "continuity: %d bracing nodes held across their member by its bending stiffness "
                    + "(results.json model.continuityNodes)%n", r.model().continuityNodes().size());
        }
        ice(out, r);
        members(out, r, frame);
        legBases(out, r);
        footings(out, r);
        hand(out, r);
        double worst = 0;
        for (SolvedCase c : r.cases()) {
            worst = Math.max(worst, c.solution().equilibriumError());
        }
        out.printf(Locale.ROOT, "equilibrium of the applied loads against the support reactions alone: largest "
                + "residual of the %d cases solved in full: %.1e%n",
                r.cases().size(), worst);
        modes(out, r);
        criticalLoad(out, r);
        double max = r.maxUtilisation();
        out.printf(Locale.ROOT, "%s: largest strength utilisation %.3f%n", max > 1.0 ? "OVERSTRESSED" : "all checks pass", max);
        out.println("requirements: " + RequirementVerdict.line(brokenRequirements(r)));
        r.serviceabilityResult().ifPresent(s -> serviceability(out, s));
        out.println("Results must be checked by a qualified engineer against the codes that apply locally.");
    }

    /**
     * The movement under the serviceability combination: the top level, every ancillary with its
     * limits, then the verdict on a line of its own.
     */
    private static void serviceability(PrintWriter out, ServiceabilityResult s) {
        ServiceMotion.Level top = s.top();
        out.printf(Locale.ROOT, "movement under %s, every azimuth (Ws: %s):%n", s.combination(),
                s.serviceWind().map(ServiceWind::rule).orElse("no wind in the model"));
        out.printf(Locale.ROOT, "  %-28s %8s  %17s  %17s  %17s  %s%n", "level or ancillary", "height m", "sway mm (wind)",
                "tilt deg (wind)", "twist deg (wind)", "limits: sway mm, tilt deg, twist deg");
        List<ServiceMotion> rows = new ArrayList<>();
        s.levels().stream().filter(l -> l == top || l.limits().any()).forEach(rows::add);
        rows.addAll(s.ancillaries());
        for (ServiceMotion m : rows) {
            String height = m instanceof ServiceMotion.Ancillary a && a.linear()
                    ? String.format(Locale.ROOT, "%.1f-%.1f", a.zFrom(), a.zTo())
                    : String.format(Locale.ROOT, "%.1f", m instanceof ServiceMotion.Level l ? l.z()
                            : ((ServiceMotion.Ancillary) m).zFrom());
            out.printf(Locale.ROOT, "  %-28s %8s  %17s  %17s  %17s  %s%n", fit(m.label(), 28), height,
                    movement(m, Movement.SWAY), movement(m, Movement.TILT), movement(m, Movement.TWIST), limits(m));
        }
        out.println("serviceability: " + ServiceabilityVerdict.line(s)
                + (s.hasLimits() ? "" : " (give them in serviceability.levels and serviceability.ancillaries)"));
    }

    /** {@code text} cut to {@code width} characters, with "..." where cut. */
    private static String fit(String text, int width) {
        return text.length() <= width ? text : text.substring(0, width - 3) + "...";
    }

    private static String movement(ServiceMotion m, Movement q) {
        MotionPeak p = m.envelope().of(q);
        String value = q == Movement.SWAY ? String.format(Locale.ROOT, "%.1f", p.value() * 1e3)
                : String.format(Locale.ROOT, "%.3f", Math.toDegrees(p.value()));
        return value + (p.azimuthDeg() == null ? "" : " (" + CaseKey.degrees(p.azimuthDeg()) + ")")
                + (Boolean.FALSE.equals(m.met(q)) ? "!" : " ");
    }

    private static String limits(ServiceMotion m) {
        if (!m.limits().any()) {
            return "none";
        }
        List<String> parts = new ArrayList<>();
        for (Movement q : Movement.values()) {
            double v = m.limits().of(q);
            parts.add(Double.isNaN(v) ? "-" : q == Movement.SWAY ? String.format(Locale.ROOT, "%.1f", v * 1e3)
                    : String.format(Locale.ROOT, "%.3f", Math.toDegrees(v)));
        }
        return String.join(", ", parts) + (m.allMet() ? ": met" : ": NOT MET");
    }

    /** The smallest elastic critical load factor of the cases solved in full, and what it means. */
    private static void criticalLoad(PrintWriter out, AnalysisResult r) {
        SecondOrder so = r.secondOrder();
        if (r.cases().isEmpty()) {
            return;
        }
        if (Double.isInfinite(so.alphaCr())) {
            out.println("elastic critical load factor: no case solved in full can buckle the structure as a whole");
        } else if (!so.applied()) {
            out.printf(Locale.ROOT, "elastic critical load factor: smallest α_cr %.1f (case %s) ≥ 10: first-order "
                    + "analysis suffices (EN 1993-1-1 5.2.1 (3))%n", so.alphaCr(), so.caseId());
        } else {
            out.printf(Locale.ROOT, "second order: smallest first-order α_cr %.2f (case %s) < 10: every wind force is "
                    + "multiplied by 1/(1 - 1/α_cr) = %.3f in the sweep, the checks and the cases above "
                    + "(EN 1993-1-1 5.2.2 (5)B)%n", so.alphaCr(), so.caseId(), so.amplification());
            if (so.beyondAmplification()) {
                out.printf(Locale.ROOT, "WARNING: α_cr %.2f < 3: EN 1993-1-1 5.2.2 (6)B asks for a second-order analysis;"
                        + " the amplification is outside its range: stiffen the tower%n", so.alphaCr());
            }
        }
        Map<String, SolvedCase> least = new LinkedHashMap<>();
        for (SolvedCase c : r.cases()) {
            least.merge(c.combination(), c, (a, b) -> b.alphaCr() < a.alphaCr() ? b : a);
        }
        List<String> parts = new ArrayList<>();
        least.forEach((combination, c) -> parts.add(String.format(Locale.ROOT, "%s %s%s%s", combination,
                Double.isFinite(c.alphaCr()) ? String.format(Locale.ROOT, "%.1f", c.alphaCr()) : "none",
                c.azimuthDeg() == null ? "" : String.format(Locale.ROOT, " at %s deg", CaseKey.degrees(c.azimuthDeg())),
                c.windAmplification() != 1.0 ? String.format(Locale.ROOT, ", wind x %.3f", c.windAmplification()) : "")));
        out.println("  smallest α_cr of each combination's cases in full: " + String.join("; ", parts));
    }

    /** The first sway and first torsion frequencies, and every mode computed on one line. */
    private static void modes(PrintWriter out, AnalysisResult r) {
        if (r.modes().isEmpty()) {
            return;
        }
        StringBuilder line = new StringBuilder("natural frequencies (dead-load masses, no ice):");
        for (NaturalMode.Kind kind : List.of(NaturalMode.Kind.SWAY, NaturalMode.Kind.TORSION)) {
            line.append(r.modes().stream().filter(m -> m.kind() == kind).findFirst()
                    .map(m -> String.format(Locale.ROOT, " first %s %.3f Hz (mode %d);", kind.label(), m.frequencyHz(),
                            m.number()))
                    .orElse(String.format(Locale.ROOT, " no %s mode among the %d lowest (--modes);", kind.label(),
                            r.modes().size())));
        }
        long internal = r.modes().stream().filter(m -> m.kind() == NaturalMode.Kind.INTERNAL).count();
        line.append(String.format(Locale.ROOT, " %d of %d modes move parts of the tower against each other "
                + "(no net sway, twist or lift)", internal, r.modes().size()));
        out.println(line);
    }

    /** Rule label → the members that break it, by member id. */
    private static Map<String, List<Integer>> brokenRequirements(AnalysisResult r) {
        Map<String, List<Integer>> out = new LinkedHashMap<>();
        for (MemberEnvelope e : r.members()) {
            for (CheckResult q : e.requirements()) {
                if (!q.passes()) {
                    out.computeIfAbsent(q.mode().label(), k -> new ArrayList<>()).add(e.member());
                }
            }
        }
        return out;
    }

    private static void structuralFactor(PrintWriter out, TowerSpec spec, ComputedStructuralFactor.Resolved factor) {
        WindSpec wind = spec.loads().wind();
        Optional<ResponseFactor> computed = factor.computed();
        if (!factor.given() && computed.isPresent()) {
            out.printf(Locale.ROOT, "wind: %s computed from the tower (%s)%n", value(computed.get()), steps(computed.get()));
            return;
        }
        String given = wind instanceof WindSpec.En1991 en
                ? String.format(Locale.ROOT, "c_s·c_d = %.3f as given in the model (loads.wind.structuralFactor)",
                        en.structuralFactor())
                : wind instanceof WindSpec.Asce7 a
                ? String.format(Locale.ROOT, "G = %.3f as given in the model (loads.wind.gustFactor)", a.gustFactor())
                : null;
        if (given == null) {
            return;
        }
        out.println("wind: " + given + computed.map(c -> String.format(Locale.ROOT,
                "; computed from the tower it would be %.3f (%s)", c.value(), steps(c))).orElse(""));
    }

    private static String value(ResponseFactor f) {
        return String.format(Locale.ROOT, f instanceof En1991StructuralFactor ? "c_s·c_d = %.3f" : "G = %.3f", f.value());
    }

    /** How a computed factor came about, in a few numbers. */
    private static String steps(ResponseFactor f) {
        if (f instanceof En1991StructuralFactor e) {
            return String.format(Locale.ROOT, "EN 1991-1-4 Annex B: first sway %.2f Hz, δ = δ_s %.3f + δ_a %.3f, "
                    + "B² = %.3f, R² = %.3f, k_p = %.2f", e.frequency(), e.structuralDamping(), e.aerodynamicDamping(),
                    e.background(), e.resonant(), e.peakFactor());
        }
        Asce7GustFactor g = (Asce7GustFactor) f;
        return String.format(Locale.ROOT, "first sway %.2f Hz, %s", g.frequency(), g.flexible()
                ? String.format(Locale.ROOT, "flexible, ASCE 7 26.11.5: β = %.4f, Q² = %.3f, R² = %.3f",
                        g.dampingRatio(), g.background(), g.resonant())
                : "rigid, n1 >= 1 Hz: ASCE 7 26.11.1");
    }

    private static void basis(PrintWriter out, TowerSpec spec) {
        ActionFactors f = spec.loads().actionFactorsOrDefault();
        out.printf(Locale.ROOT, "design basis: %s; action factors %s%s%n", spec.basis().jsonName(), f.set().jsonName(),
                f.set() == ActionFactorSet.EN1993_3_1 ? ", reliability class " + f.reliabilityClass() : "");
        for (BasisMix mix : spec.basisMixes()) {
            out.println("WARNING: mixed design basis (allowed by mixedBasis): " + mix.describe(spec.basis()));
        }
    }

    private static void ice(PrintWriter out, AnalysisResult r) {
        Asce7Ice ice = r.loads().icing();
        if (ice.isNone()) {
            return;
        }
        double top = r.tower().height();
        String rule = ice.map() == null
                ? "t_d as given at 10 m" + (ice.heightFactor() ? ", grown by f_z = (z/33 ft)^0.10" : ", constant")
                : String.format(Locale.ROOT, "t_d = 2.0 t I_i f_z K_zt^0.35 (ASCE 7 (10.4-5)) with map t = %.1f mm,"
                        + " I_i = %.2f, K_zt = %.2f", ice.map().nominal() * 1e3, ice.map().importanceFactor(),
                        ice.map().topographicFactor());
        out.printf(Locale.ROOT, "ice: %s: %.1f mm at 10 m (33 ft), %.1f mm at the top (%.1f m)%n",
                rule, ice.thicknessAt(Asce7Ice.REFERENCE_HEIGHT) * 1e3, ice.thicknessAt(top) * 1e3, top);
    }

    private static void members(PrintWriter out, AnalysisResult r, Frame frame) {
        List<MemberEnvelope> top = r.members().stream().filter(m -> m.governing() != null)
                .sorted(Comparator.comparingDouble((MemberEnvelope m) -> -m.governing().utilisation())
                        .thenComparingInt(MemberEnvelope::member))
                .limit(MOST_UTILISED).toList();
        out.println("most utilised members:");
        out.printf(Locale.ROOT, "  %6s %-10s %4s %-10s %6s  %-20s %-34s %s%n", "member", "role", "seg", "section",
                "util", "mode", "clause", "case");
        var index = new java.util.HashMap<Integer, Member>();
        frame.members().forEach(m -> index.put(m.id(), m));
        for (MemberEnvelope e : top) {
            Member m = index.get(e.member());
            out.printf(Locale.ROOT, "  %6d %-10s %4d %-10s %6.3f  %-20s %-34s %s%n", m.id(), m.role().jsonName(),
                    m.segment(), m.section().name(), e.governing().utilisation(), e.governing().mode().jsonName(),
                    e.governing().clause(), e.governingWhere().caseId());
        }
    }

    private static void legBases(PrintWriter out, AnalysisResult r) {
        out.println("leg base reactions (compression: the support pushes up on the leg; uplift: it pulls down):");
        out.printf(Locale.ROOT, "  %5s  %15s  %-26s %10s  %-26s %9s  %s%n", "node", "compression kN", "case",
                "uplift kN", "case", "shear kN", "case");
        for (LegBaseExtremes leg : r.legBases()) {
            out.printf(Locale.ROOT, "  %5d  %15s  %-26s %10s  %-26s %9s  %s%n", leg.node(), kN(leg.compression()),
                    caseOf(leg.compression()), kN(leg.uplift()), caseOf(leg.uplift()), kN(leg.shear()),
                    caseOf(leg.shear()));
        }
    }

    private static void footings(PrintWriter out, AnalysisResult r) {
        if (r.foundations().isEmpty()) {
            out.println("footings: not checked (the model gives no checks.foundation)");
            return;
        }
        out.println("footings (governing check of each kind over all leg bases):");
        var worst = new java.util.EnumMap<tetrapod.check.CheckMode, FoundationEnvelope.Governing>(
                tetrapod.check.CheckMode.class);
        double volume = 0;
        for (FoundationEnvelope f : r.foundations()) {
            f.checks().forEach((mode, g) -> worst.merge(mode, g,
                    (a, b) -> b.check().utilisation() > a.check().utilisation() ? b : a));
            volume = Math.max(volume, f.concreteVolumeRequired());
        }
        worst.forEach((mode, g) -> out.printf(Locale.ROOT, "  %-16s %6.3f  %-40s %s%n", mode.jsonName(),
                g.check().utilisation(), g.check().clause(), g.where().caseId()));
        out.printf(Locale.ROOT, "  concrete volume that would balance the governing uplift: %.2f m3 per leg%n", volume);
    }

    private static void hand(PrintWriter out, AnalysisResult r) {
        r.handGoverning().ifPresent(g -> {
            out.println("hand method (N/4 +- M/lever) beside the analysis, each in the combination that governs it:");
            HandComparison c = g.compression();
            out.printf(Locale.ROOT, "  compression in %s (largest leg compression %.1f kN at %s deg):%n", c.combination(),
                    c.feMaxCompression() / 1e3, CaseKey.degrees(c.hand().azimuthDeg()));
            handRows(out, r, c.combination(), true);
            HandComparison u = g.uplift();
            out.printf(Locale.ROOT, "  uplift in %s (largest uplift %.1f kN at %s deg):%n", u.combination(),
                    u.feMaxTension() / 1e3, CaseKey.degrees(u.hand().azimuthDeg()));
            handRows(out, r, u.combination(), false);
        });
    }

    private static void handRows(PrintWriter out, AnalysisResult r, String combination, boolean compression) {
        out.printf(Locale.ROOT, "    %7s %10s %12s %10s %12s %7s%n", "azimuth", "N kN", "M kNm", "hand kN", "analysis kN",
                "diff %");
        for (HandComparison h : r.hand()) {
            if (!h.combination().equals(combination) || !Analysis.REPORTED_AZIMUTHS.contains(h.hand().azimuthDeg())) {
                continue;
            }
            out.printf(Locale.ROOT, "    %7s %10.1f %12.1f %10.1f %12.1f %7.1f%n", CaseKey.degrees(h.hand().azimuthDeg()),
                    h.hand().n() / 1e3, h.hand().m() / 1e3,
                    (compression ? h.hand().legs().compression() : h.hand().legs().tension()) / 1e3,
                    (compression ? h.feMaxCompression() : h.feMaxTension()) / 1e3,
                    compression ? h.compressionDifferencePct() : h.tensionDifferencePct());
        }
    }

    private static String kN(Extreme e) {
        return e.caseId() == null ? "none" : String.format(Locale.ROOT, "%.1f", e.value() / 1e3);
    }

    private static String caseOf(Extreme e) {
        return e.caseId() == null ? "-" : e.caseId();
    }
}
