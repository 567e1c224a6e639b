package tetrapod.io;

import com.fasterxml.jackson.core.io.JsonStringEncoder;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.lang.reflect.Array;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.SortedMap;
import java.util.SortedSet;

/**
 * Writes plain Java values as pretty, deterministic JSON: the same value always gives the same
 * bytes. Other packages build their output from these values, so that none of them needs a JSON
 * library.
 *
 * <p>Accepted values: {@code null}, {@link String}, {@link Boolean}, {@link Number} (finite only:
 * a NaN or infinity is refused, never written), {@link Map} (keys written with
 * {@code toString()}), {@link List}, arrays (primitive or object). Maps that have an order of
 * their own ({@link LinkedHashMap}, {@link SortedMap}, {@link EnumMap}) keep it; any other map is
 * written with its keys sorted, so that hash order never reaches a file. Likewise sets other than
 * {@link SortedSet} and {@link LinkedHashSet} are refused.
 *
 * <p>Layout: two-space indentation, "\n" line ends, a final newline. An array of scalars stays on
 * one line when it is short, else its items fill lines of that width; an object whose members are
 * all scalars or arrays of scalars (a node's displacements, a member's end forces) stays on one line
 * up to a longer width, so that a large file is mostly numbers, not indentation.
 */
public final class JsonOutput {

    /** Longest array written on one line, and the width its items fill when it is longer, in characters. */
    private static final int INLINE_WIDTH = 100;
    /** Longest object of scalars and arrays of scalars written on one line, in characters. */
    private static final int RECORD_WIDTH = 400;
    private static final String INDENT = "  ";

    private JsonOutput() { }

    /** The value as JSON text, ending with a newline. */
    public static String toJson(Object value) {
        StringWriter out = new StringWriter();
        try {
            write(out, value);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }

    /** Writes the value as JSON text, ending with a newline. */
    public static void write(Writer out, Object value) throws IOException {
        new Printer(out).value(value, Where.ROOT, 0);
        out.write('\n');
        out.flush();
    }

    /** Replaces {@code file} atomically with the value as JSON (UTF-8). */
    public static void write(Path file, Object value) throws IOException {
        AtomicFiles.writeText(file, out -> write(out, value));
    }

    /**
     * The value as {@link PlainJson} would read back what {@link #write} writes of it, without the
     * text: maps in their written order with text keys, lists, text, booleans, null, whole numbers as
     * {@code Integer}, {@code Long} or {@code BigInteger} by size, and other numbers as the
     * {@code Double} their written digits parse to. Refuses what {@link #write} refuses.
     */
    public static Object plain(Object value) {
        return plain(value, Where.ROOT);
    }

    private static Object plain(Object value, Where path) {
        Object v = normalise(value, path);
        if (v instanceof List<?> list) {
            List<Object> out = new ArrayList<>(list.size());
            for (int k = 0; k < list.size(); k++) {
                out.add(plain(list.get(k), path));
            }
            return out;
        }
        if (v instanceof Map<?, ?> map) {
            Map<String, Object> out = new LinkedHashMap<>();
            for (Map.Entry<?, ?> e : map.entrySet()) {
                out.put(String.valueOf(e.getKey()), plain(e.getValue(), path));
            }
            return out;
        }
        if (v == null || v instanceof String || v instanceof Boolean) {
            return v;
        }
        if (v instanceof Double d && Double.isFinite(d)) {
            return d;               // the digits Double.toString writes parse back to this same double
        }
        String text = scalar(v, path);                  // refuses a NaN or an infinity, naming where it is
        if (v instanceof Float || !text.matches("-?\\d+")) {
            return Double.parseDouble(text);
        }
        BigInteger whole = new BigInteger(text);
        if (whole.bitLength() < Integer.SIZE) {
            return whole.intValue();
        }
        return whole.bitLength() < Long.SIZE ? (Object) whole.longValue() : whole;
    }

    /**
     * Where a value is in the document, for messages only: built as a chain of small objects and
     * spelt out ({@code $.cases[3].name}) only when something cannot be written.
     */
    private record Where(Where parent, Object key, int index) {
        static final Where ROOT = new Where(null, null, -1);

        Where at(int k) {
            return new Where(this, null, k);
        }

        Where key(Object k) {
            return new Where(this, k, -1);
        }

        @Override
        public String toString() {
            if (parent == null) {
                return "$";
            }
            return parent + (key != null ? "." + key : "[" + index + "]");
        }
    }

    /** Walks the value once, writing as it goes. */
    private record Printer(Writer out) {

        void value(Object value, Where path, int depth) throws IOException {
            Object v = normalise(value, path);
            if (v instanceof List<?> list) {
                list(list, path, depth);
            } else if (v instanceof Map<?, ?> map) {
                object(map, path, depth);
            } else {
                out.write(scalar(v, path));
            }
        }

        private void list(List<?> list, Where path, int depth) throws IOException {
            String inline = inline(list, path, INLINE_WIDTH);
            if (inline != null) {
                out.write(inline);
                return;
            }
            if (allScalars(list, path)) {
                filled(list, path, depth);
                return;
            }
            out.write("[\n");
            for (int k = 0; k < list.size(); k++) {
                indent(depth + 1);
                value(list.get(k), path.at(k), depth + 1);
                out.write(k + 1 < list.size() ? ",\n" : "\n");
            }
            indent(depth);
            out.write("]");
        }

        private void object(Map<?, ?> map, Where path, int depth) throws IOException {
            String inline = depth == 0 ? null : inline(map, path, RECORD_WIDTH);
            if (inline != null) {
                out.write(inline);
                return;
            }
            if (map.isEmpty()) {
                out.write("{}");
                return;
            }
            out.write("{\n");
            int k = 0;
            for (Map.Entry<?, ?> e : map.entrySet()) {
                indent(depth + 1);
                out.write(quote(String.valueOf(e.getKey())));
                out.write(": ");
                value(e.getValue(), path.key(e.getKey()), depth + 1);
                out.write(++k < map.size() ? ",\n" : "\n");
            }
            indent(depth);
            out.write("}");
        }

        /** A long array of scalars, its items filling lines of {@link #INLINE_WIDTH} characters. */
        private void filled(List<?> list, Where path, int depth) throws IOException {
            out.write("[\n");
            int width = 0;
            for (int k = 0; k < list.size(); k++) {
                String item = scalar(normalise(list.get(k), path.at(k)), path.at(k));
                if (width > 0 && width + 2 + item.length() + 1 > INLINE_WIDTH) {   // + 1: the comma that may follow
                    out.write(",\n");
                    width = 0;
                } else if (width > 0) {
                    out.write(", ");
                    width += 2;
                }
                if (width == 0) {
                    indent(depth + 1);
                    width = INDENT.length() * (depth + 1);
                }
                out.write(item);
                width += item.length();
            }
            out.write("\n");
            indent(depth);
            out.write("]");
        }

        private void indent(int depth) throws IOException {
            for (int k = 0; k < depth; k++) {
                out.write(INDENT);
            }
        }
    }

    /** The one-line form when every member is a scalar or an array of scalars and it fits {@code width}; else null. */
    private static String inline(Object container, Where path, int width) {
        StringBuilder line = new StringBuilder();
        if (!appendInline(line, container, path, true, width) || line.length() > width) {
            return null;
        }
        return line.toString();
    }

    private static boolean allScalars(List<?> list, Where path) {
        for (Object item : list) {
            Object v = normalise(item, path);
            if (v instanceof List<?> || v instanceof Map<?, ?>) {
                return false;
            }
        }
        return true;
    }

    private static boolean appendInline(StringBuilder line, Object value, Where path, boolean outer, int width) {
        Object v = normalise(value, path);
        if (v instanceof List<?> list) {
            line.append('[');
            for (int k = 0; k < list.size(); k++) {
                Object item = normalise(list.get(k), path);
                if (item instanceof Map<?, ?> || (item instanceof List<?> && !outer)) {
                    return false;
                }
                if (k > 0) {
                    line.append(", ");
                }
                if (!appendInline(line, item, path.at(k), false, width) || line.length() > width) {
                    return false;
                }
            }
            line.append(']');
            return true;
        }
        if (v instanceof Map<?, ?> map) {
            if (!outer) {
                return false;
            }
            if (map.isEmpty()) {
                line.append("{}");
                return true;
            }
            line.append("{ ");
            int k = 0;
            for (Map.Entry<?, ?> e : map.entrySet()) {
                if (k++ > 0) {
                    line.append(", ");
                }
                line.append(quote(String.valueOf(e.getKey()))).append(": ");
                Object item = normalise(e.getValue(), path);
                if (item instanceof Map<?, ?>) {
                    return false;
                }
                if (!appendInline(line, item, path.key(e.getKey()), item instanceof List<?>, width)
                        || line.length() > width) {
                    return false;
                }
            }
            line.append(" }");
            return true;
        }
        line.append(scalar(v, path));
        return true;
    }

    /** Arrays and collections become lists, unordered maps sorted maps; anything else unchanged. */
    private static Object normalise(Object value, Where path) {
        if (value == null) {
            return null;
        }
        if (value.getClass().isArray()) {
            int n = Array.getLength(value);
            List<Object> list = new ArrayList<>(n);
            for (int k = 0; k < n; k++) {
                list.add(Array.get(value, k));
            }
            return list;
        }
        if (value instanceof List<?>) {
            return value;
        }
        if (value instanceof Collection<?> c) {
            if (c instanceof SortedSet<?> || c instanceof LinkedHashSet<?>) {
                return List.copyOf(c);
            }
            throw new IllegalArgumentException(path + ": a collection without a defined order ("
                    + value.getClass().getSimpleName() + ") would make the output depend on hash order");
        }
        if (value instanceof Map<?, ?> map) {
            if (map instanceof LinkedHashMap<?, ?> || map instanceof SortedMap<?, ?> || map instanceof EnumMap<?, ?>) {
                return map;
            }
            List<Map.Entry<?, ?>> entries = new ArrayList<>(map.entrySet());
            entries.sort(Comparator.comparing(e -> String.valueOf(e.getKey())));
            Map<Object, Object> sorted = new LinkedHashMap<>();
            for (Map.Entry<?, ?> e : entries) {
                sorted.put(e.getKey(), e.getValue());
            }
            return sorted;
        }
        return value;
    }

    private static String scalar(Object v, Where path) {
        if (v == null) {
            return "null";
        }
        if (v instanceof String s) {
            return quote(s);
        }
        if (v instanceof Boolean b) {
            return b.toString();
        }
        if (v instanceof Double || v instanceof Float) {
            double d = ((Number) v).doubleValue();
            if (!Double.isFinite(d)) {
                throw new IllegalArgumentException(path + ": " + d + " cannot be written to JSON");
            }
            return v instanceof Float f ? Float.toString(f) : Double.toString(d);
        }
        if (v instanceof BigDecimal b) {
            return b.toString();
        }
        if (v instanceof Integer || v instanceof Long || v instanceof Short || v instanceof Byte
                || v instanceof BigInteger) {
            return v.toString();
        }
        throw new IllegalArgumentException(path + ": cannot write a " + v.getClass().getSimpleName()
                + " as JSON; convert it to a map, list, text, number or boolean");
    }

    private static String quote(String s) {
        for (int k = 0; k < s.length(); k++) {
            char c = s.charAt(k);
            if (c < 0x20 || c == '"' || c == '\\') {   // what JSON must escape (RFC 8259 section 7): Jackson does it
                return "\"" + new String(JsonStringEncoder.getInstance().quoteAsString(s)) + "\"";
            }
        }
        return "\"" + s + "\"";
    }
}
