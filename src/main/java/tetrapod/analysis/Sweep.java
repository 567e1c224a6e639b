package tetrapod.analysis;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import tetrapod.check.Extreme;
import tetrapod.common.UnstableStructureException;
import tetrapod.check.FoundationCheck;
import tetrapod.check.FoundationEnvelope;
import tetrapod.check.FoundationResult;
import tetrapod.check.ReactionLevel;
import tetrapod.check.HandMethod;
import tetrapod.check.LegBaseForces;
import tetrapod.check.MemberChecker;
import tetrapod.check.MemberEnvelope;
import tetrapod.load.CaseKey;
import tetrapod.load.Combination;
import tetrapod.model.Frame;
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
    private final MemberSweep memberChecks;
    private final List<CaseKey> keys = new ArrayList<>();
    private MemberSweep.Result memberResult;
    private final FoundationCheck footing;
    private final LoadResultants resultants;
    private final double baseWidthX;
    private final double baseWidthY;
    private final List<Integer> supportNodes;
    private final double[] reactions;
    private final double[] totals = new double[5];
    private final Map<String, List<double[]>> perCombination = new LinkedHashMap<>();
    private final Extreme[] compression;
    private final Extreme[] uplift;
    private final Extreme[] shear;
    private final FoundationEnvelope[] foundations;
    private final List<HandComparison> hand = new ArrayList<>();
    private final double[] restraintForces;
    private final double[] restraintPeak;
    private final String[] restraintPeakCase;

    /**
     * @param footing    the footing check, or null when the model gives no foundation
     * @param baseWidthX leg spacing along x at the base, m; NaN for an explicit frame (no hand method)
     * @param threads    threads for the member checks (at least 1; the results do not depend on it)
     */
    Sweep(StructuralModel model, BasisResponses responses, MemberChecker checker, FoundationCheck footing,
          LoadResultants resultants, double baseWidthX, double baseWidthY, int threads) {
        this.model = model;
        Frame frame = model.frame();
        this.responses = responses;
        this.memberChecks = new MemberSweep(frame, responses, checker, threads);
        this.footing = footing;
        this.resultants = resultants;
        this.baseWidthX = baseWidthX;
        this.baseWidthY = baseWidthY;
        this.supportNodes = frame.supports().stream().map(Support::node).toList();
        this.reactions = new double[6 * supportNodes.size()];
        int s = supportNodes.size();
        this.compression = filled(s);
        this.uplift = filled(s);
        this.shear = filled(s);
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
        keys.add(key);
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
        memberChecks.add(key, weights);
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
        return members().envelopes();
    }

    /** The member checks of every case added (made once, after the last case). */
    private MemberSweep.Result members() {
        if (memberResult == null) {
            memberResult = memberChecks.finish();
        }
        return memberResult;
    }

    List<FoundationEnvelope> foundationEnvelopes() {
        return List.of(foundations);
    }

    /** The largest member utilisation at each azimuth over every combination with wind, by ascending azimuth. */
    List<AzimuthUtilisation> utilisationByAzimuth() {
        MemberSweep.Result r = members();
        Map<Double, AzimuthUtilisation> byAzimuth = new TreeMap<>();
        for (int c = 0; c < keys.size(); c++) {
            Double azimuthDeg = keys.get(c).azimuthDeg();
            double worst = r.worstUtilisation()[c];
            if (azimuthDeg != null && worst >= 0) {
                AzimuthUtilisation old = byAzimuth.get(azimuthDeg);
                if (old == null || worst > old.utilisation()) {
                    byAzimuth.put(azimuthDeg, new AzimuthUtilisation(azimuthDeg, worst, r.worstMember()[c],
                            keys.get(c).combination().name()));
                }
            }
        }
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
