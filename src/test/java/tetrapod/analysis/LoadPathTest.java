package tetrapod.analysis;

import tetrapod.solve.StructuralModel;
import tetrapod.solve.Solver;
import tetrapod.solve.FactoredSystem;
import tetrapod.load.CaseKey;
import java.util.List;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import tetrapod.common.UnstableStructureException;
import tetrapod.model.Node;
import tetrapod.model.NodeForce;
import tetrapod.model.Support;
import tetrapod.solve.AutoRestraint;

/**
 * Every load reaches the supports (issue 11): a tower whose single diagonals leave its leg nodes
 * braced in one face only. Pin-jointed, the wind on those nodes has nowhere to go and the analysis
 * must stop; with continuous legs or a frame the legs carry it and the base forces match statics.
 */
class LoadPathTest {

    /**
     * The tower: 20 m square, one segment, single diagonals, horizontals at the ends, EN
     * wind (src/test/resources/load-path), in the given idealisation, with {@code extra} top-level keys.
     */
    private static String singleDiagonalTower(String idealisation, String extra) throws java.io.IOException {
        String json = java.nio.file.Files.readString(java.nio.file.Path.of(
                "src/test/resources/load-path/one-face-braced-truss.json"));
        return json.replace("\"idealisation\": \"truss\",", "\"idealisation\": \"" + idealisation + "\", " + extra);
    }

    @Test
    void pinJointedTheWindOnOneFaceBracedLegNodesStopsTheAnalysisNamingTheNodeAndTheFix() {
        UnstableStructureException e = assertThrows(UnstableStructureException.class,
                () -> TestTowers.analyse(singleDiagonalTower("truss", "")));
        String m = e.getMessage();
        assertTrue(m.matches("(?s).*in case '[^']+', [0-9.]+ kN of load at node \\d+ acts along .*"), m);
        assertTrue(m.contains("horizontals") && m.contains("plan bracing") && m.contains("continuous-legs"), m);
        assertEquals(1, e.freeDofs().size());
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"continuous-legs", "frame"})
    void withBendingLegsTheBaseForcesAreStaticsOfTheWholeLoad(String idealisation) throws Exception {
        TestTowers.Analysed a = TestTowers.analyse(singleDiagonalTower(idealisation, ""));
        SolvedCase diagonal = a.result().cases().stream()
                .filter(c -> c.azimuthDeg() != null && c.azimuthDeg() == 45.0 && c.combination().startsWith("1.1G"))
                .findFirst().orElseThrow();
        // Statics of the applied loads alone, about the base centre (0, 0, 0): N = −ΣFz, M = |Σ r × F|
        // (horizontal part); the hand method puts M/d on the leeward leg of the base diagonal d = 4√2 m,
        // exact here by the symmetry of a square tower about the wind's diagonal.
        Map<Integer, Node> nodes = new HashMap<>();
        a.result().tower().frame().nodes().forEach(n -> nodes.put(n.id(), n));
        double n = 0;
        double mx = 0;
        double my = 0;
        for (NodeForce f : diagonal.solution().loads().loads()) {
            Node at = nodes.get(f.node());
            n -= f.fz();
            mx += at.y() * f.fz() - at.z() * f.fy() + f.mx();
            my += at.z() * f.fx() - at.x() * f.fz() + f.my();
        }
        double d = 4.0 * Math.sqrt(2);
        double leeward = n / 4 + Math.hypot(mx, my) / d;
        double windward = n / 4 - Math.hypot(mx, my) / d;
        double largest = Double.NEGATIVE_INFINITY;
        double smallest = Double.POSITIVE_INFINITY;
        double sumFz = 0;
        for (Support s : a.result().tower().frame().supports()) {
            double fz = diagonal.solution().reaction(s.node()).fz();
            largest = Math.max(largest, fz);
            smallest = Math.min(smallest, fz);
            sumFz += fz;
        }
        assertEquals(leeward, largest, 0.05 * leeward, "leeward leg: N/4 + M/d within 5 %");
        assertEquals(windward, smallest, 0.05 * Math.abs(windward), "windward leg: N/4 − M/d within 5 %");
        assertEquals(n, sumFz, 1e-9 * n, "statics: ΣRz = −ΣFz, nothing lost");
        for (SolvedCase c : a.result().cases()) {
            assertTrue(c.solution().equilibriumError() <= 1e-9, c.id() + ": " + c.solution().equilibriumError());
        }
        for (AutoRestraintPeak p : a.result().autoRestraints()) {
            assertTrue(p.force() <= 1e-6 * n, p + " carries load");
        }
    }

    /**
     * The two idealisations with bending legs agree on the first-order leg base forces of every
     * case (each run then amplifies its wind by its own α_cr, EN 1993-1-1 5.2.2(5)B: 5.8 and 7.7 here).
     */
    @Test
    void continuousLegsAndFrameGiveTheSameLegBaseForcesWithinFivePercent() throws Exception {
        TestTowers.Analysed legs = TestTowers.analyse(singleDiagonalTower("continuous-legs", ""));
        TestTowers.Analysed frame = TestTowers.analyse(singleDiagonalTower("frame", ""));
        FactoredSystem legsSystem = Solver.factor(StructuralModel.of(legs.result().tower().frame()));
        FactoredSystem frameSystem = Solver.factor(StructuralModel.of(frame.result().tower().frame()));
        for (CaseKey key : legs.loads().caseKeys()) {
            if (key.azimuthDeg() == null || key.azimuthDeg() % 45 != 0) {
                continue;
            }
            List<NodeForce> r1 = Analysis.solveCase(legsSystem, legs.loads().loadCase(key, 1.0)).solution().reactions();
            List<NodeForce> r2 = Analysis.solveCase(frameSystem, frame.loads().loadCase(key, 1.0)).solution().reactions();
            for (int k = 0; k < r1.size(); k++) {
                assertEquals(r1.get(k).node(), r2.get(k).node());
                assertEquals(r1.get(k).fz(), r2.get(k).fz(), 0.05 * Math.abs(r1.get(k).fz()) + 1.0,
                        key.id() + " leg base " + r1.get(k).node() + " Fz");
            }
        }
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"continuous-legs", "frame"})
    void planBracingLosesNoWeight(String idealisation) throws Exception {
        // plan bracing at 10 m: its centre node is held across its diagonals by their continuity
        // (continuous-legs) or is a beam-column joint (frame); either way it is not restrained vertically
        String json = singleDiagonalTower(idealisation, "\"planBracingLevels\": [10.0],")
                .replace("\"horizontals\": \"ends\"", "\"horizontals\": \"all\"")
                .replace("\"horizontal\": \"L60x6\"", "\"horizontal\": \"L60x6\", \"plan\": \"L60x6\"");
        AnalysisResult r = TestTowers.analyse(json).result();
        assertTrue(r.model().autoRestraints().stream().noneMatch(a -> a.dof().equals("uz")),
                "no node is held vertically by an automatic restraint");
        for (SolvedCase c : r.cases()) {
            double applied = 0;
            for (NodeForce f : c.solution().loads().loads()) {
                applied -= f.fz();
            }
            double reacted = c.solution().reactions().stream().mapToDouble(NodeForce::fz).sum();
            assertEquals(applied, reacted, 1e-9 * applied, c.id() + ": statics, ΣRz = −ΣFz");
        }
        assertTrue(r.model().autoRestraints().stream().allMatch(AutoRestraint::isRotation),
                "with continuous legs or rigid joints, only rotations no member reaches are restrained");
    }
}
