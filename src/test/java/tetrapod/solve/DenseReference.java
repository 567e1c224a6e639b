package tetrapod.solve;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.SectionProperties;
import tetrapod.model.Support;

/**
 * An independent dense solution of a frame, written separately from the solver under test:
 * global DOFs for every node, element matrices from natural deformations ({@link NaturalElement}),
 * constraints as free directions per node and whole modes ({@link DenseSystem}), dense LU.
 */
final class DenseReference {

    private final Frame frame;
    private final Map<Integer, Integer> index;
    private final DenseSystem system;
    private final List<NaturalElement> elements = new ArrayList<>();

    /**
     * @param continuity nodes held across a straight bracing line by its bending (input)
     */
    DenseReference(Frame frame, List<ContinuityNode> continuity) {
        this.frame = frame;
        this.index = frame.nodeIndex();
        this.system = new DenseSystem(frame.nodes().size());
        boolean truss = frame.idealisation() == Idealisation.TRUSS;
        double e = frame.material().e();
        double g = frame.material().g();
        for (Member m : frame.members()) {
            SectionProperties p = m.section().properties();
            NaturalElement element = new NaturalElement(position(m.i()), position(m.j()),
                    new double[] {m.orientation().x(), m.orientation().y(), m.orientation().z()},
                    e * p.area(), e * p.iu(), e * p.iv(), g * p.torsion(), truss || m.axialOnly());
            elements.add(element);
            system.addMember(index.get(m.i()), index.get(m.j()), element);
        }
        for (ContinuityNode c : continuity) {
            system.addContinuity(index.get(c.lineStart()), index.get(c.node()), index.get(c.lineEnd()),
                    new double[][] {position(c.lineStart()), position(c.node()), position(c.lineEnd())}, c.stiffness());
        }
    }

    DenseSystem system() {
        return system;
    }

    /**
     * Per node index, per DOF (ux … rz), true where a support holds it or, in a truss, for the
     * rotations (not degrees of freedom of a pin-jointed model).
     */
    boolean[][] held() {
        boolean truss = frame.idealisation() == Idealisation.TRUSS;
        boolean[][] held = new boolean[frame.nodes().size()][6];
        for (boolean[] h : held) {
            Arrays.fill(h, 3, 6, truss);
        }
        for (Support s : frame.supports()) {
            for (int q = 0; q < 6; q++) {
                held[index.get(s.node())][q] |= s.restraint().holds(q);
            }
        }
        return held;
    }

    /** The solution with the supports as the only constraints. */
    Solved solve(double[] loads) {
        List<List<double[]>> free = new ArrayList<>();
        for (boolean[] h : held()) {
            List<double[]> constrained = new ArrayList<>();
            for (int q = 0; q < 6; q++) {
                if (h[q]) {
                    double[] axis = new double[6];
                    axis[q] = 1;
                    constrained.add(axis);
                }
            }
            free.add(DenseSystem.complement(constrained));
        }
        return solve(free, List.of(), loads);
    }

    /**
     * @param free  per node index, the orthonormal 6-vectors left free (input)
     * @param modes whole-structure vectors φ with φᵀu = 0 (input)
     * @param loads 6 per node (tower axes, in frame node order) (input)
     */
    Solved solve(List<List<double[]>> free, List<double[]> modes, double[] loads) {
        double[] u = system.solve(free, modes, new double[][] {loads})[0];
        Map<Integer, double[][]> memberEnd = new HashMap<>();
        for (int e = 0; e < frame.members().size(); e++) {
            Member m = frame.members().get(e);
            double[] d = new double[12];
            System.arraycopy(u, 6 * index.get(m.i()), d, 0, 6);
            System.arraycopy(u, 6 * index.get(m.j()), d, 6, 6);
            memberEnd.put(m.id(), elements.get(e).endForces(d));
        }
        return new Solved(index, u, system.residual(u, loads), memberEnd);
    }

    private double[] position(int nodeId) {
        Node n = frame.nodes().get(index.get(nodeId));
        return new double[] {n.x(), n.y(), n.z()};
    }

    /**
     * A reference solution.
     *
     * @param u         6 per node, tower axes, frame node order
     * @param residual  K·u − F, 6 per node: the forces every constraint (support, restraint, mode) exerts
     * @param memberEnd member id → {end actions at i (local 6), at j}
     */
    record Solved(Map<Integer, Integer> index, double[] u, double[] residual, Map<Integer, double[][]> memberEnd) {

        double[] displacement(int nodeId) {
            int b = 6 * index.get(nodeId);
            return Arrays.copyOfRange(u, b, b + 6);
        }

        double[] residualAt(int nodeId) {
            int b = 6 * index.get(nodeId);
            return Arrays.copyOfRange(residual, b, b + 6);
        }
    }
}
