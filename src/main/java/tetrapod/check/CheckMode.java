package tetrapod.check;

/**
 * What a check verifies. Strength modes measure a design force effect against a design resistance
 * (their ratio is a utilisation); requirement modes measure a property of the member or its
 * connection that does not depend on the load against the method's limit (slenderness limits, bolt
 * spacing and edge distances, width-to-thickness limits): reported apart, never as utilisation.
 */
public enum CheckMode {
    /** Yielding of the gross section in tension. */
    TENSION("tension"),
    /** Squashing of the (effective) cross-section in compression. */
    COMPRESSION("compression"),
    /** Flexural buckling of the member. */
    COMPRESSION_BUCKLING("compressionBuckling"),
    /** Fracture (or yield, by the method's rule) of the net section at the bolt holes. */
    NET_SECTION("netSection"),
    /** Axial force with bending moments, at a cross-section or over the member. */
    COMBINED("combined"),
    /** Shear of the bolts of the end connection. */
    BOLT_SHEAR("boltShear"),
    /** Bearing of the bolts on the member (and, by ASCE 10, tear-out over the end distance). */
    BOLT_BEARING("boltBearing"),
    /** Requirement: the method's limit on the member's slenderness ratio. */
    SLENDERNESS_LIMIT("slendernessLimit", "slenderness limit"),
    /** Requirement: minimum end and edge distances and spacing of the bolts. */
    BOLT_SPACING("boltSpacing", "bolt end/edge distance and spacing"),
    /** Requirement: the method's largest width-to-thickness ratio of the section's plate elements. */
    WIDTH_THICKNESS("widthToThickness", "width-to-thickness limit"),
    /** Local buckling of the section's plate elements under the compression force. */
    LOCAL_BUCKLING("localBuckling"),
    /** Anchor rods of a leg base in tension. */
    ANCHOR_TENSION("anchorTension"),
    /** Anchor rods of a leg base in shear. */
    ANCHOR_SHEAR("anchorShear"),
    /** Anchor rods of a leg base in tension with shear. */
    ANCHOR_COMBINED("anchorCombined"),
    /** Uplift of a footing against its weight and the soil above it. */
    UPLIFT("uplift"),
    /** Pressure under a footing against the allowable bearing pressure. */
    BEARING_PRESSURE("bearingPressure"),
    /** Sliding of a footing against friction at its base. */
    SLIDING("sliding");

    private final String jsonName;
    private final String requirement;

    CheckMode(String jsonName) {
        this(jsonName, null);
    }

    CheckMode(String jsonName, String requirement) {
        this.jsonName = jsonName;
        this.requirement = requirement;
    }

    /** True for a rule that does not depend on the load (a requirement, not a strength check). */
    public boolean isRequirement() {
        return requirement != null;
    }

    /** The requirement's name for people ("slenderness limit"); the JSON name for strength modes. */
    public String label() {
        return requirement != null ? requirement : jsonName;
    }

    /** The name results.json uses. */
    public String jsonName() {
        return jsonName;
    }
}
