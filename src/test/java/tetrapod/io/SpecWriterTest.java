package tetrapod.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import tetrapod.common.BadInputException;
import tetrapod.model.Idealisation;
import tetrapod.model.Restraint;
import tetrapod.model.Role;
import tetrapod.model.spec.BaseSpec;
import tetrapod.model.spec.Bracing;
import tetrapod.model.spec.ExplicitFrameSpec;
import tetrapod.model.spec.Horizontals;
import tetrapod.model.spec.LoadsSpec;
import tetrapod.model.spec.MaterialSpec;
import tetrapod.model.spec.SegmentSpec;
import tetrapod.model.spec.SupportType;
import tetrapod.model.spec.TowerSpec;

/** Writing specs: read → write → read gives an equal spec; output is stable and in the file format. */
class SpecWriterTest {

    private static final FixtureSections CATALOGUE = new FixtureSections();

    static Stream<Path> everyModel() throws IOException {
        Stream<Path> models;
        try (Stream<Path> listed = Files.list(Path.of("models"))) {
            models = listed.filter(p -> p.toString().endsWith(".json")).sorted().toList().stream();
        }
        return Stream.concat(models, Stream.of(
                Path.of("src/test/resources/good-specs/every-option-generated.json"),
                Path.of("src/test/resources/good-specs/explicit-frame.json")));
    }

    /** {@link #everyModel()} for callers that cannot declare IOException. */
    static Stream<Path> everyModelUnchecked() {
        try {
            return everyModel();
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("everyModel")
    void readWriteReadGivesAnEqualSpec(Path file) throws BadInputException {
        TowerSpec first = SpecReader.read(file, CATALOGUE);
        String written = SpecWriter.write(first);
        TowerSpec second = SpecReader.read(written, CATALOGUE);
        assertEquals(first, second);
        assertEquals(written, SpecWriter.write(second), "writing is a fixed point after one round");
    }

    @Test
    void atLeastThreeExampleModelsTakePart() throws IOException {
        assertTrue(everyModel().count() >= 5);
    }

    @Test
    void smallSpecIsWrittenInTheFileFormatWithDefaultsOut() {
        SegmentSpec segment = new SegmentSpec(6.0, 2.0, 1.5, 2, List.of(), Bracing.SINGLE, Horizontals.ALL, true, 0,
                Map.of(Role.DIAGONAL, "L50x5", Role.LEG, "L90x9", Role.HORIZONTAL, "L50x5"));
        TowerSpec spec = new TowerSpec("Mini", "", Idealisation.TRUSS, new BaseSpec(3.0, 2.5), List.of(segment),
                MaterialSpec.grade("S355"), SupportType.PINNED, 0.1, List.of(), Map.of(), null, LoadsSpec.NONE);
        String expected = """
                {
                  "name": "Mini",
                  "description": "",
                  "idealisation": "truss",
                  "basis": "en",
                  "base": { "widthX": 3.0, "widthY": 2.5 },
                  "segments": [
                    {
                      "height": 6.0,
                      "topWidthX": 2.0,
                      "topWidthY": 1.5,
                      "panels": 2,
                      "bracing": "single",
                      "horizontals": "all",
                      "crossingConnected": true,
                      "redundants": 0,
                      "sections": { "leg": "L90x9", "diagonal": "L50x5", "horizontal": "L50x5" }
                    }
                  ],
                  "material": "S355",
                  "supports": "pinned",
                  "connectionAllowance": 0.1,
                  "planBracingLevels": [],
                  "checks": { "method": "en1993" }
                }
                """;
        assertEquals(expected, SpecWriter.write(spec));
    }

    @Test
    void explicitFrameHasNoTowerKeysAndSupportsByTypeWherePossible() throws BadInputException {
        ExplicitFrameSpec frame = new ExplicitFrameSpec(
                List.of(new ExplicitFrameSpec.NodeSpec(1, 0, 0, 0), new ExplicitFrameSpec.NodeSpec(2, 0, 0, 2.5)),
                List.of(new ExplicitFrameSpec.MemberSpec(1, 1, 2, "L60x6", Role.GENERAL, false, null)),
                List.of(new ExplicitFrameSpec.SupportSpec(1, Restraint.FIXED),
                        new ExplicitFrameSpec.SupportSpec(2, new Restraint(true, true, false, false, false, true))));
        TowerSpec spec = new TowerSpec("Post", "", Idealisation.FRAME, null, List.of(), MaterialSpec.grade("S235"),
                SupportType.PINNED, 0.1, List.of(), Map.of(), frame,
                new LoadsSpec(List.of(new LoadsSpec.NodalLoadSpec(2, 1.0, 0, 0, 0, 0, 0))));
        String text = SpecWriter.write(spec);
        assertFalse(text.contains("\"base\""));
        assertFalse(text.contains("\"segments\""));
        assertFalse(text.contains("\"planBracingLevels\""));
        assertTrue(text.contains("{ \"node\": 1, \"type\": \"fixed\" }"), text);
        assertTrue(text.contains("{ \"node\": 2, \"restraint\": [1, 1, 0, 0, 0, 1] }"), text);
        assertTrue(text.contains("{ \"node\": 2, \"F\": [1.0, 0.0, 0.0] }"), text);
        assertEquals(spec, SpecReader.read(text, CATALOGUE));
    }

    @Test
    void writesAFileAtomically(@TempDir Path dir) throws Exception {
        TowerSpec spec = SpecReader.read(Path.of("models/hilltop-relay-k.json"), CATALOGUE);
        Path file = dir.resolve("copy.json");
        SpecWriter.write(file, spec);
        assertEquals(SpecWriter.write(spec), Files.readString(file));
        assertEquals(spec, SpecReader.read(file, CATALOGUE));
        try (Stream<Path> left = Files.list(dir)) {
            assertEquals(List.of(file), left.toList(), "no temporary file left behind");
        }
    }
}
