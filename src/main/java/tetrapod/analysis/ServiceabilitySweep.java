package tetrapod.analysis;

import java.util.ArrayList;
import java.util.List;
import tetrapod.common.UnstableStructureException;
import tetrapod.generate.PanelLevel;
import tetrapod.load.LoadComponent;
import tetrapod.load.ServiceLoads;
import tetrapod.model.Node;
import tetrapod.model.spec.AncillarySpec;
import tetrapod.solve.FactoredSystem;
import tetrapod.solve.LoadVector;
import tetrapod.solve.NodeDisplacement;
import tetrapod.solve.Solution;
import tetrapod.solve.StructuralModel;

/**
 * The serviceability sweep by superposition. Each vector of the serviceability load basis is solved
 * once with the one factorisation; each panel level's rigid-body motion ({@link RigidBodyFit}) is
 * linear in the displacements, and so is every station's motion, so both are formed per basis
 * vector once and superposed for every azimuth: six multiply-adds per station and vector, no solve.
 */
final class ServiceabilitySweep {

    private final ServiceabilityPlan plan;
    private final double[][] motions; // [basis vector][station * 6 + c]: tx, ty, tz (m), ωx, ωy, ωz (rad)

    private ServiceabilitySweep(ServiceabilityPlan plan, double[][] motions) {
        this.plan = plan;
        this.motions = motions;
    }

    /**
     * Solves the plan's load basis with {@code system} and forms every station's motion per vector.
     *
     * @throws UnstableStructureException when a basis vector's load is not carried (an auto-restraint takes it)
     */
    static ServiceabilitySweep of(FactoredSystem system, ServiceabilityPlan plan) throws UnstableStructureException {
        List<LoadVector> vectors = new ArrayList<>();
        for (LoadComponent c : plan.loads().basis().components()) {
            vectors.add(new LoadVector("serviceability, " + c.name(), c.loads()));
        }
        List<Solution> solutions = system.solveAll(vectors);
        StructuralModel model = system.model();
        List<PanelLevel> levels = plan.tower().levels();
        List<RigidBodyFit> fits = new ArrayList<>(levels.size());
        for (PanelLevel level : levels) {
            double[][] xyz = new double[4][];
            for (int k = 0; k < 4; k++) {
                Node n = model.frame().nodes().get(model.nodeIndex(level.legNodes().get(k)));
                xyz[k] = new double[] {n.x(), n.y(), n.z()};
            }
            fits.add(new RigidBodyFit(xyz));
        }
        List<ServiceabilityPlan.Station> stations = plan.stations();
        double[][] motions = new double[solutions.size()][6 * stations.size()];
        double[][] u = new double[4][3];
        double[][] levelMotion = new double[levels.size()][6];
        for (int k = 0; k < solutions.size(); k++) {
            Solution s = solutions.get(k);
            s.requireLoadCarried(vectors.get(k).name());
            for (int l = 0; l < levels.size(); l++) {
                for (int leg = 0; leg < 4; leg++) {
                    NodeDisplacement d = s.displacement(levels.get(l).legNodes().get(leg));
                    u[leg][0] = d.ux();
                    u[leg][1] = d.uy();
                    u[leg][2] = d.uz();
                }
                fits.get(l).fit(u, levelMotion[l]);
            }
            for (int st = 0; st < stations.size(); st++) {
                ServiceabilityPlan.Station station = stations.get(st);
                addPointMotion(motions[k], 6 * st, levelMotion[station.below()], station.offsetBelow(),
                        1 - station.fraction());
                addPointMotion(motions[k], 6 * st, levelMotion[station.above()], station.offsetAbove(),
                        station.fraction());
            }
        }
        return new ServiceabilitySweep(plan, motions);
    }

    /** Adds {@code factor} × the motion of the point at {@code r} from the centroid of a level moving by {@code m}. */
    private static void addPointMotion(double[] out, int at, double[] m, double[] r, double factor) {
        if (factor == 0) {
            return;
        }
        // rigid-body motion of a point: t + ω × r
        out[at] += factor * (m[0] + m[4] * r[2] - m[5] * r[1]);
        out[at + 1] += factor * (m[1] + m[5] * r[0] - m[3] * r[2]);
        out[at + 2] += factor * (m[2] + m[3] * r[1] - m[4] * r[0]);
        for (int c = 3; c < 6; c++) {
            out[at + c] += factor * m[c];
        }
    }

    /**
     * Every station's motion for the basis weights {@code weights} (input) into {@code out} (output,
     * length ≥ 6 × stations): station s's tx, ty, tz (m) and ωx, ωy, ωz (rad) at {@code out[6 s + c]}.
     * The panel levels are the first stations, bottom to top.
     *
     * @return {@code out}
     */
    double[] motions(double[] weights, double[] out) {
        int length = motions.length == 0 ? 0 : motions[0].length;
        java.util.Arrays.fill(out, 0, length, 0.0);
        for (int k = 0; k < weights.length; k++) {
            double w = weights[k];
            if (w != 0) {
                double[] v = motions[k];
                for (int i = 0; i < length; i++) {
                    out[i] += w * v[i];
                }
            }
        }
        return out;
    }

    /** Sweeps every azimuth of the serviceability combination and envelopes each station's movements. */
    ServiceabilityResult run() {
        ServiceLoads loads = plan.loads();
        List<ServiceabilityPlan.Station> stations = plan.stations();
        int n = stations.size();
        double[][] peak = new double[n][3];
        Double[][] where = new Double[n][3];
        double[] weights = new double[loads.basis().size()];
        double[] m = new double[6 * n];
        boolean first = true;
        for (Double azimuth : loads.azimuths()) {
            motions(loads.weights(azimuth, weights), m);
            for (int s = 0; s < n; s++) {
                int b = 6 * s;
                double[] values = {Math.hypot(m[b], m[b + 1]), Math.hypot(m[b + 3], m[b + 4]), Math.abs(m[b + 5])};
                for (int q = 0; q < 3; q++) {
                    if (first || values[q] > peak[s][q]) {
                        peak[s][q] = values[q];
                        where[s][q] = azimuth;
                    }
                }
            }
            first = false;
        }
        List<ServiceMotion.Level> levels = new ArrayList<>();
        List<PanelLevel> panelLevels = plan.tower().levels();
        for (int l = 0; l < panelLevels.size(); l++) {
            levels.add(new ServiceMotion.Level(l, panelLevels.get(l).z(), envelope(peak, where, List.of(l)),
                    plan.levelLimits().get(l)));
        }
        List<ServiceMotion.Ancillary> items = new ArrayList<>();
        for (ServiceabilityPlan.Item item : plan.items()) {
            AncillarySpec a = item.spec();
            double from = a instanceof AncillarySpec.Linear line ? line.from() : ((AncillarySpec.Point) a).height();
            double to = a instanceof AncillarySpec.Linear line ? line.to() : from;
            items.add(new ServiceMotion.Ancillary(a.name(), a instanceof AncillarySpec.Linear, a.face(), from, to,
                    envelope(peak, where, item.stations()), item.limits()));
        }
        return new ServiceabilityResult(loads.combination().name(), loads.wind().orElse(null), levels, items);
    }

    /** The largest of each movement over {@code at} (station indices), with its azimuth and height. */
    private MotionEnvelope envelope(double[][] peak, Double[][] where, List<Integer> at) {
        MotionPeak[] out = new MotionPeak[3];
        for (int q = 0; q < 3; q++) {
            int best = at.get(0);
            for (int s : at) {
                if (peak[s][q] > peak[best][q]) {
                    best = s;
                }
            }
            out[q] = new MotionPeak(peak[best][q], where[best][q], plan.stations().get(best).z());
        }
        return new MotionEnvelope(out[0], out[1], out[2]);
    }
}
