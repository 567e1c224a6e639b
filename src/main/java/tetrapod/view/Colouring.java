package tetrapod.view;

import java.util.Locale;

/** What the members' colours show. */
public enum Colouring {
    /** Member role (leg, diagonal, ...): categorical, needs no results. */
    ROLE,
    /** Axial force N, N, tension positive: diverging, symmetric about zero. */
    AXIAL,
    /** Utilisation (demand over resistance), 1 at the limit: sequential, a distinct colour above 1. */
    UTILISATION,
    /** Governing wind azimuth, deg: cyclic. */
    AZIMUTH;

    /** The name used on the command line: {@code role}, {@code axial}, ... */
    public String optionName() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The colouring named {@code text} (case ignored), or empty. */
    public static java.util.Optional<Colouring> fromOptionName(String text) {
        for (Colouring c : values()) {
            if (c.optionName().equalsIgnoreCase(text)) {
                return java.util.Optional.of(c);
            }
        }
        return java.util.Optional.empty();
    }
}
