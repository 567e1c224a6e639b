package tetrapod.check;

/** The flexural buckling curves of EN 1993-1-1 6.3.1.2 and their imperfection factors (Table 6.1). */
public enum BucklingCurve {
    A0(0.13), A(0.21), B(0.34), C(0.49), D(0.76);

    private final double alpha;

    BucklingCurve(double alpha) {
        this.alpha = alpha;
    }

    /** Imperfection factor α, EN 1993-1-1 Table 6.1. */
    public double alpha() {
        return alpha;
    }

    /** Reduction factor χ at non-dimensional slenderness {@code lambdaBar} on this curve. */
    public double chi(double lambdaBar) {
        return chi(lambdaBar, alpha);
    }

    /**
     * χ = 1 / (Φ + √(Φ² − λ̄²)) ≤ 1 with Φ = 0.5 [1 + α (λ̄ − 0.2) + λ̄²], EN 1993-1-1 6.3.1.2 (6.49).
     * For λ̄ ≤ 0.2 it is 1 (6.3.1.2 (4)).
     */
    public static double chi(double lambdaBar, double alpha) {
        if (!(lambdaBar >= 0) || !Double.isFinite(lambdaBar)) {
            throw new IllegalArgumentException("slenderness must be finite and >= 0, was " + lambdaBar);
        }
        if (lambdaBar <= 0.2) {
            return 1.0;                                                         // EN 1993-1-1 6.3.1.2 (4)
        }
        double phi = 0.5 * (1 + alpha * (lambdaBar - 0.2) + lambdaBar * lambdaBar);   // EN 1993-1-1 6.3.1.2
        double chi = 1 / (phi + Math.sqrt(phi * phi - lambdaBar * lambdaBar));          // EN 1993-1-1 (6.49)
        return Math.min(1.0, chi);
    }
}
