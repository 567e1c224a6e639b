package tetrapod.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Node;

/** Reverse Cuthill–McKee and the choice between the frame's order and RCM. */
class ReverseCuthillMcKeeTest {

    /** A path 0–1–…–(n−1) whose vertices are relabelled at random. */
    private static int[][] shuffledPath(int n, Random random) {
        List<Integer> label = new ArrayList<>();
        for (int v = 0; v < n; v++) {
            label.add(v);
        }
        Collections.shuffle(label, random);
        List<TreeSet<Integer>> adj = new ArrayList<>();
        for (int v = 0; v < n; v++) {
            adj.add(new TreeSet<>());
        }
        for (int v = 0; v + 1 < n; v++) {
            adj.get(label.get(v)).add(label.get(v + 1));
            adj.get(label.get(v + 1)).add(label.get(v));
        }
        return adj.stream().map(s -> s.stream().mapToInt(Integer::intValue).toArray()).toArray(int[][]::new);
    }

    @Test
    void aScrambledPathGetsBandwidthOne() {
        int[][] adjacency = shuffledPath(200, new Random(7));
        int[] order = ReverseCuthillMcKee.order(adjacency);
        int[] position = ReverseCuthillMcKee.positions(order);
        assertEquals(1, ReverseCuthillMcKee.bandwidth(adjacency, position)); // a path's optimum
        assertEquals(199, ReverseCuthillMcKee.profile(adjacency, position));
        assertEquals(200, Arrays.stream(order).distinct().count(), "a permutation");
    }

    @Test
    void disconnectedPiecesAreAllOrdered() {
        int[][] adjacency = {{1}, {0}, {}, {4}, {3}};
        int[] order = ReverseCuthillMcKee.order(adjacency);
        assertEquals(5, Arrays.stream(order).distinct().count());
    }

    @Test
    void aScrambledTowerIsReorderedToANarrowBand() {
        Frame tower = new TowerFixture(Idealisation.TRUSS, 30, 8, 2, 60).build();
        StructuralModel given = StructuralModel.of(tower);
        List<Node> nodes = new ArrayList<>(tower.nodes());
        Collections.shuffle(nodes, new Random(3));
        Frame scrambled = new Frame("scrambled", tower.idealisation(), tower.material(), nodes, tower.members(), tower.supports());
        StructuralModel model = StructuralModel.of(scrambled);
        assertEquals(NodeOrdering.REVERSE_CUTHILL_MCKEE, model.ordering().used());
        assertTrue(model.ordering().bandwidth() <= given.ordering().givenBandwidth() + 4,
                "RCM band " + model.ordering().bandwidth() + " vs bottom-up " + given.ordering().givenBandwidth());
        assertTrue(model.ordering().givenBandwidth() > 10 * model.ordering().bandwidth(), model.ordering().toString());
    }
}
