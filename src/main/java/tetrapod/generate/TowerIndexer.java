package tetrapod.generate;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import tetrapod.model.Face;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.Node;

/** Builds the {@link PanelLevel}s and {@link Panel}s of a generated frame. */
final class TowerIndexer {

    private TowerIndexer() { }

    record Index(List<PanelLevel> levels, List<Panel> panels) { }

    static Index index(Frame frame, LevelPlan plan, LatticeBuilder.Lattice lattice, List<Integer> nodeIds) {
        Set<Integer> planLevels = new HashSet<>(plan.planLevels());
        List<PanelLevel> levels = new ArrayList<>();
        for (LevelPlan.Level level : plan.levels()) {
            List<Integer> legNodes = lattice.levelLegNodes().get(level.index()).stream().map(nodeIds::get).toList();
            levels.add(new PanelLevel(level.index(), frame.nodes().get(legNodes.get(0) - 1).z(), level.widthX(),
                    level.widthY(), legNodes, plan.horizontalOwner(level).isPresent(), planLevels.contains(level.index())));
        }
        int[] firstPanelOfSegment = new int[plan.segments().size()];
        for (LevelPlan.PanelSlot slot : plan.panels()) {
            if (slot.panelInSegment() == 1) {
                firstPanelOfSegment[slot.segment()] = slot.number();
            }
        }
        List<Collector> collectors = new ArrayList<>();
        plan.panels().forEach(slot -> collectors.add(new Collector()));
        Map<Integer, Node> nodes = new HashMap<>();
        frame.nodes().forEach(n -> nodes.put(n.id(), n));
        for (Member m : frame.members()) {
            Collector c = collectors.get(firstPanelOfSegment[m.segment() - 1] + m.panel() - 2);
            switch (m.role()) {
                case LEG -> c.legs.get(legOf(nodes.get(m.i()), nodes.get(m.j()))).add(m.id());
                case PLAN -> c.plan.add(m.id());
                default -> c.faces.computeIfAbsent(m.face(), f -> new ArrayList<>()).add(m.id());
            }
        }
        List<Panel> panels = new ArrayList<>();
        for (LevelPlan.PanelSlot slot : plan.panels()) {
            Collector c = collectors.get(slot.number() - 1);
            panels.add(new Panel(slot.number(), slot.segment() + 1, slot.panelInSegment(),
                    levels.get(slot.bottomLevel()), levels.get(slot.topLevel()), c.legs, c.faces, c.plan));
        }
        return new Index(levels, panels);
    }

    /** Which leg (0..3) a leg member belongs to, from the quadrant of its midpoint. */
    private static int legOf(Node i, Node j) {
        double x = i.x() + j.x();
        double y = i.y() + j.y();
        if (y < 0) {
            return x < 0 ? 0 : 1;
        }
        return x > 0 ? 2 : 3;
    }

    private static final class Collector {
        final List<List<Integer>> legs = List.of(new ArrayList<>(), new ArrayList<>(), new ArrayList<>(), new ArrayList<>());
        final Map<Face, List<Integer>> faces = new EnumMap<>(Face.class);
        final List<Integer> plan = new ArrayList<>();
    }
}
