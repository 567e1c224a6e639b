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

    static Analysed analyse(String json) throws BadInputException, UnstableStructureException {
        SectionCatalogue catalogue = SectionCatalogue.standard();
        TowerSpec spec = SpecReader.read(json, catalogue);
        Tower tower = TowerGenerator.generate(spec, catalogue.with(spec.userSections()),
                SteelGrades.fromSpec(spec.material()));
        TowerLoads loads = TowerLoads.build(tower, spec.loads());
        return new Analysed(spec, loads, Analysis.run(tower, loads, spec.checks(), ProgressListener.NONE));
    }

    record Analysed(TowerSpec spec, TowerLoads loads, AnalysisResult result) { }
}
