package tetrapod.load;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import tetrapod.generate.Panel;
import tetrapod.generate.Tower;
import tetrapod.model.Face;
import tetrapod.model.Idealisation;
import tetrapod.model.NodeForce;
import tetrapod.model.spec.AncillarySpec;
import tetrapod.model.spec.BaseSpec;
import tetrapod.model.spec.Bracing;
import tetrapod.model.spec.Horizontals;
import tetrapod.model.spec.MaterialSpec;
import tetrapod.model.spec.SegmentSpec;
import tetrapod.model.spec.SupportType;
import tetrapod.model.spec.TowerSpec;

/** Where the ancillaries' weight and wind go, worked by the lever rule. */
class AncillariesTest {

    /** Two panels of 3 m (X bracing), 2 m square. */
    private static final Tower TOWER = Towers.build(new TowerSpec("two panels", "",
            Idealisation.TRUSS, new BaseSpec(2, 2),
            List.of(new SegmentSpec(6, 2, 2, 2, List.of(), Bracing.X,
                    Horizontals.ALL, true, 0, Towers.sections("L100x10", "L70x7", "L60x6"))),
            MaterialSpec.grade("S355"), SupportType.PINNED, 0.1, List.of(),
            Map.of(), null, null));

    @Test
    void pointItemSplitsByTheLeverRuleOverFourLegs() {
        // 2 kN at 4 m: panel 2 (3 to 6 m), a third of the way up: 2/3 to the 3 m level, 1/3 to the 6 m level
        Ancillaries items = Ancillaries.of(TOWER, List.of(new AncillarySpec.Point("lamp", 4, 2, 0.5, 1.2, 0, Face.NONE)));
        Panel p2 = TOWER.panels().get(1);
        Map<Integer, NodeForce> loads = OnePanelTowerTest.byNode(items.weights());
        assertEquals(8, loads.size());
        for (int leg = 0; leg < 4; leg++) {
            assertEquals(-2000.0 * 2 / 3 / 4, loads.get(p2.bottomLegNodes().get(leg)).fz(), 1e-9);
            assertEquals(-2000.0 / 3 / 4, loads.get(p2.topLegNodes().get(leg)).fz(), 1e-9);
        }
    }

    @Test
    void itemOnAFaceGoesToThatFacesTwoLegs() {
        // on face +x: legs 1 and 2; at the top (6 m) all to the top level
        Ancillaries items = Ancillaries.of(TOWER, List.of(new AncillarySpec.Point("dish", 6, 1, 0.5, 1.2, 0, Face.X_PLUS)));
        Panel top = TOWER.panels().get(1);
        Map<Integer, NodeForce> loads = OnePanelTowerTest.byNode(items.weights());
        assertEquals(2, loads.size());
        assertEquals(-500, loads.get(top.topLegNodes().get(1)).fz(), 1e-9);
        assertEquals(-500, loads.get(top.topLegNodes().get(2)).fz(), 1e-9);
    }

    @Test
    void linearItemIsCutAtThePanelLevels() {
        // 0.1 kN/m from 1.5 m to 4.5 m on face −y (legs 0 and 1): 1.5 m in each panel, each piece at its middle
        // (2.25 m: 3/4 up panel 1; 3.75 m: 1/4 up panel 2). Total 300 N.
        Ancillaries items = Ancillaries.of(TOWER,
                List.of(new AncillarySpec.Linear("ladder", 1.5, 4.5, 0.1, 0.4, 1.5, 0.25, Face.Y_MINUS)));
        List<NodeForce> w = items.weights();
        assertEquals(-300, w.stream().mapToDouble(NodeForce::fz).sum(), 1e-9);
        Panel p1 = TOWER.panels().get(0);
        Map<Integer, NodeForce> loads = OnePanelTowerTest.byNode(w);
        // the 3 m level takes 3/4 of 150 N from below and 3/4 of 150 N from above, over two legs
        assertEquals(-(0.75 * 150 + 0.75 * 150) / 2, loads.get(p1.topLegNodes().get(0)).fz(), 1e-9);
        assertEquals(-0.25 * 150 / 2, loads.get(p1.bottomLegNodes().get(1)).fz(), 1e-9);
        // wind: c_f × width × length × (1 − shielding) = 1.5 × 0.4 × 1.5 × 0.75 per piece
        List<WindPoint> points = items.windPoints(Asce7Ice.NONE);
        assertEquals(2, points.size());
        assertEquals(1.5 * 0.4 * 1.5 * 0.75, points.get(0).effectiveArea(), 1e-12);
        assertEquals(2.25, points.get(0).z(), 1e-12);
        // with 10 mm of ice (no height factor) the width is 0.42 m
        assertEquals(1.5 * 0.42 * 1.5 * 0.75, items.windPoints(new Asce7Ice(0.01, 900, false)).get(0).effectiveArea(), 1e-12);
    }
}
