package tetrapod.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tetrapod.view.NodeVector;
import tetrapod.view.ViewCase;
import tetrapod.view.ViewData;

/**
 * The picture of analyze and the report (the envelope) shows each leg base's reaction in the case
 * of its largest compression: the vertical component is that leg's largest compression in
 * results.json (read back with Jackson), and the horizontal one is the shear of the same case.
 */
class EnvelopeReactionsTest {

    private static final double TOLERANCE_N = 1e-6;

    @Test
    void theEnvelopeShowsEachLegsReactionInItsCaseOfLargestCompression(@TempDir Path dir) throws Exception {
        Path model = Path.of("models/ridge-lookout-square.json");
        CliRun run = CliRun.of("analyze", model.toString(), "-o", dir.toString(), "--quiet");
        assertEquals(ExitCode.DONE, run.exitCode(), run.err());
        JsonNode results = new ObjectMapper().readTree(dir.resolve("results.json").toFile());
        Map<String, JsonNode> cases = new HashMap<>();
        results.get("cases").forEach(c -> cases.put(c.get("id").asText(), c));

        ViewData data = ViewInputs.data(LoadedModel.read(model), OptionalDouble.empty(), true);
        ViewCase envelope = data.cases().get(0);
        assertEquals(results.get("legBases").size(), envelope.reactions().size(), "one reaction per leg base");
        Map<Integer, NodeVector> drawn = new HashMap<>();
        envelope.reactions().forEach(r -> drawn.put(r.node(), r));
        for (JsonNode leg : results.get("legBases")) {
            int node = leg.get("node").asInt();
            NodeVector r = drawn.get(node);
            assertTrue(r != null, "no reaction drawn at leg base " + node);
            assertEquals(leg.get("maxCompression").get("value").asDouble(), r.vector().z(), TOLERANCE_N, "Fz " + node);
            JsonNode solved = cases.get(leg.get("maxCompression").get("case").asText());
            for (JsonNode reaction : solved.get("reactions")) {
                if (reaction.get("node").asInt() == node) {
                    assertEquals(reaction.get("F").get(0).asDouble(), r.vector().x(), TOLERANCE_N, "Fx " + node);
                    assertEquals(reaction.get("F").get(1).asDouble(), r.vector().y(), TOLERANCE_N, "Fy " + node);
                }
            }
        }
    }
}
