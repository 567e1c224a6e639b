package tetrapod.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tetrapod.common.BadInputException;

class DefaultedKeysTest {

    @Test
    void keysAbsentFromTheFileAreTheDefaults() throws BadInputException {
        Object given = PlainJson.parse("{ \"name\": \"T\", \"segments\": [ { \"height\": 8 }, { \"height\": 4, "
                + "\"redundants\": 1 } ], \"loads\": {} }");
        Map<String, Object> filled = (Map<String, Object>) PlainJson.parse("{ \"name\": \"T\", \"idealisation\": "
                + "\"truss\", \"segments\": [ { \"height\": 8, \"redundants\": 0 }, { \"height\": 4, \"redundants\": 1 } ],"
                + " \"loads\": { \"sweepStep\": 5.0 }, \"checks\": { \"method\": \"en1993\" } }");
        assertEquals(List.of("$.idealisation", "$.segments[0].redundants", "$.loads.sweepStep", "$.checks"),
                DefaultedKeys.of(given, filled));
    }

    @Test
    void resultsReaderRefusesWhatIsNotAResultsFile(@TempDir Path dir) throws Exception {
        Path model = dir.resolve("model.json");
        Files.writeString(model, "{ \"name\": \"T\" }");
        BadInputException e = assertThrows(BadInputException.class, () -> ResultsReader.read(model));
        assertEquals("$.format", e.problems().get(0).path());
        Path empty = dir.resolve("empty.json");
        Files.writeString(empty, "[]");
        assertThrows(BadInputException.class, () -> ResultsReader.read(empty));
    }
}
