package tetrapod.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.model.Role;

/**
 * The picked member's highlight stays visible under every colouring (issue 16 item 8). Measured
 * with the contrast ratio of WCAG 2.1 (W3C, 2018; definitions "relative luminance" and "contrast
 * ratio"), against the 3:1 that its success criterion 1.4.11 (non-text contrast) asks of graphical
 * objects: for every colour a member can have, the outline or the white band next to it reaches
 * 3:1, and the outline reaches 3:1 against the background.
 */
class PickHighlightTest {

    /** WCAG 2.1 relative luminance of an sRGB colour. */
    static double luminance(Rgb c) {
        return 0.2126 * linear(c.r()) + 0.7152 * linear(c.g()) + 0.0722 * linear(c.b());
    }

    private static double linear(double v) {
        return v <= 0.03928 ? v / 12.92 : Math.pow((v + 0.055) / 1.055, 2.4);
    }

    /** WCAG 2.1 contrast ratio (L1 + 0.05) / (L2 + 0.05), lighter over darker. */
    static double contrast(Rgb a, Rgb b) {
        double la = luminance(a);
        double lb = luminance(b);
        return (Math.max(la, lb) + 0.05) / (Math.min(la, lb) + 0.05);
    }

    @Test
    void theContrastRatioIsWcags() {
        // WCAG 2.1: contrast ratios range from 1:1 to 21:1 (black on white)
        assertEquals(21.0, contrast(Rgb.hex(0x000000), Rgb.hex(0xFFFFFF)), 1e-9);
        assertEquals(1.0, contrast(Rgb.hex(0x777777), Rgb.hex(0x777777)), 1e-12);
        // #111111: channel 17/255 = 0.06667 → ((0.06667 + 0.055) / 1.055)^2.4 = 0.005605 (by hand);
        // on white 1.05 / 0.055605 = 18.88
        assertEquals(0.005605, luminance(PickHighlight.OUTLINE), 5e-7);
        assertEquals(18.88, contrast(PickHighlight.OUTLINE, PickHighlight.BAND), 0.01);
    }

    @Test
    void everyMemberColourHasABandOfTheHighlightAtThreeToOneOrMore() {
        List<Rgb> colours = new ArrayList<>();
        for (Role r : Role.values()) {
            colours.add(new RoleScale().colour(r));
        }
        for (int k = 0; k <= 100; k++) {
            double t = k / 100.0;
            colours.add(new UtilisationScale().colour(t));
            colours.add(new AxialScale(1).colour(2 * t - 1));
            colours.add(new AzimuthScale().colour(360 * t));
        }
        colours.add(UtilisationScale.OVERSTRESS);
        colours.add(ColourScale.NO_VALUE);
        for (Rgb c : colours) {
            double best = Math.max(contrast(c, PickHighlight.OUTLINE), contrast(c, PickHighlight.BAND));
            assertTrue(best >= 3, c + ": " + best);
        }
        assertTrue(contrast(PickHighlight.OUTLINE, Scene.BACKGROUND) >= 3);
    }
}
