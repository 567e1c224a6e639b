package tetrapod.size;

import java.nio.file.Path;
import tetrapod.common.BadInputException;
import tetrapod.io.SpecReader;
import tetrapod.section.SectionCatalogue;

/** Models for the sizing tests, read from files or from model-file text. Invented test data. */
final class TestModels {

    private TestModels() { }

    static SizingModel read(Path file) throws BadInputException, tetrapod.common.UnstableStructureException {
        return SizingModel.of(SpecReader.read(file, SectionCatalogue.standard()));
    }

    static SizingModel parse(String json) throws BadInputException, tetrapod.common.UnstableStructureException {
        return SizingModel.of(SpecReader.read(json, SectionCatalogue.standard()));
    }
}
