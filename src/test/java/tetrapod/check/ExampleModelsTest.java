package tetrapod.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import tetrapod.generate.Tower;
import tetrapod.generate.TowerGenerator;
import tetrapod.io.SpecReader;
import tetrapod.model.Member;
import tetrapod.model.Role;
import tetrapod.model.spec.TowerSpec;
import tetrapod.section.SectionCatalogue;
import tetrapod.section.SteelGrades;

/**
 * Every example model can be checked: each member under tension and compression (with end
 * moments on legs), each footing under compression and uplift, and every result is a finite
 * utilisation with a clause. A smoke test over the real catalogue, grades and checks sections; the
 * values themselves are verified in the other tests.
 */
class ExampleModelsTest {

    static Stream<Path> models() throws IOException {
        try (Stream<Path> files = Files.list(Path.of("models"))) {
            return files.filter(p -> p.toString().endsWith(".json")).sorted().toList().stream();
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("models")
    void everyMemberAndFootingOfTheExamples(Path file) throws Exception {
        SectionCatalogue catalogue = SectionCatalogue.standard();
        TowerSpec spec = SpecReader.read(file, catalogue);
        Tower tower = TowerGenerator.generate(spec, catalogue.with(spec.userSections()), SteelGrades.fromSpec(spec.material()));
        MemberChecker checker = MemberChecker.of(tower, spec.checks());
        for (double sign : new double[] {1, -1}) {
            var results = checker.checkAll(id -> forces(tower, id, sign));
            assertEquals(tower.frame().members().size(), results.size());
            results.forEach(r -> assertTrue(r.utilisation() >= 0 && !r.governing().clause().isEmpty()));
        }
        if (spec.isExplicit()) {
            return; // a published benchmark frame, given without footings
        }
        assertTrue(spec.checks().foundationSpec().isPresent(), "the generated examples give a foundation");
        FoundationCheck footing = new FoundationCheck(spec.checks().foundation(), spec.checks().partialFactors());
        for (LegBaseForces f : new LegBaseForces[] {new LegBaseForces(400e3, 30e3), new LegBaseForces(-250e3, 30e3)}) {
            FoundationResult r = footing.check(f, ReactionLevel.SERVICE);
            assertTrue(r.governing().utilisation() >= 0, "bearing and sliding always take service reactions");
        }
    }

    private static MemberForces forces(Tower tower, int id, double sign) {
        Member m = tower.frame().members().stream().filter(x -> x.id() == id).findFirst().orElseThrow();
        if (m.role() == Role.LEG && !m.axialOnly()) {
            return new MemberForces(sign * 80e3, -1.5e3, 1.0e3, 0.4e3, 0.2e3);
        }
        return MemberForces.axial(sign * 20e3);
    }
}
