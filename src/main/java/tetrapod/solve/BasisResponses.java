package tetrapod.solve;

import tetrapod.model.NodeForce;
import java.util.Arrays;
import java.util.List;
import tetrapod.common.ProgressListener;
import tetrapod.common.UnstableStructureException;

/**
 * The responses to a few load vectors, each solved once with the one factorisation, superposed
 * for any weights: a linear structure's response to Σ w_k · F_k is Σ w_k · response(F_k). Holds
 * only support reactions and member end forces, so that thousands of cases (every combination at
 * every azimuth of a fine sweep) cost a few multiply-adds each and no solve.
 */
public final class BasisResponses {

    private final int supports;
    private final int members;
    private final double[][] reactions; // [k][support * 6 + c], frame support order
    private final double[][] endForces; // [k][member * 12 + c]: atI fx..mz then atJ fx..mz
    private final double[][] axial;     // [k][member], N positive in tension
    private final double[][] restraintForces; // [k][auto-restraint], N or N·m along its direction
    private final double[][] applied;   // [k][node * 6 + c], the basis load vectors, tower axes
    private final StructuralModel model;

    private BasisResponses(StructuralModel model, double[][] reactions, double[][] endForces, double[][] axial,
                           double[][] restraintForces, double[][] applied) {
        this.model = model;
        this.supports = model.frame().supports().size();
        this.members = model.frame().members().size();
        this.reactions = reactions;
        this.endForces = endForces;
        this.axial = axial;
        this.restraintForces = restraintForces;
        this.applied = applied;
    }

    /**
     * Solves every vector of {@code basis} (input) with {@code system}.
     *
     * @throws UnstableStructureException as {@link FactoredSystem#solveAll}
     */
    public static BasisResponses of(FactoredSystem system, List<LoadVector> basis) throws UnstableStructureException {
        return of(system, basis, ProgressListener.NONE);
    }

    /** As {@link #of(FactoredSystem, List)}, telling {@code progress} of each vector solved ("solve"). */
    public static BasisResponses of(FactoredSystem system, List<LoadVector> basis, ProgressListener progress)
            throws UnstableStructureException {
        List<Solution> solutions = system.solveAll(basis, progress);
        int supports = system.model().frame().supports().size();
        int members = system.model().frame().members().size();
        double[][] reactions = new double[basis.size()][supports * 6];
        double[][] endForces = new double[basis.size()][members * 12];
        double[][] axial = new double[basis.size()][members];
        int autos = system.model().autoRestraints().size();
        double[][] restraintForces = new double[basis.size()][autos];
        double[][] applied = new double[basis.size()][];
        for (int k = 0; k < solutions.size(); k++) {
            Solution s = solutions.get(k);
            applied[k] = system.nodalLoads(basis.get(k));
            for (int a = 0; a < autos; a++) {
                restraintForces[k][a] = s.autoRestraintForce(a);
            }
            List<NodeForce> r = s.reactions();
            for (int n = 0; n < supports; n++) {
                for (int c = 0; c < 6; c++) {
                    reactions[k][n * 6 + c] = r.get(n).component(c);
                }
            }
            List<MemberEndForces> f = s.memberForces();
            for (int m = 0; m < members; m++) {
                MemberEndForces e = f.get(m);
                for (int c = 0; c < 6; c++) {
                    endForces[k][m * 12 + c] = e.atI().component(c);
                    endForces[k][m * 12 + 6 + c] = e.atJ().component(c);
                }
                axial[k][m] = e.axial();
            }
        }
        return new BasisResponses(system.model(), reactions, endForces, axial, restraintForces, applied);
    }

    /** Number of basis vectors. */
    public int size() {
        return reactions.length;
    }

    /**
     * Support reactions for {@code weights} (input, one per basis vector) into {@code out} (output,
     * length ≥ 6 × supports): support s, component c (fx..mz) at {@code out[6 s + c]}, N and N·m.
     *
     * @return {@code out}
     */
    public double[] reactions(double[] weights, double[] out) {
        return superpose(reactions, weights, out, supports * 6);
    }

    /**
     * Axial forces of every member (frame member order, N, positive in tension) for
     * {@code weights} into {@code out} (output, length ≥ members).
     *
     * @return {@code out}
     */
    public double[] axialForces(double[] weights, double[] out) {
        return superpose(axial, weights, out, members);
    }

    /**
     * As {@link #axialForces(double[], double[])}, into {@code out} from {@code offset} on (output,
     * length ≥ offset + members).
     */
    public void axialForces(double[] weights, double[] out, int offset) {
        if (weights.length != axial.length) {
            throw new IllegalArgumentException("expected " + axial.length + " weights, got " + weights.length);
        }
        Arrays.fill(out, offset, offset + members, 0.0);
        for (int k = 0; k < weights.length; k++) {
            double w = weights[k];
            if (w != 0) {
                double[] v = axial[k];
                for (int i = 0; i < members; i++) {
                    out[offset + i] += w * v[i];
                }
            }
        }
    }

    /** The axial force of the member at {@code memberIndex} for {@code weights}, N: the value {@link #axialForces} gives it. */
    public double axialForce(int memberIndex, double[] weights) {
        double sum = 0.0;
        for (int k = 0; k < weights.length; k++) {
            double w = weights[k];
            if (w != 0) {
                sum += w * axial[k][memberIndex];
            }
        }
        return sum;
    }

    /**
     * End force component {@code component} (0–5 at i, 6–11 at j, as {@link #endForces}) of the
     * member at {@code memberIndex} for {@code weights}: the value {@link #endForces} gives it.
     */
    public double endForce(int memberIndex, int component, double[] weights) {
        int at = memberIndex * 12 + component;
        double sum = 0.0;
        for (int k = 0; k < weights.length; k++) {
            double w = weights[k];
            if (w != 0) {
                sum += w * endForces[k][at];
            }
        }
        return sum;
    }

    /** End force component {@code component} of the member at {@code memberIndex} in the response to basis vector {@code k}. */
    public double basisEndForce(int k, int memberIndex, int component) {
        return endForces[k][memberIndex * 12 + component];
    }

    /**
     * End forces of the member at {@code memberIndex} (frame order) for {@code weights}, into
     * {@code out} (output, length ≥ 12): the end actions at i (fx..mz) then at j, local axes, as
     * {@link MemberEndForces}.
     *
     * @return {@code out}
     */
    public double[] endForces(int memberIndex, double[] weights, double[] out) {
        Arrays.fill(out, 0, 12, 0.0);
        int base = memberIndex * 12;
        for (int k = 0; k < weights.length; k++) {
            double w = weights[k];
            if (w != 0) {
                double[] f = endForces[k];
                for (int c = 0; c < 12; c++) {
                    out[c] += w * f[base + c];
                }
            }
        }
        return out;
    }

    /**
     * Refuses the case of {@code weights} (input) when its auto-restraints carry load, as
     * {@link Solution#requireLoadCarried} does for a case solved in full.
     *
     * @param forces output, length ≥ the auto-restraint count: the force (N) or moment (N·m) each
     *               auto-restraint exerts along its direction in this case
     * @throws UnstableStructureException see {@link LoadPath#requireCarried}
     */
    public void requireLoadCarried(String caseName, double[] weights, double[] forces) throws UnstableStructureException {
        int autos = model.autoRestraints().size();
        superpose(restraintForces, weights, forces, autos);
        for (int a = 0; a < autos; a++) {
            if (forces[a] != 0) {
                double[] load = superpose(applied, weights, new double[applied[0].length], applied[0].length);
                LoadPath.requireCarried(model, caseName, forces, LoadPath.totalLoad(load, model.size()));
                return;
            }
        }
    }

    private static double[] superpose(double[][] basis, double[] weights, double[] out, int length) {
        if (weights.length != basis.length) {
            throw new IllegalArgumentException("expected " + basis.length + " weights, got " + weights.length);
        }
        Arrays.fill(out, 0, length, 0.0);
        for (int k = 0; k < weights.length; k++) {
            double w = weights[k];
            if (w != 0) {
                double[] v = basis[k];
                for (int i = 0; i < length; i++) {
                    out[i] += w * v[i];
                }
            }
        }
        return out;
    }
}
