package tetrapod.analysis;

import java.util.List;
import java.util.Optional;
import tetrapod.common.BadInputException;
import tetrapod.common.UnstableStructureException;
import tetrapod.generate.PanelLevel;
import tetrapod.generate.Tower;
import tetrapod.load.Asce7GustFactor;
import tetrapod.load.Asce7Wind;
import tetrapod.load.En1991StructuralFactor;
import tetrapod.load.En1991Wind;
import tetrapod.load.ResponseFactor;
import tetrapod.load.TowerLoads;
import tetrapod.load.WindLoads;
import tetrapod.load.WindProfiles;
import tetrapod.model.spec.TowerSpec;
import tetrapod.model.spec.WindSpec;
import tetrapod.solve.FactoredSystem;
import tetrapod.solve.Solver;
import tetrapod.solve.StructuralModel;

/**
 * The wind's response factor from the tower itself (issue 14 item 3). The tower's first sway
 * frequency is computed from its stiffness and dead-load masses before any wind is built (the modes
 * need the masses, not the wind) and turned into c_s·c_d by EN 1991-1-4 Annex B, with the
 * structural damping of the model (Table F.2) and the aerodynamic damping of the tower's own mode
 * (F.16, {@link AerodynamicDamping}), or into G by ASCE 7 §26.11 (0.85 when rigid, G_f below 1 Hz).
 * When the EN wind gives no {@code structuralFactor}, or the ASCE 7 wind no {@code gustFactor}, the
 * wind uses the computed value; a value the user gives is used as given, and the computed one can
 * be reported beside it.
 */
public final class ComputedStructuralFactor {

    /** Modes asked for to find the first sway among them. */
    private static final int MODES = 6;

    /**
     * @param spec     the spec with the factor that the wind uses filled in
     * @param computed the factor computed from the tower (empty when there is none to compute: no EN or
     *                 ASCE 7 wind, a given factor not asked to be computed, or a given factor and
     *                 nothing that can sway)
     * @param given    whether the wind uses the model's own value (the computed one is then only reported)
     */
    public record Resolved(TowerSpec spec, Optional<ResponseFactor> computed, boolean given) { }

    private ComputedStructuralFactor() { }

    /** The factor the wind of {@code spec} uses on {@code tower}, computed only when the spec does not give it. */
    public static Resolved resolve(TowerSpec spec, Tower tower) throws BadInputException, UnstableStructureException {
        return resolve(spec, tower, null, false);
    }

    /**
     * As {@link #resolve(TowerSpec, Tower)}.
     *
     * @param formed        the loads already formed from {@code spec} with a factor still to compute
     *                      taken as 1 (only their dead loads and drag areas are used), or null to form them here
     * @param alsoWhenGiven compute the factor also when the spec gives one, to report it beside the given value
     */
    public static Resolved resolve(TowerSpec spec, Tower tower, TowerLoads formed, boolean alsoWhenGiven)
            throws BadInputException, UnstableStructureException {
        return resolve(spec, tower, formed, alsoWhenGiven, null);
    }

    /**
     * As {@link #resolve(TowerSpec, Tower, TowerLoads, boolean)}, with the stiffness of {@code tower}
     * already factorised ({@code factored}, or null to factorise it here when the modes are needed):
     * the analysis that follows uses the same factor (issue 15: it was done twice).
     */
    public static Resolved resolve(TowerSpec spec, Tower tower, TowerLoads formed, boolean alsoWhenGiven,
                                   FactoredSystem factored) throws BadInputException, UnstableStructureException {
        WindSpec wind = spec.loads().wind();
        boolean en = wind instanceof WindSpec.En1991;
        boolean us = wind instanceof WindSpec.Asce7;
        boolean toCompute = wind instanceof WindSpec.En1991 e && e.structuralFactorComputed()
                || wind instanceof WindSpec.Asce7 a && a.gustFactorComputed();
        if (!(en || us) || !tower.isGenerated() || !toCompute && !alsoWhenGiven) {
            return new Resolved(spec, Optional.empty(), !toCompute);
        }
        TowerSpec unit = toCompute ? withFactor(spec, 1.0) : spec;
        TowerLoads loads = formed != null ? formed : TowerLoads.build(tower, unit.loads());
        FactoredSystem system = factored != null ? factored : Solver.factor(StructuralModel.of(tower.frame()));
        List<NaturalMode> modes = NaturalModes.of(system, loads.basis(), MODES);
        if (modes.isEmpty()) {
            if (!toCompute) {
                return new Resolved(spec, Optional.empty(), true);
            }
            throw BadInputException.at("loads.wind", "the wind's response factor cannot be computed: the tower has no"
                    + " mass that can sway; give structuralFactor (EN) or gustFactor (ASCE 7)");
        }
        NaturalMode sway = modes.stream().filter(m -> m.kind() == NaturalMode.Kind.SWAY).findFirst()
                .orElse(modes.get(0));
        double height = tower.height();
        ResponseFactor factor;
        if (wind instanceof WindSpec.En1991 e) {
            En1991Wind profile = (En1991Wind) WindProfiles.of(e.withStructuralFactor(1.0));
            double zs = Math.max(0.6 * height, En1991Wind.minimumHeight(profile.terrain()));   // Figure 6.1 (a)
            WindLoads windLoads = loads.wind().orElseThrow();
            double dragPerMass = sway.swayDirectionDeg() == null ? 0
                    : AerodynamicDamping.dragPerMass(sway, tower.frame(),
                            NaturalModes.nodeMasses(tower.frame(), loads.basis()),
                            windLoads.dragAreas(sway.swayDirectionDeg()));
            factor = En1991StructuralFactor.of(profile, height, widthAt(tower, zs), sway.frequencyHz(),
                    e.structuralDamping(), dragPerMass);
        } else {
            WindSpec.Asce7 a = (WindSpec.Asce7) wind;
            Asce7Wind profile = (Asce7Wind) WindProfiles.of(a.withGustFactor(1.0));
            factor = Asce7GustFactor.of(profile, height, widthAt(tower, 0.6 * height), sway.frequencyHz(),
                    a.dampingRatio());
        }
        return toCompute ? new Resolved(withFactor(spec, factor.value()), Optional.of(factor), false)
                : new Resolved(spec, Optional.of(factor), true);
    }

    private static TowerSpec withFactor(TowerSpec spec, double value) {
        WindSpec wind = spec.loads().wind();
        WindSpec filled = wind instanceof WindSpec.En1991 e ? e.withStructuralFactor(value)
                : ((WindSpec.Asce7) wind).withGustFactor(value);
        return spec.withLoads(spec.loads().withWind(filled));
    }

    /**
     * The narrower leg spacing at height z, straight between panel levels: the narrower width gives
     * the larger background factor B² (B.3), the safe side for a rectangular tower.
     */
    static double widthAt(Tower tower, double z) {
        List<PanelLevel> levels = tower.levels();
        PanelLevel below = levels.get(0);
        for (PanelLevel above : levels) {
            if (above.z() >= z) {
                double t = above.z() == below.z() ? 0 : (z - below.z()) / (above.z() - below.z());
                double x = below.widthX() + t * (above.widthX() - below.widthX());
                double y = below.widthY() + t * (above.widthY() - below.widthY());
                return Math.min(x, y);
            }
            below = above;
        }
        return Math.min(below.widthX(), below.widthY());
    }
}
