package tetrapod.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

class JsonOutputTest {

    @Test
    void layoutIsPrettyAndExact() {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("format", "test/1");
        root.put("count", 3);
        root.put("values", new double[] {1.5, -2.0, 0.25});
        root.put("flags", List.of(true, false));
        root.put("nothing", null);
        root.put("point", Map.of("x", 1.0, "y", 2.0));
        root.put("empty", Map.of());
        root.put("rows", List.of(Map.of("id", 1), Map.of("id", 2)));
        String expected = """
                {
                  "format": "test/1",
                  "count": 3,
                  "values": [1.5, -2.0, 0.25],
                  "flags": [true, false],
                  "nothing": null,
                  "point": { "x": 1.0, "y": 2.0 },
                  "empty": {},
                  "rows": [
                    { "id": 1 },
                    { "id": 2 }
                  ]
                }
                """;
        assertEquals(expected, JsonOutput.toJson(root));
    }

    @Test
    void unorderedMapsAreWrittenWithSortedKeys() {
        Map<String, Integer> hashed = new HashMap<>();
        for (String k : List.of("zeta", "alpha", "mu", "beta", "omega", "gamma")) {
            hashed.put(k, k.length());
        }
        String text = JsonOutput.toJson(Map.of("m", hashed));
        assertEquals(JsonOutput.toJson(Map.of("m", new TreeMap<>(hashed))), text);
        assertTrue(text.indexOf("alpha") < text.indexOf("beta") && text.indexOf("omega") < text.indexOf("zeta"), text);
    }

    @Test
    void insertionOrderedMapsKeepTheirOrder() {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("z", 1);
        m.put("a", 2);
        assertEquals("{\n  \"z\": 1,\n  \"a\": 2\n}\n", JsonOutput.toJson(m));
    }

    @Test
    void longContainersBreakIntoLines() {
        List<Double> many = new ArrayList<>();
        for (int k = 0; k < 30; k++) {
            many.add(k + 0.5);
        }
        String text = JsonOutput.toJson(Map.of("a", many));
        assertTrue(text.startsWith("{\n  \"a\": [\n    0.5, 1.5, 2.5, "), text);
        assertTrue(text.endsWith(", 29.5\n  ]\n}\n"), text);
        assertTrue(text.lines().allMatch(l -> l.length() <= 100), text);
        assertTrue(text.lines().count() > 3, "30 numbers of 4-5 characters need more than one line of 100: " + text);
        assertEquals(many.toString().replace(" ", ""), text.substring(text.indexOf('['), text.indexOf(']') + 1)
                .replaceAll("\\s", ""), "every number once, in order");
    }

    @Test
    void anObjectOfNumbersStaysOnOneLineUpToTheLongerWidth() {
        Map<String, Object> forces = new LinkedHashMap<>();
        forces.put("member", 12);
        forces.put("N", -17216064.399081193);
        forces.put("endI", new double[] {17216064.399081193, -32008.13635325432, 28602.339680075645, -94.95837468035425,
            -20278.328678190708, -18628.23911380768});
        forces.put("endJ", new double[] {-17216064.399081193, 32008.13635325432, -28602.339680075645, 94.95837468035425,
            12939.813150137663, 10415.89675718546});
        String text = JsonOutput.toJson(List.of(forces, forces));
        String[] lines = text.split("\n");
        assertEquals(4, lines.length, text);          // [, the two objects, ]
        assertTrue(lines[1].length() > 100 && lines[1].length() <= 400, lines[1]);
        assertTrue(lines[1].startsWith("  { \"member\": 12, \"N\": -1.7216064399081193E7, \"endI\": ["), lines[1]);
    }

    @Test
    void textIsEscaped() {
        assertEquals("[\"a\\\"b\\\\c\\nd\\u0001\", \"kN·m\"]\n", JsonOutput.toJson(List.of("a\"b\\c\nd\u0001", "kN·m")));
    }

    /** Keys and text quoted as Jackson's own writer quotes them (the reference), for any character. */
    @Test
    void keysAndTextAreQuotedAsJacksonQuotesThem() throws Exception {
        com.fasterxml.jackson.databind.ObjectMapper jackson = new com.fasterxml.jackson.databind.ObjectMapper();
        java.util.Random random = new java.util.Random(15);
        for (int k = 0; k < 2000; k++) {
            StringBuilder text = new StringBuilder();
            for (int c = random.nextInt(12); c > 0; c--) {
                text.append((char) (random.nextBoolean() ? random.nextInt(0x80) : random.nextInt(0x3000)));
            }
            String s = text.toString();
            String quoted = jackson.writeValueAsString(s);
            assertEquals("[" + quoted + "]\n", JsonOutput.toJson(List.of(s)), s);
            assertEquals("{\n  " + quoted + ": 1\n}\n", JsonOutput.toJson(Map.of(s, 1)), s);
        }
    }

    @Test
    void nanAndInfinityAreRefusedNeverWritten() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> JsonOutput.toJson(Map.of("cases", List.of(Map.of("u", new double[] {1, Double.NaN})))));
        assertTrue(e.getMessage().startsWith("$.cases[0].u[1]"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> JsonOutput.toJson(List.of(Double.POSITIVE_INFINITY)));
    }

    @Test
    void unorderedSetsAndUnknownTypesAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> JsonOutput.toJson(new HashSet<>(List.of(1, 2))));
        assertThrows(IllegalArgumentException.class, () -> JsonOutput.toJson(List.of(new Object())));
    }

    @Test
    void sameValueSameBytes() {
        Map<String, Object> a = new HashMap<>();
        Map<String, Object> b = new HashMap<>(64);
        for (int k = 0; k < 50; k++) {
            a.put("key" + k, k * 0.1);
        }
        for (int k = 49; k >= 0; k--) {
            b.put("key" + k, k * 0.1);
        }
        assertEquals(JsonOutput.toJson(a), JsonOutput.toJson(b));
    }
}
