package tetrapod.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import tetrapod.report.Table.Cell;

/**
 * Model-file values as readable tables: an object's values as rows of key (in words), value and
 * unit; a list of objects (connections, ancillaries, ...) as one column per item, or one row per
 * item when there are more items than keys. Every value that Tetrapod filled in is marked as a default.
 */
final class InputTables {

    static final String DEFAULT_MARK = "default";

    private InputTables() { }

    /** Writes {@code value} (the input at JSON path {@code path}) as tables whose ids start with {@code id}. */
    static void write(Html out, String id, Results r, Object value, String path) {
        if (value instanceof List<?> list && !list.isEmpty() && !allScalars(list)) {
            items(id, r, list, path, "").writeTo(out);
            return;
        }
        Table t = new Table(id, "", List.of("item", "value", "unit", "given or assumed"));
        List<String> lists = new ArrayList<>();
        flatten(t, r, value, Map.of(), path, "", lists);
        if (!t.isEmpty()) {
            t.writeTo(out);
        }
        Map<?, ?> map = value instanceof Map<?, ?> m ? m : Map.of();
        for (String key : lists) {
            items(id + "-" + key, r, (List<?>) map.get(key), path + "." + key, Words.of(key)).writeTo(out);
        }
    }

    /** "given" or, marked, "default". */
    static Cell origin(boolean assumed) {
        return assumed ? new Cell("default", DEFAULT_MARK, "") : Cell.of("given");
    }

    private static void flatten(Table t, Results r, Object value, Map<?, ?> parent, String path, String name,
                                List<String> lists) {
        if (value instanceof Map<?, ?> map && !map.isEmpty()) {
            for (Map.Entry<?, ?> e : map.entrySet()) {
                String key = String.valueOf(e.getKey());
                if (name.isEmpty() && e.getValue() instanceof List<?> l && !l.isEmpty() && !allScalars(l)) {
                    lists.add(key);
                    continue;
                }
                flatten(t, r, e.getValue(), map, path + "." + key, name.isEmpty() ? Words.of(key)
                        : name + ", " + Words.of(key), lists);
            }
        } else {
            String key = path.substring(path.lastIndexOf('.') + 1).replaceAll("\\[\\d+]$", "");
            t.row(Cell.of(name), Cell.of(text(value)), Cell.of(unit(key, parent)), origin(r.isDefault(path)));
        }
    }

    /** A list of objects as a table: one column per item (one row per item when there are more items than keys). */
    private static Table items(String id, Results r, List<?> list, String path, String caption) {
        Set<String> keys = new LinkedHashSet<>();
        for (Object item : list) {
            if (item instanceof Map<?, ?> m) {
                m.keySet().forEach(k -> keys.add(String.valueOf(k)));
            }
        }
        Map<String, String> units = new LinkedHashMap<>();
        for (String key : keys) {
            Set<String> seen = new LinkedHashSet<>();
            for (Object item : list) {
                if (item instanceof Map<?, ?> m && m.containsKey(key)) {
                    seen.add(unit(key, m));
                }
            }
            units.put(key, seen.size() == 1 ? seen.iterator().next() : null);
        }
        boolean byColumn = list.size() <= keys.size();
        List<String> header = new ArrayList<>();
        if (byColumn) {
            header.add("");
            for (int k = 0; k < list.size(); k++) {
                header.add(itemName(list.get(k), k));
            }
        } else {
            header.add("");
            keys.forEach(key -> header.add(withUnit(key, units.get(key))));
        }
        Table t = new Table(id, caption, header);
        if (byColumn) {
            for (String key : keys) {
                List<Cell> row = new ArrayList<>(List.of(Cell.of(withUnit(key, units.get(key)))));
                for (int k = 0; k < list.size(); k++) {
                    row.add(cell(r, list.get(k), key, units.get(key), path + "[" + k + "]." + key));
                }
                t.row(row);
            }
        } else {
            for (int k = 0; k < list.size(); k++) {
                List<Cell> row = new ArrayList<>(List.of(Cell.of(Integer.toString(k + 1))));
                for (String key : keys) {
                    row.add(cell(r, list.get(k), key, units.get(key), path + "[" + k + "]." + key));
                }
                t.row(row);
            }
        }
        return t;
    }

    private static String itemName(Object item, int index) {
        if (item instanceof Map<?, ?> m) {
            for (String k : List.of("name", "role", "kind")) {
                if (m.get(k) instanceof String s && !s.isBlank()) {
                    return (index + 1) + ": " + s;
                }
            }
        }
        return Integer.toString(index + 1);
    }

    private static String withUnit(String key, String unit) {
        return Words.of(key) + (unit == null || unit.isEmpty() ? "" : ", " + unit);
    }

    /** One item's value: "–" when it has none, the unit beside it when the column's items differ in unit. */
    private static Cell cell(Results r, Object item, String key, String sharedUnit, String path) {
        Map<?, ?> m = item instanceof Map<?, ?> map ? map : Map.of();
        if (!m.containsKey(key)) {
            return Cell.of("–");
        }
        String unit = sharedUnit == null ? unit(key, m) : "";
        String text = text(m.get(key)) + (unit.isEmpty() ? "" : " " + unit);
        return r.isDefault(path) ? new Cell(text + " (default)", DEFAULT_MARK, "") : Cell.of(text);
    }

    /** The key's unit; an ancillary's weight is kN for a point item and kN/m for a linear one. */
    private static String unit(String key, Map<?, ?> parent) {
        if (key.equals("weight")) {
            return "linear".equals(parent.get("kind")) ? "kN/m" : "kN";
        }
        return InputUnits.of(key);
    }

    private static boolean allScalars(List<?> list) {
        return list.stream().noneMatch(v -> v instanceof Map<?, ?> || v instanceof List<?>);
    }

    /** A model-file value as text: numbers without needless zeros, lists in brackets, keys in words. */
    static String text(Object value) {
        if (value == null) {
            return "–";
        }
        if (value instanceof Double d) {
            return plain(d);
        }
        if (value instanceof List<?> list) {
            List<String> parts = new ArrayList<>();
            list.forEach(v -> parts.add(text(v)));
            return "[" + String.join(", ", parts) + "]";
        }
        if (value instanceof Map<?, ?> map) {
            List<String> parts = new ArrayList<>();
            map.forEach((k, v) -> parts.add(Words.of(String.valueOf(k)) + " " + text(v)));
            return String.join("; ", parts);
        }
        return value instanceof String code ? Words.code(code) : String.valueOf(value);
    }

    static String plain(double d) {
        if (d == Math.rint(d) && Math.abs(d) < 1e15) {
            return Long.toString((long) d);
        }
        return java.math.BigDecimal.valueOf(d).stripTrailingZeros().toPlainString();
    }
}
