package tetrapod.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import tetrapod.common.BadInputException;

class MergePatchTest {

    /**
     * Every row of RFC 7386 Appendix A "Example Test Cases" (original, patch, result), as the RFC
     * prints them; RFC 7396, which obsoletes 7386, repeats the same table.
     */
    @ParameterizedTest(name = "RFC 7386 Appendix A: {0} + {1} = {2}")
    @CsvSource(delimiter = '|', quoteCharacter = '`', value = {
        "{\"a\":\"b\"}                 | {\"a\":\"c\"}                          | {\"a\":\"c\"}",
        "{\"a\":\"b\"}                 | {\"b\":\"c\"}                          | {\"a\":\"b\",\"b\":\"c\"}",
        "{\"a\":\"b\"}                 | {\"a\":null}                           | {}",
        "{\"a\":\"b\",\"b\":\"c\"}     | {\"a\":null}                           | {\"b\":\"c\"}",
        "{\"a\":[\"b\"]}               | {\"a\":\"c\"}                          | {\"a\":\"c\"}",
        "{\"a\":\"c\"}                 | {\"a\":[\"b\"]}                        | {\"a\":[\"b\"]}",
        "{\"a\":{\"b\":\"c\"}}         | {\"a\":{\"b\":\"d\",\"c\":null}}       | {\"a\":{\"b\":\"d\"}}",
        "{\"a\":[{\"b\":\"c\"}]}       | {\"a\":[1]}                            | {\"a\":[1]}",
        "[\"a\",\"b\"]                 | [\"c\",\"d\"]                          | [\"c\",\"d\"]",
        "{\"a\":\"b\"}                 | [\"c\"]                                | [\"c\"]",
        "{\"a\":\"foo\"}               | null                                   | null",
        "{\"a\":\"foo\"}               | \"bar\"                                | \"bar\"",
        "{\"e\":null}                  | {\"a\":1}                              | {\"e\":null,\"a\":1}",
        "[1,2]                         | {\"a\":\"b\",\"c\":null}               | {\"a\":\"b\"}",
        "{}                            | {\"a\":{\"bb\":{\"ccc\":null}}}        | {\"a\":{\"bb\":{}}}",
    })
    void rfc7386AppendixA(String original, String patch, String result) throws BadInputException {
        JsonNode target = ModelPatches.tree(original);
        JsonNode targetBefore = target.deepCopy();
        JsonNode patchTree = ModelPatches.tree(patch);
        assertEquals(ModelPatches.tree(result), MergePatch.apply(target, patchTree));
        assertEquals(targetBefore, target, "the target is not modified");
    }

    /** RFC 7386 section 1's example: a member replaced, a nested member removed, the rest kept. */
    @Test
    void rfc7386Section1Example() throws BadInputException {
        JsonNode target = ModelPatches.tree("{\"a\":\"b\",\"c\":{\"d\":\"e\",\"f\":\"g\"}}");
        JsonNode patch = ModelPatches.tree("{\"a\":\"z\",\"c\":{\"f\":null}}");
        assertEquals(ModelPatches.tree("{\"a\":\"z\",\"c\":{\"d\":\"e\"}}"), MergePatch.apply(target, patch));
    }

    @Test
    void canonicalBytesDoNotDependOnLayout(@TempDir Path dir) throws Exception {
        Path a = dir.resolve("a.json");
        Path b = dir.resolve("b.json");
        Files.writeString(a, "{\"name\":\"t\",\"base\":{\"widthX\":6.0}}");
        Files.writeString(b, "{\n  \"name\" : \"t\",\n\n  \"base\": { \"widthX\": 6.00 }\n}\n");
        assertEquals(new String(ModelPatches.canonical(a, List.of()), StandardCharsets.UTF_8),
                new String(ModelPatches.canonical(b, List.of()), StandardCharsets.UTF_8));
    }

    @Test
    void patchThatIsNoJsonIsBadInputWithItsLine(@TempDir Path dir) throws Exception {
        Path patch = dir.resolve("p.json");
        Files.writeString(patch, "{\n  \"loads\": {\n    \"wind\": { \"basicSpeed\": 30, }\n}\n");
        BadInputException e = assertThrows(BadInputException.class, () -> ModelPatches.readPatch(patch));
        assertEquals(3, e.problems().get(0).line());
    }
}
