package tetrapod.load;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.generate.Tower;
import tetrapod.model.NodeForce;
import tetrapod.model.spec.Asce7Edition;
import tetrapod.model.spec.Exposure;
import tetrapod.model.spec.ServiceabilitySpec;
import tetrapod.model.spec.TerrainCategory;
import tetrapod.model.spec.WindSpec;

/**
 * The probability factor c_prob of EN 1991-1-4:2005 4.2(2)P Note 2 and the service wind built with it.
 *
 * <p>c_prob = ((1 − K ln(−ln(1 − p))) / (1 − K ln(−ln(0.98))))^n with the Note's recommended K = 0.2 and
 * n = 0.5. By hand for a 10-year return period, p = 0.1:
 * <pre>
 *   −ln(0.9) = 0.1053605, ln(0.1053605) = −2.250367, 1 + 0.2 × 2.250367 = 1.450073
 *   −ln(0.98) = 0.0202027, ln(0.0202027) = −3.901940, 1 + 0.2 × 3.901940 = 1.780388
 *   c_prob = (1.450073 / 1.780388)^0.5 = 0.814469^0.5 = 0.902480
 * </pre>
 */
class ServiceWindTest {

    private static final WindSpec.En1991 EN = new WindSpec.En1991(27.0, TerrainCategory.CAT_II, List.of(), 1.0, 1.0, 1.0,
            1.0, 1.25);
    private static final WindSpec.Asce7 ASCE = new WindSpec.Asce7(Asce7Edition.ASCE_7_16, 52.0, Exposure.C, 1.0, 1.0,
            0.85, 0.85);

    @Test
    void theRecommendedShapeParameterAndExponent() {
        assertEquals(0.2, En1991ProbabilityFactor.K);   // EN 1991-1-4 4.2 Note 2, recommended value
        assertEquals(0.5, En1991ProbabilityFactor.N);   // EN 1991-1-4 4.2 Note 2, recommended value
    }

    @Test
    void tenYearsByHand() {
        assertEquals(0.902480, En1991ProbabilityFactor.ofReturnPeriod(10), 2e-6);  // the hand value above
    }

    @Test
    void fiftyYearsIsTheCharacteristicWind() {
        assertEquals(1.0, En1991ProbabilityFactor.ofReturnPeriod(50), 0.0);  // p = 0.02: numerator = denominator
    }

    /**
     * An independent evaluation of the same formula: the public notebook "EC1-4 - Wind speed
     * probabilities" of the pcachim/eurocodesnb repository prints c_prob = 0.9710811820252084 for
     * p = 0.033 with K = 0.2, n = 0.5.
     */
    @Test
    void anIndependentlyPublishedValue() {
        assertEquals(0.9710811820252084, En1991ProbabilityFactor.ofProbability(0.033), 1e-12);
    }

    @Test
    void probabilitiesOutsideZeroToOneAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> En1991ProbabilityFactor.ofProbability(1.0));
        assertThrows(IllegalArgumentException.class, () -> En1991ProbabilityFactor.ofReturnPeriod(1.0));
    }

    /**
     * EN 1991-1-4 (4.3) and (4.8): q_p(z) is proportional to v_b², and v_b to c_prob; flat-sided members'
     * coefficients do not depend on the speed, so every service wind force is c_prob² times the
     * characteristic one.
     */
    @Test
    void theEnServiceWindScalesEveryForceByCProbSquared() {
        ServiceWind w = ServiceWind.of(EN, new ServiceabilitySpec.ReturnPeriod(10));
        double c = 0.902480;
        assertEquals(c, w.probabilityFactor(), 2e-6);
        assertEquals(27.0 * c, w.speed(), 1e-4);
        assertEquals(c * c, w.pressureRatio(), 4e-6);
        assertForcesScale(WindProfiles.of(EN), w.profile(), w.probabilityFactor() * w.probabilityFactor());
    }

    @Test
    void theEnDefaultIsTheCharacteristicWind() {
        ServiceWind w = ServiceWind.of(EN, null);
        assertEquals(50, w.returnPeriod());
        assertEquals(1.0, w.pressureRatio());
        assertForcesScale(WindProfiles.of(EN), w.profile(), 1.0);
    }

    /** ASCE 7-16 (26.10-1): q_z = 0.613 K_z K_zt K_d K_e V², so the service speed scales the forces by (V_s/V)². */
    @Test
    void theAsceServiceSpeedScalesByTheSquareOfTheSpeeds() {
        ServiceWind w = ServiceWind.of(ASCE, new ServiceabilitySpec.Speed(36.0));
        double ratio = (36.0 / 52.0) * (36.0 / 52.0);
        assertEquals(ratio, w.pressureRatio(), 1e-15);
        assertForcesScale(WindProfiles.of(ASCE), w.profile(), ratio);
    }

    /** Without a service speed: 0.6 × the strength-level wind, the factor ASCE 7 §2.4.1 puts on W. */
    @Test
    void theAsceDefaultIsSixTenthsOfTheStrengthWind() {
        ServiceWind w = ServiceWind.of(ASCE, null);
        assertEquals(0.6, w.pressureRatio(), 0.0);
        assertForcesScale(WindProfiles.of(ASCE), w.profile(), 0.6);
    }

    @Test
    void aKeyOfAnotherMethodIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> ServiceWind.of(EN, new ServiceabilitySpec.Speed(20)));
        assertThrows(IllegalArgumentException.class, () -> ServiceWind.of(ASCE, new ServiceabilitySpec.ReturnPeriod(10)));
        assertThrows(IllegalArgumentException.class, () -> ServiceWind.of(new WindSpec.Uniform(1.0, 1.0),
                new ServiceabilitySpec.ProbabilityFactor(0.9)));
    }

    /** Every nodal force of the service wind is {@code ratio} × the strength wind's, at several azimuths. */
    private static void assertForcesScale(WindProfile strength, WindProfile service, double ratio) {
        Tower tower = Towers.onePanel(3.0, 2.5, 4.0);
        Ancillaries none = Ancillaries.of(tower, List.of());
        WindLoads a = WindLoads.of(strength, tower, Asce7Ice.NONE, none);
        WindLoads b = WindLoads.of(service, tower, Asce7Ice.NONE, none);
        for (double azimuth : new double[] {0, 30, 45, 100, 225}) {
            List<NodeForce> fa = a.at(azimuth);
            List<NodeForce> fb = b.at(azimuth);
            assertEquals(fa.size(), fb.size());
            for (int k = 0; k < fa.size(); k++) {
                assertEquals(fa.get(k).node(), fb.get(k).node());
                assertEquals(ratio * fa.get(k).fx(), fb.get(k).fx(), 1e-12 * Math.abs(fa.get(k).fx()) + 1e-12);
                assertEquals(ratio * fa.get(k).fy(), fb.get(k).fy(), 1e-12 * Math.abs(fa.get(k).fy()) + 1e-12);
            }
        }
    }
}
