package tetrapod.check;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** χ of EN 1993-1-1 6.3.1.2 against published tables and a published worked example. */
class BucklingCurveTest {

    /**
     * Curve b (α = 0.34, EN 1993-1-1 Table 6.1). Reference: the published table of reduction
     * factors χ (ENV 1993-1-1 Table 5.5.2 and the SCI design tables; values recalled from memory),
     * each also worked by hand from (6.49), e.g. λ̄ = 1.0: Φ = 0.5 (1 + 0.34·0.8 + 1) = 1.136,
     * χ = 1/(1.136 + √(1.136² − 1)) = 0.5970; λ̄ = 2.0: Φ = 2.806, χ = 1/(2.806 + √(2.806² − 4)) = 0.2095.
     */
    @ParameterizedTest(name = "curve b, λ̄ = {0}: χ = {1}")
    @CsvSource({"0.5, 0.8842", "1.0, 0.5970", "1.5, 0.3422", "2.0, 0.2095"})
    void curveBAgainstThePublishedTable(double lambdaBar, double published) {
        assertEquals(published, BucklingCurve.B.chi(lambdaBar), 5e-5);
    }

    @Test
    void imperfectionFactorsOfTable61() {
        // EN 1993-1-1 Table 6.1
        assertEquals(0.13, BucklingCurve.A0.alpha());
        assertEquals(0.21, BucklingCurve.A.alpha());
        assertEquals(0.34, BucklingCurve.B.alpha());
        assertEquals(0.49, BucklingCurve.C.alpha());
        assertEquals(0.76, BucklingCurve.D.alpha());
    }

    @Test
    void noReductionUpToLambdaBar02() {
        // EN 1993-1-1 6.3.1.2 (4)
        assertEquals(1.0, BucklingCurve.B.chi(0.0));
        assertEquals(1.0, BucklingCurve.D.chi(0.2), 1e-12);
    }

    /**
     * Steel Buildings in Europe (SCI/ArcelorMittal), Multi-storey steel buildings Part 4, worked
     * example A.5 "Pinned column using non-slender H sections": HE 300 B, S235, A = 149 cm²,
     * I_y = 25 170 cm⁴, L_cr,y = 8.00 m, buckling curve b. Published: N_cr,y = 8151.2 kN,
     * λ̄_y = 0.655, Φ_y = 0.792, χ_y = 0.808.
     */
    @Test
    void publishedWorkedColumnExample() {
        double area = 149e-4;
        double fy = 235e6;
        double e = 210e9;
        double iy = 25170e-8;
        double length = 8.0;
        double ncr = Math.PI * Math.PI * e * iy / (length * length);
        assertEquals(8151.2e3, ncr, 0.1e3);
        double lambdaBar = Math.sqrt(area * fy / ncr);
        assertEquals(0.655, lambdaBar, 5e-4);
        assertEquals(0.808, BucklingCurve.B.chi(lambdaBar), 5e-4);
        // the same slenderness by L/(i λ1), λ1 = 93.9ε = 93.9 for S235 (EN 1993-1-1 6.3.1.3)
        double i = Math.sqrt(iy / area);
        assertEquals(0.655, length / (i * 93.9), 1e-3);   // the example rounds to three decimals
    }
}
