package tetrapod.model;

/**
 * The one colour of each member role (sRGB as 0xRRGGBB), wherever roles are told apart by colour:
 * the 3D picture and window coloured by role, the report's charts and their legends.
 *
 * <p>Chosen to stay apart for readers with the three common colour-vision deficiencies (issue 16
 * item 9): five colours of the palette of M. Okabe and K. Ito, "Color Universal Design (CUD): how to
 * make figures and presentations that are friendly to colorblind people" (2008), beside the dark slate
 * the legs have always had; view.ColourVisionTest simulates protanopia, deuteranopia and tritanopia
 * on them and asserts a least distance between every two.
 */
public final class RoleColours {

    private static final int[] RGB = {
        0x2F3B52, // leg: dark slate
        0x0072B2, // diagonal: blue (Okabe-Ito)
        0xE69F00, // horizontal: orange (Okabe-Ito)
        0x56B4E9, // redundant: sky blue (Okabe-Ito)
        0xD55E00, // plan: vermilion (Okabe-Ito)
        0x707070, // general: neutral grey
    };

    private RoleColours() { }

    /** The colour of {@code role} as 0xRRGGBB. */
    public static int rgb(Role role) {
        return RGB[role.ordinal()];
    }
}
