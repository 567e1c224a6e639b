package tetrapod.solve;

import tetrapod.model.NodeForce;
import java.util.ArrayList;
import java.util.List;
import org.ejml.data.DMatrixSparseCSC;
import tetrapod.common.ProgressListener;
import tetrapod.common.UnstableStructureException;
import tetrapod.common.UnstableStructureException.FreeDof;
import tetrapod.model.Idealisation;
import tetrapod.model.Node;

/**
 * A structure whose stiffness has been assembled and factorised once (K_ff = L·Lᵀ), ready to
 * solve any number of load vectors by forward and back substitution. Immutable and safe to use
 * from several threads at once.
 */
public final class FactoredSystem {

    /** A translation beyond this multiple of the structure size means the structure is a mechanism. */
    public static final double ABSURD_DISPLACEMENT = 1e3;
    /**
     * Above this equilibrium error, iterative refinement is taken (at most
     * {@link #MAX_REFINEMENTS} steps, each kept only if it lowers the error), with the residual
     * F − K·u accumulated in about twice the working precision: large, flexible structures, where
     * |K|·|u| is far above the loads, lose digits in a plain product. The floor that remains is
     * the rounding of u itself, ~ε·|K|·|u| per equation (docs/solver.md §5).
     */
    private static final double REFINE_ABOVE = 1e-10;
    private static final int MAX_REFINEMENTS = 2;

    private final StructuralModel model;
    private final DMatrixSparseCSC kff;
    private final DMatrixSparseCSC krf;
    private final DMatrixSparseCSC lower; // null when there is no free DOF

    FactoredSystem(StructuralModel model, DMatrixSparseCSC kff, DMatrixSparseCSC krf, DMatrixSparseCSC lower) {
        this.model = model;
        this.kff = kff;
        this.krf = krf;
        this.lower = lower;
    }

    public StructuralModel model() {
        return model;
    }

    /** The lower Cholesky factor (null when nothing is free); read-only, for benchmarks and tests. */
    DMatrixSparseCSC lowerFactor() {
        return lower;
    }

    /** Non-zeros stored in the Cholesky factor L (a measure of fill and of solve cost). */
    public long factorNonZeros() {
        return lower == null ? 0 : lower.nz_length;
    }

    /** Solves K_ff·x = b in place on the free DOFs (b input, overwritten with x), for {@link ModalAnalysis}. */
    void solveFree(double[] b) {
        if (lower != null) {
            SparseKernels.choleskySolve(lower, b);
        }
    }

    /**
     * Solves K_ff·X = B in place for {@code q} right-hand sides held row by row
     * ({@link SparseKernels#choleskySolve(DMatrixSparseCSC, double[], int)}), each the same to the
     * last bit as {@link #solveFree(double[])} gives it.
     */
    void solveFree(double[] b, int q) {
        if (lower != null) {
            SparseKernels.choleskySolve(lower, b, q);
        }
    }

    /**
     * ‖K x − λ M x‖ / ‖λ M x‖ on the free DOFs, M = diag(m): how well (λ, x) is an eigenpair
     * (dimensionless; 0 when λ M x is zero).
     */
    double residual(double[] x, double[] m, double lambda) {
        double[] kx = new double[x.length];
        SparseKernels.multiply(kff, x, kx);
        double num = 0;
        double den = 0;
        for (int e = 0; e < x.length; e++) {
            double target = lambda * m[e] * x[e];
            num += (kx[e] - target) * (kx[e] - target);
            den += target * target;
        }
        return den > 0 ? Math.sqrt(num / den) : 0;
    }

    /** {@link #solveAll(List, ProgressListener)} for one vector. */
    public Solution solve(LoadVector loads) throws UnstableStructureException {
        return solveAll(List.of(loads)).get(0);
    }

    /** {@link #solveAll(List, ProgressListener)} without progress reports. */
    public List<Solution> solveAll(List<LoadVector> loads) throws UnstableStructureException {
        return solveAll(loads, ProgressListener.NONE);
    }

    /**
     * Solves every load vector with the one factorisation, in order.
     *
     * @param loads    input; every node named must be in the frame
     * @param progress told "solve", done of total, after each vector
     * @throws UnstableStructureException when a solution is not finite or a node moves more than
     *         {@link #ABSURD_DISPLACEMENT} × the structure size (a mechanism the pivots missed)
     * @throws IllegalArgumentException   when a load names an unknown node, or applies a moment
     *         to a truss
     */
    public List<Solution> solveAll(List<LoadVector> loads, ProgressListener progress) throws UnstableStructureException {
        List<Solution> out = new ArrayList<>(loads.size());
        int done = 0;
        for (LoadVector load : loads) {
            out.add(solveOne(load));
            progress.progress("solve", ++done, loads.size());
        }
        return out;
    }

    private Solution solveOne(LoadVector load) throws UnstableStructureException {
        DofNumbering numbering = model.numbering();
        NodeConstraints constraints = model.constraints();
        int nodes = model.frame().nodes().size();
        int dpn = numbering.dofsPerNode();
        double[] applied = nodalLoads(load);
        double[] ff = new double[numbering.freeCount()];
        double[] fr = new double[numbering.restrainedCount()];
        for (int n = 0; n < nodes; n++) {
            double[] local = constraints.toNode(n, applied, 6 * n);
            for (int k = 0; k < dpn; k++) {
                int code = numbering.code(n, k);
                if (code >= 0) {
                    ff[code] = local[k];
                } else {
                    fr[-1 - code] = local[k];
                }
            }
        }
        double[] uf = ff.clone();
        if (lower != null) {
            SparseKernels.choleskySolve(lower, uf);
        }
        Response response = respond(load, applied, uf, fr);
        for (int step = 0; step < MAX_REFINEMENTS && response.error > REFINE_ABOVE && lower != null; step++) {
            double[] residual = new double[ff.length];
            SparseKernels.residualSymmetric(kff, ff, uf, residual);
            SparseKernels.choleskySolve(lower, residual);
            double[] refined = uf.clone();
            for (int k = 0; k < ff.length; k++) {
                refined[k] += residual[k];
            }
            Response better = respond(load, applied, refined, fr);
            if (!(better.error < response.error)) {
                break;
            }
            uf = refined;
            response = better;
        }
        return new Solution(model, load, response.displacement, response.reactions, response.autoForces,
                response.alongRestraints, LoadPath.totalLoad(applied, model.size()), response.error);
    }

    private record Response(double[] displacement, List<NodeForce> reactions, List<NodeForce> autoForces,
                            double[] alongRestraints, double error) { }

    private Response respond(LoadVector load, double[] applied, double[] uf, double[] fr) throws UnstableStructureException {
        DofNumbering numbering = model.numbering();
        NodeConstraints constraints = model.constraints();
        List<Node> nodes = model.frame().nodes();
        int dpn = numbering.dofsPerNode();
        double[] displacement = new double[nodes.size() * 6];
        for (int n = 0; n < nodes.size(); n++) {
            double[] local = new double[6];
            for (int k = 0; k < dpn; k++) {
                int code = numbering.code(n, k);
                local[k] = code >= 0 ? uf[code] : 0;
            }
            System.arraycopy(constraints.toGlobal(n, local), 0, displacement, 6 * n, 6);
        }
        guard(load, displacement);
        double[] restrainedForce = new double[numbering.restrainedCount()];
        SparseKernels.multiply(krf, uf, restrainedForce);
        double[][] support = new double[nodes.size()][];
        double[][] auto = new double[nodes.size()][];
        for (int r = 0; r < restrainedForce.length; r++) {
            int n = numbering.restrainedNode(r);
            int k = numbering.restrainedDof(r);
            double value = restrainedForce[r] - fr[r];
            double[][] target = constraints.kind(n, k) == NodeConstraints.SUPPORT ? support : auto;
            if (target[n] == null) {
                target[n] = new double[6];
            }
            target[n][k] = value;
        }
        List<NodeForce> reactions = new ArrayList<>(model.frame().supports().size());
        for (var s : model.frame().supports()) {
            int n = model.nodeIndex(s.node());
            reactions.add(nodeForce(nodes.get(n).id(), constraints.toGlobal(n, support[n] == null ? new double[6] : support[n])));
        }
        List<NodeForce> autoForces = new ArrayList<>();
        for (int n = 0; n < nodes.size(); n++) {
            if (auto[n] != null) {
                autoForces.add(nodeForce(nodes.get(n).id(), constraints.toGlobal(n, auto[n])));
            }
        }
        int[] rows = model.autoRestraintRows();
        double[] alongRestraints = new double[rows.length];
        for (int a = 0; a < rows.length; a++) {
            alongRestraints[a] = restrainedForce[rows[a]] - fr[rows[a]];
        }
        double error = Equilibrium.error(model, applied, reactions);
        return new Response(displacement, reactions, autoForces, alongRestraints, error);
    }

    /** Sums the load vector into a nodes × 6 array in tower axes. */
    double[] nodalLoads(LoadVector load) {
        double[] applied = new double[model.frame().nodes().size() * 6];
        boolean truss = model.frame().idealisation() == Idealisation.TRUSS;
        for (NodeForce f : load.loads()) {
            int n;
            try {
                n = model.nodeIndex(f.node());
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException("load vector " + load.name() + ": load at unknown node " + f.node(), e);
            }
            if (truss && (f.mx() != 0 || f.my() != 0 || f.mz() != 0)) {
                throw new IllegalArgumentException("load vector " + load.name() + ": a truss cannot carry the moment applied at node " + f.node());
            }
            for (int k = 0; k < 6; k++) {
                applied[6 * n + k] += f.component(k);
            }
        }
        return applied;
    }

    private void guard(LoadVector load, double[] displacement) throws UnstableStructureException {
        List<Node> nodes = model.frame().nodes();
        int worst = -1;
        double worstValue = 0;
        for (int n = 0; n < nodes.size(); n++) {
            double t = 0;
            boolean finite = true;
            for (int k = 0; k < 6; k++) {
                double v = displacement[6 * n + k];
                finite &= Double.isFinite(v);
                if (k < 3) {
                    t += v * v;
                }
            }
            if (!finite) {
                t = Double.POSITIVE_INFINITY;
            }
            if (t > worstValue) {
                worstValue = t;
                worst = n;
            }
        }
        double limit = ABSURD_DISPLACEMENT * model.size();
        if (worst >= 0 && !(Math.sqrt(worstValue) <= limit)) {
            int id = nodes.get(worst).id();
            int axis = 0;
            for (int k = 1; k < 3; k++) {
                if (!(Math.abs(displacement[6 * worst + k]) <= Math.abs(displacement[6 * worst + axis]))) {
                    axis = k;
                }
            }
            String dof = new String[] {"ux", "uy", "uz"}[axis];
            String size = Double.isFinite(worstValue) ? String.format(java.util.Locale.ROOT, "%.3g m", Math.sqrt(worstValue)) : "without limit";
            throw new UnstableStructureException("unstable structure: under load vector '" + load.name() + "' node " + id
                    + " moves " + size + " (" + dof + "), more than " + (int) ABSURD_DISPLACEMENT
                    + " times the structure size; likely cause: " + MechanismDiagnosis.MECHANISM, List.of(new FreeDof(id, dof)));
        }
    }

    private static NodeForce nodeForce(int id, double[] v) {
        return new NodeForce(id, v[0], v[1], v[2], v[3], v[4], v[5]);
    }
}
