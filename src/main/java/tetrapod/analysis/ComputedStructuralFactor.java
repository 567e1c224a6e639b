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
import tetrapod.load.WindProfiles;
import tetrapod.model.spec.TowerSpec;
import tetrapod.model.spec.WindSpec;
import tetrapod.solve.FactoredSystem;
import tetrapod.solve.Solver;
import tetrapod.solve.StructuralModel;

/**
 * The wind's response factor from the tower itself (issue 14 item 3): when an EN 1991-1-4 wind gives
 * no {@code structuralFactor}, or an ASCE 7 wind no {@code gustFactor}, the tower's first sway
 * frequency is computed from its stiffness and dead-load masses and turned into c_s·c_d by
 * EN 1991-1-4 Annex B, or into G by ASCE 7 §26.11 (0.85 when rigid, G_f below 1 Hz), which the wind
 * then uses. A value the user gives is used as given.
 */
public final class ComputedStructuralFactor {

    /**
     * Logarithmic decrement δ. EN 1991-1-4 Table F.2 gives δ_s for lattice steel towers by their
     * joints (welded, high-strength bolts, ordinary bolts; values recalled, the lowest about 0.02):
     * the lowest is taken for every tower, and the aerodynamic damping δ_a of F.5 (F.16) is left out;
     * both on the side of a larger resonant response.
     */
    public static final double LOG_DECREMENT = 0.02;
    /** The damping ratio β of ASCE 7 (26.11-12) that corresponds to {@link #LOG_DECREMENT}: δ / 2π. */
    public static final double DAMPING_RATIO = LOG_DECREMENT / (2 * Math.PI);
    /** Modes asked for to find the first sway among them. */
    private static final int MODES = 6;

    /** The spec with the factor filled in, and how it was computed (empty when the user gave it or there is no wind). */
    public record Resolved(TowerSpec spec, Optional<ResponseFactor> factor) { }

    private ComputedStructuralFactor() { }

    public static Resolved resolve(TowerSpec spec, Tower tower) throws BadInputException, UnstableStructureException {
        return resolve(spec, tower, null);
    }

    /**
     * As above, with the loads already formed from {@code spec} with the factor to compute taken as 1
     * (only their dead loads are used, for the masses), or null to form them here.
     */
    public static Resolved resolve(TowerSpec spec, Tower tower, TowerLoads unitLoads)
            throws BadInputException, UnstableStructureException {
        WindSpec wind = spec.loads().wind();
        boolean en = wind instanceof WindSpec.En1991 e && e.structuralFactorComputed();
        boolean us = wind instanceof WindSpec.Asce7 a && a.gustFactorComputed();
        if (!en && !us) {
            return new Resolved(spec, Optional.empty());
        }
        TowerSpec unit = withFactor(spec, 1.0);
        double frequency = firstSway(tower, unitLoads != null ? unitLoads : TowerLoads.build(tower, unit.loads()));
        double height = tower.height();
        ResponseFactor factor;
        if (en) {
            En1991Wind profile = (En1991Wind) WindProfiles.of(unit.loads().wind());
            double zs = Math.max(0.6 * height, En1991Wind.minimumHeight(profile.terrain()));
            factor = En1991StructuralFactor.of(profile, height, widthAt(tower, zs), frequency, LOG_DECREMENT);
        } else {
            Asce7Wind profile = (Asce7Wind) WindProfiles.of(unit.loads().wind());
            factor = Asce7GustFactor.of(profile, height, widthAt(tower, 0.6 * height), frequency, DAMPING_RATIO);
        }
        return new Resolved(withFactor(spec, factor.value()), Optional.of(factor));
    }

    /** The first mode classed as sway, else the lowest, Hz. */
    private static double firstSway(Tower tower, TowerLoads loads) throws BadInputException, UnstableStructureException {
        FactoredSystem system = Solver.factor(StructuralModel.of(tower.frame()));
        List<NaturalMode> modes = NaturalModes.of(system, loads.basis(), MODES);
        if (modes.isEmpty()) {
            throw BadInputException.at("loads.wind", "the wind's response factor cannot be computed: the tower has no"
                    + " mass that can sway; give structuralFactor (EN) or gustFactor (ASCE 7)");
        }
        return modes.stream().filter(m -> m.kind() == NaturalMode.Kind.SWAY).findFirst().orElse(modes.get(0))
                .frequencyHz();
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
