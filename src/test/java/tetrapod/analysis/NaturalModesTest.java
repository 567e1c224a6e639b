package tetrapod.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.Role;

/** The tower's natural modes: masses on the legs, and what the modes of a square tower must be by symmetry. */
class NaturalModesTest {

    private static final String NO_WIND = "{ }";

    @Test
    void everyKilogramEndsOnALegNodeAndNoneIsLost() throws Exception {
        TestTowers.Analysed a = TestTowers.analyse(TestTowers.squareTower(NO_WIND));
        Frame frame = a.result().tower().frame();
        double[] before = new double[frame.nodes().size()];
        var index = frame.nodeIndex();
        for (var c : a.loads().basis().components()) {
            if (c.action() == tetrapod.model.spec.LoadAction.DEAD) {
                c.loads().forEach(f -> before[index.get(f.node())] += -f.fz() / tetrapod.common.Units.G_ACCEL);
            }
        }
        double[] after = NaturalModes.nodeMasses(frame, a.loads().basis());
        boolean[] leg = new boolean[before.length];
        for (Member m : frame.members()) {
            if (m.role() == Role.LEG) {
                leg[index.get(m.i())] = true;
                leg[index.get(m.j())] = true;
            }
        }
        double totalBefore = 0;
        double totalAfter = 0;
        boolean anyInternal = false;
        for (int n = 0; n < before.length; n++) {
            totalBefore += before[n];
            totalAfter += after[n];
            if (!leg[n]) {
                anyInternal |= before[n] > 0;
                assertEquals(0, after[n], 0, "node index " + n + " is no leg node");
            }
        }
        assertTrue(anyInternal, "the test tower has crossings that carry mass");
        assertEquals(totalBefore, totalAfter, 1e-9 * totalBefore, "mass is conserved");
    }

    /**
     * A square tower (x and y faces alike) has equal sway frequencies in x and y, and its twist
     * about the axis is a mode of its own: by the four-fold symmetry of the structure and its masses.
     */
    @Test
    void aSquareTowerSwaysAlikeInXAndYAndTwistsOnItsOwn() throws Exception {
        List<NaturalMode> modes = TestTowers.analyse(TestTowers.squareTower(NO_WIND)).result().modes();
        assertEquals(NaturalModes.DEFAULT_COUNT, modes.size());
        List<NaturalMode> sway = modes.stream().filter(m -> m.kind() == NaturalMode.Kind.SWAY).toList();
        NaturalMode first = sway.get(0);
        NaturalMode second = sway.get(1);
        assertEquals(first.frequencyHz(), second.frequencyHz(), 1e-6 * first.frequencyHz(), "x and y sway alike");
        assertEquals(first.massX() + first.massY(), second.massX() + second.massY(), 1e-6,
                "the pair shares one sway, in two directions");
        NaturalMode torsion = modes.stream().filter(m -> m.kind() == NaturalMode.Kind.TORSION).findFirst().orElseThrow();
        assertTrue(torsion.inertiaZ() > 0.2 && torsion.massX() + torsion.massY() < 1e-6,
                "a pure twist: " + torsion);
        for (int k = 1; k < modes.size(); k++) {
            assertTrue(modes.get(k).frequencyHz() >= modes.get(k - 1).frequencyHz() * (1 - 1e-9), "ascending");
        }
    }
}
