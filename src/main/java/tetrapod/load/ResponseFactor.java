package tetrapod.load;

/**
 * The dynamic response factor a wind force is multiplied by, computed from the tower's first sway
 * frequency: c_s·c_d of EN 1991-1-4 or G of ASCE 7.
 */
public sealed interface ResponseFactor permits En1991StructuralFactor, Asce7GustFactor {

    /** The factor, dimensionless. */
    double value();

    /** The first sway frequency it was computed from, Hz. */
    double frequency();
}
