package tetrapod.io;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import tetrapod.common.Suggestions;
import tetrapod.model.spec.ServiceabilitySpec;
import tetrapod.model.spec.ServiceabilitySpec.AncillaryLimitSpec;
import tetrapod.model.spec.ServiceabilitySpec.LevelLimitSpec;
import tetrapod.model.spec.ServiceabilitySpec.LimitSpec;
import tetrapod.model.spec.ServiceabilitySpec.ServiceWindSpec;

/**
 * Reads {@code serviceability}: the service wind (years, m/s or a factor, each allowed by one wind
 * method) and the movement limits of levels and ancillaries (mm, degrees, a height ratio). Limits
 * that cannot be meant (zero, negative, a tilt of tens of degrees) are refused with their key.
 */
final class ServiceabilityReader {

    static final List<String> KEYS = List.of("wind", "levels", "ancillaries");
    static final List<String> LIMIT_KEYS = List.of("sway_mm", "swayHeightRatio", "tilt_deg", "twist_deg");
    static final List<String> LEVEL_KEYS = join(List.of("from", "to"), LIMIT_KEYS);
    static final List<String> ANCILLARY_KEYS = join(List.of("name"), LIMIT_KEYS);
    /** The service-wind key each wind method allows. */
    static final Map<String, List<String>> WIND_KEYS = windKeys();

    /** Return periods accepted, years: p = 1/T at most 0.5, and not beyond what a record could mean. */
    static final Bound RETURN_PERIOD = new Bound(2, true, 10_000, true);
    static final Bound FACTOR = new Bound(0, false, 1.5, true);
    static final Bound SPEED = new Bound(0, false, LoadsReader.MAX_SPEED, true);
    static final Bound SWAY_MM = new Bound(0, false, 5_000, true);
    static final Bound HEIGHT_RATIO = new Bound(10, true, 100_000, true);
    static final Bound ROTATION_DEG = new Bound(0, false, 10, true);

    /** The wind method when loads.wind is given but its method cannot be read (reported there). */
    static final String UNREADABLE_WIND = "";

    private final Problems problems;

    ServiceabilityReader(Problems problems) {
        this.problems = problems;
    }

    private static List<String> join(List<String> a, List<String> b) {
        List<String> all = new ArrayList<>(a);
        all.addAll(b);
        return List.copyOf(all);
    }

    private static Map<String, List<String>> windKeys() {
        Map<String, List<String>> m = new LinkedHashMap<>();
        m.put("en1991", List.of("returnPeriod", "probabilityFactor"));
        m.put("asce7", List.of("speed", "windFactor"));
        m.put("uniform", List.of("windFactor"));
        return m;
    }

    /**
     * The serviceability object, or null (reported).
     *
     * @param windMethod  the model's wind method (en1991, asce7, uniform), null without wind, or
     *                    {@link #UNREADABLE_WIND} when its method is missing or unknown
     * @param height      the generated tower's height, m (NaN when not known)
     * @param ancillaries the file's {@code loads.ancillaries} array, or null
     */
    ServiceabilitySpec read(Fields f, String windMethod, double height, JsonNode ancillaries) {
        int before = problems.count();
        f.allowOnly(KEYS);
        Fields windFields = f.object("wind", false);
        ServiceWindSpec wind = windFields == null ? null : wind(windFields, windMethod);
        List<LevelLimitSpec> levels = new ArrayList<>();
        JsonNode levelArray = f.array("levels", false);
        if (levelArray != null) {
            for (int k = 0; k < levelArray.size(); k++) {
                Fields entry = Fields.of(levelArray.get(k), JsonPaths.index(f.path("levels"), k), problems);
                LevelLimitSpec level = entry == null ? null : level(entry, height);
                if (level != null) {
                    levels.add(level);
                }
            }
        }
        List<AncillaryLimitSpec> items = new ArrayList<>();
        JsonNode itemArray = f.array("ancillaries", false);
        if (itemArray != null) {
            Map<String, String> kinds = itemKinds(ancillaries);
            Map<String, String> seen = new HashMap<>();
            for (int k = 0; k < itemArray.size(); k++) {
                Fields entry = Fields.of(itemArray.get(k), JsonPaths.index(f.path("ancillaries"), k), problems);
                AncillaryLimitSpec item = entry == null ? null : item(entry, kinds, seen);
                if (item != null) {
                    items.add(item);
                }
            }
        }
        return problems.count() == before ? new ServiceabilitySpec(wind, levels, items) : null;
    }

    private ServiceWindSpec wind(Fields f, String method) {
        List<String> all = List.of("returnPeriod", "probabilityFactor", "speed", "windFactor");
        f.allowOnly(all);
        List<String> given = f.keys().stream().filter(all::contains).toList();
        boolean known = method != null && WIND_KEYS.containsKey(method);
        if (given.isEmpty()) {
            problems.add(f.path(), "give one of " + String.join(", ", known ? WIND_KEYS.get(method) : all)
                    + " (or leave serviceability.wind out for the default of the wind method)");
            return null;
        }
        if (given.size() > 1) {
            problems.add(f.path(given.get(1)), "give one of " + String.join(", ", given) + ", not both");
            return null;
        }
        String key = given.get(0);
        if (method == null) {
            problems.add(f.path(key), "the model has no wind (loads.wind): the serviceability combination is the dead "
                    + "load alone");
            return null;
        }
        if (known && !WIND_KEYS.get(method).contains(key)) {
            problems.add(f.path(key), "does not go with the " + method + " wind; with it give "
                    + String.join(" or ", WIND_KEYS.get(method)));
            return null;
        }
        return switch (key) {
            case "returnPeriod" -> {
                double t = f.requiredNumber(key, RETURN_PERIOD, "years");
                yield Double.isNaN(t) ? null : new ServiceabilitySpec.ReturnPeriod(t);
            }
            case "probabilityFactor" -> {
                double c = f.requiredNumber(key, FACTOR, "");
                yield Double.isNaN(c) ? null : new ServiceabilitySpec.ProbabilityFactor(c);
            }
            case "speed" -> {
                double v = f.requiredNumber(key, SPEED, "m/s");
                yield Double.isNaN(v) ? null : new ServiceabilitySpec.Speed(v);
            }
            default -> {
                double w = f.requiredNumber(key, FACTOR, "");
                yield Double.isNaN(w) ? null : new ServiceabilitySpec.WindFactor(w);
            }
        };
    }

    private LevelLimitSpec level(Fields f, double height) {
        int before = problems.count();
        f.allowOnly(LEVEL_KEYS);
        Bound range = Double.isFinite(height) ? new Bound(0, true, height, true) : Bound.NON_NEGATIVE;
        double from = f.optionalNumber("from", range, "m", Double.NaN);
        double to = f.optionalNumber("to", range, "m", Double.NaN);
        if (f.has("from") && f.has("to") && from > to) {
            problems.add(f.path("to"), "must not be below from (" + Numbers.format(from) + " m), was "
                    + Numbers.shown(f.get("to")));
        }
        LimitSpec limits = limits(f, true);
        return problems.count() == before ? new LevelLimitSpec(from, to, limits) : null;
    }

    private AncillaryLimitSpec item(Fields f, Map<String, String> kinds, Map<String, String> seen) {
        int before = problems.count();
        f.allowOnly(ANCILLARY_KEYS);
        String name = f.requiredText("name");
        String kind = null;
        if (name != null) {
            kind = kinds.get(name);
            if (kind == null) {
                String near = Suggestions.nearest(name, List.copyOf(kinds.keySet()));
                problems.add(f.path("name"), "no ancillary is called '" + name + "' in loads.ancillaries"
                        + (near != null ? "; did you mean '" + near + "'?"
                        : kinds.isEmpty() ? " (the model has none)" : "; the names are " + String.join(", ", kinds.keySet())));
            }
            String first = seen.putIfAbsent(name, f.path());
            if (first != null) {
                problems.add(f.path("name"), "the limits of '" + name + "' are already given at " + first);
            }
        }
        LimitSpec limits = limits(f, !"linear".equals(kind));
        return problems.count() == before ? new AncillaryLimitSpec(name, limits) : null;
    }

    /** The limit keys of {@code f}; at least one must be given. */
    private LimitSpec limits(Fields f, boolean ratioAllowed) {
        if (LIMIT_KEYS.stream().noneMatch(f::has)) {
            problems.add(f.path(), "give at least one limit: " + String.join(", ", LIMIT_KEYS));
            return LimitSpec.NONE;
        }
        if (!ratioAllowed && f.has("swayHeightRatio")) {
            problems.add(f.path("swayHeightRatio"), "applies to a level or a point item, whose height is one number; "
                    + "give a linear item's sway limit as sway_mm");
        }
        double sway = f.optionalNumber("sway_mm", SWAY_MM, "mm", Double.NaN);
        double ratio = f.optionalNumber("swayHeightRatio", HEIGHT_RATIO, "", Double.NaN);
        double tilt = f.optionalNumber("tilt_deg", ROTATION_DEG, "degrees", Double.NaN);
        double twist = f.optionalNumber("twist_deg", ROTATION_DEG, "degrees", Double.NaN);
        return new LimitSpec(sway, ratio, tilt, twist);
    }

    /** Name → kind (point, linear) of every ancillary of the file that has both. */
    private static Map<String, String> itemKinds(JsonNode ancillaries) {
        Map<String, String> kinds = new LinkedHashMap<>();
        if (ancillaries == null || !ancillaries.isArray()) {
            return kinds;
        }
        for (JsonNode item : ancillaries) {
            JsonNode name = item.get("name");
            JsonNode kind = item.get("kind");
            if (name != null && name.isTextual()) {
                kinds.putIfAbsent(name.textValue(), kind != null && kind.isTextual() ? kind.textValue() : "");
            }
        }
        return kinds;
    }
}
