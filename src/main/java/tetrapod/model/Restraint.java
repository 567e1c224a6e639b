package tetrapod.model;

import java.util.List;

/** Which of a node's six degrees of freedom (ux, uy, uz, rx, ry, rz) a support holds. */
public record Restraint(boolean ux, boolean uy, boolean uz, boolean rx, boolean ry, boolean rz) {

    public static final List<String> DOF_NAMES = List.of("ux", "uy", "uz", "rx", "ry", "rz");
    public static final Restraint PINNED = new Restraint(true, true, true, false, false, false);
    public static final Restraint FIXED = new Restraint(true, true, true, true, true, true);

    /** Is degree of freedom {@code dof} (0 = ux ... 5 = rz) held? */
    public boolean holds(int dof) {
        return switch (dof) {
            case 0 -> ux;
            case 1 -> uy;
            case 2 -> uz;
            case 3 -> rx;
            case 4 -> ry;
            case 5 -> rz;
            default -> throw new IndexOutOfBoundsException("dof " + dof);
        };
    }

    /** From six 0/1 flags in the order ux, uy, uz, rx, ry, rz. */
    public static Restraint of(List<Boolean> flags) {
        if (flags.size() != 6) {
            throw new IllegalArgumentException("a restraint needs 6 flags, got " + flags.size());
        }
        return new Restraint(flags.get(0), flags.get(1), flags.get(2), flags.get(3), flags.get(4), flags.get(5));
    }
}
