package tetrapod.check;

import tetrapod.model.Material;
import tetrapod.model.Member;
import tetrapod.model.spec.CheckMethod;
import tetrapod.model.spec.ChecksSpec;

/** A published method for checking lattice members and their bolted end connections. */
public sealed interface MemberCheck permits En1993MemberCheck, Asce10MemberCheck {

    /**
     * The member's resistances by this method for one set of buckling lengths and one end
     * connection, computed once for any load case.
     */
    MemberResistance resistance(Member member, Material material, BucklingLength buckling, Connection connection);

    /** Every check of the method for one member in one load case. */
    default MemberCheckResult check(MemberCheckInput input) {
        return resistance(input.member(), input.material(), input.buckling(), input.connection()).check(input.forces());
    }

    /**
     * The nominal design force of a redundant (secondary bracing) member as a fraction of the
     * compression in the member it braces (see {@link RedundantForces}).
     */
    double redundantForceFraction();

    /** Where that fraction comes from. */
    String redundantForceClause();

    /** The method {@code checks.method} names, with its parameters. */
    static MemberCheck of(ChecksSpec checks) {
        return checks.method() == CheckMethod.ASCE10
                ? new Asce10MemberCheck()
                : new En1993MemberCheck(checks.partialFactors());
    }
}
