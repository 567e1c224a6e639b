package tetrapod.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import tetrapod.report.Table.Cell;

/** Model-file values as key/value tables, each value that Tetrapod filled in marked as a default. */
final class InputTables {

    static final String DEFAULT_MARK = "default";

    private InputTables() { }

    /**
     * Every leaf under {@code value} (the input at JSON path {@code path}) as one row: the key path
     * relative to the object, the value, the unit, and whether it was filled in.
     */
    static Table flat(String id, Results r, Object value, String path) {
        Table t = new Table(id, "", List.of("key", "value", "unit", "given or assumed"));
        List<String[]> rows = new ArrayList<>();
        flatten(value, path, "", rows);
        for (String[] row : rows) {
            boolean assumed = r.isDefault(row[0]);
            t.row(Cell.of(row[1]), Cell.of(row[2]), Cell.of(row[3]), origin(assumed));
        }
        return t;
    }

    /** "given" or, marked, "default". */
    static Cell origin(boolean assumed) {
        return assumed ? new Cell("default", DEFAULT_MARK, "") : Cell.of("given");
    }

    private static void flatten(Object value, String path, String name, List<String[]> rows) {
        flatten(value, Map.of(), path, name, rows);
    }

    private static void flatten(Object value, Map<?, ?> parent, String path, String name, List<String[]> rows) {
        if (value instanceof Map<?, ?> map && !map.isEmpty()) {
            for (Map.Entry<?, ?> e : map.entrySet()) {
                String key = String.valueOf(e.getKey());
                flatten(e.getValue(), map, path + "." + key, name.isEmpty() ? key : name + "." + key, rows);
            }
        } else if (value instanceof List<?> list && !list.isEmpty() && !allScalars(list)) {
            for (int k = 0; k < list.size(); k++) {
                flatten(list.get(k), parent, path + "[" + k + "]", name + "[" + k + "]", rows);
            }
        } else {
            String key = name.contains(".") ? name.substring(name.lastIndexOf('.') + 1) : name;
            key = key.replaceAll("\\[\\d+]$", "");
            rows.add(new String[] {path, name, text(value), unit(key, parent)});
        }
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

    /** A model-file value as text: numbers without needless zeros, lists in brackets. */
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
            map.forEach((k, v) -> parts.add(k + ": " + text(v)));
            return "{" + String.join(", ", parts) + "}";
        }
        return String.valueOf(value);
    }

    static String plain(double d) {
        if (d == Math.rint(d) && Math.abs(d) < 1e15) {
            return Long.toString((long) d);
        }
        return java.math.BigDecimal.valueOf(d).stripTrailingZeros().toPlainString();
    }
}
