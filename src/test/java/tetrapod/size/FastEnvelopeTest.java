package tetrapod.size;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import tetrapod.analysis.Analysis;
import tetrapod.analysis.AnalysisResult;
import tetrapod.check.Extreme;
import tetrapod.check.MemberEnvelope;
import tetrapod.common.ProgressListener;

/**
 * The proof that checking only the cases that can govern loses nothing: on every example model
 * (X, K and single bracing; truss and frame idealisation; EN 1993 and ASCE 10) each member's
 * envelope equals, to the last bit, the one the full sweep of {@code Analysis.run} finds by
 * checking every member at every case: governing utilisation, mode, clause, case and azimuth,
 * largest tension and compression.
 */
class FastEnvelopeTest {

    static Stream<Path> models() throws IOException {
        try (Stream<Path> files = Files.list(Path.of("models"))) {
            return files.filter(p -> p.toString().endsWith(".json")).sorted().toList().stream();
        }
    }

    /** Frame idealisation (beam-column legs) with crossing diagonals, by each method. Invented test data. */
    static Stream<String> frameTowers() {
        String tower = """
            { "name": "frame test tower %1$s",
              "idealisation": "frame",
              "base": { "widthX": 5.0, "widthY": 4.0 },
              "segments": [
                { "height": 9.0, "topWidthX": 3.5, "topWidthY": 3.0, "panels": 3, "bracing": "x", "horizontals": "ends",
                  "redundants": 1,
                  "sections": { "leg": "L100x10", "diagonal": "L60x6", "horizontal": "L60x6", "redundant": "L45x4.5",
                                "plan": "L50x5" } },
                { "height": 6.0, "topWidthX": 2.0, "topWidthY": 2.0, "panels": 2, "bracing": "k", "horizontals": "all",
                  "sections": { "leg": "L80x8", "diagonal": "L50x5", "horizontal": "L50x5" } } ],
              "supports": "fixed",
              "planBracingLevels": [9.0],
              "loads": { "wind": { "method": "uniform", "pressure": 1.1, "forceCoefficient": 2.6 },
                         "ancillaries": [ { "kind": "point", "name": "lamp", "height": 15.0, "weight": 3.0, "area": 1.5,
                                            "forceCoefficient": 1.2, "face": "+x" } ],
                         "sweepStep": 15.0 },
              "checks": { "method": "%1$s" } }
            """;
        return Stream.of("en1993", "asce10").map(tower::formatted);
    }

    @ParameterizedTest(name = "{index}")
    @MethodSource("frameTowers")
    void sameEnvelopeOnFrameTowersWithCrossingDiagonals(String json) throws Exception {
        sameEnvelope(TestModels.parse(json));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("models")
    void sameEnvelopeAsTheFullSweepWithFewerChecks(Path file) throws Exception {
        sameEnvelope(TestModels.read(file));
    }

    private static void sameEnvelope(SizingModel model) throws Exception {
        AnalysisResult full = Analysis.run(model.tower(), model.loads(), model.spec().checks(), ProgressListener.NONE);
        Evaluation fast = FastEnvelope.evaluate(model.tower(), model.loads(), model.spec().checks());

        List<MemberEnvelope> expected = full.members();
        assertEquals(expected.size(), fast.envelopes().size());
        assertEquals(full.caseCount(), fast.caseCount());
        for (int m = 0; m < expected.size(); m++) {
            MemberEnvelope e = expected.get(m);
            MemberEnvelope f = fast.envelopes().get(m);
            String who = "member " + e.member();
            assertEquals(e.member(), f.member(), who);
            assertEquals(e.governing().utilisation(), f.governing().utilisation(), 0.0, who);
            assertEquals(e.governing(), f.governing(), who);
            same(e.governingWhere(), f.governingWhere(), who + " governing case");
            same(e.maxTension(), f.maxTension(), who + " tension");
            same(e.maxCompression(), f.maxCompression(), who + " compression");
        }
        long everyCheck = (long) expected.size() * full.caseCount();
        assertTrue(fast.checkCount() <= everyCheck, fast.checkCount() + " checks");
        if (full.caseCount() > 1 && model.tower().frame().idealisation() == tetrapod.model.Idealisation.TRUSS) {
            assertTrue(fast.checkCount() * 10 < everyCheck, "a truss needs far fewer checks: " + fast.checkCount()
                    + " of " + everyCheck);
        }
    }

    private static void same(Extreme expected, Extreme actual, String who) {
        assertEquals(expected.value(), actual.value(), 0.0, who);
        assertEquals(expected.caseId(), actual.caseId(), who);
        assertEquals(expected.azimuthDeg(), actual.azimuthDeg(), who);
    }
}
