package tetrapod.check;

import java.util.List;
import tetrapod.common.Units;
import tetrapod.model.spec.FoundationSpec;
import tetrapod.model.spec.PartialFactors;

/** A published or common-practice rule for the anchor rods holding one leg base. */
public sealed interface AnchorRodCheck permits En1993AnchorRods, AllowableStressAnchorRods {

    /**
     * @param tension the uplift carried by the rods of the leg, N (≥ 0)
     * @param shear   the horizontal force at the leg base, N (≥ 0), shared by the rods
     */
    List<CheckResult> check(double tension, double shear);

    /** The rods the model file describes: by grade (EN 1993-1-8) or by allowable stresses. */
    static AnchorRodCheck of(FoundationSpec.AnchorRodSpec spec, PartialFactors factors) {
        if (spec instanceof FoundationSpec.RodsByGrade g) {
            return new En1993AnchorRods(g.count(), g.diameter() * Units.MM, g.grade(), factors.gammaM2());
        }
        FoundationSpec.RodsByAllowableStress a = (FoundationSpec.RodsByAllowableStress) spec;
        return new AllowableStressAnchorRods(a.count(), a.diameter() * Units.MM, a.allowableTension() * Units.MPA,
                a.allowableShear() * Units.MPA);
    }
}
