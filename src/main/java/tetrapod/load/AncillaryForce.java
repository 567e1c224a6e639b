package tetrapod.load;

/**
 * The wind on one ancillary item (or on the piece of a linear item within one panel) at one azimuth.
 *
 * @param item          index of the ancillary in the spec's list
 * @param name          its name
 * @param z             height where it acts, m
 * @param q             pressure there for this azimuth, Pa
 * @param effectiveArea force coefficient × area × (1 − shielding), m²
 * @param fx            N
 * @param fy            N
 */
public record AncillaryForce(int item, String name, double z, double q, double effectiveArea, double fx, double fy) { }
