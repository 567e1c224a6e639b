package tetrapod.load;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import tetrapod.model.spec.TerrainCategory;

/**
 * c_s·c_d of EN 1991-1-4:2005 §6.3.1 and Annex B against a hand calculation of the same clauses,
 * done apart from this code (our own): terrain II, v_b,0 = 25 m/s, h = 30 m, b = 3 m, n_1 = 2 Hz,
 * δ = 0.05; and the resonant part with its damping against a published worked example.
 */
class En1991StructuralFactorTest {

    private static final En1991Wind WIND = En1991Wind.of(TerrainCategory.CAT_II, 25);

    @Test
    void eachStepOfAnnexBAgreesWithTheHandCalculation() {
        En1991StructuralFactor f = En1991StructuralFactor.of(WIND, 30, 3, 2.0, 0.05);
        assertEquals(18.0, f.referenceHeight(), 1e-12);          // z_s = 0.6 h
        assertEquals(27.959, f.meanVelocity(), 1e-3);            // (4.3)
        assertEquals(0.16989, f.turbulence(), 1e-5);             // (4.7)
        assertEquals(85.724, f.lengthScale(), 1e-3);             // (B.1)
        assertEquals(0.66969, f.background(), 1e-5);             // (B.3)
        assertEquals(0.22338, f.resonant(), 1e-5);               // (B.6) with (B.2), (B.7), (B.8)
        assertEquals(1.00026, f.upCrossing(), 1e-5);             // (B.5)
        assertEquals(3.74466, f.peakFactor(), 1e-5);             // (B.4)
        assertEquals(1.00602, f.value(), 1e-5);                  // (6.2)
    }

    /**
     * Steel Buildings in Europe, <i>Multi-Storey Steel Buildings, Part 3: Actions</i> (ArcelorMittal,
     * Peiner Träger, Corus; SECHALO project RFS2-CT-2008-0030), Appendix A "Worked example: wind action
     * on a multi-storey building", sheet 11 of 18: h = 35 m and b = 10 m (as its η_h and η_b show them),
     * n_1,x = 3.1 Hz, δ_s = 0.05, δ_a by (F.16) with c_f = 0.9, ρ = 1.25 kg/m³, m_e = 150 t/m. Terrain III
     * and v_b = 26 m/s are taken because they reproduce the sheet's v_m(z_s) = 23.8 m/s and
     * L(z_s) = 75.9 m (the sheet that states them was not read). The example prints its values to three
     * figures from rounded intermediate values; each is checked to one unit of its last printed figure. Its B², k_p and c_s·c_d are on a sheet
     * not read here, so (B.3)–(B.5) and (6.2) rest on the hand calculation above.
     */
    @Test
    void theResonantPartAndItsDampingAgreeWithAPublishedWorkedExample() {
        En1991Wind wind = En1991Wind.of(TerrainCategory.CAT_III, 26);
        En1991StructuralFactor f = En1991StructuralFactor.of(wind, 35, 10, 3.1, 0.05, 0.9 * 10 / 150e3);
        assertEquals(23.8, f.meanVelocity(), 0.1);                                    // v_m(z_s), z_s = 21 m
        assertEquals(75.9, f.lengthScale(), 0.1);                                     // (B.1)
        double fl = 3.1 * f.lengthScale() / f.meanVelocity();
        assertEquals(9.89, fl, 0.01);                                                 // (B.2)
        assertEquals(0.0302, En1991StructuralFactor.spectralDensity(fl), 0.0001);     // (B.2)
        assertEquals(0.0003, f.aerodynamicDamping(), 0.0001);                         // (F.16)
        assertEquals(0.0503, f.logDecrement(), 0.0001);                               // (F.15)
        assertEquals(0.0465, En1991StructuralFactor.aerodynamicAdmittance(4.6 * 35 * fl / f.lengthScale()), 0.0001);
        assertEquals(0.153, En1991StructuralFactor.aerodynamicAdmittance(4.6 * 10 * fl / f.lengthScale()), 0.001);
        assertEquals(0.0211, f.resonant(), 0.0001);                                   // (B.6)
    }

    @Test
    void theAdmittanceIsOneAtZeroAndFollowsB7() {
        assertEquals(1.0, En1991StructuralFactor.aerodynamicAdmittance(0), 1e-12);
        // either side of the switch from the series to the closed form
        assertEquals(En1991StructuralFactor.aerodynamicAdmittance(0.999999e-4),
                En1991StructuralFactor.aerodynamicAdmittance(1.000001e-4), 1e-9);
        assertEquals(1 - 2e-3 / 3 + 1e-6 / 3, En1991StructuralFactor.aerodynamicAdmittance(1e-3), 1e-9);
        double eta = 2.0;
        assertEquals(1 / eta - (1 - Math.exp(-2 * eta)) / (2 * eta * eta),
                En1991StructuralFactor.aerodynamicAdmittance(eta), 1e-15);
    }

    /** A stiffer tower responds less at resonance: R² falls and c_s·c_d with it, towards the background part alone. */
    @Test
    void aStifferTowerHasASmallerResonantPartAndFactor() {
        En1991StructuralFactor soft = En1991StructuralFactor.of(WIND, 30, 3, 0.8, 0.05);
        En1991StructuralFactor stiff = En1991StructuralFactor.of(WIND, 30, 3, 8.0, 0.05);
        assertTrue(soft.resonant() > stiff.resonant() && soft.value() > stiff.value());
        assertEquals(soft.background(), stiff.background(), 1e-15);
        double rigid = (1 + 2 * 3.0 * stiff.turbulence() * Math.sqrt(stiff.background())) / (1 + 7 * stiff.turbulence());
        assertTrue(stiff.value() >= rigid, "k_p ≥ 3 (B.4) bounds the factor from below");
    }
}
