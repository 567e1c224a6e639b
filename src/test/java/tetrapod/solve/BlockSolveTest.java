package tetrapod.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.Restraint;
import tetrapod.model.Support;
import tetrapod.model.Vec3;

/**
 * Several right-hand sides solved with one pass over the Cholesky factor give, each, the same bits
 * as solving it alone with EJML's triangular solves (whose solutions the solver's tests check).
 */
class BlockSolveTest {

    @Test
    void eachRightHandSideIsTheSameToTheLastBitAsSolvedAlone() throws Exception {
        FactoredSystem system = Solver.factor(StructuralModel.of(bentFrame()));
        int n = system.model().numbering().freeCount();
        int q = 5;
        Random random = new Random(11);
        double[][] alone = new double[q][n];
        double[] block = new double[n * q];
        for (int r = 0; r < q; r++) {
            for (int e = 0; e < n; e++) {
                alone[r][e] = random.nextDouble() - 0.5;
                block[e * q + r] = alone[r][e];
            }
        }
        for (double[] b : alone) {
            system.solveFree(b);
        }
        system.solveFree(block, q);
        for (int r = 0; r < q; r++) {
            for (int e = 0; e < n; e++) {
                assertEquals(Double.doubleToLongBits(alone[r][e]), Double.doubleToLongBits(block[e * q + r]),
                        "right-hand side " + r + ", row " + e);
            }
        }
    }

    /** A bent cantilever of beam-columns in space, so that every free DOF couples to others. */
    private static Frame bentFrame() {
        var section = TestFrames.section("beam", 5e-3, 8e-6, 2e-6, 5e-6);
        List<Node> nodes = new ArrayList<>();
        List<Member> members = new ArrayList<>();
        for (int k = 0; k <= 12; k++) {
            nodes.add(new Node(k + 1, 0.3 * Math.sin(k), 0.2 * k, 0.5 * k));
            if (k > 0) {
                members.add(TestFrames.beam(k, k, k + 1, section, Vec3.X));
            }
        }
        return TestFrames.frame("bent cantilever", Idealisation.FRAME, TestFrames.STEEL, nodes, members,
                List.of(new Support(1, Restraint.FIXED)));
    }
}
