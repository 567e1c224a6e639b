package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * docs/methods.md, "The cases written in full": every case solved in full is listed with its
 * reactions and α_cr, and its vectors (loads, displacements, member end forces) are written exactly
 * when it has no wind or governs a leg base reaction or a footing check, as the file's own
 * legBases[] and foundations[] name them.
 */
class CasesWrittenInFullTest {

    static Stream<Path> models() throws IOException {
        return ExampleRuns.models();
    }

    @ParameterizedTest
    @MethodSource("models")
    void vectorsExactlyForTheCasesWithoutWindAndTheGoverningOnes(Path model) {
        JsonNode doc = ExampleRuns.results(model);
        Set<String> governing = new HashSet<>();
        for (JsonNode leg : doc.get("legBases")) {
            for (String extreme : new String[] {"maxCompression", "maxUplift", "maxShear"}) {
                governing.add(leg.get(extreme).get("case").asText());
            }
        }
        for (JsonNode footing : doc.get("foundations")) {
            footing.get("checks").forEach(c -> governing.add(c.get("case").asText()));
        }
        int without = 0;
        int windCases = 0;
        for (JsonNode c : doc.get("cases")) {
            String id = c.get("id").asText();
            boolean expected = c.get("azimuthDeg").isNull() || governing.contains(id);
            for (String vector : new String[] {"loads", "displacements", "memberForces"}) {
                assertEquals(expected, c.has(vector), model.getFileName() + " case " + id + ": " + vector);
            }
            assertTrue(c.has("reactions") && c.has("alphaCr"), id + ": reactions and α_cr always");
            without += expected ? 0 : 1;
            windCases += c.get("azimuthDeg").isNull() ? 0 : 1;
        }
        assertTrue(governing.stream().allMatch(id -> id.equals("null") || hasCase(doc, id)),
                model.getFileName() + ": every governing case is among the cases");
        // in every bundled example some wind case governs no reaction and no footing
        assertTrue(windCases == 0 || without > 0, model.getFileName() + ": some wind case is written without its vectors");
    }

    private static boolean hasCase(JsonNode doc, String id) {
        for (JsonNode c : doc.get("cases")) {
            if (c.get("id").asText().equals(id)) {
                return true;
            }
        }
        return false;
    }
}
