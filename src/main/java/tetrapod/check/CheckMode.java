package tetrapod.check;

/** What a check verifies: the failure mode its utilisation measures. */
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
    /** Bearing of the bolts on the member, end and edge distances, spacing. */
    BOLT_BEARING("boltBearing"),
    /** The method's limit on the member's slenderness ratio. */
    SLENDERNESS_LIMIT("slenderness"),
    /** Local buckling of the section's plate elements (width-to-thickness ratio). */
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

    CheckMode(String jsonName) {
        this.jsonName = jsonName;
    }

    /** The name results.json uses. */
    public String jsonName() {
        return jsonName;
    }
}
