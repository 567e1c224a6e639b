package tetrapod.model.spec;

/**
 * Partial factors for resistance of EN 1993 (dimensionless): γM0 cross-sections, γM1 member
 * instability, γM2 net sections and bolts.
 */
public record PartialFactors(double gammaM0, double gammaM1, double gammaM2) {

    /** The values EN 1993-1-1 6.1 (1) Note 2B and EN 1993-1-8 Table 2.1 recommend: 1.00, 1.00, 1.25. */
    public static final PartialFactors RECOMMENDED = new PartialFactors(1.00, 1.00, 1.25);

    public PartialFactors {
        if (!(gammaM0 > 0) || !(gammaM1 > 0) || !(gammaM2 > 0)) {
            throw new IllegalArgumentException("partial factors must be > 0");
        }
    }
}
