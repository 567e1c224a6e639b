package tetrapod.solve;

import tetrapod.model.NodeForce;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import tetrapod.common.UnstableStructureException;
import tetrapod.model.Node;

/**
 * The response of the structure to one {@link LoadVector}. Immutable; safe to share.
 *
 * <ul>
 * <li>{@link #displacements()}: every node, in frame order, tower axes (m, rad); DOFs not in the
 *     model (rotations of a truss) are zero;
 * <li>{@link #reactions()}: every support node, in the frame's support order: the forces and
 *     moments the support exerts on the structure, tower axes (N, N·m); components the support
 *     does not hold are zero;
 * <li>{@link #autoRestraintForces()}: forces the solver's auto-restraints exert (see
 *     {@link StabilityInspector}). They are zero unless a load has a component along an
 *     auto-restrained direction, which the lattice model cannot carry: a non-zero value means a
 *     load went straight into the ground of the model, and the load generator should move it to
 *     a node that can take it ({@link #largestAutoRestraintForce()});
 * <li>{@link #memberForces()}: end forces of every member in its local axes (see
 *     {@link MemberEndForces} for the sign convention), computed from the displacements on request;
 * <li>{@link #equilibriumError()}: the global equilibrium residual, see there.
 * </ul>
 */
public final class Solution {

    private final StructuralModel model;
    private final LoadVector loads;
    private final double[] displacement; // nodes × 6, global
    private final List<NodeForce> reactions;
    private final List<NodeForce> autoRestraintForces;
    private final double[] alongRestraints; // per model.autoRestraints(), N or N·m along its direction
    private final double totalLoad;
    private final double equilibriumError;

    Solution(StructuralModel model, LoadVector loads, double[] displacement, List<NodeForce> reactions,
             List<NodeForce> autoRestraintForces, double[] alongRestraints, double totalLoad, double equilibriumError) {
        this.model = model;
        this.loads = loads;
        this.displacement = displacement;
        this.reactions = List.copyOf(reactions);
        this.autoRestraintForces = List.copyOf(autoRestraintForces);
        this.alongRestraints = alongRestraints;
        this.totalLoad = totalLoad;
        this.equilibriumError = equilibriumError;
    }

    /**
     * The force (N) or moment (N·m) that auto-restraint {@code index} (in the order of
     * {@link StructuralModel#autoRestraints()}) exerts along its direction.
     */
    public double autoRestraintForce(int index) {
        return alongRestraints[index];
    }

    /** The applied load's size Σ|F| + Σ|M|/L over nodes and directions ({@link LoadPath#totalLoad}), N. */
    public double totalLoad() {
        return totalLoad;
    }

    /**
     * Refuses this solution when an auto-restraint carries load (see {@link LoadPath}).
     *
     * @param caseName the case, for the message
     * @throws UnstableStructureException naming the node, direction, force and the fix
     */
    public void requireLoadCarried(String caseName) throws UnstableStructureException {
        LoadPath.requireCarried(model, caseName, alongRestraints, totalLoad);
    }

    /** The load vector this solution answers. */
    public LoadVector loads() {
        return loads;
    }

    /** Displacements of all nodes, in frame order. */
    public List<NodeDisplacement> displacements() {
        List<Node> nodes = model.frame().nodes();
        List<NodeDisplacement> out = new ArrayList<>(nodes.size());
        for (int n = 0; n < nodes.size(); n++) {
            out.add(displacementAt(n));
        }
        return Collections.unmodifiableList(out);
    }

    /** Displacement of node {@code id}. */
    public NodeDisplacement displacement(int id) {
        return displacementAt(model.nodeIndex(id));
    }

    private NodeDisplacement displacementAt(int n) {
        int b = 6 * n;
        return new NodeDisplacement(model.frame().nodes().get(n).id(), displacement[b], displacement[b + 1],
                displacement[b + 2], displacement[b + 3], displacement[b + 4], displacement[b + 5]);
    }

    /** Support reactions, one per support, in the frame's support order. */
    public List<NodeForce> reactions() {
        return reactions;
    }

    /** The reaction at support node {@code id}. */
    public NodeForce reaction(int id) {
        for (NodeForce r : reactions) {
            if (r.node() == id) {
                return r;
            }
        }
        throw new IllegalArgumentException("node " + id + " has no support");
    }

    /** Forces of the auto-restraints, one per auto-restrained node, in frame node order. */
    public List<NodeForce> autoRestraintForces() {
        return autoRestraintForces;
    }

    /** Largest |force| (N) or |moment| (N·m) that an auto-restraint carries; 0 when none does. */
    public double largestAutoRestraintForce() {
        double max = 0;
        for (NodeForce f : autoRestraintForces) {
            max = Math.max(max, Math.max(f.force().norm(), f.moment().norm()));
        }
        return max;
    }

    /** End forces of all members, in frame member order. */
    public List<MemberEndForces> memberForces() {
        List<MemberElement> elements = model.elements();
        List<MemberEndForces> out = new ArrayList<>(elements.size());
        for (MemberElement e : elements) {
            out.add(forces(e));
        }
        return Collections.unmodifiableList(out);
    }

    /** End forces of member {@code id}. */
    public MemberEndForces memberForces(int id) {
        return forces(model.elements().get(model.memberIndex(id)));
    }

    private MemberEndForces forces(MemberElement e) {
        double[] ui = new double[6];
        double[] uj = new double[6];
        System.arraycopy(displacement, 6 * e.i(), ui, 0, 6);
        System.arraycopy(displacement, 6 * e.j(), uj, 0, 6);
        return e.endForces(ui, uj);
    }

    /**
     * Global equilibrium residual of the loads against the support reactions alone:
     * max(|ΣF|, |ΣM₀|/L) / Σ(|F| + |M|/L) over the loads, where M₀ are moments about the origin and
     * L is the structure size ({@link StructuralModel#size()}); 0 when there is no load.
     */
    public double equilibriumError() {
        return equilibriumError;
    }
}
