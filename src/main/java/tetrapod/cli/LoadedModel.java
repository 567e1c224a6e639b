package tetrapod.cli;

import java.nio.file.Path;
import java.util.Optional;
import tetrapod.analysis.ServiceabilityPlan;
import tetrapod.common.BadInputException;
import tetrapod.generate.Tower;
import tetrapod.generate.TowerGenerator;
import tetrapod.io.ProblemLines;
import tetrapod.io.SpecReader;
import tetrapod.load.TowerLoads;
import tetrapod.model.Material;
import tetrapod.model.spec.TowerSpec;
import tetrapod.section.SectionCatalogue;
import tetrapod.section.SteelGrades;

/**
 * A model file read, its sections and material resolved, its tower built, its loads formed and its
 * serviceability sweep planned (empty for an explicit frame).
 */
record LoadedModel(Path file, TowerSpec spec, SectionCatalogue sections, Material material, Tower tower,
                   TowerLoads loads, Optional<ServiceabilityPlan> serviceability) {

    static LoadedModel read(Path file) throws BadInputException {
        TowerSpec spec;
        try {
            spec = SpecReader.read(file, SectionCatalogue.standard());
        } catch (BadInputException e) {
            throw GeometryFirst.withGeometry(file, e);
        }
        SectionCatalogue sections = SectionCatalogue.standard().with(spec.userSections());
        Material material = SteelGrades.fromSpec(spec.material());
        try {
            Tower tower = TowerGenerator.generate(spec, sections, material);
            TowerLoads loads = TowerLoads.build(tower, spec.loads());
            Optional<ServiceabilityPlan> serviceability = ServiceabilityPlan.of(tower, loads, spec.serviceability());
            return new LoadedModel(file, spec, sections, material, tower, loads, serviceability);
        } catch (BadInputException e) {
            // found after reading: the paths are known, the lines are looked up in the file
            throw ProblemLines.located(file, e);
        }
    }
}
