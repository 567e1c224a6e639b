package tetrapod.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Reading the plain values of a results document (maps, lists, numbers, text): each accessor
 * names the key it wants and fails with the key's name when the document does not have it.
 */
final class Tree {

    private Tree() { }

    @SuppressWarnings("unchecked")
    static Map<String, Object> map(Object value, String what) {
        if (value instanceof Map<?, ?> m) {
            return (Map<String, Object>) m;
        }
        throw new IllegalArgumentException("results: " + what + " is not an object");
    }

    static Map<String, Object> map(Map<String, Object> parent, String key) {
        return map(parent.get(key), key);
    }

    /** The object at {@code key}, or an empty map when the key is absent or null. */
    static Map<String, Object> mapOrEmpty(Map<String, Object> parent, String key) {
        Object v = parent.get(key);
        return v == null ? Map.of() : map(v, key);
    }

    static List<Object> list(Map<String, Object> parent, String key) {
        Object v = parent.get(key);
        if (v == null) {
            return List.of();
        }
        if (v instanceof List<?> l) {
            return new ArrayList<>(l);
        }
        throw new IllegalArgumentException("results: " + key + " is not an array");
    }

    static List<Map<String, Object>> maps(Map<String, Object> parent, String key) {
        List<Map<String, Object>> out = new ArrayList<>();
        for (Object o : list(parent, key)) {
            out.add(map(o, key + "[]"));
        }
        return out;
    }

    static double num(Map<String, Object> parent, String key) {
        Object v = parent.get(key);
        if (v instanceof Number n) {
            return n.doubleValue();
        }
        throw new IllegalArgumentException("results: " + key + " is not a number");
    }

    /** The number at {@code key}, or null when it is null or absent. */
    static Double numOrNull(Map<String, Object> parent, String key) {
        Object v = parent.get(key);
        return v instanceof Number n ? n.doubleValue() : null;
    }

    static int integer(Map<String, Object> parent, String key) {
        return (int) Math.round(num(parent, key));
    }

    static List<Double> nums(Map<String, Object> parent, String key) {
        List<Double> out = new ArrayList<>();
        for (Object o : list(parent, key)) {
            if (!(o instanceof Number n)) {
                throw new IllegalArgumentException("results: " + key + " holds something other than numbers");
            }
            out.add(n.doubleValue());
        }
        return out;
    }

    /** The text at {@code key}, or null when it is null or absent. */
    static String str(Map<String, Object> parent, String key) {
        Object v = parent.get(key);
        return v == null ? null : v.toString();
    }

    static boolean bool(Map<String, Object> parent, String key) {
        return Boolean.TRUE.equals(parent.get(key));
    }
}
