package tetrapod.check;

/**
 * One member's strength checks by one method ({@link MemberCheck#resistance}) for one set of
 * buckling lengths and one end connection, with every resistance that does not depend on the
 * load computed once: a load case then costs a few multiplications and no text.
 * {@link #utilisation} is, to the last bit, the utilisation of the governing strength check that
 * {@link #check} makes (with its clause and note) for the same forces.
 */
public sealed interface MemberResistance permits En1993Resistance, Asce10Resistance {

    /**
     * The member's strength utilisation (the largest ratio of its strength checks).
     *
     * @param axial   the design axial force, N (tension positive)
     * @param momentY the larger end moment about local y, N·m (≥ 0)
     * @param momentZ the larger end moment about local z, N·m (≥ 0)
     * @param psiY    ψ of the moment diagram about y (−1 … 1)
     * @param psiZ    ψ of the moment diagram about z (−1 … 1)
     */
    double utilisation(double axial, double momentY, double momentZ, double psiY, double psiZ);

    /** Every check, strength and requirements, with its clause and note, for the design {@code forces}. */
    MemberCheckResult check(MemberForces forces);

    /** {@link #utilisation} of {@code forces}. */
    default double utilisation(MemberForces forces) {
        return utilisation(forces.axial(), forces.maxMomentY(), forces.maxMomentZ(), forces.psiY(), forces.psiZ());
    }
}
