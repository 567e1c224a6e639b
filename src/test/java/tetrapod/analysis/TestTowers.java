package tetrapod.analysis;

import tetrapod.common.BadInputException;
import tetrapod.common.ProgressListener;
import tetrapod.common.UnstableStructureException;
import tetrapod.generate.Tower;
import tetrapod.generate.TowerGenerator;
import tetrapod.io.SpecReader;
import tetrapod.load.TowerLoads;
import tetrapod.model.spec.TowerSpec;
import tetrapod.section.SectionCatalogue;
import tetrapod.section.SteelGrades;

/** Towers analysed from model-file text, for the analysis tests. Invented test data. */
final class TestTowers {

    private TestTowers() { }

    /** A 20 m square X-braced tower, 5 m to 2 m, with the given {@code loads} object (JSON text). */
    static String squareTower(String loads) {
        return """
            { "name": "square test tower",
              "base": { "widthX": 5.0, "widthY": 5.0 },
              "segments": [ { "height": 20.0, "topWidthX": 2.0, "topWidthY": 2.0, "panels": 5, "bracing": "x",
                  "horizontals": "all",
                  "sections": { "leg": "L120x12", "diagonal": "L70x7", "horizontal": "L60x6" } } ],
              "loads": %s }
            """.formatted(loads);
    }

    /**
     * The one-panel hand tower (2 m square, 3 m high, X bracing, horizontals at the ends, sections
     * given by their properties, no connection allowance) under a uniform wind of {@code pressure}
     * kPa with the combinations "strength" 1.35 G + 1.5 W and "uplift" 1.0 G + 1.5 W, with
     * {@code checks} as its checks object ("" for none). Invented test data, worked by hand in the tests.
     */
    static String handTower(double pressure, String checks) {
        return """
            { "name": "one-panel hand tower",
              "base": { "widthX": 2.0, "widthY": 2.0 },
              "segments": [ { "height": 3.0, "panels": 1, "bracing": "x", "horizontals": "ends",
                  "sections": { "leg": "LEG", "diagonal": "DIAG", "horizontal": "HOR" } } ],
              "connectionAllowance": 0.0,
              "userSections": {
                "LEG": { "properties": { "A_cm2": 19.2, "Iy_cm4": 177.0, "Iz_cm4": 177.0, "Iv_cm4": 73.0, "J_cm4": 6.4,
                                         "width_mm": 100, "flatSided": true, "mass_kg_per_m": 10.0 } },
                "DIAG": { "properties": { "A_cm2": 9.4, "Iy_cm4": 42.3, "Iz_cm4": 42.3, "Iv_cm4": 17.6, "J_cm4": 1.6,
                                          "width_mm": 70, "flatSided": true, "mass_kg_per_m": 5.0 } },
                "HOR": { "properties": { "A_cm2": 6.9, "Iy_cm4": 22.8, "Iz_cm4": 22.8, "Iv_cm4": 9.4, "J_cm4": 0.9,
                                         "width_mm": 60, "flatSided": true, "mass_kg_per_m": 4.0 } } },
              "loads": { "wind": { "method": "uniform", "pressure": %s, "forceCoefficient": 1.0 },
                         "combinations": [ { "name": "strength", "dead": 1.35, "wind": 1.5 },
                                           { "name": "uplift", "dead": 1.0, "wind": 1.5 } ],
                         "sweepStep": 5.0 }%s }
            """.formatted(pressure, checks.isEmpty() ? "" : ",\n  \"checks\": " + checks);
    }

    static Analysed analyse(String json) throws BadInputException, UnstableStructureException {
        SectionCatalogue catalogue = SectionCatalogue.standard();
        TowerSpec spec = SpecReader.read(json, catalogue);
        Tower tower = TowerGenerator.generate(spec, catalogue.with(spec.userSections()),
                SteelGrades.fromSpec(spec.material()));
        spec = ComputedStructuralFactor.resolve(spec, tower).spec();
        TowerLoads loads = TowerLoads.build(tower, spec.loads());
        return new Analysed(spec, loads, Analysis.run(tower, loads, spec.checks(), ProgressListener.NONE));
    }

    record Analysed(TowerSpec spec, TowerLoads loads, AnalysisResult result) { }
}
