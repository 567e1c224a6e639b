package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import tetrapod.analysis.Analysis;
import tetrapod.analysis.AnalysisResult;
import tetrapod.common.ProgressListener;
import tetrapod.io.JsonOutput;
import tetrapod.io.PlainJson;
import tetrapod.report.ResultsDocument;

/**
 * analyze makes its CSVs and report from the results in memory (issue 15): what it uses must be
 * exactly what 'tetrapod report' reads back from results.json, value for value and type for type
 * (Jackson's reading of the written text is the reference).
 */
class InMemoryResultsTest {

    @ParameterizedTest
    @ValueSource(strings = {"models/ridge-lookout-square.json", "models/benchmark-25-bar-space-truss.json"})
    void theDocumentInMemoryEqualsTheFileReadBack(String model) throws Exception {
        LoadedModel loaded = LoadedModel.read(Path.of(model));
        AnalysisResult result = Analysis.run(loaded.tower(), loaded.loads(), loaded.spec().checks(), 6,
                ProgressListener.NONE);
        Map<String, Object> doc = ResultsDocument.build(loaded.spec(), result, List.of(),
                new ResultsDocument.Source("m.json", "0".repeat(64), "test"));
        assertEquals(PlainJson.parse(JsonOutput.toJson(doc)), JsonOutput.plain(doc));
    }

    @Test
    void everyKindOfValueComesBackAsTheReaderGivesIt() throws Exception {
        Map<String, Object> value = new LinkedHashMap<>();
        value.put("whole", 7);
        value.put("long", 1L << 40);
        value.put("huge", BigInteger.TEN.pow(30));
        value.put("minInt", Integer.MIN_VALUE);
        value.put("beyondInt", Integer.MAX_VALUE + 1L);
        value.put("double", 0.1 + 0.2);
        value.put("negativeZero", -0.0);
        value.put("tiny", 4.9e-324);
        value.put("float", 0.1f);
        value.put("decimalWhole", new BigDecimal("12"));
        value.put("decimal", new BigDecimal("1.25"));
        value.put("decimalExponent", new BigDecimal("1E+3"));
        value.put("array", new double[] {1.5, 2.0});
        value.put("ints", new int[] {1, -2});
        value.put("sorted", new TreeMap<>(Map.of("b", 1, "a", true)));
        value.put("unordered", Map.of("z", "last", "y", "first"));
        value.put("nothing", null);
        value.put("nested", List.of(List.of(1, 2.5), Map.of()));
        assertEquals(PlainJson.parse(JsonOutput.toJson(value)), JsonOutput.plain(value));
        assertEquals(List.of("y", "z"), List.copyOf(((Map<?, ?>) ((Map<?, ?>) JsonOutput.plain(value)).get("unordered"))
                .keySet()));
    }

    @Test
    void whatCannotBeWrittenIsRefusedAlike() {
        assertThrows(IllegalArgumentException.class, () -> JsonOutput.plain(Map.of("x", Double.NaN)));
        assertThrows(IllegalArgumentException.class, () -> JsonOutput.toJson(Map.of("x", Double.NaN)));
    }
}
