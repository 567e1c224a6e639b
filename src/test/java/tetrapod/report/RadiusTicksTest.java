package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The polar charts' radius: every force inside the circle, and the last tick half a unit inside it. */
class RadiusTicksTest {

    @ParameterizedTest
    @ValueSource(doubles = {0.0, 0.013, 0.9, 1.0, 7.3, 40.0, 41.0, 99.9, 100.0, 263.4, 1234.5, 9.9e4})
    void theLargestForceFitsAndTheLastTickStaysClearOfTheCircle(double max) {
        PolarCharts.RadiusTicks t = PolarCharts.RadiusTicks.covering(max);
        assertTrue(t.upper() > max, "circle beyond the largest force");
        double ticks = (t.upper() - t.unit() / 2) / t.unit();
        assertEquals(Math.rint(ticks), ticks, 1e-9, "the circle is half a unit beyond a tick");
        assertTrue(ticks >= 1 && ticks <= 4, ticks + " ticks");
        double mantissa = t.unit() / Math.pow(10, Math.floor(Math.log10(t.unit())));
        assertTrue(java.util.Set.of(1.0, 2.0, 2.5, 5.0).stream().anyMatch(m -> Math.abs(m - mantissa) < 1e-9),
                "unit " + t.unit());
    }

    @ParameterizedTest
    @ValueSource(doubles = {40.0, 100.0})
    void aRoundForceIsTheLastTick(double max) {
        PolarCharts.RadiusTicks t = PolarCharts.RadiusTicks.covering(max);
        assertEquals(max, t.upper() - t.unit() / 2, 1e-9);
    }
}
