package tetrapod.model;

/**
 * The one colour of each member role (sRGB as 0xRRGGBB), wherever roles are told apart by colour:
 * the 3D picture and window coloured by role, the report's charts and their legends.
 */
public final class RoleColours {

    private static final int[] RGB = {
        0x2F3B52, // leg: dark slate
        0x2A9D8F, // diagonal: teal
        0xC98A1B, // horizontal: ochre
        0x9C8AC4, // redundant: lavender
        0x6F8F2F, // plan: olive
        0x707070, // general: grey
    };

    private RoleColours() { }

    /** The colour of {@code role} as 0xRRGGBB. */
    public static int rgb(Role role) {
        return RGB[role.ordinal()];
    }
}
