package tetrapod.analysis;

import java.util.List;
import tetrapod.generate.Tower;
import tetrapod.load.AzimuthWind;
import tetrapod.load.TowerLoads;

import tetrapod.solve.BasisResponses;
import tetrapod.solve.StructuralModel;

/**
 * Everything the analysis found.
 *
 * @param cases        the cases reported in full: each combination without wind once, each with
 *                     wind at 0, 45, ... 315 degrees
 * @param wind         the wind on each panel at each reported azimuth
 * @param sweep        every leg base's reaction against azimuth, per combination with wind
 * @param legBases     governing reactions of each leg base over every case of the sweep
 * @param members      largest tension and compression of each member over every case
 * @param responses    the superposable responses, for further cases
 * @param caseCount    number of load cases covered (combinations × azimuths)
 */
public record AnalysisResult(Tower tower, TowerLoads loads, StructuralModel model, List<SolvedCase> cases,
                             List<AzimuthWind> wind, List<LegBaseSweep> sweep, List<LegBaseExtremes> legBases,
                             List<MemberAxialEnvelope> members, BasisResponses responses, int caseCount) {
    public AnalysisResult {
        cases = List.copyOf(cases);
        wind = List.copyOf(wind);
        sweep = List.copyOf(sweep);
        legBases = List.copyOf(legBases);
        members = List.copyOf(members);
    }
}
