package tetrapod.size;

import java.nio.file.Path;
import tetrapod.common.BadInputException;
import tetrapod.generate.Tower;
import tetrapod.generate.TowerGenerator;
import tetrapod.load.TowerLoads;
import tetrapod.model.Material;
import tetrapod.model.spec.TowerSpec;
import tetrapod.section.SectionCatalogue;
import tetrapod.section.SteelGrades;

/**
 * A tower spec with what sizing needs to rebuild it: the catalogue (with the spec's user
 * sections), the material, and the tower and loads it gives.
 */
public record SizingModel(TowerSpec spec, SectionCatalogue catalogue, Material material, Tower tower,
                          TowerLoads loads) {

    /** Builds the tower and its loads from {@code spec}, looking sections up in the standard catalogue. */
    public static SizingModel of(TowerSpec spec) throws BadInputException {
        SectionCatalogue catalogue = SectionCatalogue.standard().with(spec.userSections());
        Material material = SteelGrades.fromSpec(spec.material());
        return of(spec, catalogue, material);
    }

    static SizingModel of(TowerSpec spec, SectionCatalogue catalogue, Material material) throws BadInputException {
        Tower tower = TowerGenerator.generate(spec, catalogue, material);
        return new SizingModel(spec, catalogue, material, tower, TowerLoads.build(tower, spec.loads()));
    }

    /** The same model with another spec (other sections), rebuilt. */
    SizingModel with(TowerSpec other) throws BadInputException {
        return of(other, catalogue, material);
    }
}
