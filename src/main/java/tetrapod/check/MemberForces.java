package tetrapod.check;

/**
 * The forces in one member for one load case, SI units.
 *
 * <p>{@code axial} is N, positive in tension. The end moments are the end forces of the
 * stiffness method: the moments (N·m) that the nodes exert on the member at end i and at end j,
 * about the member's local y and z axes (for an angle, y is the major principal axis u–u and z the
 * minor v–v). With no load along the member the bending moment varies linearly between the ends:
 * the internal moment is −m_i at i and +m_j at j, so equal end moments of opposite sign bend the
 * member in single curvature. Members of a truss have zero moments.
 */
public record MemberForces(double axial, double myI, double myJ, double mzI, double mzJ) {

    public MemberForces {
        for (double v : new double[] {axial, myI, myJ, mzI, mzJ}) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("member forces must be finite");
            }
        }
    }

    /** An axial force only, N (positive in tension). */
    public static MemberForces axial(double n) {
        return new MemberForces(n, 0, 0, 0, 0);
    }

    /**
     * The forces from the 12 end actions of the stiffness method in local axes, at i (fx, fy, fz,
     * mx, my, mz) then at j, with the axial force {@code axial} (N, positive in tension).
     */
    public static MemberForces ofEndActions(double axial, double[] ends) {
        return new MemberForces(axial, ends[4], ends[10], ends[5], ends[11]);
    }

    public boolean inTension() {
        return axial > 0;
    }

    public boolean inCompression() {
        return axial < 0;
    }

    /** The compressive force as a positive number (0 in tension), N. */
    public double compression() {
        return Math.max(0, -axial);
    }

    /** The tensile force (0 in compression), N. */
    public double tension() {
        return Math.max(0, axial);
    }

    /** Largest bending moment about local y along the member, N·m (≥ 0). */
    public double maxMomentY() {
        return largest(myI, myJ);
    }

    /** Largest bending moment about local z along the member, N·m (≥ 0). */
    public double maxMomentZ() {
        return largest(mzI, mzJ);
    }

    public boolean hasMoments() {
        return maxMomentY() > 0 || maxMomentZ() > 0;
    }

    /** ψ of the moment diagram about y: the smaller end moment over the larger, −1 ≤ ψ ≤ 1 (1 when none). */
    public double psiY() {
        return psi(myI, myJ);
    }

    /** ψ of the moment diagram about z. */
    public double psiZ() {
        return psi(mzI, mzJ);
    }

    /** The larger magnitude of the end moments {@code atI} and {@code atJ}, N·m (≥ 0). */
    static double largest(double atI, double atJ) {
        return Math.max(Math.abs(atI), Math.abs(atJ));
    }

    /** ψ of a linear moment diagram from the end moments {@code atI} and {@code atJ} (end forces, as the record's). */
    static double psi(double atI, double atJ) {
        double internalI = -atI;
        double internalJ = atJ;
        double large = Math.abs(internalI) >= Math.abs(internalJ) ? internalI : internalJ;
        double small = large == internalI ? internalJ : internalI;
        return large == 0 ? 1.0 : small / large;
    }
}
