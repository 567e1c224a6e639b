package tetrapod.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;

class JsonLocationsTest {

    private static final String TEXT = """
            {
              "name": "x",
              "segments": [
                { "height": 1 },
                {
                  "height": 2,
                  "sections": { "leg": "L50x5" }
                }
              ],
              "userSections": {
                "CHS 60.3": { "tube": { "d_mm": 60.3,
                  "t_mm": 3.2 } }
              },
              "bad": NaN
            }
            """;

    @Test
    void linesByPath() throws BadInputException {
        JsonLocations loc = JsonLocations.parse(TEXT);
        assertEquals(1, loc.line(""));
        assertEquals(2, loc.line("name"));
        assertEquals(4, loc.line("segments[0]"));
        assertEquals(4, loc.line("segments[0].height"));
        assertEquals(5, loc.line("segments[1]"));
        assertEquals(6, loc.line("segments[1].height"));
        assertEquals(7, loc.line("segments[1].sections.leg"));
        assertEquals(12, loc.line("userSections[\"CHS 60.3\"].tube.t_mm"));
        // a missing key is placed on the line of the object that lacks it
        assertEquals(5, loc.line("segments[1].panels"));
        assertTrue(Double.isNaN(loc.root().get("bad").doubleValue()), "NaN is read so that it can be refused clearly");
    }

    @Test
    void duplicateKeysAreCollectedNotFatal() throws BadInputException {
        JsonLocations loc = JsonLocations.parse("{\n \"a\": 1,\n \"b\": { \"c\": 1,\n \"c\": 2 },\n \"a\": 3\n}");
        assertEquals(2, loc.duplicateKeys().size());
        assertEquals(new Problem("b.c", 4, "duplicate key 'c' (first given on line 3); give each key once"),
                loc.duplicateKeys().get(0));
        assertEquals("a", loc.duplicateKeys().get(1).path());
        assertEquals(5, loc.duplicateKeys().get(1).line());
        assertEquals(1, loc.root().get("a").intValue(), "the first value is kept");
    }

    @Test
    void malformedJsonIsOnePlainProblemOnItsLine() {
        String[][] cases = {
            {"{\n \"a\": 1,\n \"b\": tru\n}", "3", "malformed JSON: unrecognised word 'tru'"},
            {"{\n \"a\": 1\n", "3", "malformed JSON: the text ends before every object and array is closed"},
            {"{\n \"a\": [1\n 2]\n}", "3", "malformed JSON: unexpected character '2': expected a comma between the values of an array"},
            {"{\n \"a\": \"two\nlines\"\n}", "2", "malformed JSON: a line break or control character inside a string"},
            {"{ \"a\": 1 }\n}", "2", "malformed JSON: unexpected '}'"},
            {"{ 'a': 1 }", "1", "malformed JSON: unexpected character \"'\" (a single quote; JSON needs double quotes): expected a key in double quotes"},
        };
        for (String[] c : cases) {
            BadInputException e = assertThrows(BadInputException.class, () -> JsonLocations.parse(c[0]));
            assertEquals(1, e.problems().size());
            Problem p = e.problems().get(0);
            assertEquals("$", p.path());
            assertEquals(Integer.parseInt(c[1]), p.line(), c[0]);
            assertTrue(p.message().startsWith(c[2]), p.message());
            assertFalse(p.message().contains("Source") || p.message().contains("code ")
                    || p.message().contains("fasterxml"), p.message());
        }
    }

    @Test
    void pathsQuoteKeysThatAreNotPlainWords() {
        assertEquals("segments[2].topWidthX", JsonPaths.child(JsonPaths.index("segments", 2), "topWidthX"));
        assertEquals("userSections.L95x9.angle.t_mm",
                JsonPaths.child(JsonPaths.child(JsonPaths.child("userSections", "L95x9"), "angle"), "t_mm"));
        assertEquals("userSections[\"CHS 60.3\"]", JsonPaths.child("userSections", "CHS 60.3"));
        assertEquals("userSections", JsonPaths.parent("userSections[\"CHS 60.3\"]"));
        assertEquals("userSections[\"CHS 60.3\"]", JsonPaths.parent("userSections[\"CHS 60.3\"].tube"));
        assertEquals("frame.members", JsonPaths.parent("frame.members[4]"));
        assertEquals("frame.members[4]", JsonPaths.parent("frame.members[4].j"));
        assertEquals("", JsonPaths.parent("name"));
    }
}
