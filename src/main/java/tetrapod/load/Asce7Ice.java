package tetrapod.load;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import tetrapod.common.Units;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.NodeForce;
import tetrapod.model.SectionShape;

/**
 * Radial glaze ice on members and ancillaries by ASCE 7-16 chapter 10 (atmospheric icing): the
 * thickness grows with height, members take the ice area of (10.4-1), flat items the ice volume of
 * (10.4-2), and every wind width grows by twice the thickness. Equation numbers and the height
 * factor are recalled from memory (docs/methods.md). SI units.
 *
 * @param thickness    design radial thickness t_d at 33 ft (10.06 m) above ground, m (0: no ice)
 * @param density      ice density, kg/m³ (§10.4.1: at least 56 pcf ≈ 900 kg/m³)
 * @param heightFactor whether t_d grows with height by f_z
 * @param map          the ASCE 7 map values t_d was computed from by (10.4-5), or null when the
 *                     model gave t_d itself
 */
public record Asce7Ice(double thickness, double density, boolean heightFactor, MapValues map) {

    /** No ice. */
    public static final Asce7Ice NONE = new Asce7Ice(0, 900, false);
    /** 33 ft, the reference height of the ice maps, m. */
    public static final double REFERENCE_HEIGHT = 33 * Asce7Wind.FOOT;
    /** Above 900 ft f_z = 1.4. */
    public static final double TOP_OF_HEIGHT_FACTOR = 900 * Asce7Wind.FOOT;

    /**
     * @param nominal           nominal ice thickness t of the map, m
     * @param importanceFactor  I_i, no unit
     * @param topographicFactor K_zt, no unit
     */
    public record MapValues(double nominal, double importanceFactor, double topographicFactor) { }

    public Asce7Ice {
        if (!(thickness >= 0) || !(density > 0)) {
            throw new IllegalArgumentException("ice thickness must be >= 0 and density > 0");
        }
    }

    /** The design thickness as given (no map values). */
    public Asce7Ice(double thickness, double density, boolean heightFactor) {
        this(thickness, density, heightFactor, null);
    }

    /** The ice of the ASCE 7 map: t_d(z) = 2.0 t I_i f_z K_zt^0.35, growing with height. */
    public static Asce7Ice fromMap(MapValues map, double density) {
        return new Asce7Ice(designThickness(map, 1.0), density, true, map);   // f_z = 1 at 33 ft
    }

    /** Design ice thickness t_d = 2.0 t I_i f_z K_zt^0.35 at height factor f_z, m. */
    public static double designThickness(MapValues map, double fz) {
        return 2.0 * map.nominal() * map.importanceFactor() * fz * Math.pow(map.topographicFactor(), 0.35);   // ASCE 7-16 10.4.6 (10.4-5)
    }

    public boolean isNone() {
        return thickness == 0;
    }

    /** Height factor f_z = (z/33 ft)^0.10 for 0 < z ≤ 900 ft, 1.4 above. */
    public static double heightFactor(double z) {
        if (z <= 0) {
            return 0;
        }
        return z > TOP_OF_HEIGHT_FACTOR ? 1.4 : Math.pow(z / REFERENCE_HEIGHT, 0.10);   // ASCE 7-16 10.4.4 (10.4-4)
    }

    /** Radial thickness at height z, m. */
    public double thicknessAt(double z) {
        return heightFactor ? thickness * heightFactor(z) : thickness;
    }

    /** Characteristic dimension D_c: the diameter of the circle round the section (Fig. 10.4-1), m. */
    public static double characteristicDimension(SectionShape shape) {
        if (shape instanceof SectionShape.Angle a) {
            return Math.hypot(a.legA(), a.legB());   // heel and toes on the circle: the hypotenuse
        }
        return shape.windWidth();
    }

    /** Ice area of a member's cross-section A_i = π t (D_c + t), m². */
    public double iceArea(double characteristicDimension, double z) {
        double t = thicknessAt(z);
        return Math.PI * t * (characteristicDimension + t);   // ASCE 7-16 10.4.1 (10.4-1)
    }

    /** Ice weight per metre of a member or linear item, N/m. */
    public double weightPerMetre(double characteristicDimension, double z) {
        return density * Units.G_ACCEL * iceArea(characteristicDimension, z);
    }

    /** Ice weight on a flat or bulky item of area A facing the wind: ρ g π t A, N. */
    public double itemWeight(double area, double z) {
        return density * Units.G_ACCEL * Math.PI * thicknessAt(z) * area;   // ASCE 7-16 10.4.1 (10.4-2), plates
    }

    /** Width facing the wind with ice on both edges: b + 2t, m. */
    public double icedWidth(double width, double z) {
        return width + 2 * thicknessAt(z);
    }

    /**
     * Area of an item facing the wind with ice on its edges, taking its outline as a square of the
     * same area: (√A + 2t)², m² (Tetrapod's approximation).
     */
    public double icedArea(double area, double z) {
        double side = Math.sqrt(area) + 2 * thicknessAt(z);
        return area > 0 ? side * side : 0;
    }

    /** Ice weight on every member, half at each end, N (−z), in ascending node id. */
    public List<NodeForce> memberWeights(Frame frame) {
        if (isNone()) {
            return List.of();
        }
        Map<Integer, Double> zOf = new TreeMap<>();
        frame.nodes().forEach(n -> zOf.put(n.id(), n.z()));
        double[] lengths = frame.memberLengths();
        Map<Integer, Double> down = new TreeMap<>();
        for (int k = 0; k < lengths.length; k++) {
            Member m = frame.members().get(k);
            double zMid = (zOf.get(m.i()) + zOf.get(m.j())) / 2;
            double w = weightPerMetre(characteristicDimension(m.section().shape()), zMid) * lengths[k];
            down.merge(m.i(), w / 2, Double::sum);
            down.merge(m.j(), w / 2, Double::sum);
        }
        List<NodeForce> loads = new ArrayList<>(down.size());
        down.forEach((node, w) -> loads.add(NodeForce.force(node, 0, 0, -w)));
        return loads;
    }
}
