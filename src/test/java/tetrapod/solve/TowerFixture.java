package tetrapod.solve;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import tetrapod.model.Face;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.Restraint;
import tetrapod.model.Role;
import tetrapod.model.Section;
import tetrapod.model.Support;
import tetrapod.model.Vec3;

/**
 * Builds simple four-leg lattice towers programmatically (test-only; the real generator lives in
 * tetrapod.generate). Square plan, straight taper, nodes numbered bottom-up. Corners 0..3 at
 * (−,−), (+,−), (+,+), (−,+); face f joins corners f and f+1.
 */
final class TowerFixture {

    enum Pattern { X, SINGLE, K }

    static final Section LEG = TestFrames.section("leg", 2.9e-3, 6.0e-6, 1.6e-6, 1.5e-8);
    static final Section BRACE = TestFrames.section("brace", 1.2e-3, 1.1e-6, 0.3e-6, 2.5e-9);
    static final Section HORIZONTAL = TestFrames.section("horizontal", 0.9e-3, 0.6e-6, 0.16e-6, 1.5e-9);

    private final Idealisation idealisation;
    private final int panels;
    private final double baseWidth;
    private final double topWidth;
    private final double height;
    private Pattern pattern = Pattern.X;
    private Restraint support = Restraint.PINNED;
    private final Set<Integer> levelsWithoutHorizontals = new HashSet<>();
    private final Set<Integer> supportedCorners = new HashSet<>(List.of(0, 1, 2, 3));
    private boolean splitHorizontalWithRedundant;
    private boolean splitLegAtMidHeight;

    private final List<Node> nodes = new ArrayList<>();
    private final List<Member> members = new ArrayList<>();

    TowerFixture(Idealisation idealisation, int panels, double baseWidth, double topWidth, double height) {
        this.idealisation = idealisation;
        this.panels = panels;
        this.baseWidth = baseWidth;
        this.topWidth = topWidth;
        this.height = height;
    }

    TowerFixture pattern(Pattern p) {
        this.pattern = p;
        return this;
    }

    TowerFixture support(Restraint r) {
        this.support = r;
        return this;
    }

    /** Leave out the horizontals at panel level {@code level} (0 = base). */
    TowerFixture withoutHorizontalsAt(int level) {
        levelsWithoutHorizontals.add(level);
        return this;
    }

    /** Support only these corners. */
    TowerFixture supportedCorners(Integer... corners) {
        supportedCorners.clear();
        supportedCorners.addAll(List.of(corners));
        return this;
    }

    /**
     * X pattern: split the bottom horizontal of face 0 in panel 1 at its midpoint and join that
     * node to the diagonals' crossing point with a redundant.
     */
    TowerFixture redundantInFirstPanel() {
        this.splitHorizontalWithRedundant = true;
        return this;
    }

    /** Split leg 0 of panel 1 at mid-height by a node that nothing else joins. */
    TowerFixture splitFirstLeg() {
        this.splitLegAtMidHeight = true;
        return this;
    }

    /** Node id of corner c at level k. */
    static int cornerId(int level, int corner, TowerFixture t) {
        return t.corner[level][corner];
    }

    private int[][] corner;

    Frame build() {
        nodes.clear();
        members.clear();
        corner = new int[panels + 1][4];
        for (int c = 0; c < 4; c++) {
            corner[0][c] = addNode(position(0, c));
        }
        for (int k = 0; k < panels; k++) {
            List<int[]> pending = new ArrayList<>(); // members to add once the top corners exist
            int[] crossing = new int[4];
            int splitLegNode = -1;
            if (pattern == Pattern.X) {
                double wb = width(k);
                double wt = width(k + 1);
                double s = wb / (wb + wt);
                for (int f = 0; f < 4; f++) {
                    Vec3 a = position(k, f);
                    Vec3 bTop = position(k + 1, (f + 1) % 4);
                    crossing[f] = addNode(a.lerp(bTop, s));
                }
            }
            if (splitLegAtMidHeight && k == 0) {
                splitLegNode = addNode(position(0, 0).lerp(position(1, 0), 0.5));
            }
            int redundantNode = -1;
            if (splitHorizontalWithRedundant && k == 0 && pattern == Pattern.X) {
                redundantNode = addNode(position(0, 0).lerp(position(0, 1), 0.5));
            }
            for (int c = 0; c < 4; c++) {
                corner[k + 1][c] = addNode(position(k + 1, c));
            }
            int[] apex = new int[4];
            if (pattern == Pattern.K) {
                for (int f = 0; f < 4; f++) {
                    apex[f] = addNode(position(k + 1, f).lerp(position(k + 1, (f + 1) % 4), 0.5));
                }
            }
            // legs
            for (int c = 0; c < 4; c++) {
                if (c == 0 && splitLegNode > 0) {
                    addLeg(corner[k][c], splitLegNode, c);
                    addLeg(splitLegNode, corner[k + 1][c], c);
                } else {
                    addLeg(corner[k][c], corner[k + 1][c], c);
                }
            }
            for (int f = 0; f < 4; f++) {
                int a0 = corner[k][f];
                int b0 = corner[k][(f + 1) % 4];
                int a1 = corner[k + 1][f];
                int b1 = corner[k + 1][(f + 1) % 4];
                switch (pattern) {
                    case X -> {
                        addBrace(a0, crossing[f], Role.DIAGONAL);
                        addBrace(crossing[f], b1, Role.DIAGONAL);
                        addBrace(b0, crossing[f], Role.DIAGONAL);
                        addBrace(crossing[f], a1, Role.DIAGONAL);
                    }
                    case SINGLE -> {
                        if ((k + f) % 2 == 0) {
                            addBrace(a0, b1, Role.DIAGONAL);
                        } else {
                            addBrace(b0, a1, Role.DIAGONAL);
                        }
                    }
                    case K -> {
                        addBrace(a0, apex[f], Role.DIAGONAL);
                        addBrace(b0, apex[f], Role.DIAGONAL);
                    }
                }
            }
            // horizontals at the panel's bottom level (level k)
            if (!levelsWithoutHorizontals.contains(k) && (k == 0 || pattern != Pattern.K)) {
                for (int f = 0; f < 4; f++) {
                    int a = corner[k][f];
                    int b = corner[k][(f + 1) % 4];
                    if (f == 0 && redundantNode > 0) {
                        addBrace(a, redundantNode, Role.HORIZONTAL);
                        addBrace(redundantNode, b, Role.HORIZONTAL);
                        addBrace(redundantNode, crossing[0], Role.REDUNDANT);
                    } else {
                        addBrace(a, b, Role.HORIZONTAL);
                    }
                }
            }
            // K pattern: the top horizontal of each face, split at the apex
            if (pattern == Pattern.K && !levelsWithoutHorizontals.contains(k + 1)) {
                for (int f = 0; f < 4; f++) {
                    addBrace(corner[k + 1][f], apex[f], Role.HORIZONTAL);
                    addBrace(apex[f], corner[k + 1][(f + 1) % 4], Role.HORIZONTAL);
                }
            }
            pending.clear();
        }
        // top horizontals for X and single patterns
        if (pattern != Pattern.K && !levelsWithoutHorizontals.contains(panels)) {
            for (int f = 0; f < 4; f++) {
                addBrace(corner[panels][f], corner[panels][(f + 1) % 4], Role.HORIZONTAL);
            }
        }
        List<Support> supports = new ArrayList<>();
        for (int c = 0; c < 4; c++) {
            if (supportedCorners.contains(c)) {
                supports.add(new Support(corner[0][c], support));
            }
        }
        return new Frame("test tower", idealisation, TestFrames.STEEL, nodes, members, supports);
    }

    /** Ids of the top corner nodes. */
    int[] topCorners() {
        return corner[panels].clone();
    }

    int[] baseCorners() {
        return corner[0].clone();
    }

    private double width(int level) {
        return baseWidth + (topWidth - baseWidth) * level / panels;
    }

    private Vec3 position(int level, int c) {
        double h = width(level) / 2;
        double sx = (c == 0 || c == 3) ? -1 : 1;
        double sy = (c == 0 || c == 1) ? -1 : 1;
        return new Vec3(sx * h, sy * h, height * level / panels);
    }

    private int addNode(Vec3 p) {
        int id = nodes.size() + 1;
        nodes.add(new Node(id, p.x(), p.y(), p.z()));
        return id;
    }

    private void addLeg(int i, int j, int c) {
        double sx = (c == 0 || c == 3) ? -1 : 1;
        double sy = (c == 0 || c == 1) ? -1 : 1;
        boolean axial = idealisation == Idealisation.TRUSS;
        members.add(new Member(members.size() + 1, i, j, Role.LEG, 1, 0, Face.NONE, LEG, axial,
                new Vec3(sx, sy, 0).unit()));
    }

    private void addBrace(int i, int j, Role role) {
        members.add(new Member(members.size() + 1, i, j, role, 1, 0, Face.NONE,
                role == Role.HORIZONTAL ? HORIZONTAL : BRACE, true, Vec3.Z));
    }
}
