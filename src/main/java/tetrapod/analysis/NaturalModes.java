package tetrapod.analysis;

import java.util.ArrayList;
import java.util.List;
import tetrapod.common.UnstableStructureException;
import tetrapod.common.Units;
import tetrapod.generate.Tower;
import tetrapod.load.LoadBasis;
import tetrapod.load.LoadComponent;
import tetrapod.load.TowerLoads;
import tetrapod.model.Frame;
import tetrapod.model.Node;
import tetrapod.model.NodeForce;
import tetrapod.model.spec.LoadAction;
import tetrapod.solve.FactoredSystem;
import tetrapod.solve.ModalAnalysis;
import tetrapod.solve.Solver;
import tetrapod.solve.StructuralModel;

/**
 * The tower's lowest natural modes: lumped masses from the permanent loads (the steelwork's
 * self-weight with the connection allowance and the ancillaries' weight, each node's downward
 * dead load over g, gathered on the leg nodes; no ice, no rotary inertia), solved by
 * {@link ModalAnalysis}, each mode classified by its effective modal masses.
 */
public final class NaturalModes {

    /** Modes computed when the user does not say how many. */
    public static final int DEFAULT_COUNT = 12;
    /**
     * Below this sum of effective modal mass fractions (x, y, z and twist) a mode moves parts of the
     * tower against each other, not the tower as a whole (Tetrapod's own threshold, no published source).
     */
    static final double LOCAL_BELOW = 0.05;

    private NaturalModes() { }

    /**
     * The lumped mass of each node (frame order), kg: its downward dead load over g, with the mass
     * of every node that no leg reaches passed on to the leg nodes ({@link LegMasses}).
     */
    static double[] nodeMasses(Frame frame, LoadBasis basis) {
        double[] mass = new double[frame.nodes().size()];
        var index = frame.nodeIndex();
        for (LoadComponent c : basis.components()) {
            if (c.action() != LoadAction.DEAD) {
                continue;
            }
            for (NodeForce f : c.loads()) {
                mass[index.get(f.node())] += Math.max(0, -f.fz()) / Units.G_ACCEL;
            }
        }
        return LegMasses.gather(frame, mass);
    }

    /** The {@code count} lowest modes of {@code tower} with the dead-load masses of {@code loads}, without an analysis. */
    public static List<NaturalMode> of(Tower tower, TowerLoads loads, int count) throws UnstableStructureException {
        return of(Solver.factor(StructuralModel.of(tower.frame())), loads.basis(), count);
    }

    /**
     * The {@code count} lowest modes, or fewer when the structure has fewer massed translations
     * (none without mass).
     */
    static List<NaturalMode> of(FactoredSystem system, LoadBasis basis, int count) {
        Frame frame = system.model().frame();
        double[] mass = nodeMasses(frame, basis);
        int available = ModalAnalysis.massedTranslations(system, mass);
        int wanted = Math.min(count, available);
        if (wanted < 1) {
            return List.of();
        }
        List<ModalAnalysis.Mode> modes = ModalAnalysis.lowest(system, mass, wanted);
        List<NaturalMode> out = new ArrayList<>(modes.size());
        for (int k = 0; k < modes.size(); k++) {
            out.add(classify(k + 1, modes.get(k), frame.nodes(), mass));
        }
        return out;
    }

    /**
     * Effective modal mass fractions of a mass-normalised mode φ: L_d² / Σm for the translations
     * d = x, y, z (L_d = Σ m φ_d) and L_rz² / Σ m (x² + y²) for the twist about the tower's axis
     * (L_rz = Σ m (x φ_y − y φ_x)); the largest names the mode.
     */
    static NaturalMode classify(int number, ModalAnalysis.Mode mode, List<Node> nodes, double[] mass) {
        double[] phi = mode.shape();
        double lx = 0;
        double ly = 0;
        double lz = 0;
        double lrz = 0;
        double total = 0;
        double polar = 0;
        for (int n = 0; n < nodes.size(); n++) {
            double m = mass[n];
            Node node = nodes.get(n);
            lx += m * phi[6 * n];
            ly += m * phi[6 * n + 1];
            lz += m * phi[6 * n + 2];
            lrz += m * (node.x() * phi[6 * n + 1] - node.y() * phi[6 * n]);
            total += m;
            polar += m * (node.x() * node.x() + node.y() * node.y());
        }
        double fx = lx * lx / total;
        double fy = ly * ly / total;
        double fz = lz * lz / total;
        double frz = polar > 0 ? lrz * lrz / polar : 0;
        NaturalMode.Kind kind;
        if (fx + fy + fz + frz < LOCAL_BELOW) {
            kind = NaturalMode.Kind.INTERNAL;
        } else if (frz > fx + fy && frz > fz) {
            kind = NaturalMode.Kind.TORSION;
        } else if (fz > fx + fy) {
            kind = NaturalMode.Kind.VERTICAL;
        } else {
            kind = NaturalMode.Kind.SWAY;
        }
        Double direction = kind == NaturalMode.Kind.SWAY
                ? (Math.toDegrees(Math.atan2(ly, lx)) % 180 + 180) % 180 + 0.0 : null;
        return new NaturalMode(number, mode.frequencyHz(), kind, direction, fx, fy, fz, frz, mode.residual(),
                mode.shape());
    }
}
