package tetrapod.load;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import tetrapod.generate.Panel;
import tetrapod.generate.Tower;
import tetrapod.model.Face;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.Vec3;

/**
 * Measures every panel's faces for the wind. A face's members are its two legs and its bracing
 * (diagonals, horizontals, redundants counted in the panel); each shows the wind its width (grown
 * by the ice) times its length projected on a vertical plane parallel to the face. Overlaps at
 * joints and crossings are not deducted; plan bracing is not counted (it lies edge-on to the wind
 * inside the tower).
 */
public final class PanelExposures {

    private PanelExposures() { }

    /**
     * The exposure of every panel of a generated tower, bottom to top.
     *
     * @param tower a generated tower (not modified)
     * @param ice   the ice on the members ({@link Asce7Ice#NONE} for bare steel)
     */
    public static List<PanelExposure> of(Tower tower, Asce7Ice ice) {
        Map<Integer, Member> members = new HashMap<>();
        tower.frame().members().forEach(m -> members.put(m.id(), m));
        Map<Integer, Node> nodes = new HashMap<>();
        tower.frame().nodes().forEach(n -> nodes.put(n.id(), n));
        List<PanelExposure> out = new ArrayList<>(tower.panels().size());
        for (Panel panel : tower.panels()) {
            Map<Face, Measured> faces = new HashMap<>();
            double moment = 0;
            double area = 0;
            for (Face face : Panel.FACES) {
                Measured m = measure(panel, face, members, nodes, ice);
                faces.put(face, m);
                moment += m.areaMoment;
                area += m.areas.total();
            }
            double zRef = area > 0 ? moment / area : (panel.zBottom() + panel.zTop()) / 2;
            out.add(new PanelExposure(panel.number(), panel.zBottom(), panel.zTop(), zRef,
                    mean(faces.get(Face.X_PLUS).areas, faces.get(Face.X_MINUS).areas),
                    mean(faces.get(Face.Y_PLUS).areas, faces.get(Face.Y_MINUS).areas),
                    Attachments.at(panel, zRef, Face.NONE)));
        }
        return List.copyOf(out);
    }

    private record Measured(FaceAreas areas, double areaMoment) { }

    private static Measured measure(Panel panel, Face face, Map<Integer, Member> members, Map<Integer, Node> nodes,
                                    Asce7Ice ice) {
        Vec3 normal = normal(face);
        double flat = 0;
        double moment = 0;
        Map<Double, Double> round = new TreeMap<>();
        for (int id : panel.membersInFace(face)) {
            Member m = members.get(id);
            Vec3 a = nodes.get(m.i()).position();
            Vec3 b = nodes.get(m.j()).position();
            Vec3 d = b.minus(a);
            double projected = d.minus(normal.times(d.dot(normal))).norm();
            double zMid = (a.z() + b.z()) / 2;
            double width = ice.icedWidth(m.section().shape().windWidth(), zMid);
            double area = width * projected;
            if (m.section().shape().flatSided()) {
                flat += area;
            } else {
                round.merge(width, area, Double::sum);
            }
            moment += area * zMid;
        }
        List<FaceAreas.RoundArea> roundAreas = new ArrayList<>();
        round.forEach((diameter, area) -> roundAreas.add(new FaceAreas.RoundArea(diameter, area)));
        return new Measured(new FaceAreas(flat, roundAreas, panel.faceOutlineArea(face)), moment);
    }

    private static FaceAreas mean(FaceAreas a, FaceAreas b) {
        Map<Double, Double> round = new TreeMap<>();
        a.round().forEach(r -> round.merge(r.diameter(), r.area() / 2, Double::sum));
        b.round().forEach(r -> round.merge(r.diameter(), r.area() / 2, Double::sum));
        List<FaceAreas.RoundArea> list = new ArrayList<>();
        round.forEach((diameter, area) -> list.add(new FaceAreas.RoundArea(diameter, area)));
        return new FaceAreas((a.flat() + b.flat()) / 2, list, (a.gross() + b.gross()) / 2);
    }

    /** The outward normal of a face. */
    static Vec3 normal(Face face) {
        return switch (face) {
            case X_PLUS -> Vec3.X;
            case X_MINUS -> Vec3.X.times(-1);
            case Y_PLUS -> Vec3.Y;
            case Y_MINUS -> Vec3.Y.times(-1);
            case NONE -> throw new IllegalArgumentException("a panel face must be one of the four faces");
        };
    }
}
