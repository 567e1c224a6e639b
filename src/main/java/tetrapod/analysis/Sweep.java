package tetrapod.analysis;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import tetrapod.model.Frame;
import tetrapod.solve.BasisResponses;

/**
 * Collects, case by case, the leg base reactions against azimuth and the extremes of reactions and
 * member axial forces. Keeps envelopes, not every case's results.
 */
final class Sweep {

    private final Frame frame;
    private final BasisResponses responses;
    private final List<Integer> supportNodes;
    private final double[] reactions;
    private final double[] axial;
    private final Map<String, List<double[]>> perCombination = new LinkedHashMap<>();
    private final Extreme[] compression;
    private final Extreme[] uplift;
    private final Extreme[] shear;
    private final Extreme[] tension;
    private final Extreme[] memberCompression;

    Sweep(Frame frame, BasisResponses responses) {
        this.frame = frame;
        this.responses = responses;
        this.supportNodes = Analysis.supportNodes(frame.supports());
        this.reactions = new double[6 * supportNodes.size()];
        this.axial = new double[frame.members().size()];
        this.compression = new Extreme[supportNodes.size()];
        this.uplift = new Extreme[supportNodes.size()];
        this.shear = new Extreme[supportNodes.size()];
        this.tension = new Extreme[frame.members().size()];
        this.memberCompression = new Extreme[frame.members().size()];
    }

    void startCombination(String combination, int azimuths) {
        perCombination.put(combination, new ArrayList<>(azimuths));
    }

    /** One case: the combination, its azimuth (null without wind) and the basis weights (input). */
    void add(String combination, Double azimuthDeg, double[] weights) {
        responses.reactions(weights, reactions);
        List<double[]> rows = perCombination.get(combination);
        for (int s = 0; s < supportNodes.size(); s++) {
            double fz = reactions[6 * s + 2];
            double fh = Math.hypot(reactions[6 * s], reactions[6 * s + 1]);
            compression[s] = larger(compression[s], fz, combination, azimuthDeg);
            uplift[s] = larger(uplift[s], -fz, combination, azimuthDeg);
            shear[s] = larger(shear[s], fh, combination, azimuthDeg);
            if (rows != null) {
                rows.add(new double[] {s, azimuthDeg, fz, fh});
            }
        }
        responses.axialForces(weights, axial);
        for (int m = 0; m < axial.length; m++) {
            tension[m] = larger(tension[m], axial[m], combination, azimuthDeg);
            memberCompression[m] = larger(memberCompression[m], -axial[m], combination, azimuthDeg);
        }
    }

    /** Replaces {@code current} when {@code value} is positive and larger; the first case wins ties. */
    private static Extreme larger(Extreme current, double value, String combination, Double azimuthDeg) {
        if (value > 0 && (current == null || value > current.value())) {
            return new Extreme(value, combination, azimuthDeg);
        }
        return current;
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

    List<MemberAxialEnvelope> memberEnvelopes() {
        List<MemberAxialEnvelope> out = new ArrayList<>(tension.length);
        for (int m = 0; m < tension.length; m++) {
            out.add(new MemberAxialEnvelope(frame.members().get(m).id(), tension[m], memberCompression[m]));
        }
        return out;
    }
}
