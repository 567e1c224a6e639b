package tetrapod.analysis;

import java.util.List;
import java.util.Optional;
import tetrapod.common.BadInputException;
import tetrapod.common.UnstableStructureException;
import tetrapod.generate.PanelLevel;
import tetrapod.generate.Tower;
import tetrapod.load.En1991StructuralFactor;
import tetrapod.load.En1991Wind;
import tetrapod.load.TowerLoads;
import tetrapod.load.WindProfiles;
import tetrapod.model.spec.TowerSpec;
import tetrapod.model.spec.WindSpec;
import tetrapod.solve.FactoredSystem;
import tetrapod.solve.Solver;
import tetrapod.solve.StructuralModel;

/**
 * The structural factor c_s·c_d from the tower itself (issue 14 item 3): when an EN 1991-1-4 wind
 * gives no {@code structuralFactor}, the tower's first sway frequency is computed from its
 * stiffness and dead-load masses and EN 1991-1-4 Annex B turns it into c_s·c_d, which the wind then
 * uses. A value the user gives is used as given.
 */
public final class ComputedStructuralFactor {

    /**
     * Logarithmic decrement δ. EN 1991-1-4 Table F.2 gives δ_s for lattice steel towers by their
     * joints (welded, high-strength bolts, ordinary bolts; values recalled, the lowest about 0.02):
     * the lowest is taken for every tower, and the aerodynamic damping δ_a of F.5 (F.16) is left out;
     * both on the side of a larger resonant response.
     */
    public static final double LOG_DECREMENT = 0.02;
    /** Modes asked for to find the first sway among them. */
    private static final int MODES = 6;

    /** The spec with c_s·c_d filled in, and how it was computed (empty when the user gave it or there is no EN wind). */
    public record Resolved(TowerSpec spec, Optional<En1991StructuralFactor> factor) { }

    private ComputedStructuralFactor() { }

    public static Resolved resolve(TowerSpec spec, Tower tower) throws BadInputException, UnstableStructureException {
        if (!(spec.loads().wind() instanceof WindSpec.En1991 en) || !en.structuralFactorComputed()) {
            return new Resolved(spec, Optional.empty());
        }
        TowerSpec unit = withFactor(spec, en, 1.0);
        TowerLoads loads = TowerLoads.build(tower, unit.loads());
        FactoredSystem system = Solver.factor(StructuralModel.of(tower.frame()));
        List<NaturalMode> modes = NaturalModes.of(system, loads.basis(), MODES);
        if (modes.isEmpty()) {
            throw BadInputException.at("loads.wind", "c_s·c_d cannot be computed: the tower has no mass that can"
                    + " sway; give structuralFactor");
        }
        double frequency = modes.stream().filter(m -> m.kind() == NaturalMode.Kind.SWAY).findFirst()
                .orElse(modes.get(0)).frequencyHz();
        double height = tower.height();
        En1991Wind wind = (En1991Wind) WindProfiles.of(unit.loads().wind());
        double zs = Math.max(0.6 * height, En1991Wind.minimumHeight(wind.terrain()));
        En1991StructuralFactor factor = En1991StructuralFactor.of(wind, height, widthAt(tower, zs), frequency,
                LOG_DECREMENT);
        return new Resolved(withFactor(spec, en, factor.value()), Optional.of(factor));
    }

    private static TowerSpec withFactor(TowerSpec spec, WindSpec.En1991 en, double value) {
        return spec.withLoads(spec.loads().withWind(en.withStructuralFactor(value)));
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
