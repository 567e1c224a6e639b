package tetrapod.load;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import tetrapod.model.spec.Asce7Edition;
import tetrapod.model.spec.Exposure;

/**
 * ASCE 7-16 §26.11.5 gust-effect factor of a flexible structure against a hand calculation of the
 * same equations, done apart from this code (our own, no published worked example): exposure C,
 * V = 50 m/s, h = 60 m, B = L = 4 m, n₁ = 0.8 Hz, β = 0.01.
 */
class Asce7GustFactorTest {

    private static final Asce7Wind WIND = Asce7Wind.of(Asce7Edition.ASCE_7_16, Exposure.C, 50);

    @Test
    void eachStepOf26115AgreesWithTheHandCalculation() {
        Asce7GustFactor g = Asce7GustFactor.of(WIND, 60, 4, 0.8, 0.01);
        assertTrue(g.flexible());
        assertEquals(118.110 * Asce7Wind.FOOT, g.equivalentHeight(), 1e-3);   // z̄ = 0.6 h
        assertEquals(0.161709, g.turbulence(), 1e-6);                          // (26.11-7)
        assertEquals(645.245 * Asce7Wind.FOOT, g.lengthScale(), 1e-3);         // (26.11-9)
        assertEquals(0.763019, g.background(), 1e-6);                          // (26.11-8)
        assertEquals(39.5439, g.meanVelocity(), 1e-4);                         // (26.11-16)
        assertEquals(0.581499, g.resonant(), 1e-6);                            // (26.11-12) with -13, -14, -15
        assertEquals(4.135939, g.resonantPeak(), 1e-6);                        // (26.11-11)
        assertEquals(1.047520, g.value(), 1e-6);                               // (26.11-10)
    }

    @Test
    void aTowerOfOneHertzOrMoreIsRigid() {
        Asce7GustFactor g = Asce7GustFactor.of(WIND, 60, 4, 1.0, 0.01);
        assertFalse(g.flexible());
        assertEquals(0.85, g.value(), 0);                                      // §26.11.1
    }
}
