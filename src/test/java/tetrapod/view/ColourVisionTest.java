package tetrapod.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import tetrapod.model.Role;

/**
 * The colour scales stay readable for the three common colour-vision deficiencies (issue 16 item
 * 9). Each deficiency is simulated with the matrices of G. M. Machado, M. M. Oliveira and L. A. F.
 * Fernandes, "A physiologically-based model for simulation of color vision deficiency", IEEE TVCG
 * 15(6), 2009, at severity 1.0, applied to linear sRGB (the coefficients are recalled from memory;
 * each row sums to 1 so that white stays white, checked below). Distances are Euclidean in Oklab
 * (ΔE_OK, as CSS Color Module Level 4 defines deltaEOK). The least distances asked for are our own
 * design criteria, no standard's: 0.09 between any two role colours, 0.06 between azimuths 30° apart,
 * 0.02 between points a tenth of a continuous bar apart (about two just-noticeable steps in Oklab,
 * common practice, recalled).
 */
class ColourVisionTest {

    private static final Map<String, double[][]> DEFICIENCIES = Map.of(
            "protanopia", new double[][] {
                {0.152286, 1.052583, -0.204868}, {0.114503, 0.786281, 0.099216}, {-0.003882, -0.048116, 1.051998}},
            "deuteranopia", new double[][] {
                {0.367322, 0.860646, -0.227968}, {0.280085, 0.672501, 0.047413}, {-0.011820, 0.042940, 0.968881}},
            "tritanopia", new double[][] {
                {1.255528, -0.076749, -0.178779}, {-0.078411, 0.930809, 0.147602}, {0.004733, 0.691367, 0.303900}},
            "normal vision", new double[][] {{1, 0, 0}, {0, 1, 0}, {0, 0, 1}});

    @Test
    void theSimulationKeepsWhiteAndGreysAsTheyAre() {
        DEFICIENCIES.forEach((name, m) -> {
            for (double[] row : m) {
                assertEquals(1.0, row[0] + row[1] + row[2], 2e-6, name);
            }
            Rgb grey = Rgb.hex(0x808080);
            assertTrue(distance(seen(grey, m), OkLab.fromSrgb(grey)) < 1e-5, name);
        });
    }

    /** Ottosson (2020) / CSS Color 4: the Oklab coordinates of the sRGB primaries (recalled, 4 digits). */
    @Test
    void oklabOfTheSrgbPrimariesIsThePublishedOne() {
        assertOklab(0xFF0000, 0.6280, 0.2249, 0.1258);
        assertOklab(0x00FF00, 0.8664, -0.2339, 0.1795);
        assertOklab(0x0000FF, 0.4520, -0.0325, -0.3115);
    }

    @Test
    void everyTwoRoleColoursStayApartForEveryReader() {
        RoleScale scale = new RoleScale();
        List<String> close = new ArrayList<>();
        DEFICIENCIES.forEach((name, m) -> {
            for (Role a : Role.values()) {
                for (Role b : Role.values()) {
                    double d = distance(seen(scale.colour(a), m), seen(scale.colour(b), m));
                    if (a.ordinal() < b.ordinal() && d < 0.09) {
                        close.add(name + ": " + a.jsonName() + " and " + b.jsonName() + " ΔE_OK " + d);
                    }
                }
            }
        });
        assertEquals(List.of(), close);
    }

    @Test
    void azimuths30DegreesApartStayApartForEveryReader() {
        AzimuthScale scale = new AzimuthScale();
        List<String> close = new ArrayList<>();
        DEFICIENCIES.forEach((name, m) -> {
            for (int deg = 0; deg < 360; deg += 30) {
                double d = distance(seen(scale.colour(deg), m), seen(scale.colour(deg + 30), m));
                if (d < 0.06) {
                    close.add(name + ": " + deg + "° and " + (deg + 30) + "° ΔE_OK " + d);
                }
            }
        });
        assertEquals(List.of(), close);
    }

    /** The loop is drawn as designed: no colour of it is clamped into the sRGB gamut. */
    @Test
    void theAzimuthLoopLiesInsideTheSrgbGamut() {
        for (int deg = 0; deg < 360; deg++) {
            double[] lab = AzimuthScale.lab(deg);
            assertTrue(distance(OkLab.fromSrgb(new AzimuthScale().colour(deg)), lab) < 0.004, deg + "°");
        }
    }

    @Test
    void theContinuousScalesStepVisiblyForEveryReader() {
        List<String> close = new ArrayList<>();
        AxialScale axial = new AxialScale(100);
        UtilisationScale utilisation = new UtilisationScale();
        DEFICIENCIES.forEach((name, m) -> {
            for (int k = 0; k < 10; k++) {
                double u = k / 10.0;
                double du = distance(seen(utilisation.colour(u), m), seen(utilisation.colour(u + 0.1), m));
                if (du < 0.02) {
                    close.add(name + ": utilisation " + u + " ΔE_OK " + du);
                }
                double f = -100 + 20 * k;
                double df = distance(seen(axial.colour(f), m), seen(axial.colour(f + 20), m));
                if (df < 0.02) {
                    close.add(name + ": axial " + f + " ΔE_OK " + df);
                }
            }
        });
        assertEquals(List.of(), close);
    }

    private static void assertOklab(int hex, double l, double a, double b) {
        double[] lab = OkLab.fromSrgb(Rgb.hex(hex));
        assertEquals(l, lab[0], 1e-3, "L of " + Integer.toHexString(hex));
        assertEquals(a, lab[1], 1e-3, "a of " + Integer.toHexString(hex));
        assertEquals(b, lab[2], 1e-3, "b of " + Integer.toHexString(hex));
    }

    /** Oklab of {@code c} as a reader with deficiency {@code m} sees it. */
    private static double[] seen(Rgb c, double[][] m) {
        double[] lin = {OkLab.toLinear(c.r()), OkLab.toLinear(c.g()), OkLab.toLinear(c.b())};
        double[] out = new double[3];
        for (int i = 0; i < 3; i++) {
            double v = m[i][0] * lin[0] + m[i][1] * lin[1] + m[i][2] * lin[2];
            v = Math.max(0, Math.min(1, v));
            out[i] = v <= 0.0031308 ? 12.92 * v : 1.055 * Math.pow(v, 1 / 2.4) - 0.055;
        }
        return OkLab.fromSrgb(new Rgb((float) out[0], (float) out[1], (float) out[2]));
    }

    private static double distance(double[] p, double[] q) {
        return Math.sqrt((p[0] - q[0]) * (p[0] - q[0]) + (p[1] - q[1]) * (p[1] - q[1]) + (p[2] - q[2]) * (p[2] - q[2]));
    }
}
