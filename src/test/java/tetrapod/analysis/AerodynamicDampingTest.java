package tetrapod.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.load.DragArea;
import tetrapod.load.NodeShare;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Material;
import tetrapod.model.Node;

/**
 * The drag-to-mass ratio c_f b / m_e that the aerodynamic damping of EN 1991-1-4 (F.16) takes, from a
 * mode: for even drag and mass it is c_f b / m of (F.16) whatever the mode's shape (the equivalent mass
 * of (F.17) is the mass itself then); with a drag shared between two nodes the mode's displacement where
 * it acts is their share-weighted mean, worked by hand below. Invented numbers.
 */
class AerodynamicDampingTest {

    private static final int NODES = 5;

    @Test
    void evenDragAndMassGiveTheRatioOfF16WhateverTheModeShape() {
        double[] mass = new double[NODES];
        List<DragArea> drags = new ArrayList<>();
        for (int n = 0; n < NODES; n++) {
            mass[n] = 400;                                             // kg at each node
            drags.add(new DragArea(0.6, List.of(new NodeShare(n + 1, 1.0))));   // c_f A, m², at each node
        }
        double[] shape = {0, 0.1, 0.35, 0.7, 1.2};                    // any shape along the sway direction
        double ratio = AerodynamicDamping.dragPerMass(sway(shape, 30), frame(), mass, drags);
        assertEquals(0.6 / 400, ratio, 1e-15);                         // (F.16): c_f b / m
    }

    @Test
    void aDragSharedBetweenTwoNodesActsWithTheirMeanDisplacement() {
        double[] mass = {0, 100, 100, 0, 0};
        double[] shape = {0, 1.0, 3.0, 0, 0};
        // 1 m² of drag shared 1/4 : 3/4 between nodes 2 and 3: φ_p = 0.25 · 1 + 0.75 · 3 = 2.5
        List<DragArea> drags = List.of(new DragArea(1.0, List.of(new NodeShare(2, 0.25), new NodeShare(3, 0.75))));
        double ratio = AerodynamicDamping.dragPerMass(sway(shape, 0), frame(), mass, drags);
        assertEquals(1.0 * 2.5 * 2.5 / (100 * 1 + 100 * 9), ratio, 1e-15);
    }

    @Test
    void aModeThatDoesNotSwayIsNotDampedByTheAlongWindDrag() {
        double[] mass = {1, 1, 1, 1, 1};
        List<DragArea> drags = List.of(new DragArea(1.0, List.of(new NodeShare(5, 1.0))));
        NaturalMode twist = new NaturalMode(1, 2.0, NaturalMode.Kind.TORSION, null, 0, 0, 0, 1, 0, new double[6 * NODES]);
        assertEquals(0, AerodynamicDamping.dragPerMass(twist, frame(), mass, drags), 0);
    }

    /** A sway mode along {@code directionDeg} whose displacement along it is {@code along} at each node. */
    private static NaturalMode sway(double[] along, double directionDeg) {
        double[] phi = new double[6 * NODES];
        for (int n = 0; n < NODES; n++) {
            phi[6 * n] = along[n] * Math.cos(Math.toRadians(directionDeg));
            phi[6 * n + 1] = along[n] * Math.sin(Math.toRadians(directionDeg));
            phi[6 * n + 2] = 0.05 * along[n];                           // vertical motion takes no part
        }
        return new NaturalMode(1, 1.5, NaturalMode.Kind.SWAY, directionDeg, 0.6, 0.3, 0, 0, 0, phi);
    }

    private static Frame frame() {
        List<Node> nodes = new ArrayList<>();
        for (int n = 0; n < NODES; n++) {
            nodes.add(new Node(n + 1, 0, 0, 3.0 * n));
        }
        Material steel = new Material("test", 210e9, 81e9, 7850,
                List.of(new Material.StrengthBand(Double.POSITIVE_INFINITY, 355e6, 490e6)), "test material");
        return new Frame("line of nodes", Idealisation.FRAME, steel, nodes, List.of(), List.of());
    }
}
