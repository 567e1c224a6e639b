package tetrapod.analysis;

import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import tetrapod.check.Extreme;
import tetrapod.check.FoundationEnvelope;
import tetrapod.check.MemberEnvelope;
import tetrapod.generate.Tower;
import tetrapod.load.AzimuthWind;
import tetrapod.load.TowerLoads;
import tetrapod.solve.BasisResponses;
import tetrapod.solve.StructuralModel;

/**
 * Everything the analysis found.
 *
 * @param cases       the cases reported in full: each combination without wind once, each with
 *                    wind at 0, 45, ... 315 degrees, and every case that governs a leg base
 *                    reaction or a footing check (a member's governing case is named in its
 *                    envelope, with its forces, and not solved in full)
 * @param wind        the wind on each panel at each reported azimuth
 * @param sweep       every leg base's reaction against azimuth, per combination with wind
 * @param legBases    governing reactions of each leg base over every case
 * @param members     every member's governing check and largest tension and compression
 * @param foundations every footing's governing checks (empty when the model gives no foundation)
 * @param hand        the hand method beside the analysis, per wind combination and azimuth
 * @param responses   the superposable responses, for further cases
 * @param caseCount   number of load cases covered (combinations × azimuths)
 * @param utilisationByAzimuth the largest member utilisation at each azimuth of the sweep over every
 *                    combination with wind, by ascending azimuth (empty without wind)
 * @param autoRestraints every auto-restraint of the model with the largest force it carried over
 *                    the sweep (each below the limit of {@code solve.LoadPath}, or the run would
 *                    have stopped)
 * @param modes       the lowest natural modes, from the lowest frequency up (empty when not asked for
 *                    or when nothing carries mass)
 * @param serviceability how far each level and ancillary moves under the serviceability combination,
 *                    over every azimuth; null for an explicit frame (no panel levels)
 */
public record AnalysisResult(Tower tower, TowerLoads loads, StructuralModel model, List<SolvedCase> cases,
                             List<AzimuthWind> wind, List<LegBaseSweep> sweep, List<LegBaseExtremes> legBases,
                             List<MemberEnvelope> members, List<FoundationEnvelope> foundations,
                             List<HandComparison> hand, BasisResponses responses, int caseCount,
                             List<AzimuthUtilisation> utilisationByAzimuth, List<AutoRestraintPeak> autoRestraints,
                             List<NaturalMode> modes, SecondOrder secondOrder,
                             ServiceabilityResult serviceability) {
    public AnalysisResult {
        cases = List.copyOf(cases);
        wind = List.copyOf(wind);
        sweep = List.copyOf(sweep);
        legBases = List.copyOf(legBases);
        members = List.copyOf(members);
        foundations = List.copyOf(foundations);
        hand = List.copyOf(hand);
        utilisationByAzimuth = List.copyOf(utilisationByAzimuth);
        autoRestraints = List.copyOf(autoRestraints);
        modes = List.copyOf(modes);
    }

    /** The serviceability envelope; empty for an explicit frame. */
    public Optional<ServiceabilityResult> serviceabilityResult() {
        return Optional.ofNullable(serviceability);
    }

    /** The cases in which the hand method is compared for compression and for uplift; empty without a comparison. */
    public Optional<HandGoverning> handGoverning() {
        return HandGoverning.of(hand);
    }

    /**
     * The ids of the cases that govern a leg base reaction (largest compression, uplift, shear) or a
     * footing check: those whose vectors results.json writes (docs/methods.md, "The cases written in full").
     */
    public Set<String> governingCaseIds() {
        Set<String> ids = new HashSet<>();
        for (LegBaseExtremes leg : legBases) {
            for (Extreme e : List.of(leg.compression(), leg.uplift(), leg.shear())) {
                if (e != null && e.caseId() != null) {
                    ids.add(e.caseId());
                }
            }
        }
        for (FoundationEnvelope f : foundations) {
            f.checks().values().forEach(g -> {
                if (g.where() != null && g.where().caseId() != null) {
                    ids.add(g.where().caseId());
                }
            });
        }
        return ids;
    }

    /** The largest utilisation of any member or footing. */
    public double maxUtilisation() {
        double max = 0;
        for (MemberEnvelope m : members) {
            max = Math.max(max, m.governing() == null ? 0 : m.governing().utilisation());
        }
        for (FoundationEnvelope f : foundations) {
            for (FoundationEnvelope.Governing g : f.checks().values()) {
                max = Math.max(max, g.check().utilisation());
            }
        }
        return max;
    }
}
