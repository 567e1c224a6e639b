package tetrapod.size;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import tetrapod.common.Units;
import tetrapod.model.Role;

/**
 * The practical rules a sized section must follow besides its checks.
 *
 * <ul>
 * <li>a minimum thickness and a minimum leg width per role (m; defaults {@link #DEFAULT_MIN_THICKNESS}
 *     and {@link #DEFAULT_MIN_WIDTH}, assumed as common practice, no published source);</li>
 * <li>the sections to choose from: {@code allowed} names, or when empty every equal-leg angle of
 *     the catalogue;</li>
 * <li>always: the connection's holes fit on the flat of the connected angle leg, bracing is no
 *     wider than the leg it bolts to, and a leg is no lighter than the leg of the segment above
 *     (see {@link SectionRules}).</li>
 * </ul>
 *
 * @param minThickness per role, m (a role not listed: no minimum)
 * @param minWidth     per role, m: the narrower leg of an angle, the diameter of a tube
 * @param allowed      section names to choose from (as the catalogue or the spec's user sections
 *                     name them); empty for every equal angle of the catalogue
 */
public record SizingRules(Map<Role, Double> minThickness, Map<Role, Double> minWidth, List<String> allowed) {

    /** Legs at least 5 mm thick, every other role 4 mm (assumed; common practice for galvanised lattice steel). */
    public static final Map<Role, Double> DEFAULT_MIN_THICKNESS = byRole(5.0, 4.0);
    /** Legs at least 50 mm wide, every other role 40 mm (assumed; common practice). */
    public static final Map<Role, Double> DEFAULT_MIN_WIDTH = byRole(50.0, 40.0);

    public static final SizingRules DEFAULT = new SizingRules(DEFAULT_MIN_THICKNESS, DEFAULT_MIN_WIDTH, List.of());

    public SizingRules {
        minThickness = Map.copyOf(minThickness);
        minWidth = Map.copyOf(minWidth);
        allowed = List.copyOf(allowed);
        for (Map<Role, Double> limits : List.of(minThickness, minWidth)) {
            limits.values().forEach(v -> {
                if (!(v >= 0) || !Double.isFinite(v)) {
                    throw new IllegalArgumentException("a minimum must be >= 0 m, was " + v);
                }
            });
        }
    }

    public double minThickness(Role role) {
        return minThickness.getOrDefault(role, 0.0);
    }

    public double minWidth(Role role) {
        return minWidth.getOrDefault(role, 0.0);
    }

    /** These rules with other minima (m) for some roles. */
    public SizingRules withMinima(Map<Role, Double> thickness, Map<Role, Double> width) {
        Map<Role, Double> t = new EnumMap<>(Role.class);
        t.putAll(minThickness);
        t.putAll(thickness);
        Map<Role, Double> w = new EnumMap<>(Role.class);
        w.putAll(minWidth);
        w.putAll(width);
        return new SizingRules(t, w, allowed);
    }

    /** These rules choosing only from {@code names}. */
    public SizingRules withAllowed(List<String> names) {
        return new SizingRules(minThickness, minWidth, names);
    }

    private static Map<Role, Double> byRole(double legMm, double otherMm) {
        Map<Role, Double> m = new EnumMap<>(Role.class);
        for (Role r : Role.values()) {
            m.put(r, (r == Role.LEG ? legMm : otherMm) * Units.MM);
        }
        return Map.copyOf(m);
    }
}
