package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The bundled generated examples read as designs (issue 12 "Done when"), from their results.json:
 * utilisation comes from strength only, every requirement is met, some role works between 0.5 and
 * 1.0, and the largest utilisation changes with the wind's azimuth.
 */
class ExampleDesignsTest {

    private static final Set<String> REQUIREMENTS = Set.of("slendernessLimit", "boltSpacing", "widthToThickness");

    static Stream<Path> generated() throws IOException {
        return ExampleRuns.models().filter(p -> !p.getFileName().toString().startsWith("benchmark"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("generated")
    void theExampleReadsAsADesign(Path model) throws IOException {
        JsonNode r = ExampleRuns.results(model);
        Map<Integer, String> roles = new HashMap<>();
        r.get("model").get("members").forEach(m -> roles.put(m.get("id").asInt(), m.get("role").asText()));
        Map<String, Double> byRole = new HashMap<>();
        for (JsonNode c : r.get("checks")) {
            assertTrue(!REQUIREMENTS.contains(c.get("mode").asText()), "member " + c.get("member") + " governed by "
                    + c.get("mode"));
            byRole.merge(roles.get(c.get("member").asInt()), c.get("utilisation").asDouble(), Math::max);
        }
        assertTrue(byRole.values().stream().allMatch(u -> u <= 1.0), "strength: " + byRole);
        assertTrue(byRole.values().stream().anyMatch(u -> u >= 0.5), "some role between 0.5 and 1.0: " + byRole);
        for (JsonNode q : r.get("requirements")) {
            assertTrue(q.get("met").asBoolean(), "member " + q.get("member") + " breaks " + q.get("rule"));
        }
        double lo = Double.MAX_VALUE;
        double hi = 0;
        for (JsonNode u : r.get("sweep").get("maxUtilisation").get("utilisation")) {
            lo = Math.min(lo, u.asDouble());
            hi = Math.max(hi, u.asDouble());
        }
        assertTrue(hi - lo > 0.02 * hi, "the largest utilisation against azimuth varies: " + lo + " to " + hi);
    }
}
