package tetrapod.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;
import tetrapod.model.Role;

class ColourScaleTest {

    /** CIE 1976 L* of an sRGB colour, computed without Oklab: Y from IEC 61966-2-1 linearisation and ITU-R BT.709 weights. */
    static double cieLightness(Rgb c) {
        double y = 0.2126 * OkLab.toLinear(c.r()) + 0.7152 * OkLab.toLinear(c.g()) + 0.0722 * OkLab.toLinear(c.b());
        double f = y > 216.0 / 24389 ? Math.cbrt(y) : (24389.0 / 27 * y + 16) / 116;  // CIE 15:2004 (8.3)
        return 116 * f - 16;
    }

    @Test
    void oklabMapsWhiteToLightnessOneAndGreysToZeroChroma() {
        double[] white = OkLab.fromSrgb(new Rgb(1, 1, 1));
        assertEquals(1.0, white[0], 1e-4);
        assertEquals(0.0, white[1], 1e-4);
        assertEquals(0.0, white[2], 1e-4);
        double[] grey = OkLab.fromSrgb(new Rgb(0.5f, 0.5f, 0.5f));
        assertEquals(0.0, grey[1], 1e-4);
        assertEquals(0.0, grey[2], 1e-4);
        assertEquals(0.0, OkLab.fromSrgb(new Rgb(0, 0, 0))[0], 1e-9);
    }

    @Test
    void oklabRoundTripsEverySrgbColour() {
        Random random = new Random(7);
        for (int k = 0; k < 500; k++) {
            Rgb c = new Rgb(random.nextFloat(), random.nextFloat(), random.nextFloat());
            double[] lab = OkLab.fromSrgb(c);
            Rgb back = OkLab.toSrgb(lab[0], lab[1], lab[2]);
            assertTrue(c.channelDistance(back.packed()) <= 1, c + " came back as " + back);
        }
    }

    @Test
    void utilisationScaleEndsAndLimit() {
        UtilisationScale s = new UtilisationScale();
        // the ends are the scale's first and last stops (pale blue-grey, deep violet)
        assertTrue(s.colour(0).channelDistance(OkLab.lch(0.86, 0.035, 235).packed()) <= 1, s.colour(0).toString());
        assertTrue(s.colour(1.0).channelDistance(OkLab.lch(0.30, 0.12, 300).packed()) <= 1, s.colour(1).toString());
        assertEquals(s.colour(0), s.colour(-0.3), "negative utilisation is drawn as 0");
        assertEquals(UtilisationScale.OVERSTRESS, s.colour(1.0000001));
        assertEquals(UtilisationScale.OVERSTRESS, s.colour(3.7));
        assertNotEquals(UtilisationScale.OVERSTRESS, s.colour(1.0), "exactly at the limit is not over it");
        assertEquals(ColourScale.NO_VALUE, s.colour(Double.NaN));
    }

    @Test
    void utilisationScaleGetsSteadilyDarkerAndNeverNearTheOverstressColour() {
        UtilisationScale s = new UtilisationScale();
        double previous = Double.MAX_VALUE;
        for (int k = 0; k <= 200; k++) {
            Rgb c = s.colour(k / 200.0);
            double lightness = cieLightness(c);
            assertTrue(lightness < previous + 1e-9, "lightness rises at u = " + k / 200.0);
            previous = lightness;
            assertTrue(c.channelDistance(UtilisationScale.OVERSTRESS.packed()) > 90,
                    "u = " + k / 200.0 + " looks like the overstress colour");
        }
        assertTrue(cieLightness(s.colour(0)) - cieLightness(s.colour(1)) > 50, "too little lightness range");
    }

    @Test
    void axialScaleIsSymmetricWithCompressionWarmAndTensionCool() {
        AxialScale s = new AxialScale(250e3);
        Rgb zero = s.colour(0);
        double[] lab = OkLab.fromSrgb(zero);
        assertTrue(Math.hypot(lab[1], lab[2]) < 0.02, "zero force should be near-neutral: " + zero);
        for (double n : new double[] {50e3, 125e3, 250e3}) {
            assertEquals(cieLightness(s.colour(n)), cieLightness(s.colour(-n)), 3.0, "lightness at ±" + n);
        }
        Rgb compression = s.colour(-250e3);
        Rgb tension = s.colour(250e3);
        assertTrue(compression.r() > compression.b(), "compression should be warm: " + compression);
        assertTrue(tension.b() > tension.r(), "tension should be cool: " + tension);
        assertEquals(s.colour(-250e3), s.colour(-900e3), "beyond the range is the end colour");
        assertEquals(1.0, new AxialScale(0).range(), "an all-zero case still has a scale");
    }

    @Test
    void axialLegendNumbersTheRangeInKilonewtons() {
        Legend legend = new AxialScale(199_990).legend();  // ±199.99 kN
        assertEquals(List.of("-200 compression", "-100", "0", "100", "200 tension"),
                legend.ticks().stream().map(Legend.Tick::label).toList());
    }

    @Test
    void azimuthScaleIsCyclic() {
        AzimuthScale s = new AzimuthScale();
        assertEquals(s.colour(0), s.colour(360));
        assertEquals(s.colour(45), s.colour(-315));
        assertNotEquals(s.colour(0), s.colour(180));
    }

    @Test
    void everyRoleHasItsOwnColour() {
        RoleScale s = new RoleScale();
        Set<Rgb> seen = new HashSet<>();
        for (Role r : Role.values()) {
            assertTrue(seen.add(s.colour(r)), "two roles share " + s.colour(r));
            assertEquals(s.colour(r), s.colour(r.ordinal()));
        }
        assertEquals(Role.values().length, s.legend().swatches().size());
    }

    @Test
    void utilisationLegendNumbersTheBarAndNamesTheOverstressColour() {
        Legend legend = new UtilisationScale().legend();
        assertEquals("0", legend.ticks().get(0).label());
        assertEquals("1.00", legend.ticks().get(legend.ticks().size() - 1).label());
        assertEquals(1.0, legend.ticks().get(legend.ticks().size() - 1).position());
        assertEquals(Legend.BAR_SAMPLES, legend.bar().size());
        assertEquals(new UtilisationScale().colour(1.0), legend.bar().get(legend.bar().size() - 1));
        assertTrue(legend.swatches().stream().anyMatch(w -> w.colour().equals(UtilisationScale.OVERSTRESS)
                && w.label().contains("over 1.00")));
    }
}
