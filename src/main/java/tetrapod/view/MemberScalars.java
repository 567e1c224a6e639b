package tetrapod.view;

import java.util.Arrays;

/**
 * One number per member, in the order of the frame's members; immutable. {@link Double#NaN}
 * marks a member that has no value (for example a member that was not checked): it is drawn in
 * the neutral colour and described as "no value", never printed as NaN.
 */
public final class MemberScalars {

    private final double[] values;

    private MemberScalars(double[] values) {
        this.values = values;
    }

    /** A copy of {@code values} (input, not modified). Infinite values are rejected. */
    public static MemberScalars of(double... values) {
        double[] copy = values.clone();
        for (int k = 0; k < copy.length; k++) {
            if (Double.isInfinite(copy[k])) {
                throw new IllegalArgumentException("member scalar " + k + " is infinite");
            }
        }
        return new MemberScalars(copy);
    }

    public int size() {
        return values.length;
    }

    public double get(int member) {
        return values[member];
    }

    public boolean has(int member) {
        return !Double.isNaN(values[member]);
    }

    /** Largest |value| over the members that have one; 0 when none has. */
    public double maxAbs() {
        double max = 0;
        for (double v : values) {
            if (!Double.isNaN(v)) {
                max = Math.max(max, Math.abs(v));
            }
        }
        return max;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof MemberScalars m && Arrays.equals(values, m.values);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(values);
    }

    @Override
    public String toString() {
        return "MemberScalars[" + values.length + "]";
    }
}
