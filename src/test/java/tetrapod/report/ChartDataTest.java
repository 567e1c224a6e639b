package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import tetrapod.report.Rows.LegSweep;
import tetrapod.report.Rows.PanelRow;
import tetrapod.report.Rows.WindRow;

/** The numbers behind the charts, on small hand-made inputs whose answers are worked here. */
class ChartDataTest {

    @Test
    void histogramBinsAreTenthsUpToOneThenAboveOne() {
        assertEquals(0, ChartData.bin(0.0));
        assertEquals(0, ChartData.bin(0.0999));
        assertEquals(1, ChartData.bin(0.1));
        assertEquals(9, ChartData.bin(0.95));
        assertEquals(9, ChartData.bin(1.0), "exactly 1.0 passes: the last band up to 1.0");
        assertEquals(10, ChartData.bin(1.0001));
        assertEquals(10, ChartData.bin(99.0));
        assertEquals("0.9–1.0", ChartData.binLabel(9));
        assertEquals("> 1.0", ChartData.binLabel(10));
    }

    @Test
    void legBaseEnvelopeTakesTheLargestOverCombinationsAtEachAzimuth() {
        // node 1: two combinations; compression is Fz > 0, uplift −Fz > 0, zero where the other sign
        LegSweep a = new LegSweep(1, "A", List.of(0.0, 90.0), List.of(10.0, -4.0), List.of(1.0, 2.0));
        LegSweep b = new LegSweep(1, "B", List.of(0.0, 90.0), List.of(7.0, -9.0), List.of(3.0, 0.5));
        Map<Integer, List<ChartData.Point>> compression = ChartData.legBaseEnvelope(List.of(a, b), false);
        assertEquals(List.of(new ChartData.Point(0, 10), new ChartData.Point(90, 0)), compression.get(1));
        Map<Integer, List<ChartData.Point>> uplift = ChartData.legBaseEnvelope(List.of(a, b), true);
        assertEquals(List.of(new ChartData.Point(0, 0), new ChartData.Point(90, 9)), uplift.get(1));
        Map<Integer, List<ChartData.Point>> shear = ChartData.legBaseShear(List.of(a, b));
        assertEquals(List.of(new ChartData.Point(0, 3), new ChartData.Point(90, 2)), shear.get(1));
    }

    @Test
    void identicalPressureProfilesAreShownOnce() {
        PanelRow low = new PanelRow(1, 0, 2, 1, 1000, 0.2, 3, 1, 10, 0);
        PanelRow high = new PanelRow(2, 2, 4, 3, 1200, 0.2, 3, 1, 12, 0);
        PanelRow highOther = new PanelRow(2, 2, 4, 3, 900, 0.2, 3, 1, 9, 0);
        Map<Double, List<ChartData.Point>> profiles = ChartData.pressureProfiles(List.of(
                new WindRow(0, List.of(low, high)), new WindRow(45, List.of(low, high)),
                new WindRow(90, List.of(low, highOther))));
        assertEquals(List.of(0.0, 90.0), List.copyOf(profiles.keySet()));
        // a staircase: each panel's q over its height, bottom then top
        assertEquals(List.of(new ChartData.Point(1000, 0), new ChartData.Point(1000, 2), new ChartData.Point(1200, 2),
                new ChartData.Point(1200, 4)), profiles.get(0.0));
    }

    @Test
    void formatsWriteNoNegativeZeroAndAzimuthsWithoutTrailingZeros() {
        assertEquals("0.0", Format.kN(-1e-9));
        assertEquals("12.3", Format.kN(12_345));
        assertEquals("45", Format.degrees(45.0));
        assertEquals("47.5", Format.degrees(47.5));
        assertEquals("0.1", Format.degrees(0.1));
        assertEquals("no wind", Format.azimuth(null));
        assertEquals("1.000", Format.utilisation(0.99951));
    }
}
