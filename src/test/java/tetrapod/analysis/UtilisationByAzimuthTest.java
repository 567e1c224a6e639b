package tetrapod.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import tetrapod.check.MemberEnvelope;
import tetrapod.common.ProgressListener;
import tetrapod.generate.Tower;
import tetrapod.generate.TowerGenerator;
import tetrapod.io.SpecReader;
import tetrapod.load.TowerLoads;
import tetrapod.model.spec.TowerSpec;
import tetrapod.section.SectionCatalogue;
import tetrapod.section.SteelGrades;

/**
 * The largest member utilisation at each azimuth agrees with the members' own envelopes: each
 * member's governing utilisation is reached at its governing azimuth, and nothing exceeds the
 * largest envelope.
 */
class UtilisationByAzimuthTest {

    @Test
    void thePerAzimuthMaximumAgreesWithEveryMembersEnvelope() throws Exception {
        TowerSpec spec = SpecReader.read(Path.of("models/harbour-beacon-rectangular.json"), SectionCatalogue.standard());
        Tower tower = TowerGenerator.generate(spec, SectionCatalogue.standard().with(spec.userSections()),
                SteelGrades.fromSpec(spec.material()));
        TowerLoads loads = TowerLoads.build(tower, ComputedStructuralFactor.resolve(spec, tower).spec().loads());
        AnalysisResult result = Analysis.run(tower, loads, spec.checks(), ProgressListener.NONE);

        List<AzimuthUtilisation> rows = result.utilisationByAzimuth();
        assertEquals(loads.azimuths(), rows.stream().map(AzimuthUtilisation::azimuthDeg).toList(),
                "one entry per azimuth of the sweep, ascending");
        Map<Double, AzimuthUtilisation> byAzimuth = new HashMap<>();
        rows.forEach(r -> byAzimuth.put(r.azimuthDeg(), r));
        double largest = 0;
        for (MemberEnvelope m : result.members()) {
            double u = m.governing().utilisation();
            largest = Math.max(largest, u);
            Double az = m.governingWhere().azimuthDeg();
            if (az != null) {
                assertTrue(byAzimuth.get(az).utilisation() >= u - 1e-12,
                        "member " + m.member() + " reaches " + u + " at " + az + " deg");
            }
        }
        double top = rows.stream().mapToDouble(AzimuthUtilisation::utilisation).max().orElseThrow();
        assertEquals(largest, top, 1e-12, "the sweep's largest is the largest envelope");
        for (AzimuthUtilisation r : rows) {
            MemberEnvelope m = result.members().stream().filter(e -> e.member() == r.member()).findFirst().orElseThrow();
            assertTrue(r.utilisation() <= m.governing().utilisation() + 1e-12,
                    "member " + r.member() + " at " + r.azimuthDeg() + " deg exceeds its own envelope");
        }
    }

    /**
     * Utilisation means strength (issue 12): on a square tower whose legs carry more on a diagonal
     * wind (N/4 + M/d) than on a face-normal one (N/4 + M/(2b)), the largest utilisation must change
     * with the azimuth; a load-independent rule would give a flat line.
     */
    @Test
    void theLargestUtilisationVariesWithTheAzimuth() throws Exception {
        AnalysisResult r = TestTowers.analyse(TestTowers.squareTower(
                "{ \"wind\": { \"method\": \"en1991\", \"basicSpeed\": 27.0, \"terrain\": \"II\" }, \"sweepStep\": 15.0 }"))
                .result();
        double lo = r.utilisationByAzimuth().stream().mapToDouble(AzimuthUtilisation::utilisation).min().orElseThrow();
        double hi = r.utilisationByAzimuth().stream().mapToDouble(AzimuthUtilisation::utilisation).max().orElseThrow();
        assertTrue(hi - lo > 0.05 * hi, "largest utilisation from " + lo + " to " + hi);
        for (MemberEnvelope m : r.members()) {
            assertTrue(!m.governing().mode().isRequirement(), "member " + m.member() + " governed by " + m.governing());
        }
    }
}
