package tetrapod.check;

import java.util.Arrays;
import java.util.function.IntToDoubleFunction;
import tetrapod.model.Member;

/**
 * One member's strength utilisation in any load case, as numbers alone, for sweeping many cases:
 * its buckling state in the case (from the forces of its crossing partners), its design axial
 * force (a redundant's nominal force when larger than its own) and the utilisation from
 * resistances computed once per buckling state ({@link MemberResistance}). {@link #of} equals, to
 * the last bit, the governing utilisation that {@link MemberChecker#check} gives the same case.
 *
 * <p>Keeps the resistances of the states it has met: use from one thread at a time.
 */
public final class MemberUtilisation {

    private final MemberChecker checker;
    private final int index;
    private final Member member;
    private int[] states = new int[0];
    private MemberResistance[] resistances = new MemberResistance[0];

    MemberUtilisation(MemberChecker checker, int index, Member member) {
        this.checker = checker;
        this.index = index;
        this.member = member;
    }

    public Member member() {
        return member;
    }

    /**
     * The member's buckling state in a case ({@link BucklingLengths#state}).
     *
     * @param axialByIndex the axial force (N, tension positive) of every member in the case, by frame index
     */
    public int state(IntToDoubleFunction axialByIndex) {
        return checker.bucklingLengths().state(index, axialByIndex);
    }

    /**
     * The axial force (N, tension positive) the member is checked for: its own {@code axial}, or a
     * redundant's nominal compression when larger ({@link MemberChecker#designForces}).
     */
    public double designAxial(double axial, IntToDoubleFunction axialByIndex) {
        return checker.designAxial(index, axial, axialByIndex);
    }

    /**
     * The strength utilisation in buckling state {@code state} under the design axial force
     * {@code axial} (N) and the end moments about local y and z at i and j (N·m, as
     * {@link MemberForces}).
     */
    public double of(int state, double axial, double myI, double myJ, double mzI, double mzJ) {
        return resistance(state).utilisation(axial, MemberForces.largest(myI, myJ), MemberForces.largest(mzI, mzJ),
                MemberForces.psi(myI, myJ), MemberForces.psi(mzI, mzJ));
    }

    /**
     * A utilisation no smaller than {@link #of} for any end moments of magnitude at most
     * {@code momentY} and {@code momentZ} (N·m) with the same state and axial force: every strength
     * check of either method grows with the moments and with ψ (through C_m), and ψ ≤ 1.
     */
    public double atMost(int state, double axial, double momentY, double momentZ) {
        return resistance(state).utilisation(axial, momentY, momentZ, 1.0, 1.0);
    }

    /** A utilisation no larger than {@link #of} with any moments: the checks of the axial force alone. */
    public double atLeast(int state, double axial) {
        return resistance(state).utilisation(axial, 0, 0, 1.0, 1.0);
    }

    /** The resistances in buckling state {@code state}, made on first use. */
    MemberResistance resistance(int state) {
        for (int k = 0; k < states.length; k++) {
            if (states[k] == state) {
                return resistances[k];
            }
        }
        MemberResistance made = checker.resistance(index, state);
        states = Arrays.copyOf(states, states.length + 1);
        resistances = Arrays.copyOf(resistances, resistances.length + 1);
        states[states.length - 1] = state;
        resistances[resistances.length - 1] = made;
        return made;
    }
}
