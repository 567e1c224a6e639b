package tetrapod.solve;

import java.util.Objects;

/**
 * Forces at both ends of a member, in its local axes.
 *
 * <p><b>Sign convention.</b> {@link #atI()} and {@link #atJ()} are the <i>end actions</i>: the
 * forces and moments that the joint (the rest of the structure) exerts on the member end, positive
 * along the positive local axes — the quantities {@code f = k·d} of the stiffness method. With no
 * loads along the member they are in equilibrium on their own.
 *
 * <p>The <i>stress resultants</i> (internal forces on a cut with outward normal +x, the usual
 * beam-theory convention: N positive in tension) are {@link #internalAtJ()} = atJ and
 * {@link #internalAtI()} = −atI. In particular the axial force N = atJ.fx = −atI.fx, positive in
 * tension ({@link #axial()}).
 *
 * <p>For axial-only members (every member of a truss, pin-ended bracing of a frame) only fx is
 * non-zero.
 *
 * @param member member id
 */
public record MemberEndForces(int member, EndForces atI, EndForces atJ) {

    public MemberEndForces {
        Objects.requireNonNull(atI, "atI");
        Objects.requireNonNull(atJ, "atJ");
    }

    /** Axial force N, positive in tension, N. */
    public double axial() {
        return atJ.fx();
    }

    /** Stress resultants at end i: N, Vy, Vz, T, My, Mz with the cut-face convention. */
    public EndForces internalAtI() {
        return atI.negated();
    }

    /** Stress resultants at end j: N, Vy, Vz, T, My, Mz with the cut-face convention. */
    public EndForces internalAtJ() {
        return atJ;
    }
}
