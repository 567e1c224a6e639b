package tetrapod.model.spec;

import java.util.Locale;

/**
 * The family of published rules a model is designed to: every default of the model file follows
 * it, and a model that takes a rule of the other family must say so ({@code mixedBasis}).
 *
 * <ul>
 * <li>EN: EN 1991-1-4 wind, EN 1993-3-1 Annex A partial factors for actions, EN 1993 member and
 *     bolt checks, EN 1997-1 UPL for footing uplift and EN 1993-1-8 anchor rods.</li>
 * <li>US: ASCE 7 wind, ice and load combinations, ASCE 10 member and bolt checks.</li>
 * </ul>
 * Rules of common practice (uniform wind, a factor of safety on uplift, an allowable bearing
 * pressure, allowable rod stresses, sliding) belong to neither family and are accepted in both.
 */
public enum DesignBasis {
    EN,
    US;

    public String jsonName() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** How the family is named in messages and the report. */
    public String title() {
        return this == EN ? "EN (Eurocodes)" : "US (ASCE)";
    }
}
