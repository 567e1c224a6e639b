package tetrapod.generate;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import tetrapod.model.Face;
import tetrapod.model.Role;
import tetrapod.model.Section;
import tetrapod.model.Vec3;
import tetrapod.model.spec.SegmentSpec;

/**
 * Lays out every member line of a generated tower (legs per panel, face bracing, redundants,
 * horizontals, plan bracing) and registers their end points and joints. Lines are split into
 * members afterwards by {@link MemberSplitter}.
 */
final class LatticeBuilder {

    /** Leg k stands at (SIGN_X[k]·X/2, SIGN_Y[k]·Y/2): counter-clockwise from (−, −) seen from above. */
    static final int[] SIGN_X = {-1, 1, 1, -1};
    static final int[] SIGN_Y = {-1, -1, 1, 1};
    /** The face from leg k to leg k+1, named by its outward normal. */
    static final Face[] FACE_AFTER_LEG = {Face.Y_MINUS, Face.X_PLUS, Face.Y_PLUS, Face.X_MINUS};

    /**
     * The member lines and the node registry.
     *
     * @param levelLegNodes per panel level, the registry indexes of legs 0..3 there
     */
    record Lattice(NodeRegistry registry, List<RawMember> members, List<List<Integer>> levelLegNodes) {
        Lattice {
            members = List.copyOf(members);
            levelLegNodes = levelLegNodes.stream().map(List::copyOf).toList();
        }
    }

    private final LevelPlan plan;
    private final List<SegmentSpec> segments;
    private final List<Map<Role, Section>> sections;
    private final NodeRegistry registry = new NodeRegistry();
    private final List<RawMember> members = new ArrayList<>();

    private LatticeBuilder(LevelPlan plan, List<SegmentSpec> segments, List<Map<Role, Section>> sections) {
        this.plan = plan;
        this.segments = segments;
        this.sections = sections;
    }

    static Lattice build(LevelPlan plan, List<SegmentSpec> segments, List<Map<Role, Section>> sections) {
        return new LatticeBuilder(plan, segments, sections).build();
    }

    private Lattice build() {
        List<List<Integer>> levelLegNodes = new ArrayList<>();
        for (LevelPlan.Level level : plan.levels()) {
            List<Integer> legs = new ArrayList<>(4);
            for (int k = 0; k < 4; k++) {
                legs.add(registry.add(corner(level, k)));
            }
            levelLegNodes.add(legs);
        }
        for (LevelPlan.PanelSlot panel : plan.panels()) {
            addPanel(panel);
        }
        for (LevelPlan.Level level : plan.levels()) {
            addHorizontals(level);
        }
        for (int index : plan.planLevels()) {
            addPlanBracing(plan.levels().get(index));
        }
        return new Lattice(registry, members, levelLegNodes);
    }

    static Vec3 corner(LevelPlan.Level level, int leg) {
        return new Vec3(SIGN_X[leg] * level.widthX() / 2, SIGN_Y[leg] * level.widthY() / 2, level.z());
    }

    private void addPanel(LevelPlan.PanelSlot panel) {
        LevelPlan.Level bottom = plan.levels().get(panel.bottomLevel());
        LevelPlan.Level top = plan.levels().get(panel.topLevel());
        SegmentSpec seg = segments.get(panel.segment());
        Map<Role, Section> own = sections.get(panel.segment());
        int segmentNumber = panel.segment() + 1;
        Line[] legLines = new Line[4];
        for (int k = 0; k < 4; k++) {
            legLines[k] = new Line(corner(bottom, k), corner(top, k));
            add(new RawMember(legLines[k].from(), legLines[k].to(), Role.LEG, segmentNumber, panel.panelInSegment(),
                    Face.NONE, own.get(Role.LEG)));
        }
        FacePattern pattern = FacePattern.of(seg.bracing(), seg.crossingConnected());
        for (int k = 0; k < 4; k++) {
            int next = (k + 1) % 4;
            PanelFace face = new PanelFace(FACE_AFTER_LEG[k], legLines[k].from(), legLines[next].from(),
                    legLines[k].to(), legLines[next].to());
            FaceBracing bracing = pattern.brace(face, panel.panelInSegment());
            for (Line d : bracing.diagonals()) {
                add(new RawMember(d.from(), d.to(), Role.DIAGONAL, segmentNumber, panel.panelInSegment(),
                        face.face(), own.get(Role.DIAGONAL)));
            }
            bracing.joints().forEach(registry::add);
            for (int r = 1; r <= seg.redundants(); r++) {
                double z = bottom.z() + (top.z() - bottom.z()) * r / (seg.redundants() + 1.0);
                addRedundantLine(legLines[k].atHeight(z), legLines[next].atHeight(z), bracing.diagonals(), face,
                        segmentNumber, panel.panelInSegment(), own.get(Role.REDUNDANT));
            }
        }
    }

    /** Leg node → each diagonal's node at this height, in order along the face → the other leg node. */
    private void addRedundantLine(Vec3 start, Vec3 end, List<Line> diagonals, PanelFace face,
                                  int segment, int panel, Section section) {
        Vec3 along = end.minus(start);
        List<Vec3> stops = new ArrayList<>();
        stops.add(start);
        diagonals.stream().map(d -> d.atHeight(start.z()))
                .sorted(Comparator.comparingDouble((Vec3 p) -> p.minus(start).dot(along)))
                .forEach(stops::add);
        stops.add(end);
        for (int k = 0; k + 1 < stops.size(); k++) {
            add(new RawMember(stops.get(k), stops.get(k + 1), Role.REDUNDANT, segment, panel, face.face(), section));
        }
    }

    private void addHorizontals(LevelPlan.Level level) {
        plan.horizontalOwner(level).ifPresent(owner -> {
            Section section = sections.get(owner.segment()).get(Role.HORIZONTAL);
            for (int k = 0; k < 4; k++) {
                add(new RawMember(corner(level, k), corner(level, (k + 1) % 4), Role.HORIZONTAL,
                        owner.segment() + 1, owner.panel(), FACE_AFTER_LEG[k], section));
            }
        });
    }

    /** Diagonals leg 0 → leg 2 and leg 1 → leg 3, joined at the centre node on the tower axis. */
    private void addPlanBracing(LevelPlan.Level level) {
        LevelPlan.Owner owner = plan.planOwner(level);
        Section section = sections.get(owner.segment()).get(Role.PLAN);
        registry.add(new Vec3(0, 0, level.z()));
        for (int k = 0; k < 2; k++) {
            add(new RawMember(corner(level, k), corner(level, k + 2), Role.PLAN, owner.segment() + 1, owner.panel(),
                    Face.NONE, section));
        }
    }

    private void add(RawMember member) {
        registry.add(member.from());
        registry.add(member.to());
        members.add(member);
    }
}
