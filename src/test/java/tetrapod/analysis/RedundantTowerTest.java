package tetrapod.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Truss towers with redundants: pin-jointed, the redundant chains of a panel would sway as a
 * mechanism; the diagonals' bending continuity holds them, and the towers solve in equilibrium.
 */
class RedundantTowerTest {

    @ParameterizedTest(name = "redundants {0}, top width {1} m")
    @CsvSource({"1, 2.0", "2, 2.0", "2, 5.0", "1, 5.0"})
    void redundantBracedTrussTowersSolve(int redundants, double top) throws Exception {
        String spec = TestTowers.squareTower(
                "{ \"wind\": { \"method\": \"en1991\", \"basicSpeed\": 27.0, \"terrain\": \"II\" }, \"sweepStep\": 15.0 }")
                .replace("\"horizontals\": \"all\",", "\"horizontals\": \"ends\", \"redundants\": " + redundants + ",")
                .replace("\"horizontal\": \"L60x6\" }", "\"horizontal\": \"L60x6\", \"redundant\": \"L50x5\" }")
                .replace("\"topWidthX\": 2.0, \"topWidthY\": 2.0", "\"topWidthX\": " + top + ", \"topWidthY\": " + top);
        AnalysisResult r = TestTowers.analyse(spec).result();
        assertFalse(r.model().continuityNodes().isEmpty() && top != 5.0 && redundants == 1,
                "a tapered panel's redundant level misses the crossing: its diagonal nodes need continuity");
        for (SolvedCase c : r.cases()) {
            assertTrue(c.solution().equilibriumError() < 1e-9, c.id());
        }
        // Σ vertical reactions = Σ vertical loads in every reported case.
        SolvedCase first = r.cases().get(0);
        double loads = first.solution().loads().loads().stream().mapToDouble(l -> l.fz()).sum();
        double reactions = first.solution().reactions().stream().mapToDouble(f -> f.fz()).sum();
        assertEquals(-loads, reactions, 1e-9 * Math.abs(loads));
    }
}
