package tetrapod.report;

import java.util.Locale;
import java.util.Map;

/**
 * Names of the model file and results.json (camelCase keys, unit suffixes, JSON paths) as the
 * words a reader of the report expects: {@code anchorTension} → "anchor tension",
 * {@code endDistance_mm} → "end distance", {@code $.segments[1].redundants} → "segment 2, redundants".
 */
final class Words {

    /** Keys whose plain split would read badly. */
    private static final Map<String, String> SPECIAL = Map.ofEntries(
            Map.entry("E", "modulus of elasticity E"), Map.entry("G", "shear modulus G"),
            Map.entry("fy", "yield strength fy"), Map.entry("fu", "tensile strength fu"),
            Map.entry("F", "force and moment [Fx, Fy, Fz, Mx, My, Mz]"),
            Map.entry("widthX", "width in x"), Map.entry("widthY", "width in y"),
            Map.entry("topWidthX", "top width in x"), Map.entry("topWidthY", "top width in y"),
            Map.entry("windOnIce", "wind on ice"), Map.entry("crossingConnected", "diagonals joined where they cross"),
            Map.entry("mass_kg_per_m", "mass per metre"), Map.entry("Kzt", "topographic factor K_zt"),
            Map.entry("cf", "force coefficient"));

    /** Codes that the model file uses as values and people write otherwise. */
    private static final Map<String, String> CODES = Map.of("en1993", "EN 1993", "asce10", "ASCE 10",
            "en1991", "EN 1991-1-4", "asce7", "ASCE 7");

    /** A list's name → what one of its items is called. */
    private static final Map<String, String> ITEMS = Map.of("segments", "segment", "connections", "connection",
            "ancillaries", "ancillary", "combinations", "combination", "nodal", "nodal load", "nodes", "node",
            "members", "member", "buckling", "buckling override", "userSections", "user section");

    private Words() { }

    /** A key or a JSON name in words, lower case, its unit suffix dropped (the unit goes in its own column). */
    static String of(String key) {
        if (key == null || key.isEmpty()) {
            return "";
        }
        String special = SPECIAL.get(key);
        if (special != null) {
            return special;
        }
        String bare = key.replaceFirst("_(mm|cm2|cm4|kg_per_m|kN|m)$", "");
        StringBuilder b = new StringBuilder(bare.length() + 8);
        for (int k = 0; k < bare.length(); k++) {
            char c = bare.charAt(k);
            boolean boundary = k > 0 && Character.isUpperCase(c) && !Character.isUpperCase(bare.charAt(k - 1));
            if (boundary) {
                b.append(' ');
            }
            b.append(c == '_' ? ' ' : c);
        }
        return lowerWords(b.toString());
    }

    /** Lower-cases each word unless it is an abbreviation of two or more capitals (“ASCE”, “K”). */
    private static String lowerWords(String text) {
        StringBuilder b = new StringBuilder();
        for (String w : text.split(" ")) {
            if (w.isEmpty()) {
                continue;
            }
            boolean abbreviation = w.length() > 1 && w.equals(w.toUpperCase(Locale.ROOT));
            b.append(b.length() == 0 ? "" : " ").append(abbreviation ? w : w.toLowerCase(Locale.ROOT));
        }
        return b.toString();
    }

    /** A value of the model file as people write it: {@code en1993} → "EN 1993"; others as they are. */
    static String code(String value) {
        return CODES.getOrDefault(value, value);
    }

    /**
     * A JSON path of the model file in words: each list item by its number from 1, each key in
     * words; {@code $.checks.connections[0].endDistance_mm} → "checks, connection 1, end distance".
     */
    static String path(String jsonPath) {
        String rest = jsonPath.startsWith("$") ? jsonPath.substring(1) : jsonPath;
        StringBuilder b = new StringBuilder();
        String last = "";
        for (String part : rest.split("(?=[.\\[])")) {
            if (part.isEmpty()) {
                continue;
            }
            String piece;
            if (part.startsWith("[")) {
                int index = Integer.parseInt(part.substring(1, part.length() - 1));
                piece = ITEMS.getOrDefault(last, "item") + " " + (index + 1);
                if (b.length() > 0 && b.toString().endsWith(of(last))) {
                    b.setLength(b.length() - of(last).length());
                    if (b.toString().endsWith(", ")) {
                        b.setLength(b.length() - 2);
                    }
                }
            } else {
                last = part.substring(1);
                piece = of(last);
            }
            b.append(b.length() == 0 ? "" : ", ").append(piece);
        }
        return b.toString();
    }
}
