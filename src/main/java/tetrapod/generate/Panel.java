package tetrapod.generate;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import tetrapod.model.Face;

/**
 * A panel of a generated tower: the part between two consecutive panel levels, with the ids of
 * the members counted in it. Every member of the tower is counted in exactly one panel: legs,
 * diagonals and redundants in the panel they lie in; a horizontal or plan bracing at a level in the
 * panel below it (at z = 0 in the bottom panel; at a segment boundary whose horizontals only the
 * upper segment asks for, in the upper segment's first panel).
 *
 * @param number          1 = the bottom panel of the tower, counting up through all segments
 * @param segment         1 = the bottom segment
 * @param panelInSegment  1 = the bottom panel of its segment
 * @param bottom          the level at its bottom
 * @param top             the level at its top
 * @param legMembers      for legs 0..3, the ids of that leg's members in this panel, bottom to top
 * @param bracingMembers  for each of the four faces, the ids of the diagonals, horizontals and
 *                        redundants counted in this panel (legs not included)
 * @param planMembers     ids of plan bracing members counted in this panel
 */
public record Panel(int number, int segment, int panelInSegment, PanelLevel bottom, PanelLevel top,
                    List<List<Integer>> legMembers, Map<Face, List<Integer>> bracingMembers,
                    List<Integer> planMembers) {

    /** The four lattice faces in leg order: face k runs from leg k to leg k+1. */
    public static final List<Face> FACES = List.of(Face.Y_MINUS, Face.X_PLUS, Face.Y_PLUS, Face.X_MINUS);

    public Panel {
        legMembers = legMembers.stream().map(List::copyOf).toList();
        if (legMembers.size() != 4) {
            throw new IllegalArgumentException("a panel has four legs, got " + legMembers.size());
        }
        Map<Face, List<Integer>> faces = new EnumMap<>(Face.class);
        for (Face f : FACES) {
            faces.put(f, List.copyOf(bracingMembers.getOrDefault(f, List.of())));
        }
        bracingMembers = Map.copyOf(faces);
        planMembers = List.copyOf(planMembers);
    }

    public double zBottom() {
        return bottom.z();
    }

    public double zTop() {
        return top.z();
    }

    public double height() {
        return top.z() - bottom.z();
    }

    /** Node ids of legs 0..3 at the panel's bottom. */
    public List<Integer> bottomLegNodes() {
        return bottom.legNodes();
    }

    /** Node ids of legs 0..3 at the panel's top. */
    public List<Integer> topLegNodes() {
        return top.legNodes();
    }

    /** Leg spacing along x at height z inside the panel (linear between its levels), m. */
    public double widthXAt(double z) {
        return bottom.widthX() + (top.widthX() - bottom.widthX()) * (z - zBottom()) / height();
    }

    /** Leg spacing along y at height z inside the panel, m. */
    public double widthYAt(double z) {
        return bottom.widthY() + (top.widthY() - bottom.widthY()) * (z - zBottom()) / height();
    }

    /** Horizontal width of a face at height z: faces ±y span x, faces ±x span y, m. */
    public double faceWidthAt(Face face, double z) {
        return switch (face) {
            case Y_MINUS, Y_PLUS -> widthXAt(z);
            case X_MINUS, X_PLUS -> widthYAt(z);
            case NONE -> throw new IllegalArgumentException("a panel face must be one of the four faces");
        };
    }

    /** Area of the face's outline (a trapezoid) projected on a vertical plane parallel to it, m². */
    public double faceOutlineArea(Face face) {
        return (faceWidthAt(face, zBottom()) + faceWidthAt(face, zTop())) / 2 * height();
    }

    /** The legs bounding a face: face k lies between legs k and k+1. */
    public static List<Integer> legsOf(Face face) {
        int k = FACES.indexOf(face);
        if (k < 0) {
            throw new IllegalArgumentException("a panel face must be one of the four faces");
        }
        return List.of(k, (k + 1) % 4);
    }

    /** Every member lying in a face in this panel: its bracing and the members of its two legs. */
    public List<Integer> membersInFace(Face face) {
        List<Integer> ids = new ArrayList<>();
        for (int leg : legsOf(face)) {
            ids.addAll(legMembers.get(leg));
        }
        ids.addAll(bracingMembers.get(face));
        return List.copyOf(ids);
    }

    /** Every member counted in this panel, each once. */
    public List<Integer> allMembers() {
        List<Integer> ids = new ArrayList<>();
        legMembers.forEach(ids::addAll);
        FACES.forEach(f -> ids.addAll(bracingMembers.get(f)));
        ids.addAll(planMembers);
        return List.copyOf(ids);
    }
}
