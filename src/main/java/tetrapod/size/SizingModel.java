package tetrapod.size;

import java.nio.file.Path;
import tetrapod.analysis.ComputedStructuralFactor;
import tetrapod.common.BadInputException;
import tetrapod.common.UnstableStructureException;
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
    public static SizingModel of(TowerSpec spec) throws BadInputException, UnstableStructureException {
        SectionCatalogue catalogue = SectionCatalogue.standard().with(spec.userSections());
        Material material = SteelGrades.fromSpec(spec.material());
        return of(spec, catalogue, material);
    }

    /**
     * The spec stays as given; the loads use c_s·c_d computed for these sections when the wind
     * asks for it (analysis.ComputedStructuralFactor), so that each design is loaded as analyze
     * would load it.
     */
    static SizingModel of(TowerSpec spec, SectionCatalogue catalogue, Material material)
            throws BadInputException, UnstableStructureException {
        Tower tower = TowerGenerator.generate(spec, catalogue, material);
        TowerSpec loaded = ComputedStructuralFactor.resolve(spec, tower).spec();
        return new SizingModel(spec, catalogue, material, tower, TowerLoads.build(tower, loaded.loads()));
    }

    /** The same model with another spec (other sections), rebuilt. */
    SizingModel with(TowerSpec other) throws BadInputException, UnstableStructureException {
        return of(other, catalogue, material);
    }
}
