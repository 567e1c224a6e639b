package tetrapod.size;

import java.util.Arrays;

/**
 * The cases of one axial-only member, sorted into classes as the sweep goes: a class is the sign
 * of the axial force (tension, zero, compression) and the state of the crossing partners (which of
 * them are in tension, as a bit mask), which together fix the buckling lengths and the branch of
 * every check. For each class it keeps the first case and the case with the largest |N| (the
 * earlier on a tie). Mutable; one per member, filled by one thread.
 */
final class CaseClasses {

    private long[] masks = new long[4];
    private int[] signs = new int[4];
    private int[] first = new int[4];
    private double[] firstAxial = new double[4];
    private int[] extreme = new int[4];
    private double[] extremeAxial = new double[4];
    private int size;

    /** Adds case number {@code caseIndex} with axial force {@code axial} (N) and partner state {@code mask}. */
    void add(int caseIndex, double axial, long mask) {
        int sign = Demand.signOf(axial);
        for (int s = 0; s < size; s++) {
            if (masks[s] == mask && signs[s] == sign) {
                if (Math.abs(axial) > Math.abs(extremeAxial[s])) {
                    extreme[s] = caseIndex;
                    extremeAxial[s] = axial;
                }
                return;
            }
        }
        if (size == masks.length) {
            int n = 2 * size;
            masks = Arrays.copyOf(masks, n);
            signs = Arrays.copyOf(signs, n);
            first = Arrays.copyOf(first, n);
            firstAxial = Arrays.copyOf(firstAxial, n);
            extreme = Arrays.copyOf(extreme, n);
            extremeAxial = Arrays.copyOf(extremeAxial, n);
        }
        masks[size] = mask;
        signs[size] = sign;
        first[size] = caseIndex;
        firstAxial[size] = axial;
        extreme[size] = caseIndex;
        extremeAxial[size] = axial;
        size++;
    }

    int size() {
        return size;
    }

    long mask(int slot) {
        return masks[slot];
    }

    int firstCase(int slot) {
        return first[slot];
    }

    double firstAxial(int slot) {
        return firstAxial[slot];
    }

    int extremeCase(int slot) {
        return extreme[slot];
    }

    double extremeAxial(int slot) {
        return extremeAxial[slot];
    }
}
