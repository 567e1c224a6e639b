package tetrapod.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import tetrapod.check.Extreme;
import tetrapod.check.MemberEnvelope;
import tetrapod.model.Face;
import tetrapod.model.Member;
import tetrapod.model.Role;

/**
 * Where the wind governs a square tower with no ancillaries (issue 5, "governing azimuth"), with
 * EN 1993-3-1's incidence factor K_θ (en1991) and without it (uniform pressure).
 */
class GoverningAzimuthTest {

    private static final Set<Double> DIAGONAL_AZIMUTHS = Set.of(45.0, 135.0, 225.0, 315.0);

    private static String wind(String method) {
        String wind = method.equals("en1991")
                ? "{ \"method\": \"en1991\", \"basicSpeed\": 27.0, \"terrain\": \"II\" }"
                : "{ \"method\": \"uniform\", \"pressure\": 1.0, \"forceCoefficient\": 2.8 }";
        return "{ \"wind\": " + wind + ", \"sweepStep\": 5.0 }";
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"en1991", "uniform"})
    void legBaseExtremesOccurWithTheWindOnADiagonal(String method) throws Exception {
        AnalysisResult r = TestTowers.analyse(TestTowers.squareTower(wind(method))).result();
        for (LegBaseExtremes leg : r.legBases()) {
            // One leg takes M/d on a diagonal wind; two legs share M/(2b) > M/d... on a face-normal wind.
            assertTrue(DIAGONAL_AZIMUTHS.contains(leg.compression().azimuthDeg()),
                    "leg " + leg.node() + " compression governs at " + leg.compression().azimuthDeg());
            assertTrue(DIAGONAL_AZIMUTHS.contains(leg.uplift().azimuthDeg()),
                    "leg " + leg.node() + " uplift governs at " + leg.uplift().azimuthDeg());
        }
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"en1991", "uniform"})
    void sideFaceDiagonalsGovernWithTheWindNormalToAFace(String method) throws Exception {
        // Prismatic with single diagonals: each panel is statically determinate, so a face's diagonals
        // carry its share of the shear and nothing else. (Crossed diagonals also take compression
        // from the shortening of their legs, which moves their worst azimuth off the face normal.)
        AnalysisResult r = TestTowers.analyse(TestTowers.squareTower(wind(method))
                .replace("\"topWidthX\": 2.0, \"topWidthY\": 2.0", "\"topWidthX\": 5.0, \"topWidthY\": 5.0")
                .replace("\"bracing\": \"x\"", "\"bracing\": \"single\"")).result();
        List<Member> members = r.tower().frame().members();
        for (Face face : List.of(Face.X_PLUS, Face.X_MINUS, Face.Y_PLUS, Face.Y_MINUS)) {
            // The ±x faces lie in planes of constant x: they carry the shear of a wind along y, which
            // blows normal to the ±y faces, and the other way round.
            Set<Double> normal = face == Face.X_PLUS || face == Face.X_MINUS ? Set.of(90.0, 270.0) : Set.of(0.0, 180.0);
            MemberEnvelope worst = null;
            for (int m = 0; m < members.size(); m++) {
                Member member = members.get(m);
                if (member.role() == Role.DIAGONAL && member.face() == face && member.segment() == 1
                        && member.panel() == 1) {
                    MemberEnvelope e = r.members().get(m);
                    if (worst == null || e.maxCompression().value() > worst.maxCompression().value()) {
                        worst = e;
                    }
                }
            }
            Extreme where = worst.maxCompression();
            // With the wind normal to a face, each side face carries half the shear; at any other azimuth less.
            assertTrue(normal.contains(where.azimuthDeg()),
                    "face " + face.label() + ": its bottom diagonals govern at " + where.azimuthDeg());
        }
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"en1991", "uniform"})
    void theHandMethodAgreesWithTheAnalysisOnADiagonalWind(String method) throws Exception {
        AnalysisResult r = TestTowers.analyse(TestTowers.squareTower(wind(method))).result();
        int compared = 0;
        for (HandComparison h : r.hand()) {
            if (DIAGONAL_AZIMUTHS.contains(h.hand().azimuthDeg())) {
                // N/4 ± M/d: a symmetric square tower on a diagonal wind is the hand method's own case;
                // the difference is the little load the bracing shares with the side legs (issue 5: "within a few percent").
                assertEquals(0, h.compressionDifferencePct(), 3.0, h.combination() + " at " + h.hand().azimuthDeg());
                assertEquals(0, h.tensionDifferencePct(), 3.0, h.combination() + " at " + h.hand().azimuthDeg());
                compared++;
            }
        }
        assertTrue(compared >= 4);
    }
}
