package tetrapod.check;

/**
 * The forces a leg base puts on its footing in one load case, from the support's reaction.
 *
 * @param vertical   the vertical reaction the support exerts on the tower, N: positive when the
 *                   leg presses down on the footing (compression), negative when it pulls up (uplift)
 * @param horizontal the horizontal reaction's magnitude √(Fx² + Fy²), N (≥ 0)
 */
public record LegBaseForces(double vertical, double horizontal) {

    public LegBaseForces {
        if (!Double.isFinite(vertical) || !Double.isFinite(horizontal) || horizontal < 0) {
            throw new IllegalArgumentException("leg base forces must be finite, the horizontal one >= 0");
        }
    }

    /** From the reaction components the support exerts on the structure, N. */
    public static LegBaseForces fromReaction(double fx, double fy, double fz) {
        return new LegBaseForces(fz, Math.hypot(fx, fy));
    }

    /** The compression into the footing (0 under uplift), N. */
    public double compression() {
        return Math.max(0, vertical);
    }

    /** The uplift (0 in compression), N. */
    public double uplift() {
        return Math.max(0, -vertical);
    }
}
