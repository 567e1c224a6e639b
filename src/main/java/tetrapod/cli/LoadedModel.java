package tetrapod.cli;

import java.nio.file.Path;
import java.util.Optional;
import tetrapod.analysis.ComputedStructuralFactor;
import tetrapod.analysis.ServiceabilityPlan;
import tetrapod.common.BadInputException;
import tetrapod.common.UnstableStructureException;
import tetrapod.generate.Tower;
import tetrapod.generate.TowerGenerator;
import tetrapod.io.ProblemLines;
import tetrapod.io.SpecReader;
import tetrapod.load.TowerLoads;
import tetrapod.model.Material;
import tetrapod.model.spec.TowerSpec;
import tetrapod.model.spec.WindSpec;
import tetrapod.solve.FactoredSystem;
import tetrapod.solve.Solver;
import tetrapod.solve.StructuralModel;
import tetrapod.section.SectionCatalogue;
import tetrapod.section.SteelGrades;

/**
 * A model file read, its sections and material resolved, its tower built, its loads formed and its
 * serviceability sweep planned.
 *
 * @param spec           the model as read, with the wind's c_s·c_d or G filled in where it is computed
 * @param responseFactor the factor the wind uses, and the one computed from the tower when it was
 * @param serviceability the serviceability sweep (empty for an explicit frame)
 * @param factored       the tower's stiffness assembled and factorised when the response factor's modes
 *                       needed it (for analyze, which then reuses it); empty otherwise
 */
record LoadedModel(Path file, TowerSpec spec, SectionCatalogue sections, Material material, Tower tower,
                   TowerLoads loads, ComputedStructuralFactor.Resolved responseFactor,
                   Optional<ServiceabilityPlan> serviceability, Optional<FactoredSystem> factored) {

    /** The model ready to analyse: a wind without a given c_s·c_d (EN) or G (ASCE 7) gets one computed from the tower. */
    static LoadedModel read(Path file) throws BadInputException, UnstableStructureException {
        return load(file, true, false);
    }

    /**
     * As {@link #read(Path)}, with the response factor computed from the tower also when the model
     * gives one, so that analyze reports the computed value beside the user's.
     */
    static LoadedModel forAnalysis(Path file) throws BadInputException, UnstableStructureException {
        return load(file, true, true);
    }

    /**
     * The model checked without solving anything (validate, geometry): a response factor still to be
     * computed (c_s·c_d or G) stays so in the spec, and is taken as 1 for forming the loads only,
     * whose values are not used.
     */
    static LoadedModel checked(Path file) throws BadInputException {
        try {
            return load(file, false, false);
        } catch (UnstableStructureException e) {
            throw new IllegalStateException("nothing is solved when a model is only checked", e);
        }
    }

    private static LoadedModel load(Path file, boolean resolve, boolean alsoWhenGiven)
            throws BadInputException, UnstableStructureException {
        TowerSpec spec;
        try {
            spec = SpecReader.read(file, SectionCatalogue.standard());
        } catch (BadInputException e) {
            throw GeometryFirst.withGeometry(file, e);
        }
        try {
            SectionCatalogue sections = SectionCatalogue.standard().with(spec.userSections());
            Material material = SteelGrades.fromSpec(spec.material());
            Tower tower = TowerGenerator.generate(spec, sections, material);
            TowerSpec unit = unitFactor(spec);
            TowerLoads loads = TowerLoads.build(tower, unit.loads());
            WorkBudget.check(tower, loads);
            ComputedStructuralFactor.Resolved factor = new ComputedStructuralFactor.Resolved(spec, Optional.empty(),
                    unit == spec);
            FactoredSystem factored = null;
            if (resolve && (unit != spec || alsoWhenGiven)) {
                // analyze factorises the stiffness anyway: once, here, when the modes need it
                factored = alsoWhenGiven && tower.isGenerated() ? Solver.factor(StructuralModel.of(tower.frame())) : null;
                factor = ComputedStructuralFactor.resolve(spec, tower, loads, alsoWhenGiven, factored);
                if (factor.spec() != spec) {
                    spec = factor.spec();
                    loads = TowerLoads.build(tower, spec.loads());
                }
            }
            Optional<ServiceabilityPlan> serviceability = ServiceabilityPlan.of(tower, loads, spec.serviceability());
            return new LoadedModel(file, spec, sections, material, tower, loads, factor, serviceability,
                    Optional.ofNullable(factored));
        } catch (BadInputException e) {
            // found after reading: the paths are known, the lines are looked up in the file
            throw ProblemLines.located(file, e);
        }
    }

    /** The spec with a response factor still to be computed taken as 1. */
    private static TowerSpec unitFactor(TowerSpec spec) {
        if (spec.loads().wind() instanceof WindSpec.En1991 en && en.structuralFactorComputed()) {
            return spec.withLoads(spec.loads().withWind(en.withStructuralFactor(1.0)));
        }
        if (spec.loads().wind() instanceof WindSpec.Asce7 a && a.gustFactorComputed()) {
            return spec.withLoads(spec.loads().withWind(a.withGustFactor(1.0)));
        }
        return spec;
    }
}
