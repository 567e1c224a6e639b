package tetrapod.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import tetrapod.generate.Tower;
import tetrapod.generate.TowerGenerator;
import tetrapod.io.SpecReader;
import tetrapod.model.Member;
import tetrapod.model.spec.TowerSpec;
import tetrapod.section.SectionCatalogue;
import tetrapod.section.SteelGrades;

/**
 * The numbers of {@link MemberUtilisation} against the checks in full of {@link MemberChecker}: an
 * invariant of the two paths through the same method, over every member of the examples (and the
 * examples checked by the other method and as frames), random forces and random partner states.
 * The utilisation must agree to the last bit, since the sweep picks the governing case from the
 * numbers and writes the checks in full; the bounds must hold for every case they stand for.
 * The values of the checks themselves are verified against the standards in the other tests.
 */
class MemberUtilisationTest {

    private static final int FORCES_PER_MEMBER = 40;

    static Stream<String> models() {
        return Stream.of("ridge-lookout-square", "hilltop-relay-k", "harbour-beacon-rectangular",
                "benchmark-25-bar-space-truss")
                .flatMap(m -> Stream.of(m, m + " as frame", m + " other method"));
    }

    /** An example, as a frame (every member with bending) or with the other family's member checks. */
    static Tower tower(String name, SectionCatalogue catalogue, TowerSpec[] specOut) throws Exception {
        String file = name.split(" ")[0];
        String original = Files.readString(Path.of("models", file + ".json"));
        String text = original;
        if (name.endsWith("as frame")) {
            text = text.replace("\"idealisation\": \"continuous-legs\"", "\"idealisation\": \"frame\"")
                    .replace("\"idealisation\": \"truss\"", "\"idealisation\": \"frame\"");
        }
        if (name.endsWith("other method")) {
            text = text.contains("\"en1993\"") ? text.replace("\"en1993\"", "\"asce10\"")
                    : text.replace("\"asce10\"", "\"en1993\"");
            text = text.replaceFirst("\\{", "{ \"mixedBasis\": true,");
        }
        if (!name.equals(file)) {
            assertTrue(!text.equals(original), name + ": the variant differs from the example");
        }
        TowerSpec spec = SpecReader.read(text, catalogue);
        specOut[0] = spec;
        return TowerGenerator.generate(spec, catalogue.with(spec.userSections()), SteelGrades.fromSpec(spec.material()));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("models")
    void numbersAgreeWithTheChecksInFullAndBoundThem(String name) throws Exception {
        SectionCatalogue catalogue = SectionCatalogue.standard();
        TowerSpec[] spec = new TowerSpec[1];
        Tower tower = tower(name, catalogue, spec);
        MemberChecker checker = MemberChecker.of(tower, spec[0].checks());
        int n = tower.frame().members().size();
        Random random = new Random(name.hashCode());
        double[] axial = new double[n];
        java.util.Map<Integer, Integer> index = new java.util.HashMap<>();
        for (int m = 0; m < n; m++) {
            index.put(tower.frame().members().get(m).id(), m);
        }
        for (int m = 0; m < n; m++) {
            Member member = tower.frame().members().get(m);
            MemberUtilisation u = checker.utilisation(m);
            double scale = member.section().area() * 355e6;
            for (int k = 0; k < FORCES_PER_MEMBER; k++) {
                for (int i = 0; i < n; i++) {
                    axial[i] = random.nextInt(5) == 0 ? 0.0 : (random.nextDouble() - 0.5) * scale;
                }
                axial[m] = k == 0 ? 0.0 : k == 1 ? -0.0 : (random.nextDouble() - 0.5) * 2 * scale;
                boolean bending = !member.axialOnly() && k % 4 != 0;
                double moment = 0.02 * scale;
                double myI = bending ? (random.nextDouble() - 0.5) * moment : 0;
                double myJ = bending ? (random.nextDouble() - 0.5) * moment : 0;
                double mzI = bending && k % 3 != 0 ? (random.nextDouble() - 0.5) * moment : 0;
                double mzJ = bending ? (random.nextDouble() - 0.5) * moment : 0;
                MemberForces own = new MemberForces(axial[m], myI, myJ, mzI, mzJ);
                double[] row = axial.clone();
                int state = u.state(i -> row[i]);
                double design = u.designAxial(own.axial(), i -> row[i]);
                MemberCheckResult full = checker.check(member.id(), own,
                        id -> row[index.get(id)]);
                double fast = u.of(state, design, myI, myJ, mzI, mzJ);
                assertEquals(Double.doubleToLongBits(full.utilisation()), Double.doubleToLongBits(fast),
                        () -> name + " member " + member.id() + ": checks in full " + full.utilisation() + ", numbers " + fast);
                double largestY = Math.max(Math.abs(myI), Math.abs(myJ));
                double largestZ = Math.max(Math.abs(mzI), Math.abs(mzJ));
                assertTrue(u.atMost(state, design, largestY, largestZ) >= fast, name + " member " + member.id());
                assertTrue(u.atMost(state, design, 1.5 * largestY, 1.5 * largestZ) >= fast, name + " member " + member.id());
                assertTrue(u.atLeast(state, design) <= fast, name + " member " + member.id());
            }
        }
    }
}
