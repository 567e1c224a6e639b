package tetrapod.analysis;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import tetrapod.check.Extreme;
import tetrapod.common.UnstableStructureException;
import tetrapod.check.FoundationCheck;
import tetrapod.check.FoundationEnvelope;
import tetrapod.check.FoundationResult;
import tetrapod.check.ReactionLevel;
import tetrapod.check.HandMethod;
import tetrapod.check.LegBaseForces;
import tetrapod.check.MemberCheckResult;
import tetrapod.check.MemberChecker;
import tetrapod.check.MemberEnvelope;
import tetrapod.check.MemberForces;
import tetrapod.load.CaseKey;
import tetrapod.load.Combination;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.Support;
import tetrapod.solve.BasisResponses;
import tetrapod.solve.StructuralModel;

/**
 * Takes the cases one by one (formed by superposition) and keeps what the report needs: each leg
 * base's reaction against azimuth, the extremes of the reactions, every member's check envelope,
 * every footing's check envelope, the largest member utilisation at each azimuth, and the hand
 * method beside the analysis. Keeps envelopes, not
 * every case's results.
 */
final class Sweep {

    private final StructuralModel model;
    private final BasisResponses responses;
    private final MemberChecker checker;
    private final FoundationCheck footing;
    private final LoadResultants resultants;
    private final double baseWidthX;
    private final double baseWidthY;
    private final List<Integer> supportNodes;
    private final double[] reactions;
    private final double[] axial;
    private final double[] ends = new double[12];
    private final double[] totals = new double[5];
    private final Map<String, List<double[]>> perCombination = new LinkedHashMap<>();
    private final Extreme[] compression;
    private final Extreme[] uplift;
    private final Extreme[] shear;
    private final MemberEnvelope[] members;
    private final FoundationEnvelope[] foundations;
    private final List<HandComparison> hand = new ArrayList<>();
    private final Map<Double, AzimuthUtilisation> byAzimuth = new java.util.TreeMap<>();
    private final double[] restraintForces;
    private final double[] restraintPeak;
    private final String[] restraintPeakCase;

    /**
     * @param footing    the footing check, or null when the model gives no foundation
     * @param baseWidthX leg spacing along x at the base, m; NaN for an explicit frame (no hand method)
     */
    Sweep(StructuralModel model, BasisResponses responses, MemberChecker checker, FoundationCheck footing,
          LoadResultants resultants, double baseWidthX, double baseWidthY) {
        this.model = model;
        Frame frame = model.frame();
        this.responses = responses;
        this.checker = checker;
        this.footing = footing;
        this.resultants = resultants;
        this.baseWidthX = baseWidthX;
        this.baseWidthY = baseWidthY;
        this.supportNodes = frame.supports().stream().map(Support::node).toList();
        this.reactions = new double[6 * supportNodes.size()];
        this.axial = new double[frame.members().size()];
        int s = supportNodes.size();
        this.compression = filled(s);
        this.uplift = filled(s);
        this.shear = filled(s);
        this.members = new MemberEnvelope[frame.members().size()];
        for (int m = 0; m < members.length; m++) {
            members[m] = MemberEnvelope.empty(frame.members().get(m).id());
        }
        int autos = model.autoRestraints().size();
        this.restraintForces = new double[autos];
        this.restraintPeak = new double[autos];
        this.restraintPeakCase = new String[autos];
        this.foundations = new FoundationEnvelope[footing == null ? 0 : s];
        for (int k = 0; k < foundations.length; k++) {
            foundations[k] = FoundationEnvelope.empty(supportNodes.get(k));
        }
    }

    private static Extreme[] filled(int n) {
        Extreme[] e = new Extreme[n];
        java.util.Arrays.fill(e, Extreme.NONE);
        return e;
    }

    /**
     * One case and its basis weights (input).
     *
     * @throws UnstableStructureException when an auto-restraint carries load in this case
     */
    void add(CaseKey key, double[] weights) throws UnstableStructureException {
        Combination combination = key.combination();
        Double azimuthDeg = key.azimuthDeg();
        String caseId = key.id();
        responses.requireLoadCarried(caseId, weights, restraintForces);
        for (int a = 0; a < restraintForces.length; a++) {
            if (restraintPeakCase[a] == null || Math.abs(restraintForces[a]) > restraintPeak[a]) {
                restraintPeak[a] = Math.abs(restraintForces[a]);
                restraintPeakCase[a] = caseId;
            }
        }
        responses.reactions(weights, reactions);
        List<double[]> rows = azimuthDeg == null ? null
                : perCombination.computeIfAbsent(combination.name(), k -> new ArrayList<>());
        double feCompression = Double.NEGATIVE_INFINITY;
        double feTension = Double.NEGATIVE_INFINITY;
        for (int s = 0; s < supportNodes.size(); s++) {
            double fx = reactions[6 * s];
            double fy = reactions[6 * s + 1];
            double fz = reactions[6 * s + 2];
            double fh = Math.hypot(fx, fy);
            feCompression = Math.max(feCompression, fz);
            feTension = Math.max(feTension, -fz);
            if (fz > 0) {
                compression[s] = compression[s].max(fz, caseId, azimuthDeg);
            }
            if (fz < 0) {
                uplift[s] = uplift[s].max(-fz, caseId, azimuthDeg);
            }
            shear[s] = shear[s].max(fh, caseId, azimuthDeg);
            if (rows != null) {
                rows.add(new double[] {s, azimuthDeg, fz, fh});
            }
            footing(s, fx, fy, fz, caseId, azimuthDeg, ReactionLevel.FACTORED);
        }
        responses.axialForces(weights, axial);
        double worst = -1;
        int worstMember = 0;
        for (int m = 0; m < axial.length; m++) {
            Member member = model.frame().members().get(m);
            MemberForces forces = memberForces(m, member, weights);
            MemberCheckResult checked = checker.check(member.id(), forces, id -> axial[model.memberIndex(id)]);
            members[m] = members[m].with(checked, forces, caseId, azimuthDeg);
            if (checked.governing().utilisation() > worst) {
                worst = checked.governing().utilisation();
                worstMember = member.id();
            }
        }
        if (azimuthDeg != null && worst >= 0) {
            AzimuthUtilisation old = byAzimuth.get(azimuthDeg);
            if (old == null || worst > old.utilisation()) {
                byAzimuth.put(azimuthDeg, new AzimuthUtilisation(azimuthDeg, worst, worstMember, combination.name()));
            }
        }
        if (azimuthDeg != null && !Double.isNaN(baseWidthX)) {
            hand.add(handComparison(combination.name(), azimuthDeg, weights, feCompression, feTension));
        }
    }

    /**
     * One service case (unfactored, {@code load.ServiceCombinations}): only the footing rules that
     * take service reactions see it; members and the reaction extremes are factored.
     */
    void addService(CaseKey key, double[] weights) {
        responses.reactions(weights, reactions);
        for (int s = 0; s < supportNodes.size(); s++) {
            footing(s, reactions[6 * s], reactions[6 * s + 1], reactions[6 * s + 2], key.id(), key.azimuthDeg(),
                    ReactionLevel.SERVICE);
        }
    }

    private void footing(int s, double fx, double fy, double fz, String caseId, Double azimuthDeg, ReactionLevel level) {
        if (footing == null) {
            return;
        }
        LegBaseForces f = LegBaseForces.fromReaction(fx, fy, fz);
        FoundationResult result = footing.check(f, level);
        if (result != null) {
            foundations[s] = foundations[s].with(result, f, caseId, azimuthDeg, level);
        }
    }

    private MemberForces memberForces(int m, Member member, double[] weights) {
        if (member.axialOnly()) {
            return MemberForces.axial(axial[m]);
        }
        responses.endForces(m, weights, ends);
        // End actions at i (fx..mz) then at j: my is component 4, mz component 5.
        return new MemberForces(axial[m], ends[4], ends[10], ends[5], ends[11]);
    }

    private HandComparison handComparison(String combination, double azimuthDeg, double[] weights,
                                          double feCompression, double feTension) {
        resultants.combine(weights, totals);
        double n = -totals[2];
        double h = Math.hypot(totals[0], totals[1]);
        double m = Math.hypot(totals[3], totals[4]);
        double zH = h > 0 ? m / h : 0;
        HandMethod.LegForces legs = HandMethod.atAzimuth(n, m, azimuthDeg, baseWidthX, baseWidthY);
        HandMethod.Result result = new HandMethod.Result(azimuthDeg, n, h, zH, m,
                HandMethod.baseDiagonal(baseWidthX, baseWidthY), legs);
        return new HandComparison(combination, result, feCompression, feTension);
    }

    List<LegBaseSweep> legBaseSweeps() {
        List<LegBaseSweep> out = new ArrayList<>();
        for (int s = 0; s < supportNodes.size(); s++) {
            for (Map.Entry<String, List<double[]>> e : perCombination.entrySet()) {
                List<Double> az = new ArrayList<>();
                List<Double> fz = new ArrayList<>();
                List<Double> fh = new ArrayList<>();
                for (double[] row : e.getValue()) {
                    if ((int) row[0] == s) {
                        az.add(row[1]);
                        fz.add(row[2]);
                        fh.add(row[3]);
                    }
                }
                out.add(new LegBaseSweep(supportNodes.get(s), e.getKey(), az, fz, fh));
            }
        }
        return out;
    }

    List<LegBaseExtremes> legBaseExtremes() {
        List<LegBaseExtremes> out = new ArrayList<>();
        for (int s = 0; s < supportNodes.size(); s++) {
            out.add(new LegBaseExtremes(supportNodes.get(s), compression[s], uplift[s], shear[s]));
        }
        return out;
    }

    List<MemberEnvelope> memberEnvelopes() {
        return List.of(members);
    }

    List<FoundationEnvelope> foundationEnvelopes() {
        return List.of(foundations);
    }

    /** The largest member utilisation at each azimuth over every combination with wind, by ascending azimuth. */
    List<AzimuthUtilisation> utilisationByAzimuth() {
        return List.copyOf(byAzimuth.values());
    }

    /** Every auto-restraint with the largest force it carried over the sweep, in the model's order. */
    List<AutoRestraintPeak> autoRestraintPeaks() {
        List<AutoRestraintPeak> out = new ArrayList<>(restraintPeak.length);
        for (int a = 0; a < restraintPeak.length; a++) {
            out.add(new AutoRestraintPeak(model.autoRestraints().get(a), restraintPeak[a], restraintPeakCase[a]));
        }
        return out;
    }

    List<HandComparison> handComparisons() {
        return List.copyOf(hand);
    }
}
