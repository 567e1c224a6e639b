package tetrapod.load;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import tetrapod.generate.Tower;
import tetrapod.generate.TowerGenerator;
import tetrapod.io.SpecReader;
import tetrapod.model.NodeForce;
import tetrapod.model.spec.TowerSpec;
import tetrapod.section.SectionCatalogue;
import tetrapod.section.SteelGrades;

/** The example models' loads build, and their every case superposes from the load basis. */
class ExampleModelLoadsTest {

    @ParameterizedTest
    @ValueSource(strings = {"ridge-lookout-square.json", "harbour-beacon-rectangular.json", "hilltop-relay-k.json"})
    void loadsBuildAndSuperpose(String file) throws Exception {
        TowerSpec spec = SpecReader.read(Path.of("models", file), SectionCatalogue.standard());
        Tower tower = TowerGenerator.generate(spec, SectionCatalogue.standard().with(spec.userSections()),
                SteelGrades.fromSpec(spec.material()));
        TowerLoads loads = TowerLoads.build(tower,
                tetrapod.analysis.ComputedStructuralFactor.resolve(spec, tower).spec().loads());
        assertTrue(loads.wind().isPresent());
        assertEquals(72, loads.azimuths().size());
        LoadBasis basis = loads.basis();
        for (CaseKey key : loads.caseKeys()) {
            if (key.azimuthDeg() != null && key.azimuthDeg() % 35 != 0) {
                continue;   // every seventh azimuth (0, 35, 70, ...) of every combination
            }
            double[] w = basis.weights(key.combination(), key.azimuthDeg());
            Map<Integer, double[]> sum = new HashMap<>();
            for (int j = 0; j < basis.size(); j++) {
                for (NodeForce l : basis.components().get(j).loads()) {
                    double[] f = sum.computeIfAbsent(l.node(), n -> new double[3]);
                    f[0] += w[j] * l.fx();
                    f[1] += w[j] * l.fy();
                    f[2] += w[j] * l.fz();
                }
            }
            for (NodeForce l : loads.loadCase(key).loads()) {
                double[] f = sum.get(l.node());
                assertEquals(l.fx(), f[0], 1e-7, key.id());
                assertEquals(l.fy(), f[1], 1e-7, key.id());
                assertEquals(l.fz(), f[2], 1e-7, key.id());
            }
        }
    }
}
