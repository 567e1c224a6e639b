package tetrapod.analysis;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import tetrapod.load.CaseKey;

/** The one-line verdict on the movement limits, for people (the summary and the report say the same). */
public final class ServiceabilityVerdict {

    /** Places named per group before "and n more". */
    static final int NAMED = 6;

    private ServiceabilityVerdict() { }

    /**
     * A limit not met.
     *
     * @param label      what moves too much: an ancillary's name or "level at 42 m"
     * @param ancillary  whether it is an ancillary (else a level)
     * @param movement   which movement
     * @param value      m (sway) or rad
     * @param limit      m or rad
     * @param azimuthDeg the wind azimuth where it is largest, degrees; null without wind
     */
    public record Exceedance(String label, boolean ancillary, Movement movement, double value, double limit,
                             Double azimuthDeg) { }

    /** The limits not met of {@code result}, levels first, then ancillaries, each by movement. */
    public static List<Exceedance> exceedances(ServiceabilityResult result) {
        List<Exceedance> out = new ArrayList<>();
        List<ServiceMotion> all = new ArrayList<>(result.levels());
        all.addAll(result.ancillaries());
        for (ServiceMotion m : all) {
            for (Movement q : Movement.values()) {
                if (Boolean.FALSE.equals(m.met(q))) {
                    out.add(new Exceedance(m.label(), m instanceof ServiceMotion.Ancillary, q, m.envelope().of(q).value(),
                            m.limits().of(q), m.envelope().of(q).azimuthDeg()));
                }
            }
        }
        return out;
    }

    /** The verdict of {@code result}. */
    public static String line(ServiceabilityResult result) {
        long levels = result.levels().stream().filter(l -> l.limits().any()).count();
        long items = result.ancillaries().stream().filter(a -> a.limits().any()).count();
        return line(exceedances(result), (int) levels, (int) items);
    }

    /**
     * @param exceedances   every limit not met (input)
     * @param limitedLevels how many levels have a limit
     * @param limitedItems  how many ancillaries have a limit
     * @return e.g. "NOT MET: 2 ancillaries exceed their tilt limit: dish A (0.620° > 0.500°, wind 45°), ...",
     *         "every limit met (2 ancillaries, 3 levels)", or "no limits given: ..."
     */
    public static String line(List<Exceedance> exceedances, int limitedLevels, int limitedItems) {
        if (limitedLevels == 0 && limitedItems == 0) {
            return "no limits given: the movements are reported without a verdict";
        }
        if (exceedances.isEmpty()) {
            List<String> parts = new ArrayList<>();
            if (limitedItems > 0) {
                parts.add(count(limitedItems, "ancillary", "ancillaries"));
            }
            if (limitedLevels > 0) {
                parts.add(count(limitedLevels, "level", "levels"));
            }
            return "every limit met (" + String.join(" and ", parts) + " with limits)";
        }
        Map<String, List<Exceedance>> groups = new LinkedHashMap<>();
        for (boolean ancillary : new boolean[] {true, false}) {
            for (Movement q : Movement.values()) {
                for (Exceedance e : exceedances) {
                    if (e.ancillary() == ancillary && e.movement() == q) {
                        groups.computeIfAbsent((ancillary ? "a" : "l") + q.label(), k -> new ArrayList<>()).add(e);
                    }
                }
            }
        }
        StringBuilder out = new StringBuilder("NOT MET: ");
        String separator = "";
        for (List<Exceedance> group : groups.values()) {
            Exceedance first = group.get(0);
            int n = group.size();
            out.append(separator).append(first.ancillary() ? count(n, "ancillary", "ancillaries")
                            : count(n, "level", "levels")).append(n == 1 ? " exceeds its " : " exceed their ")
                    .append(first.movement().label()).append(" limit: ");
            for (int k = 0; k < Math.min(NAMED, n); k++) {
                Exceedance e = group.get(k);
                out.append(k == 0 ? "" : ", ").append(e.label()).append(" (").append(amount(e.movement(), e.value()))
                        .append(" > ").append(amount(e.movement(), e.limit()))
                        .append(e.azimuthDeg() == null ? "" : ", wind " + CaseKey.degrees(e.azimuthDeg()) + "°").append(')');
            }
            if (n > NAMED) {
                out.append(" and ").append(n - NAMED).append(" more");
            }
            separator = "; ";
        }
        return out.toString();
    }

    /** A movement for people: sway in mm to 0.1 mm, rotations in degrees to 0.001°. */
    public static String amount(Movement q, double value) {
        return q == Movement.SWAY ? String.format(Locale.ROOT, "%.1f mm", value * 1e3)
                : String.format(Locale.ROOT, "%.3f°", Math.toDegrees(value));
    }

    private static String count(long n, String one, String many) {
        return n + " " + (n == 1 ? one : many);
    }
}
