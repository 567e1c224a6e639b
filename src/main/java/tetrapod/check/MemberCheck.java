package tetrapod.check;

import tetrapod.model.spec.CheckMethod;
import tetrapod.model.spec.ChecksSpec;

/** A published method for checking lattice members and their bolted end connections. */
public sealed interface MemberCheck permits En1993MemberCheck, Asce10MemberCheck {

    /** Every check of the method for one member in one load case. */
    MemberCheckResult check(MemberCheckInput input);

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
