package tetrapod.solve;

/**
 * How nodes are ordered for equation numbering. EJML's sparse Cholesky has no fill-reducing
 * ordering of its own, so the band structure we give it decides the fill and the work.
 */
public enum NodeOrdering {
    /** The frame's order or reverse Cuthill–McKee, whichever has the smaller profile. */
    AUTOMATIC,
    /** The frame's node order as given (towers are generated bottom-up, already banded). */
    GIVEN,
    /** Reverse Cuthill–McKee on the node adjacency graph. */
    REVERSE_CUTHILL_MCKEE
}
